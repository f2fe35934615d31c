import type { Semiring } from '../semiring.js';

/** Several semirings side by side, componentwise: one sweep yields one value per component. */
export function tupleSemiring(rings: readonly Semiring<unknown>[]): Semiring<unknown[]> {
  const map = (f: (r: Semiring<unknown>, k: number) => unknown) => rings.map(f);
  return {
    name: `tuple(${rings.map((r) => r.name).join(',')})`,
    zero: map((r) => r.zero),
    one: map((r) => r.one),
    add: (a, b) => map((r, k) => r.add(a[k], b[k])),
    // Sweeps only add into tuples they created by a multiplication, whose components are fresh too.
    addInPlace: (acc, b) => {
      rings.forEach((r, k) => (acc[k] = r.addInPlace ? r.addInPlace(acc[k], b[k]) : r.add(acc[k], b[k])));
      return acc;
    },
    mul: (a, b) => map((r, k) => r.mul(a[k], b[k])),
    isZero: (a) => rings.every((r, k) => r.isZero(a[k])),
    equals: (a, b) => rings.every((r, k) => r.equals(a[k], b[k])),
    fromInteger: (n) => map((r) => r.fromInteger(n)),
    variable: (name) => map((r) => r.variable(name)),
    position: (i, j) => map((r) => r.position(i, j)),
    terms: (a) => rings.reduce((n, r, k) => n + (r.terms ? r.terms(a[k]) : 1), 0),
    toText: (a) => `(${rings.map((r, k) => r.toText(a[k])).join(', ')})`,
  };
}
