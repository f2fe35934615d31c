import type { z } from 'zod';
import type { ErrorParts } from '../../errors/index.js';
import type { CheckContext } from '../compile-context.js';

/** One kind of y-substitution step: schema, static check, action on one class, metadata. */
export interface SubstitutionStepDef<S extends { type: string } = { type: string }, Z extends z.ZodType = z.ZodType<S>> {
  readonly type: S['type'];
  readonly schema: Z & z.core.$ZodTypeDiscriminable;
  /** `n(v)`: the number of y variables at a variable assignment (the larger of both sides' N). */
  check(step: S, ctx: CheckContext, n: (values: Record<string, number>) => number): void;
  /** The step's permutation of y_1..y_m for one class, as 1-based images. */
  images(step: S, values: Readonly<Record<string, number>>, m: number): number[];
  /** Why the step does not fit one class (m variables), with the field at fault; undefined when it does. */
  rangeError(step: S, values: Readonly<Record<string, number>>, m: number): { parts: ErrorParts; field?: string } | undefined;
  variables(step: S): string[];
  /** The step as written, e.g. `rev[1..a]`. */
  text(step: S): string;
}

export function defineSubstitutionStep<Z extends z.ZodType<{ type: string }> & z.core.$ZodTypeDiscriminable>(def: SubstitutionStepDef<z.output<Z>, Z>): SubstitutionStepDef<z.output<Z>, Z> {
  return def;
}
