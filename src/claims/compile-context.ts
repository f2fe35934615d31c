import type { ErrorParts } from '../errors/index.js';
import type { PieceSet } from '../engine/index.js';
import type { Affine, ExpressionInput } from './affine.js';

/** Throws the coded claim error at a JSON path. */
export type Fail = (parts: ErrorParts, path: string, hint?: string) => never;

/** The first variable assignment where a condition fails, or undefined when it holds everywhere. */
export type Where = (pred: (values: Record<string, number>) => boolean) => Record<string, number> | undefined;

/** What a registry entry's static check may use: the family, the theories and the claim's error reporting. */
export interface CheckContext {
  readonly left: PieceSet;
  readonly right: PieceSet;
  /** Side lengths the entry acts on: before the step for a transform step, the family's for the rest. */
  readonly lengths: readonly Affine[];
  /** Side lengths of T(b) (relations and measures only; equal to `lengths` for steps). */
  readonly transformedLengths: readonly Affine[];
  /** The measure compares integers / polynomials in y (relations only). */
  readonly integer: boolean;
  readonly polynomial: boolean;
  /** The claim's measure type (relations only). */
  readonly measureType: string;
  /** Checks an affine condition at the corners of the variable box (enough for affine conditions). */
  readonly cornerWhere: Where;
  /** Checks a condition at every point of the variable box. */
  readonly pointWhere: Where;
  /** Parses an expression, failing with its JSON path on a syntax error or an undeclared variable. */
  expr(input: ExpressionInput, path: string): Affine;
  readonly fail: Fail;
  /** JSON path of the entry, e.g. `transform[1]`. */
  readonly path: string;
}
