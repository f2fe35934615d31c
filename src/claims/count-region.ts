import {
  completeToTriangle,
  countBoundaryValues,
  type CountOptions,
  type ProgressCallback,
  type Semiring,
  type Weigher,
  fillingCountSemiring,
  fractionSemiring,
  valueRing,
  type Fraction,
  type StripLetter,
  generatingSemiring,
  integerSemiring,
  statisticWeigher,
  type Generating,
  makeRegion,
  polynomialSemiring,
  type PieceSet,
  type Polynomial,
  type Region,
  type SafeInt,
} from '../engine/index.js';
import { CodedError, toCodedError } from '../errors/index.js';
import { hasIntegerWeights } from './integer-weights.js';

export type RegionValue =
  | { readonly type: 'integer'; readonly value: SafeInt }
  | { readonly type: 'polynomial'; readonly value: Polynomial; readonly size: number; readonly variableNames: readonly string[] }
  /** Laurent polynomials in t_1..t_N, or quotients in y_1..y_N (named parameters follow, as for polynomials). */
  | { readonly type: 'fraction'; readonly value: Fraction; readonly size: number; readonly letter: StripLetter; readonly variableNames: readonly string[] };

export interface CountResult {
  readonly theory: string;
  readonly region: Region;
  readonly sides: readonly string[];
  /** Present with `completed`: the triangle actually counted. */
  readonly completion?: { readonly region: Region; readonly sides: readonly string[] };
  readonly puzzles: SafeInt;
  readonly value: RegionValue;
  /** With `statistic`: the number of puzzles with k pieces of that kind, as coefficients a_0, a_1, …. */
  readonly distribution?: { readonly kind: string; readonly counts: Generating };
}

/** Side lengths from six clockwise strings, validated as a region. */
export function regionOfSides(sides: readonly string[]): Region {
  try {
    return makeRegion(sides.map((s) => [...s].length));
  } catch (e) {
    // The lengths come from the side strings: the error points at the field `sides` (the CLI names its flag).
    const err = toCodedError(e);
    throw err.path === 'lengths' || err.path?.startsWith('lengths[') ? err.relocated({ path: 'sides' }) : err;
  }
}

/** The exact value and the number of fillings of one boundary, or of its completed triangle. */
export function countRegion(
  pieces: PieceSet,
  sides: readonly string[],
  options: { completed?: boolean; statistic?: string; memoryLimitBytes?: number; onProgress?: ProgressCallback } = {},
): CountResult {
  try {
    const region = regionOfSides(sides);
    const completion = options.completed ? completeToTriangle(region, sides, pieces) : undefined;
    const target = completion ?? { region, sides };
    const kind = options.statistic;
    if (kind !== undefined && !pieces.pieces.some((p) => p.kind === kind)) {
      const kinds = [...new Set(pieces.pieces.map((p) => p.kind))];
      throw new CodedError('invalid_argument', { what: 'Statistic kind', expected: `a piece kind of ${pieces.name}, one of ${kinds.map((k) => `'${k}'`).join(' | ')}`, received: `'${kind}'` }, { path: 'statistic' });
    }
    // One sweep gives the number of puzzles, the value and the statistic's distribution.
    const ringKind = valueRing(pieces);
    const fraction = ringKind.kind === 'fraction' ? fractionSemiring(target.region.size, ringKind.letter) : undefined;
    const integer = !fraction && hasIntegerWeights(pieces);
    const poly = polynomialSemiring(target.region.size);
    const valueSemiring = (fraction ?? (integer ? integerSemiring : poly)) as Semiring<unknown>;
    const limits = { ...(options.memoryLimitBytes !== undefined ? { memoryLimitBytes: options.memoryLimitBytes } : {}), ...(options.onProgress ? { onProgress: options.onProgress } : {}) };
    const rings: CountOptions<unknown>[] = [{ semiring: fillingCountSemiring, ...limits }, { semiring: valueSemiring }];
    if (kind !== undefined) rings.push({ semiring: generatingSemiring as Semiring<unknown>, weigher: statisticWeigher(new Set([kind])) as Weigher<unknown> });
    const [puzzles, v, counts] = countBoundaryValues(target.region, target.sides, pieces, rings) as [SafeInt, unknown, Generating | undefined];
    const value: RegionValue = fraction
      ? { type: 'fraction', value: v as Fraction, size: fraction.size, letter: fraction.letter, variableNames: fraction.variableNames }
      : integer
        ? { type: 'integer', value: v as SafeInt }
        : { type: 'polynomial', value: v as Polynomial, size: poly.size, variableNames: poly.variableNames };
    const distribution = kind === undefined ? undefined : { kind, counts: counts! };
    return { theory: pieces.name, region, sides, ...(completion ? { completion } : {}), puzzles, value, ...(distribution ? { distribution } : {}) };
  } catch (e) {
    throw toCodedError(e);
  }
}
