import { CodedError } from '../errors/index.js';
import { grassmannianStrings, inv } from './grassmannian-strings.js';
import { csmRestrictionTable, type SchwartzMacPherson } from './ssm-localization.js';
import type { RefPolynomial } from './ref-polynomial.js';

// The SSM and CSM structure constants of Gr(k, n) evaluated at one integer point y, in exact rationals.
// The restrictions are the exact polynomials of ssm-localization.ts (fast even for n = 6); only the
// triangular solve, whose rational-function values swell beyond reach at n = 6, is done at the point.

/** An exact rational number num/den with den > 0 and gcd(num, den) = 1. */
export interface PointRational {
  readonly num: bigint;
  readonly den: bigint;
}

const abs = (a: bigint) => (a < 0n ? -a : a);
function gcd(a: bigint, b: bigint): bigint {
  let [x, y] = [abs(a), abs(b)];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function rational(num: bigint, den: bigint): PointRational {
  if (den === 0n) throw new CodedError('division_by_zero', { what: 'SSM value at a point', expected: 'a point where no denominator vanishes', received: 'a zero denominator' }, { hint: 'choose another point' });
  if (num === 0n) return { num: 0n, den: 1n };
  const g = gcd(num, den) * (den < 0n ? -1n : 1n);
  return { num: num / g, den: den / g };
}

const add = (a: PointRational, b: PointRational) => rational(a.num * b.den + b.num * a.den, a.den * b.den);
const mul = (a: PointRational, b: PointRational) => rational(a.num * b.num, a.den * b.den);
const div = (a: PointRational, b: PointRational) => rational(a.num * b.den, a.den * b.num);
const int = (v: bigint): PointRational => ({ num: v, den: 1n });

function valueAt(p: RefPolynomial, y: readonly bigint[]): bigint {
  let total = 0n;
  for (const t of p.rawTerms()) {
    let v = t.coeff;
    t.exps.forEach((e, m) => {
      for (let q = 0; q < e; q++) v *= y[m]!;
    });
    total += v;
  }
  return total;
}

/** Π over the tangent weights y_j − y_i at V_w (w_i = 1, w_j = 0) of 1 + y_j − y_i, at the point. */
function totalChernAt(w: string, y: readonly bigint[]): bigint {
  let acc = 1n;
  for (let i = 0; i < w.length; i++) for (let j = 0; j < w.length; j++) if (w[i] === '1' && w[j] === '0') acc *= 1n + y[j]! - y[i]!;
  return acc;
}

/**
 * Structure constants keyed `${λ},${μ},${ν}` at the point y (y[m] the value of y_{m+1}), every triple
 * present (zeros included): for 'ssm' the e_{λμ}^ν of s_SM(X_λ°)·s_SM(X_μ°) = Σ_ν e_{λμ}^ν s_SM(X_ν°), for
 * 'csm' those of c_SM. The same point-by-point solve as `schwartzMacPhersonTable`, in exact rationals.
 * Throws `division_by_zero` when a tangent or normal weight factor vanishes at the point.
 */
export function schwartzMacPhersonAtPoint(kind: SchwartzMacPherson, k: number, n: number, y: readonly bigint[]): Map<string, PointRational> {
  if (y.length < n) throw new CodedError('invalid_argument', { what: 'Point', expected: `${n} coordinates`, received: `${y.length}` });
  const strings = [...grassmannianStrings(k, n)].sort((a, b) => inv(a) - inv(b));
  const table = csmRestrictionTable(k, n);
  const at = new Map<string, bigint>();
  for (const lam of strings) {
    for (const w of strings) {
      const r = table.get(lam)!.get(w);
      at.set(`${lam},${w}`, r === undefined ? 0n : valueAt(r, y));
    }
  }
  const chern = new Map(strings.map((w) => [w, totalChernAt(w, y)]));
  const out = new Map<string, PointRational>();
  strings.forEach((lam, li) => {
    for (let mi = li; mi < strings.length; mi++) {
      const mu = strings[mi]!;
      const found: Array<[string, PointRational]> = [];
      for (const w of strings) {
        // Restrictions vanish unless ν ≤ w in Bruhat order, so the ν found so far are all that can appear at w.
        let rem = int(at.get(`${lam},${w}`)! * at.get(`${mu},${w}`)!);
        if (kind === 'ssm') rem = div(rem, int(chern.get(w)!));
        for (const [nu, c] of found) rem = add(rem, mul(c, int(-at.get(`${nu},${w}`)!)));
        const value = div(rem, int(at.get(`${w},${w}`)!));
        found.push([w, value]);
      }
      for (const [nu, c] of found) {
        out.set(`${lam},${mu},${nu}`, c);
        out.set(`${mu},${lam},${nu}`, c);
      }
    }
  });
  return out;
}

/**
 * A bound on the total degree of the numerator of (engine value − reference value) for one triple of
 * Gr(k, n), both read as rational functions in y: Cramer's rule on the triangular system (|S| classes,
 * entries of degree ≤ dim) gives numerator and denominator degrees ≤ 2·|S|·dim for the reference; the
 * right-hand side adds 2·dim; a puzzle value has numerator and denominator degree ≤ n(n−1)/2. A nonzero
 * difference vanishes at a point drawn uniformly from a box of side B with probability ≤ bound/B
 * (Schwartz–Zippel lemma).
 */
export function pointDegreeBound(k: number, n: number): number {
  const classes = grassmannianStrings(k, n).length;
  const dim = k * (n - k);
  return 2 * classes * dim + 2 * dim + n * (n - 1);
}
