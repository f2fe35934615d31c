import { describe, expect, it } from 'vitest';
import { fractionEquals, fractionSemiring } from '../../../src/engine/index.js';
import { localizationTableRows, localizationValue } from '../../../src/run/localization-values.js';

describe('structure constants by localization', () => {
  it('equivariant K-theory of P²: [O_line]² = (1 − t2/t3)[O_line] + (t2/t3)[O_pt]', () => {
    // Solved by hand from [O_010]|_010 = 1 − t2/t3, [O_010]|_100 = 1 − t1/t3 and [O_100]|_100 = (1 − t1/t2)(1 − t1/t3).
    const R = fractionSemiring(3, 't');
    const ratio = R.divide!(R.strip!('t', 2), R.strip!('t', 3));
    expect(fractionEquals(localizationValue('equivariant-k-theory', '010', '010', '100'), ratio)).toBe(true);
    expect(fractionEquals(localizationValue('equivariant-k-theory', '010', '010', '010'), R.add(R.one, R.mul(R.fromInteger(-1), ratio)))).toBe(true);
  });

  it('SSM of P¹: s_SM(C)² = s_SM(C) − s_SM(pt)/(1 + y2 − y1)', () => {
    // By hand: s_SM(C)|_01 = 1, s_SM(C)|_10 = 1/(1+χ), s_SM(pt)|_10 = χ/(1+χ), χ = y2 − y1.
    const R = fractionSemiring(2, 'y');
    const chi = R.position(1, 2);
    expect(fractionEquals(localizationValue('ssm', '01', '01', '10'), R.divide!(R.fromInteger(-1), R.add(R.one, chi)))).toBe(true);
    expect(fractionEquals(localizationValue('ssm', '01', '01', '01'), R.one)).toBe(true);
    // c_SM by hand: c(C)|_01 = 1 − χ, c(C)|_10 = 1, c(pt)|_10 = χ; at 01 (1 − χ)² = d'(1 − χ), so d' = 1 − χ;
    // at 10, 1 = d'·1 + d·χ, so d = 1: c_SM(C)² = (1 − χ)c_SM(C) + c_SM(pt).
    expect(fractionEquals(localizationValue('ssm-chern', '01', '01', '10'), R.one)).toBe(true);
    expect(fractionEquals(localizationValue('ssm-chern', '01', '01', '01'), R.add(R.one, R.mul(R.fromInteger(-1), chi)))).toBe(true);
  });

  it('lists the c_SM table of P¹ sorted by λ, μ, ν with the values solved by hand', () => {
    // By hand from the restrictions above: c(C)·c(pt) vanishes at 01 and is χ at 10, so it is c(pt);
    // c(pt)² = χ² at 10 = χ·c(pt)|_10, so it is χ·c(pt).
    const R = fractionSemiring(2, 'y');
    const chi = R.position(1, 2);
    const rows = localizationTableRows('ssm-chern', { k: 1, n: 2 });
    expect(rows.map((r) => `${r.lambda},${r.mu},${r.nu}`)).toEqual(['01,01,01', '01,01,10', '01,10,10', '10,01,10', '10,10,10']);
    const expected = [R.add(R.one, R.mul(R.fromInteger(-1), chi)), R.one, R.one, R.one, chi];
    rows.forEach((r, i) => {
      expect(r.value.type).toBe('fraction');
      if (r.value.type === 'fraction') expect(fractionEquals(r.value.value, expected[i]!)).toBe(true);
    });
  });

  it('refuses classes of different Grassmannians', () => {
    expect(() => localizationValue('ssm', '01', '011', '10')).toThrow(/--triangle: expected three 0\/1 strings of one Gr\(k, n\)/);
  });
});
