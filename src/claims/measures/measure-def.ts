import type { z } from 'zod';
import type { PieceSet } from '../../engine/index.js';
import type { CheckContext } from '../compile-context.js';

/** How a measure is counted: an integer or generating-polynomial semiring, or the theory's own value. */
export type Counting = 'puzzles' | 'value' | { readonly statistic: string };

/** One measure type. Registered in `measure-registry.ts`. */
export interface MeasureDef<M extends { type: string } = { type: string }, Z extends z.ZodType = z.ZodType<M>> {
  readonly type: M['type'];
  readonly schema: Z & z.core.$ZodTypeDiscriminable;
  check(measure: M, ctx: CheckContext): void;
  /** The measure is an integer on this piece set (a polynomial measure is `value` with non-integer weights). */
  integer(measure: M, pieces: PieceSet): boolean;
  counting(measure: M): Counting;
  /** How the measure reads, e.g. `the number of puzzles`. */
  text(measure: M): string;
}

export function defineMeasure<Z extends z.ZodType<{ type: string }> & z.core.$ZodTypeDiscriminable>(def: MeasureDef<z.output<Z>, Z>): MeasureDef<z.output<Z>, Z> {
  return def;
}
