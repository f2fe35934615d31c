import { describe, expect, it } from 'vitest';
import { crosscheck } from '../../../src/run/crosscheck.js';
import { tripleCount } from '../../helpers/grassmannian-counts.js';

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
});
