import { CodedError } from '../errors/index.js';

/** Six side lengths s1..s6, clockwise from the up-right side 1 (see DEVELOPERS.md, "Lattice"). */
export type SideLengths = readonly [number, number, number, number, number, number];

/**
 * A lattice hexagon (possibly degenerate: triangle, parallelogram) placed inside its completed
 * triangle of side `size` = s6 + s1 + s2, whose bottom-left corner is the lattice origin.
 */
export interface Region {
  readonly lengths: SideLengths;
  /** Side N of the completed triangle; also the number of equivariant variables y_1..y_N. */
  readonly size: number;
}

export const SIDE_NAMES = ['side 1 (up-right)', 'side 2 (right)', 'side 3 (down-right)', 'side 4 (down-left)', 'side 5 (left)', 'side 6 (up-left)'] as const;

/** Validates six side lengths and returns the region; throws `invalid_region` if they do not close. */
export function makeRegion(lengths: readonly number[]): Region {
  if (lengths.length !== 6) {
    throw new CodedError('invalid_region', { what: 'Side lengths', expected: '6 numbers', received: `${lengths.length}` }, { path: 'lengths' });
  }
  lengths.forEach((s, i) => {
    if (!Number.isInteger(s) || s < 0) {
      throw new CodedError('invalid_region', { what: 'Side length', expected: 'a nonnegative integer', received: `${s}` }, { path: `lengths[${i}]` });
    }
  });
  const [s1, s2, s3, s4, s5, s6] = lengths as unknown as SideLengths;
  if (s1 + s2 !== s4 + s5 || s2 + s3 !== s5 + s6) {
    throw new CodedError('invalid_region', { what: 'Side lengths do not close', expected: 's1+s2 = s4+s5 and s2+s3 = s5+s6', received: `${lengths.join(',')} (${s1 + s2} vs ${s4 + s5}, ${s2 + s3} vs ${s5 + s6})` }, { path: 'lengths', hint: 'a hexagon closes iff opposite "gaps" agree, e.g. triangle n,0,n,0,n,0 or parallelogram a,b,0,a,b,0' });
  }
  const region: Region = { lengths: [s1, s2, s3, s4, s5, s6], size: s6 + s1 + s2 };
  if (unitTriangleCount(region) === 0) {
    throw new CodedError('invalid_region', { what: 'Region', expected: 'a region with at least one unit triangle', received: `side lengths ${lengths.join(',')} (a flat segment)` }, { path: 'lengths', hint: 'let the family variables start at values that give the region some area' });
  }
  return region;
}

/** The upright triangle of side n. */
export function triangleRegion(n: number): Region {
  return makeRegion([n, 0, n, 0, n, 0]);
}

/** Number of unit triangles of the region (its area in unit triangles). */
export function unitTriangleCount(region: Region): number {
  const [, s2, , s4, , s6] = region.lengths;
  const n = region.size;
  return n * n - s2 * s2 - s4 * s4 - s6 * s6;
}
