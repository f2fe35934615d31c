import { countCompletions, fractionSemiring, integerSemiring, polynomialSemiring, triangleRegion, valueRing, type PieceSet } from '../engine/index.js';
import { toCodedError } from '../errors/index.js';
import { hasIntegerWeights } from '../claims/resolve-theory.js';
import type { RegionValue } from '../claims/count-region.js';

/** One term σ_ν of a product σ_λ·σ_μ with its structure constant. */
export interface ProductTerm {
  readonly nu: string;
  readonly value: RegionValue;
}

/** The whole product σ_λ·σ_μ: every ν with a nonzero structure constant, ν in lexicographic order. */
export interface Product {
  readonly theory: string;
  readonly lambda: string;
  readonly mu: string;
  readonly products: readonly ProductTerm[];
}

/** Expands σ_λ·σ_μ from one sweep of the triangle with its bottom side left open. */
export function expandProduct(pieces: PieceSet, lambda: string, mu: string): Product {
  const n = [...lambda].length;
  const sides = [lambda, '', mu, '', null, ''];
  const terms: ProductTerm[] = [];
  try {
    // The open side is side 5, read clockwise (right to left); ν is read left to right.
    const nu = (side5: string) => [...side5].reverse().join('');
    const ringKind = valueRing(pieces);
    if (ringKind.kind === 'fraction') {
      const ring = fractionSemiring(n, ringKind.letter);
      for (const [side5, v] of countCompletions(triangleRegion(n), sides, pieces, { semiring: ring })) {
        terms.push({ nu: nu(side5), value: { type: 'fraction', value: v, size: n, letter: ring.letter, variableNames: ring.variableNames } });
      }
    } else if (hasIntegerWeights(pieces)) {
      for (const [side5, v] of countCompletions(triangleRegion(n), sides, pieces, { semiring: integerSemiring })) {
        terms.push({ nu: nu(side5), value: { type: 'integer', value: v } });
      }
    } else {
      const ring = polynomialSemiring(n);
      for (const [side5, v] of countCompletions(triangleRegion(n), sides, pieces, { semiring: ring })) {
        terms.push({ nu: nu(side5), value: { type: 'polynomial', value: v, size: n, variableNames: ring.variableNames } });
      }
    }
  } catch (e) {
    throw toCodedError(e).relocated({ path: 'triangle' }); // the field; the CLI names its flag
  }
  terms.sort((a, b) => (a.nu < b.nu ? -1 : a.nu > b.nu ? 1 : 0));
  return { theory: pieces.name, lambda, mu, products: terms };
}
