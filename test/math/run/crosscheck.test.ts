import { describe, expect, it } from 'vitest';
import { crosscheck } from '../../../src/run/crosscheck.js';
import { resolveTheory } from '../../../src/claims/resolve-theory.js';
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

  it('non-equivariant SSM: both K-triangles (−1 each) = localization at y = 0 on every triple with n ≤ 6 [Knutson–Zinn-Justin 2021; Aluffi–Mihalcea, Compositio 2016]', () => {
    const s = crosscheck({ theory: 'ssm-nonequivariant', maxN: 6 });
    expect(s.triples).toBe(tripleCount(6));
    expect(s.firstDisagreement).toBeUndefined();
  });

  it('equivariant SSM: the built-in pieces (y = 0 pieces plus crossing rhombi ±χ/(1 + χ)) = localization on every triple with n ≤ 5 [Aluffi–Mihalcea operator, Compositio 2016; s_SM = c_SM / c(T Gr)]', () => {
    const s = crosscheck({ theory: 'ssm', maxN: 5 });
    expect(s.triples).toBe(tripleCount(5));
    expect(s.firstDisagreement).toBeUndefined();
  });

  it('equivariant SSM at n = 6: the built-in pieces = localization at two random integer points on every triple with n ≤ 6 [Schwartz–Zippel identity test; exact rationals]', () => {
    const s = crosscheck({ theory: 'ssm', maxN: 6, points: 2, seed: 7 });
    expect(s.triples).toBe(tripleCount(6));
    expect(s.firstDisagreement).toBeUndefined();
    expect(s.points!.errorBound).toBeLessThan(1e-20);
  });

  it('the point test catches a wrong SSM rule: one crossing rhombus of the wrong sign', () => {
    const ssm = resolveTheory('ssm');
    const wrong = { ...ssm, pieces: ssm.pieces.map((p) => (p.name === 'ssm-rhombus-10.10.0.1' ? { ...p, weight: { type: 'integer' as const, value: 1 } } : p)) };
    const s = crosscheck({ theory: 'ssm', maxN: 4, points: 1, pieces: wrong });
    expect(s.agreements).toBeLessThan(s.triples);
  });

  it('a custom Laurent piece set is checked against equivariant K-theory by localization, and a wrong one is caught', () => {
    // c_{010,010}^{100} = t2/t3 by localization (isobaric divided differences), while this demo set gives 1.
    const s = crosscheck({ theory: 'equivariant-k-theory', maxN: 4, pieces: resolveTheory('conjectures/pieces/laurent-weights-demo.json') });
    expect(s.agreements).toBeLessThan(s.triples);
    expect(s.firstDisagreement).toMatchObject({ lambda: '010', mu: '010', nu: '100', reference: 't2*t3^-1' });
  });

  it('equivariant K-theory: the rhombus-weighted piece set = localization on every triple with n ≤ 6 [isobaric divided differences; Kostant–Kumar 1990]', () => {
    const s = crosscheck({ theory: 'equivariant-k-theory', maxN: 6, pieces: resolveTheory('conjectures/pieces/equivariant-k-theory-rhombi.json') });
    expect(s.triples).toBe(tripleCount(6));
    expect(s.firstDisagreement).toBeUndefined();
  });
});
