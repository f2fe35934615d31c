import { describe, expect, it } from 'vitest';
import { pointFraction, pointSemiring } from '../../../../src/engine/index.js';
import { CodedError } from '../../../../src/errors/index.js';

// Arithmetic of ℚ at the point y = (3, 8, −4) [by hand; common practice, no source].
describe('values at a rational point', () => {
  const R = pointSemiring([3n, 8n, -4n]);
  const q = (i: number, j: number) => R.divide!(R.position(i, j), R.add(R.one, R.position(i, j))); // χ/(1 + χ)

  it('evaluates strips and positions: y_j − y_i', () => {
    expect(pointFraction(R.position(1, 2))).toEqual({ num: 5n, den: 1n });
    expect(pointFraction(R.position(2, 3))).toEqual({ num: -12n, den: 1n });
    expect(pointFraction(R.strip!('y', 3))).toEqual({ num: -4n, den: 1n });
  });

  it('adds and multiplies quotients exactly: 5/6 + (−12)/(−11) = 127/66, and 5/6 · 12/11 = 10/11', () => {
    expect(pointFraction(R.add(q(1, 2), q(2, 3)))).toEqual({ num: 127n, den: 66n });
    expect(pointFraction(R.mul(q(1, 2), q(2, 3)))).toEqual({ num: 10n, den: 11n });
    // −7/(−6) = 7/6: the sign of a negative divisor moves to the numerator.
    expect(pointFraction(R.divide!(R.position(1, 3), R.add(R.one, R.position(1, 3))))).toEqual({ num: 7n, den: 6n });
  });

  it('tests equality across different denominators and cancels to zero', () => {
    const a = R.divide!(R.fromInteger(2), R.fromInteger(4));
    const b = R.divide!(R.fromInteger(-3), R.fromInteger(-6));
    expect(R.equals(a, b)).toBe(true);
    expect(R.isZero(R.add(a, R.mul(R.fromInteger(-1), b)))).toBe(true);
    expect(R.toText(R.add(q(1, 2), q(2, 3)))).toBe('127/66');
  });

  it('refuses a zero divisor and a missing coordinate with coded errors', () => {
    expect(() => R.divide!(R.one, R.position(1, 1))).toThrow(CodedError);
    expect(() => R.position(1, 4)).toThrow(/Point coordinate: expected a value for strip 4/);
  });
});
