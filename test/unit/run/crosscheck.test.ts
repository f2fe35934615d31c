import { describe, expect, it } from 'vitest';
import { theoryPieceSet } from '../../../src/engine/index.js';
import { crosscheck } from '../../../src/run/crosscheck.js';

// Σ_{n ≤ N} Σ_k C(n,k)^3, the number of triples (λ, μ, ν) of all Gr(k, n) [common practice, no source]
function tripleCount(maxN: number): number {
  let total = 0;
  for (let n = 1; n <= maxN; n++) {
    let c = 1;
    for (let k = 0; k <= n; k++) {
      total += c ** 3;
      c = (c * (n - k)) / (k + 1);
    }
  }
  return total;
}

describe('engine against independent references', () => {
  it('cohomology: puzzles = LR tableaux on every triple with n ≤ 7 [LR rule; Fulton, Young Tableaux, 1997]', () => {
    const s = crosscheck({ theory: 'cohomology', maxN: 7 });
    expect(s.triples).toBe(tripleCount(7));
    expect(s.firstDisagreement).toBeUndefined();
    expect(s.agreements).toBe(s.triples);
  });

  it('equivariant: puzzles = localization on every triple with n ≤ 6 [Billey’s formula, Duke 1999; Knutson–Tao, Duke 2003]', () => {
    const s = crosscheck({ theory: 'equivariant', maxN: 6 });
    expect(s.triples).toBe(tripleCount(6));
    expect(s.firstDisagreement).toBeUndefined();
  });

  it('K-theory: puzzles = stable Grothendieck expansion on every triple with n ≤ 7 [Buch, Acta Math. 2002]', () => {
    const s = crosscheck({ theory: 'k-theory', maxN: 7 });
    expect(s.triples).toBe(tripleCount(7));
    expect(s.firstDisagreement).toBeUndefined();
  });

  it('dual K-theory: puzzles = Möbius inversion of the K-theory table on every triple with n ≤ 7 [Brion, J. Algebra 2002]', () => {
    const s = crosscheck({ theory: 'dual-k-theory', maxN: 7 });
    expect(s.triples).toBe(tripleCount(7));
    expect(s.firstDisagreement).toBeUndefined();
  });

  it('reports the first disagreement when the pieces are wrong', () => {
    // K-theory pieces add signed terms the cohomology reference does not have: G1·G1 ∋ −G21 [Buch 2002]
    const s = crosscheck({ theory: 'cohomology', maxN: 4, pieces: theoryPieceSet('k-theory') });
    expect(s.agreements).toBeLessThan(s.triples);
    expect(s.firstDisagreement).toMatchObject({ engine: expect.stringMatching(/^-1\*/), reference: '0' });
  });
});
