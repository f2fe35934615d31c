import { RefPolynomial } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

/** A quotient of two polynomials (no normal form: compare with `rationalEquals`). */
export interface RefRational {
  readonly num: RefPolynomial;
  readonly den: RefPolynomial;
}

export const rational = (p: RefPolynomial): RefRational => ({ num: p, den: RefPolynomial.constant(1n) });

export function rationalAdd(a: RefRational, b: RefRational): RefRational {
  if (a.den.equals(b.den)) return { num: a.num.add(b.num), den: a.den };
  return { num: a.num.mul(b.den).add(b.num.mul(a.den)), den: a.den.mul(b.den) };
}

export function rationalMul(a: RefRational, b: RefRational): RefRational {
  return { num: a.num.mul(b.num), den: a.den.mul(b.den) };
}

export function rationalDiv(a: RefRational, b: RefRational): RefRational {
  if (b.num.isZero()) throw new CodedError('invalid_argument', { what: 'Formula quotient', expected: 'a nonzero denominator', received: '0' });
  return { num: a.num.mul(b.den), den: a.den.mul(b.num) };
}

export function rationalEquals(a: RefRational, b: RefRational): boolean {
  return a.num.mul(b.den).equals(b.num.mul(a.den));
}

/**
 * Evaluates a weight formula for a piece on strips i, j, straight from its text by recursive descent (the
 * reference's own reading of the grammar, sharing nothing with the engine's parser): integers, named
 * parameters, y_i y_j t_i t_j (variable index strip−1), + − * / ^ and parentheses.
 */
export function evaluateFormulaText(text: string, strips: { i: number; j: number }, parameter: (name: string) => RefPolynomial): RefRational {
  const src = text.replace(/\s+/g, '');
  let p = 0;
  const bad = (): never => {
    throw new CodedError('invalid_piece', { what: 'Weight formula', expected: 'a well-formed formula', received: `'${text}' (at ${p + 1})` });
  };
  const expr = (): RefRational => {
    let acc = term();
    while (src[p] === '+' || src[p] === '-') {
      const op = src[p++];
      const t = term();
      acc = rationalAdd(acc, op === '+' ? t : { num: t.num.neg(), den: t.den });
    }
    return acc;
  };
  const term = (): RefRational => {
    let acc = unary();
    while (src[p] === '*' || src[p] === '/') {
      const op = src[p++];
      const u = unary();
      acc = op === '*' ? rationalMul(acc, u) : rationalDiv(acc, u);
    }
    return acc;
  };
  const unary = (): RefRational => {
    if (src[p] === '-') {
      p++;
      const u = unary();
      return { num: u.num.neg(), den: u.den };
    }
    const base = atom();
    if (src[p] !== '^') return base;
    p++;
    const m = /^-?[0-9]+/.exec(src.slice(p)) ?? bad();
    p += m[0].length;
    const e = Number(m[0]);
    let acc = rational(RefPolynomial.constant(1n));
    for (let k = 0; k < Math.abs(e); k++) acc = rationalMul(acc, base);
    return e < 0 ? rationalDiv(rational(RefPolynomial.constant(1n)), acc) : acc;
  };
  const atom = (): RefRational => {
    if (src[p] === '(') {
      p++;
      const v = expr();
      if (src[p++] !== ')') bad();
      return v;
    }
    const num = /^[0-9]+/.exec(src.slice(p));
    if (num) {
      p += num[0].length;
      return rational(RefPolynomial.constant(BigInt(num[0])));
    }
    const name = /^[A-Za-z][A-Za-z0-9_]*/.exec(src.slice(p)) ?? bad();
    p += name[0].length;
    const strip = /^[yt]_?([ij])$/.exec(name[0]);
    if (strip) return rational(RefPolynomial.variable((strip[1] === 'i' ? strips.i : strips.j) - 1));
    return rational(parameter(name[0]));
  };
  const v = expr();
  if (p !== src.length) bad();
  return v;
}
