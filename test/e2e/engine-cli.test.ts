import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const cli = (args: string[]) => spawnSync(process.execPath, ['dist/cli/main.js', ...args], { encoding: 'utf8' });

// dist/ is built once by the npm script before any test; test/setup/dist-is-fresh.ts checks it is current.
describe('puzzlesweep count', () => {
  it('prints the stable JSON fields', () => {
    const r = cli(['count', '--theory', 'equivariant', '--triangle', '10,10,10', '--json']);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ theory: 'equivariant', lengths: [2, 0, 2, 0, 2, 0], sides: ['10', '', '10', '', '01', ''], puzzles: 1, formatVersion: 2 });
    // Integers are JSON numbers below 2^53 [README, "Counting one boundary"].
    // c_{10,10}^{10} = y2 − y1 on Gr(1,2) [localization; Knutson–Tao, Duke 2003]
    expect(out.value.terms).toHaveLength(2);
    expect(out.value.terms).toEqual(
      expect.arrayContaining([
        { coefficient: 1, exponents: [0, 1] },
        { coefficient: -1, exponents: [1, 0] },
      ]),
    );
  });

  it('counts c_{21,21}^{321} = 2 given as sides [value from memory]', () => {
    const r = cli(['count', '--theory', 'cohomology', '--sides', '010101,-,010101,-,010101,-', '--json']);
    expect(JSON.parse(r.stdout).value).toBe(2);
  });

  it('counts puzzles by a statistic: G1·G1 ∋ −G21 comes from one puzzle with one K-piece [Buch, Acta Math. 2002]', () => {
    const r = cli(['count', '--theory', 'k-theory', '--triangle', '0101,0101,1010', '--statistic', 'k-piece', '--json']);
    expect(JSON.parse(r.stdout)).toMatchObject({ value: -1, distribution: { kind: 'k-piece', counts: [0, 1] } });
    const bad = cli(['count', '--theory', 'k-theory', '--triangle', '0101,0101,1010', '--statistic', 'k']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain("one of '0-triangle' | '1-triangle' | '10-triangle' | 'k-piece', received 'k'");
  });

  it('counts the completed triangle with --completed', () => {
    const r = cli(['count', '--theory', 'cohomology', '--sides', '01,1,01,1,01,1', '--completed', '--json']);
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout)).toMatchObject({ region: 'completed', completion: { lengths: [4, 0, 4, 0, 4, 0] } });
  });

  it.each([
    [['count', '--theory', 'cohomology', '--sides', '01,1,01,1,2,-'], 'invalid_region', '--sides'],
    [['count', '--theory', 'cohomology', '--sides', '01,1,01,1,02,1'], 'invalid_boundary', '--sides[4]'],
    [['count', '--theory', 'kohomology', '--triangle', '01,01,01'], 'unknown_theory', '--theory'],
    [['count', '--theory', 'cohomology', '--triangle', '01,01'], 'invalid_argument', '--triangle'],
  ])('rejects bad input with a coded error and exit 2: %j', (args, code, where) => {
    const r = cli(args);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`[${code}]`);
    expect(r.stderr).toContain(`→ at ${where}`);
  });

  it('reads a custom piece set and names the bad field of a broken one', () => {
    const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-'));
    const file = join(dir, 'broken.json');
    writeFileSync(file, JSON.stringify({ name: 'broken', boundaryLabels: ['0', '1'], pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['sideways'] }] }));
    const r = cli(['count', '--theory', file, '--triangle', '01,01,01']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('[invalid_piece_set]');
    expect(r.stderr).toContain('pieces[0].orientations[0]');
  });
});

describe('puzzlesweep show and crosscheck', () => {
  it('draws every puzzle: two for c_{21,21}^{321} [value from memory]', () => {
    const r = cli(['show', '--theory', 'cohomology', '--triangle', '010101,010101,101010']);
    expect(r.status).toBe(0);
    expect(r.stdout.match(/^puzzle \d+$/gm)).toHaveLength(2);
  });

  it('exits 0 when engine and reference agree and 1 when a custom piece set disagrees', () => {
    expect(cli(['crosscheck', '--theory', 'cohomology', '--max-n', '4']).status).toBe(0);
    const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-'));
    const file = join(dir, 'no-rhombi.json');
    // without the 10-triangles only trivial products survive, so σ1·σ1 = σ2 + σ11 is missed [Pieri’s rule; Fulton 1997]
    writeFileSync(file, JSON.stringify({ name: 'no-rhombi', boundaryLabels: ['0', '1'], pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] }, { edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] }] }));
    const r = cli(['crosscheck', '--theory', 'cohomology', '--max-n', '4', '--pieces', file]);
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('first disagreement');
  });
});
