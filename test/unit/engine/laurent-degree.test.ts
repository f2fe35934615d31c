import { describe, expect, it } from 'vitest';
import { fractionEquals, fractionSemiring, laurentSpan, parseWeightFormula, substituteFraction } from '../../../src/engine/index.js';

describe('laurentSpan', () => {
  // Bounds read off by hand from each formula (common practice, no source).
  it('bounds the total degree and the negative degree of a Laurent weight', () => {
    expect(laurentSpan(parseWeightFormula('1 - t_i/t_j'))).toEqual({ high: 1, negative: 1 });
    expect(laurentSpan(parseWeightFormula('-t_i^2*t_j'))).toEqual({ high: 3, negative: 0 });
    expect(laurentSpan(parseWeightFormula('t_i^-2'))).toEqual({ high: 0, negative: 2 });
    expect(laurentSpan(parseWeightFormula('a/(t_i*t_j)'))).toEqual({ high: 1, negative: 2 });
  });

  it('is undefined for a quotient by anything but ± a monomial', () => {
    expect(laurentSpan(parseWeightFormula('1/(1 + t_i)'))).toBeUndefined();
    expect(laurentSpan(parseWeightFormula('t_i/2'))).toBeUndefined();
    expect(laurentSpan(parseWeightFormula('(y_j - y_i)^-1'))).toBeUndefined();
  });
});

describe('substituteFraction', () => {
  it('moves negative exponents with σ: σ = (1 3) sends t1/t2 − t2·t3^-2 to t3/t2 − t2·t1^-2 (by hand)', () => {
    const R = fractionSemiring(3, 't');
    const t = (k: number) => R.strip!('t', k);
    const value = R.add(R.divide!(t(1), t(2)), R.mul(R.fromInteger(-1), R.divide!(t(2), R.mul(t(3), t(3)))));
    const expected = R.add(R.divide!(t(3), t(2)), R.mul(R.fromInteger(-1), R.divide!(t(2), R.mul(t(1), t(1)))));
    const sigma = [3, 2, 1];
    const image = substituteFraction(value, (k) => sigma[k]! - 1);
    expect(fractionEquals(image, expected)).toBe(true);
    expect(fractionEquals(image, value)).toBe(false);
  });

  it('permutes the variables inside a non-monomial denominator too: 1/(1 + y2 − y1) under (1 2) is 1/(1 + y1 − y2)', () => {
    const R = fractionSemiring(2, 'y');
    const value = R.divide!(R.one, R.add(R.one, R.position(1, 2)));
    const expected = R.divide!(R.one, R.add(R.one, R.position(2, 1)));
    expect(fractionEquals(substituteFraction(value, (k) => 1 - k), expected)).toBe(true);
    expect(fractionEquals(substituteFraction(value, (k) => 1 - k), value)).toBe(false);
  });
});
