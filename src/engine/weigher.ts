import type { UnitTriangle } from './lattice.js';
import type { Piece } from './piece-set.js';
import type { Semiring } from './semiring.js';
import { generatingSemiring, type Generating } from './semirings/statistic-semiring.js';

/** The weight of one piece placed on one unit triangle. */
export type Weigher<T> = (piece: Piece, triangle: UnitTriangle) => T;

/**
 * Strip indices of a unit triangle: following its up-right strip and its up-left strip down to the
 * bottom of the completed triangle meets bottom edges i ≤ j (numbered from 1 at the left).
 */
export function positionIndices(t: UnitTriangle): { i: number; j: number } {
  return { i: t.x + 1, j: t.x + t.y + (t.orientation === 'up' ? 1 : 2) };
}

/** Weighs each piece as its set declares: integer, named variable, or y_j − y_i by position. */
export function declaredWeigher<T>(semiring: Semiring<T>): Weigher<T> {
  return (piece, triangle) => {
    const w = piece.weight;
    if (w.type === 'integer') return semiring.fromInteger(w.value);
    if (w.type === 'variable') return semiring.variable(w.name);
    const { i, j } = positionIndices(triangle);
    return semiring.position(i, j);
  };
}

/** Weighs t for each piece of a counted kind and 1 otherwise: the generating polynomial of that statistic. */
export function statisticWeigher(kinds: ReadonlySet<string>): Weigher<Generating> {
  return (piece) => (kinds.has(piece.kind) ? generatingSemiring.t : generatingSemiring.one);
}
