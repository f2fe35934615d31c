import { describe, expect, it } from 'vitest';
import { RefPolynomial, toTerms } from '../../../src/reference/ref-polynomial.js';

const y = (i: number): RefPolynomial => RefPolynomial.variable(i);
const c = (v: number): RefPolynomial => RefPolynomial.constant(v);

describe('RefPolynomial', () => {
  it('expands (y1 + y2)^2 = y1^2 + 2 y1 y2 + y2^2 (binomial theorem, common practice)', () => {
    const s = y(0).add(y(1));
    expect(toTerms(s.mul(s), 2)).toEqual([
      { coefficient: 1n, exponents: [0, 2] },
      { coefficient: 2n, exponents: [1, 1] },
      { coefficient: 1n, exponents: [2, 0] },
    ]);
  });

  it('removes cancelled terms and sorts lexicographically (common practice, no source)', () => {
    const p = y(0).sub(y(0)).add(c(3)).add(y(2)).sub(c(3));
    expect(toTerms(p, 3)).toEqual([{ coefficient: 1n, exponents: [0, 0, 1] }]);
    expect(toTerms(RefPolynomial.zero(), 4)).toEqual([]);
    expect(c(5).sub(c(5)).isZero()).toBe(true);
  });

  it('divides exactly: (y1 − y2)(y1 + 2y3)^2 / (y1 − y2) = (y1 + 2y3)^2 (common practice)', () => {
    const a = y(0).sub(y(1));
    const b = y(0).add(y(2).scale(2n));
    expect(a.mul(b).mul(b).divExact(a).equals(b.mul(b))).toBe(true);
    expect(a.mul(b).mul(b).divExact(b).equals(a.mul(b))).toBe(true);
    expect(c(12).divExact(c(-4)).equals(c(-3))).toBe(true);
  });

  it('divides by linear forms with a unit variable (synthetic division) as multiplication undoes (common practice)', () => {
    const f = c(1).add(y(2)).sub(y(0)); // 1 + y3 − y1
    const g = y(1).mul(y(1)).add(c(5).mul(y(0)).mul(y(2))).sub(c(7)); // y2² + 5 y1 y3 − 7
    const h = c(2).mul(y(0)).sub(y(1)).add(c(3)); // 2y1 − y2 + 3: unit only in y2
    const p = f.mul(f).mul(f).mul(g).mul(h);
    expect(p.divExact(f).divExact(f).equals(f.mul(g).mul(h))).toBe(true);
    expect(p.divExact(h).equals(f.mul(f).mul(f).mul(g))).toBe(true);
    expect(() => g.divExact(f)).toThrowError(/expected a divisor/);
    expect(() => f.mul(g).add(c(1)).divExact(h)).toThrowError(/expected a divisor/);
  });

  it('throws a coded error on an inexact division (y1 is not divisible by y2; 3 is not divisible by 2)', () => {
    expect(() => y(0).divExact(y(1))).toThrowError(/Polynomial division: expected a divisor/);
    expect(() => c(3).divExact(c(2))).toThrowError(/expected a divisor/);
    expect(() => y(0).add(c(1)).mul(y(1)).add(c(1)).divExact(y(0).add(c(1)))).toThrow();
    try {
      y(0).divExact(RefPolynomial.zero());
    } catch (e) {
      expect((e as { code: string }).code).toBe('inexact_division');
    }
  });

  it('handles big coefficients exactly: (2^40 y1)^2 = 2^80 y1^2 (common practice)', () => {
    const p = y(0).scale(2n ** 40n);
    expect(toTerms(p.mul(p), 1)).toEqual([{ coefficient: 2n ** 80n, exponents: [2] }]);
  });

  it('reports degree, homogeneity, substitution and variable permutation (common practice)', () => {
    const p = y(0).mul(y(1)).add(y(2).mul(y(2)));
    expect(p.degree()).toBe(2);
    expect(p.isHomogeneous()).toBe(true);
    expect(p.add(c(1)).isHomogeneous()).toBe(false);
    // y1 ↦ 1, y2 ↦ 2, y3 ↦ 3: 1·2 + 9 = 11
    expect(p.substitute([c(1), c(2), c(3)]).equals(c(11))).toBe(true);
    // swapping y1 and y3 gives y3 y2 + y1^2
    expect(p.permuteVariables([2, 1, 0]).equals(y(2).mul(y(1)).add(y(0).mul(y(0))))).toBe(true);
  });

  it('rejects too few variables in toTerms with a coded error', () => {
    expect(() => toTerms(y(3), 2)).toThrowError(/Variable count: expected at least 4, received 2/);
  });
});
