import type { Puzzle } from '../engine/index.js';

/** A puzzle's weight as text: the product of its pieces' weights other than 1, e.g. `(y3 - y1)(-1)`. */
export function puzzleWeightText(puzzle: Puzzle): string {
  const factors = puzzle.pieces.map((p) => p.weight).filter((w) => w !== '1');
  if (factors.length === 0) return '1';
  const minus = factors.filter((w) => w === '-1').length;
  const rest = factors.filter((w) => w !== '-1');
  // Signs are collected in front so a K-theory puzzle reads `−1`, `+1`, or `−(y3 − y1)`.
  const sign = minus % 2 === 1 ? '-' : '';
  if (rest.length === 0) return sign ? '-1' : '1';
  const body = rest.length === 1 && !sign ? rest[0]! : rest.map((w) => (/[ +]|^-/.test(w) ? `(${w})` : w)).join('');
  return sign + body;
}
