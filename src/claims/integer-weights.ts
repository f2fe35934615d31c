import type { PieceSet } from '../engine/index.js';

/** True when every piece weighs an integer, so values are integers rather than polynomials. */
export function hasIntegerWeights(pieces: PieceSet): boolean {
  return pieces.pieces.every((p) => p.weight.type === 'integer');
}
