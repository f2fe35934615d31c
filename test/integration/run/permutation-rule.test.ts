import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { toTerms } from '../../../src/reference/ref-polynomial.js';
import { loadSweepClaim } from '../../../src/run/load-sweep-claim.js';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';
import { equivariantPieces } from '../../unit/reference/puzzle-pieces.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-rule-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const claim = {
  id: 'equivariant-parallelogram-exchange',
  statement: 'Exchanging sides 1 and 4 of an (a,0,b,a,0,b) parallelogram changes its equivariant value by some block reversal.',
  theory: 'equivariant',
  family: { sides: ['a', 0, 'b', 'a', 0, 'b'], variables: [{ name: 'a', min: 1, max: 4 }, { name: 'b', min: 1, max: 4 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
  transform: [{ type: 'exchange', sides: [1, 4] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equalUpToPermutation', searchSpace: 'blockReversals' } },
};

const words = (n: number) => Array.from({ length: 2 ** n }, (_, i) => i.toString(2).padStart(n, '0'));
const ones = (w: string) => [...w].filter((c) => c === '1').length;

// The value as sorted terms, each variable renamed y_m ↦ y_σ(m).
function terms(lengths: number[], sides: string[], n: number, sigma: (m: number) => number): string[] {
  const p = naiveCount(lengths, sides, equivariantPieces()).value;
  return toTerms(p, n)
    .map((t) => {
      const e = new Array<number>(n).fill(0);
      t.exponents.forEach((x, m) => (e[sigma(m + 1) - 1] = x));
      return `${t.coefficient}:${e.join(',')}`;
    })
    .sort();
}

describe('rule inference (issue 7)', () => {
  it('exchanging sides 1 and 4 of (a,0,b,a,0,b) in equivariant cohomology: one affine block reversal for every class a, b ≤ 4', async () => {
    const file = join(dir, 'claim.json');
    writeFileSync(file, JSON.stringify(claim));
    const db = join(dir, 'rule.sqlite');
    const s = await runSweep({ claims: [loadSweepClaim(file)], options: parseRunOptions({ db, workers: 2 }) });
    // Per-instance permutations are kept only on request (run --keep-permutations); class-wide ones always.
    const store = new Database(db, { readonly: true });
    expect((store.prepare('SELECT COUNT(*) AS n FROM permutations').get() as { n: number }).n).toBe(0);
    expect((store.prepare('SELECT COUNT(*) AS n FROM chunks WHERE common_permutations IS NOT NULL').get() as { n: number }).n).toBeGreaterThan(0);
    store.close();
    const rule = s.claims[0]!.permutationRule!;
    expect(s.claims[0]!.classes).toHaveLength(16);
    expect(rule.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] });
    // Checked against plain backtracking (src/reference/naive-count.ts) on every boundary of a few classes:
    // value(b) = σ(value(T(b))) with σ = rev[b+1..a+b] on y_1..y_(a+b), T exchanging sides 1 and 4.
    for (const [a, b] of [[2, 1], [2, 2], [3, 1], [1, 2]] as const) {
      const n = a + b;
      const sigma = (m: number) => (m > b ? b + 1 + a + b - m : m);
      const lengths = [a, 0, b, a, 0, b];
      for (const s1 of words(a)) {
        for (const s4 of words(a)) {
          if (ones(s1) !== ones(s4)) continue;
          for (const s3 of words(b)) {
            for (const s6 of words(b)) {
              const here = terms(lengths, [s1, '', s3, s4, '', s6], n, (m) => m);
              expect(terms(lengths, [s4, '', s3, s1, '', s6], n, sigma), `a=${a},b=${b} ${s1}|${s3}|${s4}|${s6}`).toEqual(here);
            }
          }
        }
      }
    }
  });
});
