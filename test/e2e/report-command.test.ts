import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { countBoundary, fillingCountSemiring, makeRegion, structureConstantSides, theoryPieceSet } from '../../src/engine/index.js';
import { parseXml } from '../helpers/xml-check.js';

const CLI = resolve('dist/cli/main.js');
const CLAIM = resolve('conjectures/k-theory-equals-cohomology.json');
const work = mkdtempSync(join(tmpdir(), 'puzzlesweep-report-cli-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));
const cli = (...args: string[]) => spawnSync('node', [CLI, ...args], { cwd: work, encoding: 'utf8' });

const count = (theory: string, sides: readonly string[]) =>
  Number(countBoundary(makeRegion(sides.map((s) => s.length)), sides, theoryPieceSet(theory), { semiring: fillingCountSemiring }));

describe('show --svg / --tikz and report, through the built CLI', () => {
  it('writes an SVG and a TikZ document with every puzzle of the boundary', () => {
    // λ=1001, μ=0110, ν=1010 in Gr(2,4): a small equivariant boundary with several puzzles and rhombi (common practice, no source).
    const triangle = '1001,0110,1010';
    const r = cli('show', '--theory', 'equivariant', '--triangle', triangle, '--svg', 'out/p.svg', '--tikz', 'out/p.tex');
    expect(r.status, r.stderr).toBe(0);
    const want = count('equivariant', structureConstantSides(...(triangle.split(',') as [string, string, string])));
    const svg = parseXml(readFileSync(join(work, 'out/p.svg'), 'utf8'));
    expect(svg.filter((e) => e.attributes['data-puzzle'] !== undefined).length).toBe(want);
    expect(readFileSync(join(work, 'out/p.tex'), 'utf8').match(/\\begin\{tikzpicture\}/g)?.length).toBe(want);
    // Without --svg/--tikz, the text drawing stays.
    expect(cli('show', '--theory', 'equivariant', '--triangle', triangle).stdout).toContain('puzzle 1');
  });

  it('reports a swept claim with its counterexample drawn, puzzles matching the engine count', () => {
    const db = join(work, 's.sqlite');
    spawnSync('node', [CLI, 'run', CLAIM, '--db', db, '--workers', '1', '--json'], { cwd: work, encoding: 'utf8' });
    const listed = JSON.parse(execFileSync('node', [CLI, 'counterexamples', 'k-theory-equals-cohomology', '--db', db, '--json'], { encoding: 'utf8' })) as {
      left: { theory: string; sides: string[] };
      right: { theory: string; sides: string[] };
    }[];
    expect(listed.length).toBeGreaterThan(0);
    const r = cli('report', 'k-theory-equals-cohomology', '--db', db, '--out', 'r/report.html', '--draw', '1');
    expect(r.status, r.stderr).toBe(0);
    const html = readFileSync(join(work, 'r/report.html'), 'utf8');
    expect(html).not.toMatch(/<script|<link|src="http|href="http/);
    const first = listed[0]!;
    expect((html.match(/<g data-puzzle=/g) ?? []).length).toBe(count(first.left.theory, first.left.sides) + count(first.right.theory, first.right.sides));
    expect((html.match(/<tr data-listed=/g) ?? []).length).toBe(listed.length - 1);
  });

  it('names the argument when the claim is not in the store', () => {
    const r = cli('report', 'no-such-claim', '--db', join(work, 'missing.sqlite'));
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('--db');
  });
});
