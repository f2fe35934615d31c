import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { naiveCount } from '../../src/reference/naive-count.js';
import { cohomologyPieces, kTheoryPieces } from '../unit/reference/puzzle-pieces.js';
import { commandWords, expectReplayReproduces } from '../helpers/contracts.js';
import { cli } from './cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-query-'));
const db = join(dir, 'store.sqlite');
const CLAIM = 'conjectures/k-theory-equals-cohomology.json';
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let replayCmd = '';
beforeAll(() => {
  const r = cli(['run', CLAIM, '--db', db, '--workers', '2', '--max', 'n=3']);
  expect(r.status).toBe(0);
  const raised = cli(['run', CLAIM, '--db', db, '--workers', '2']);
  expect(raised.status).toBe(1);
  replayCmd = /replay: (.*)$/m.exec(raised.stdout)![1]!;
});

describe('status, counterexamples, replay and schema (built CLI)', () => {
  it('status reports verified classes, counterexample count and the last run', () => {
    const r = cli(['status', 'k-theory-equals-cohomology', '--db', db, '--json']);
    expect(r.status).toBe(0);
    const [s] = JSON.parse(r.stdout) as { verified: { classKey: string }[]; counterexamples: number; lastRun: { status: string } }[];
    expect(s!.verified.map((v) => v.classKey)).toEqual(['n=1', 'n=2', 'n=3']);
    expect(s!.lastRun.status).toBe('completed');
    expect(s!.counterexamples).toBeGreaterThan(0);
    expect(cli(['status', '--db', db]).stdout).toContain('k-theory-equals-cohomology');
  });

  it('counterexamples --smallest --json lists a boundary whose values differ by a brute-force count', () => {
    const r = cli(['counterexamples', CLAIM, '--db', db, '--smallest', '--limit', '1', '--json']);
    expect(r.status).toBe(0);
    const [c] = JSON.parse(r.stdout) as { lengths: number[]; left: { sides: string[]; text: string }; right: { text: string } }[];
    // Independent values by plain backtracking (src/reference/naive-count.ts).
    const coh = naiveCount(c!.lengths, c!.left.sides, cohomologyPieces()).value.toString();
    const k = naiveCount(c!.lengths, c!.left.sides, kTheoryPieces()).value.toString();
    expect(coh).not.toBe(k);
    expect([BigInt(c!.left.text), BigInt(c!.right.text)]).toEqual([BigInt(coh), BigInt(k)]);
  });

  it('the printed replay command recomputes the instance with both boundaries, values and puzzles', () => {
    expect(replayCmd).toMatch(/^puzzlesweep replay /);
    const r = cli(commandWords(replayCmd).slice(1));
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('fails (counterexample)');
    expect(r.stdout).toMatch(/left: cohomology/);
    expect(r.stdout).toMatch(/right: k-theory/);
    expect(r.stdout).toContain('puzzle 1');
    const bad = cli(['replay', CLAIM, '--instance', 'n=4']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('[invalid_argument]');
  });

  it('replay --json reproduces every stored counterexample of the smallest class: boundaries, values, verdict', () => {
    type Side = { sides: string[]; text: string };
    const stored = JSON.parse(cli(['counterexamples', CLAIM, '--db', db, '--smallest', '--json']).stdout) as { classKey: string; index: string; left: Side; right: Side }[];
    const seen = (m: Side) => ({ sides: m.sides, text: m.text });
    expectReplayReproduces(
      stored,
      (c) => {
        const r = cli(['replay', CLAIM, '--instance', `${c.classKey}:${c.index}`, '--json']);
        const out = JSON.parse(r.stdout) as { status: string; left: Side; right: Side };
        return { exit: r.status, status: out.status, left: seen(out.left), right: seen(out.right) };
      },
      (c) => ({ exit: 1, status: 'fails', left: seen(c.left), right: seen(c.right) }),
      (c) => `${c.classKey}:${c.index}`,
    );
  });

  it('schema --out writes the JSON Schema that the committed schema file and the claim files use', () => {
    const out = join(dir, 'claim.schema.json');
    expect(cli(['schema', '--out', out]).status).toBe(0);
    const schema = JSON.parse(readFileSync(out, 'utf8')) as { $schema: string; required: string[] };
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    // The claim's parts as issue 3 §1 lists them.
    expect([...schema.required].sort()).toEqual(['compare', 'family', 'id', 'statement', 'theory', 'transform']);
    expect(readFileSync(out, 'utf8')).toBe(readFileSync('conjectures/schema/claim.schema.json', 'utf8'));
    const claim = JSON.parse(readFileSync(CLAIM, 'utf8')) as { $schema: string };
    expect(claim.$schema).toBe('./schema/claim.schema.json');
  });
});
