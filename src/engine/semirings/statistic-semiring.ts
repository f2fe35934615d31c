import type { Semiring } from '../semiring.js';
import { addInt, intEquals, isZeroInt, mulInt, type SafeInt } from './safe-integer.js';

/** A generating polynomial Σ_k a_k t^k as its coefficient list a_0, a_1, … (no trailing zeros). */
export type Generating = readonly SafeInt[];

function trim(a: SafeInt[]): SafeInt[] {
  let end = a.length;
  while (end > 0 && isZeroInt(a[end - 1]!)) end--;
  return a.slice(0, end);
}

/** Univariate polynomials in t with exact integer coefficients; `t` marks one piece of the counted kind. */
export const generatingSemiring: Semiring<Generating> & { readonly t: Generating } = {
  name: 'generating',
  zero: [],
  one: [1],
  t: [0, 1],
  add(a, b) {
    const r: SafeInt[] = [];
    for (let k = 0; k < Math.max(a.length, b.length); k++) r.push(addInt(a[k] ?? 0, b[k] ?? 0));
    return trim(r);
  },
  mul(a, b) {
    if (a.length === 0 || b.length === 0) return [];
    const r: SafeInt[] = new Array<SafeInt>(a.length + b.length - 1).fill(0);
    for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) r[i + j] = addInt(r[i + j]!, mulInt(a[i]!, b[j]!));
    return trim(r);
  },
  isZero: (a) => a.length === 0,
  equals: (a, b) => a.length === b.length && a.every((c, k) => intEquals(c, b[k]!)),
  fromInteger: () => [1],
  variable: () => [1],
  position: () => [1],
  toText: (a) =>
    a.length === 0
      ? '0'
      : a.flatMap((c, k) => (isZeroInt(c) ? [] : [k === 0 ? `${c}` : `${c === 1 ? '' : `${c}*`}t${k === 1 ? '' : `^${k}`}`])).join(' + '),
};
