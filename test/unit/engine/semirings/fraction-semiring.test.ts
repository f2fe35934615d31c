import { describe, expect, it } from 'vitest';
import { fractionSemiring, fractionTerms, fractionText, modularSemiring } from '../../../../src/engine/index.js';
import { CodedError } from '../../../../src/errors/index.js';

// Field identities of ℚ(t) [common practice, no source].
describe('exact fractions', () => {
  const R = fractionSemiring(3, 't');
  const t = (m: number) => R.strip!('t', m);
  const sub = (a: ReturnType<typeof t>, b: ReturnType<typeof t>) => R.add(a, R.mul(R.fromInteger(-1), b));

  it('keeps Laurent polynomials in one form: (1 − t1/t2)·t2 = t2 − t1', () => {
    const v = R.mul(sub(R.one, R.divide!(t(1), t(2))), t(2));
    expect(R.equals(v, sub(t(2), t(1)))).toBe(true);
    expect(fractionTerms(v, 3)?.map((x) => `${x.coefficient}:${x.exponents.join(',')}`).sort()).toEqual(['-1:1,0,0', '1:0,1,0']);
    expect(fractionTerms(R.divide!(R.one, t(3)), 3)).toEqual([{ coefficient: 1n, exponents: [0, 0, -1] }]);
  });

  it('adds over common denominators and tests zero exactly', () => {
    const a = R.divide!(R.one, sub(R.one, t(1))); // 1/(1 − t1)
    const b = R.divide!(t(1), sub(R.one, t(1))); // t1/(1 − t1)
    expect(R.equals(sub(a, b), R.one)).toBe(true);
    expect(R.isZero(sub(R.add(a, b), R.divide!(sub(t(1), R.fromInteger(-1)), sub(R.one, t(1)))))).toBe(true);
    expect(R.equals(R.divide!(R.one, sub(t(2), t(1))), R.divide!(R.fromInteger(-1), sub(t(1), t(2))))).toBe(true);
  });

  it('writes a denominator of several factors in parentheses, so the text reads as the value', () => {
    const Y = fractionSemiring(3, 'y');
    const f = (i: number, j: number) => Y.add(Y.one, Y.position(i, j));
    const v = Y.mul(Y.divide!(Y.fromInteger(-1), f(1, 2)), Y.divide!(Y.one, f(1, 3)));
    expect(fractionText(v, (k) => `y${k + 1}`)).toBe('(-1) / ((y2 - y1 + 1)*(y3 - y1 + 1))');
    expect(fractionText(Y.divide!(Y.one, f(1, 2)), (k) => `y${k + 1}`)).toBe('(1) / (y2 - y1 + 1)');
  });

  it('refuses division by zero with a coded error', () => {
    expect(() => R.divide!(R.one, R.zero)).toThrow(CodedError);
    const M = modularSemiring(1);
    expect(() => M.divide!(M.one, M.zero)).toThrow(/nonzero modulo/);
  });

  it('agrees with modular evaluation: (t1 − t2)/t2 · t2 ≡ t1 − t2', () => {
    const M = modularSemiring(7);
    const x = M.divide!(M.add(M.strip!('t', 1), M.mul(M.fromInteger(-1), M.strip!('t', 2))), M.strip!('t', 2));
    expect(M.equals(M.mul(x, M.strip!('t', 2)), M.add(M.strip!('t', 1), M.mul(M.fromInteger(-1), M.strip!('t', 2))))).toBe(true);
  });
});
