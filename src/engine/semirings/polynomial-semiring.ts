import type { Semiring } from '../semiring.js';
import { packedForm, type PackedForm } from './packed-polynomial-semiring.js';
import { addPoly, addPolyInPlace, constantPoly, mulPoly, ONE_POLY, polyEquals, polyText, subPoly, variablePoly, ZERO_POLY, type Polynomial } from './polynomial.js';

export interface PolynomialSemiring extends Semiring<Polynomial> {
  /** Number of equivariant variables y_1..y_N (variables 0..N−1); named variables follow. */
  readonly size: number;
  /** Names of the formal variables met so far, in index order after the y's. */
  readonly variableNames: readonly string[];
  variableName(k: number): string;
}

/** Exact polynomials in y_1..y_N and any named formal variables. */
export function polynomialSemiring(size: number): PolynomialSemiring {
  const names: string[] = [];
  const variableName = (k: number) => (k < size ? `y${k + 1}` : (names[k - size] ?? `v${k}`));
  let work: PackedForm | undefined;
  const ring: PolynomialSemiring = {
    name: 'polynomial',
    size,
    variableNames: names,
    variableName,
    zero: ZERO_POLY,
    one: ONE_POLY,
    add: addPoly,
    addInPlace: addPolyInPlace,
    mul: mulPoly,
    isZero: (a) => a.size === 0,
    equals: polyEquals,
    fromInteger: (n) => constantPoly(BigInt(n)),
    variable(name) {
      let k = names.indexOf(name);
      if (k < 0) k = names.push(name) - 1;
      return variablePoly(size + k);
    },
    position: (i, j) => subPoly(variablePoly(j - 1), variablePoly(i - 1)),
    strip: (_letter, index) => variablePoly(index - 1),
    toText: (a) => polyText(a, variableName),
    terms: (a) => a.size,
    // Sweeps compute in typed arrays of interned monomials (one table per ring, kept while it lives).
    work: () => (work ??= packedForm(ring)),
  };
  return ring;
}
