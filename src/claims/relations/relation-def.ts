import type { z } from 'zod';
import type { CheckContext } from '../compile-context.js';
import type { Value } from '../measure.js';
import type { Permutation } from '../substitution.js';

/** One relation type between left = measure(b) and right = measure(T(b)). Registered in `relation-registry.ts`. */
export interface RelationDef<R extends { type: string } = { type: string }, Z extends z.ZodType = z.ZodType<R>> {
  readonly type: R['type'];
  readonly schema: Z & z.core.$ZodTypeDiscriminable;
  /** Meaning checks: the measure kind it needs, indices in range. */
  check(relation: R, ctx: CheckContext): void;
  /** left R right ⇔ right R left, so an involutive transform may check each pair {b, T(b)} once. */
  readonly symmetric: boolean;
  /** The fixed y-permutation σ of one class (m variables) compared through, if the relation has one. */
  substitution?(relation: R, values: Readonly<Record<string, number>>, m: number): Permutation;
  /** The permutations searched for one that makes both sides equal, if the relation searches. */
  searchSpace?(relation: R): 'blockReversals' | 'allPermutations';
  /** Whether left R right; `right` is σ(right value) for substitution relations. */
  holds(left: Value, right: Value): boolean;
  /** Family variables the relation mentions (its value can differ between classes of equal lengths). */
  variables(relation: R): string[];
  /** The relation as a formula in L = left value, R = right value, e.g. `L = σ(R), σ = rev[1..a]`. */
  text(relation: R): string;
  /** How a failing instance reads, e.g. `L ≠ σ(R)`. */
  readonly failure: string;
}

export function defineRelation<Z extends z.ZodType<{ type: string }> & z.core.$ZodTypeDiscriminable>(def: RelationDef<z.output<Z>, Z>): RelationDef<z.output<Z>, Z> {
  return def;
}
