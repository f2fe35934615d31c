
import type { PieceSet } from './piece-set.js';
import { SIDE_NAMES, type Region } from './region.js';
import { CodedError } from '../errors/index.js';

/** Six clockwise side strings; side 5 may be left open (`null`) to get every completion at once. */
export type Boundary = readonly [string, string, string, string, string | null, string];

/** Clockwise sides of the upright triangle with λ on NW (up), μ on NE (down), ν on the bottom (left to right). */
export function structureConstantSides(lambda: string, mu: string, nu: string): [string, string, string, string, string, string] {
  return [lambda, '', mu, '', reverseString(nu), ''];
}

export function reverseString(s: string): string {
  return [...s].reverse().join('');
}

/** Checks lengths and alphabet of each side; throws `invalid_boundary` naming the side. */
export function checkBoundary(region: Region, sides: readonly (string | null)[], pieces: PieceSet): Boundary {
  if (sides.length !== 6) {
    throw new CodedError('invalid_boundary', { what: 'Boundary', expected: '6 side strings', received: `${sides.length}` }, { path: 'sides' });
  }
  const allowed = new Set(pieces.boundaryLabels);
  sides.forEach((s, i) => {
    if (s === null) {
      if (i !== 4) throw new CodedError('internal_error', { what: 'Open side', expected: 'side 5', received: `side ${i + 1}` }, { path: `sides[${i}]` });
      return;
    }
    const chars = [...s];
    const want = region.lengths[i]!;
    if (chars.length !== want) {
      throw new CodedError('invalid_boundary', { what: `${capitalise(SIDE_NAMES[i]!)}`, expected: `${want} labels`, received: `${chars.length} ('${s}')` }, { path: `sides[${i}]`, hint: want === 0 ? "an empty side is written as '' or '-'" : `the side lengths are ${region.lengths.join(',')}` });
    }
    const bad = chars.find((c) => !allowed.has(c));
    if (bad !== undefined) {
      throw new CodedError('invalid_boundary', { what: `${capitalise(SIDE_NAMES[i]!)}`, expected: `labels from ${[...allowed].map((l) => `'${l}'`).join(' | ')}`, received: `'${bad}' in '${s}'` }, { path: `sides[${i}]`, hint: 'internal labels such as 10 never sit on the boundary' });
    }
  });
  return sides as unknown as Boundary;
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}
