import type { z } from 'zod';
import type { PieceSet } from '../../engine/index.js';
import type { Affine } from '../affine.js';
import type { SideMap } from '../side-map.js';
import type { CheckContext } from '../compile-context.js';

/** Concrete side lengths and clockwise strings of a boundary. */
export interface Boundary {
  readonly lengths: readonly number[];
  readonly sides: readonly string[];
}

/** One transform step type: its schema, static check, action and metadata. Registered in `step-registry.ts`. */
export interface TransformStepDef<S extends { type: string } = { type: string }, Z extends z.ZodType = z.ZodType<S>> {
  readonly type: S['type'];
  readonly schema: Z & z.core.$ZodTypeDiscriminable;
  /** Meaning checks beyond the schema, against the side lengths before this step. */
  check(step: S, ctx: CheckContext): void;
  /** The action as a relabelling of sides, or undefined when the step is not one (completion). */
  sideMap(step: S): SideMap | undefined;
  /** Side lengths after the step (symbolically). */
  lengths(step: S, lengths: readonly Affine[]): Affine[];
  /** The action on a concrete boundary, for steps without a side map. */
  apply?(step: S, b: Boundary, pieces: PieceSet): Boundary;
  /** Applying the step twice is the identity. */
  involutive(step: S): boolean;
  /** Family variables the step mentions. */
  variables(step: S): string[];
  /** How the step reads in summaries and failures, e.g. `exchange sides 1 ↔ 4`. */
  text(step: S): string;
}

/** Declares a step type with its types inferred from the schema. */
export function defineStep<Z extends z.ZodType<{ type: string }> & z.core.$ZodTypeDiscriminable>(def: TransformStepDef<z.output<Z>, Z>): TransformStepDef<z.output<Z>, Z> {
  return def;
}
