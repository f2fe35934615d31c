
import type { PieceSet } from './piece-set.js';
import { formulaUses, type StripLetter } from './weight-formula.js';
import { CodedError } from '../errors/index.js';

/** Which exact ring a piece set's values live in, and the letter of its strip variables. */
export interface ValueRing {
  /** integer weights only; polynomials in y (and parameters); or quotients (Laurent polynomials in t, rational functions). */
  readonly kind: 'integer' | 'polynomial' | 'fraction';
  readonly letter: StripLetter;
}

/**
 * The value ring of a piece set: formulas in t (Laurent polynomials) or with quotients need fractions;
 * y and t may not be mixed, since both stand for the strips' positions. Throws `invalid_piece_set`.
 */
export function valueRing(set: PieceSet): ValueRing {
  const letters = new Set<StripLetter>();
  let divides = false;
  let integer = true;
  for (const p of set.pieces) {
    const w = p.weight;
    if (w.type === 'integer') continue;
    integer = false;
    if (w.type === 'position') letters.add('y');
    if (w.type === 'formula') {
      const uses = formulaUses(w.formula);
      for (const l of uses.letters) letters.add(l);
      divides ||= uses.divides;
    }
    if (letters.size > 1) {
      throw new CodedError('invalid_piece_set', { what: 'Strip variables', expected: 'one letter, y or t, in the whole piece set', received: `both (piece '${p.name}')` }, { path: 'pieces', hint: 't_m stands for e^{y_m}: write every weight of one set in the same letter' });
    }
  }
  const letter: StripLetter = letters.has('t') ? 't' : 'y';
  if (integer) return { kind: 'integer', letter };
  return { kind: divides || letter === 't' ? 'fraction' : 'polynomial', letter };
}
