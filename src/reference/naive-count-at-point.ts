import { naiveSum, type NaivePiece } from './naive-count.js';
import type { RefPolynomial } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

/** An exact rational number num/den with den > 0 and gcd(num, den) = 1. */
export interface ExactRational {
  readonly num: bigint;
  readonly den: bigint;
}

const abs = (a: bigint): bigint => (a < 0n ? -a : a);
function gcd(a: bigint, b: bigint): bigint {
  a = abs(a);
  b = abs(b);
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

export function exactRational(num: bigint, den: bigint): ExactRational {
  if (den === 0n) {
    throw new CodedError('division_by_zero', { what: 'Weight quotient', expected: 'a denominator that is nonzero at the point', received: '0' }, { hint: 'choose another point' });
  }
  const g = gcd(num, den) || 1n;
  const s = den < 0n ? -1n : 1n;
  return { num: (s * num) / g, den: (s * den) / g };
}

/** A polynomial's value at a point (variable k takes point[k]; missing ones are an error). */
export function evaluateAt(p: RefPolynomial, point: readonly bigint[]): bigint {
  let total = 0n;
  for (const t of p.rawTerms()) {
    let v = t.coeff;
    t.exps.forEach((e, k) => {
      if (e === 0) return;
      const x = point[k];
      if (x === undefined) throw new CodedError('invalid_argument', { what: `Point coordinate ${k}`, expected: 'an integer', received: 'none' });
      v *= x ** BigInt(e);
    });
    total += v;
  }
  return total;
}

/** The point: y_t ↦ y(t) for t = 1..N, named parameter ↦ parameter(name). */
export interface NaivePoint {
  y(t: number): bigint;
  parameter(name: string): bigint;
}

const add = (a: ExactRational, b: ExactRational) => exactRational(a.num * b.den + b.num * a.den, a.den * b.den);
const mul = (a: ExactRational, b: ExactRational) => exactRational(a.num * b.num, a.den * b.den);

/**
 * `naiveCount` evaluated at integer points, all in one backtracking pass: every weight becomes an exact
 * rational at each point, reduced by gcd after each step, so the sum never carries a growing polynomial
 * denominator. Throws `division_by_zero` when a weight's denominator vanishes at a point.
 */
export function naiveCountAtPoints(
  sides: readonly number[],
  boundary: readonly string[],
  pieces: readonly NaivePiece[],
  points: readonly NaivePoint[],
): { fillings: bigint; values: ExactRational[]; variableNames: string[] } {
  // Variable numbering of naiveCount: y_t is t−1 (t = 1..N), then the named parameters in sorted order.
  const { fillings, value, variableNames } = naiveSum<ExactRational[]>(sides, boundary, pieces, ({ N, variableNames }) => {
    const coords = points.map((point) => [...Array.from({ length: N }, (_, k) => point.y(k + 1)), ...variableNames.map((n) => point.parameter(n))]);
    return {
      one: points.map(() => ({ num: 1n, den: 1n })),
      zero: points.map(() => ({ num: 0n, den: 1n })),
      add: (a, b) => a.map((v, k) => add(v, b[k]!)),
      mul: (a, b) => a.map((v, k) => mul(v, b[k]!)),
      lift: (w) => coords.map((c) => exactRational(evaluateAt(w.num, c), evaluateAt(w.den, c))),
    };
  });
  return { fillings, values: value, variableNames };
}
