import type { z } from 'zod';
import type { CheckContext } from '../compile-context.js';

/** One kind of y-substitution step: schema, static check, action on one class, metadata. */
export interface SubstitutionStepDef<S extends { type: string } = { type: string }> {
  readonly type: S['type'];
  readonly schema: z.ZodType<S> & z.core.$ZodTypeDiscriminable;
  /** `n(v)`: the number of y variables at a variable assignment (the larger of both sides' N). */
  check(step: S, ctx: CheckContext, n: (values: Record<string, number>) => number): void;
  /** The step's permutation of y_1..y_m for one class, as 1-based images. */
  images(step: S, values: Readonly<Record<string, number>>, m: number): number[];
  variables(step: S): string[];
  /** The step as written, e.g. `rev[1..a]`. */
  text(step: S): string;
}

export function defineSubstitutionStep<S extends { type: string }>(def: SubstitutionStepDef<S>): SubstitutionStepDef<S> {
  return def;
}
