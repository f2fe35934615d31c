import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli } from './cli-process.js';
import { hexagonFamily } from '../helpers/hexagon-family.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-discover-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// (a,0,b,a,0,b) with opposite sides of equal content, a, b ≤ 2: small enough for a spawned CLI.
const familyFile = join(dir, 'hexagon.json');
writeFileSync(
  familyFile,
  JSON.stringify({
    id: 'hex',
    family: hexagonFamily(2),
    space: { complement: ['none'] },
  }),
);

describe('discover (built CLI)', () => {
  const db = join(dir, 'store.sqlite');
  const out = join(dir, 'found');

  it('prints exactly { survivors: [{ claim, evidence }], dropped: [{ claim, counterexample }] } and writes runnable claim files', () => {
    const r = cli(['discover', familyFile, '--theory', 'equivariant', '--db', db, '--out', out, '--json']);
    expect(r.status, r.stderr).toBe(0);
    const result = JSON.parse(r.stdout) as { survivors: { claim: { id: string; compare: { relation: unknown } }; evidence: { file: string } }[]; dropped: { claim: object; counterexample: object }[] };
    expect(Object.keys(result)).toEqual(['survivors', 'dropped']);
    for (const s of result.survivors) expect(Object.keys(s)).toEqual(['claim', 'evidence']);
    for (const d of result.dropped) expect(Object.keys(d)).toEqual(['claim', 'counterexample']);
    expect(result.dropped.length).toBeGreaterThan(0);
    const exchange = result.survivors.find((s) => s.claim.id === 'hex-equivariant-exchange-1-4-substituted');
    expect(exchange?.claim.compare.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] });
    expect(existsSync(exchange!.evidence.file)).toBe(true);
    expect(JSON.parse(readFileSync(exchange!.evidence.file, 'utf8'))).toEqual(exchange!.claim);
    // The written claim is a claim file like any other: it sweeps, with exact polynomials, without a counterexample.
    const swept = cli(['run', exchange!.evidence.file, '--db', join(dir, 'sweep.sqlite'), '--workers', '1', '--exact', '--max', 'a=3', '--json']);
    expect(swept.status, swept.stdout + swept.stderr).toBe(0);
  });

  it('a second run resumes from the store: nothing is swept again and the report is the same', () => {
    const first = JSON.parse(cli(['discover', familyFile, '--theory', 'equivariant', '--db', db, '--out', out, '--json']).stdout) as { survivors: { claim: { id: string } }[] };
    const again = cli(['discover', familyFile, '--theory', 'equivariant', '--db', db, '--out', out]);
    expect(again.status).toBe(0);
    // Only stored counterexamples are recomputed (two values each at most).
    const computed = Number(/(\d+) values computed/.exec(again.stdout)![1]);
    const dropped = Number(/dropped: (\d+)/.exec(again.stdout)![1]);
    expect(computed).toBeLessThanOrEqual(2 * dropped);
    for (const s of first.survivors) expect(again.stdout).toContain(s.claim.id);
  });

  it('bad input names the field and exits 2', () => {
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({ family: { sides: ['a', 0, 'a'], variables: [{ name: 'a', min: 1, max: 2 }] } }));
    const r = cli(['discover', bad, '--theory', 'cohomology', '--db', db]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('family.sides');
  });
});
