import { describe, expect, it } from 'vitest';
import { theoryPieceSet } from '../../../src/engine/index.js';
import { crosscheck } from '../../../src/run/crosscheck.js';
import { tripleCount } from '../../helpers/grassmannian-counts.js';

// The quick loop: every theory on n ≤ 3 (test/math/run/crosscheck.test.ts goes to n ≤ 7).
describe('crosscheck on small Grassmannians', () => {
  it.each([
    ['cohomology', 'LR tableaux; Fulton, Young Tableaux, 1997'],
    ['equivariant', 'localization; Billey, Duke 1999'],
    ['k-theory', 'stable Grothendieck expansion; Buch, Acta Math. 2002'],
    ['dual-k-theory', 'Möbius inversion of the K-theory table; Brion, J. Algebra 2002'],
  ] as const)('%s: puzzles agree with the reference on every triple with n ≤ 3 [%s]', (theory, _source) => {
    const s = crosscheck({ theory, maxN: 3 });
    expect(s.triples).toBe(tripleCount(3));
    expect(s.agreements).toBe(s.triples);
    expect(s.firstDisagreement).toBeUndefined();
    expect(s.rows.reduce((sum, r) => sum + r.triples, 0)).toBe(s.triples);
  });

  it('reports the first disagreement when the pieces are wrong', () => {
    // K-theory pieces add signed terms the cohomology reference does not have: G1·G1 ∋ −G21 [Buch 2002]
    const s = crosscheck({ theory: 'cohomology', maxN: 4, pieces: theoryPieceSet('k-theory') });
    expect(s.agreements).toBeLessThan(s.triples);
    expect(s.firstDisagreement).toMatchObject({ engine: expect.stringMatching(/^-1\*/), reference: '0' });
  });
});
