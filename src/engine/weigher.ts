import type { UnitTriangle } from './lattice.js';
import type { Piece } from './piece-set.js';

import type { Semiring } from './semiring.js';
import { evaluateFormula, type FormulaRing } from './weight-formula.js';
import { generatingSemiring, type Generating } from './semirings/statistic-semiring.js';
import { CodedError } from '../errors/index.js';

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
    if (semiring.weightless) return semiring.one;
    if (w.type === 'integer') return semiring.fromInteger(w.value);
    if (w.type === 'variable') return semiring.variable(w.name);
    const { i, j } = positionIndices(triangle);
    if (w.type === 'formula') return evaluateFormula(w.formula, formulaRing(semiring), { i, j });
    return semiring.position(i, j);
  };
}

/** The operations of a semiring a formula needs; throws `invalid_weight_formula` when it cannot divide. */
export function formulaRing<T>(semiring: Semiring<T>): FormulaRing<T> {
  return {
    one: semiring.one,
    add: (a, b) => semiring.add(a, b),
    mul: (a, b) => semiring.mul(a, b),
    fromInteger: (n) => semiring.fromInteger(n),
    variable: (name) => semiring.variable(name),
    strip: (letter, index) => {
      if (!semiring.strip) throw new CodedError('invalid_weight_formula', { what: 'Weight formula', expected: 'a value ring with strip variables', received: `the ${semiring.name} ring` }, { path: 'weight.formula' });
      return semiring.strip(letter, index);
    },
    divide: (a, b) => {
      if (!semiring.divide) {
        throw new CodedError('invalid_weight_formula', { what: 'Weight formula', expected: 'a value ring that divides', received: `the ${semiring.name} ring` }, { path: 'weight.formula', hint: 'count with exact fractions or modular values' });
      }
      return semiring.divide(a, b);
    },
  };
}

/** Weighs t for each piece of a counted kind and 1 otherwise: the generating polynomial of that statistic. */
export function statisticWeigher(kinds: ReadonlySet<string>): Weigher<Generating> {
  return (piece) => (kinds.has(piece.kind) ? generatingSemiring.t : generatingSemiring.one);
}
