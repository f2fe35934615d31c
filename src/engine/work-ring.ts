import { genericWeights } from './count-kernel.js';
import type { GenericWeights } from './generic-sweep.js';
import type { KernelPlan } from './kernel-plan.js';
import type { Semiring } from './semiring.js';
import type { Weigher } from './weigher.js';

/** The ring a generic sweep computes in, its weight table, and the way back to the caller's values. */
export interface WorkRing<T> {
  readonly semiring: Semiring<unknown>;
  readonly weights: GenericWeights<unknown>;
  out(value: unknown): T;
}

/**
 * A generic sweep of `semiring` runs in its work form when it has one (polynomials as typed arrays):
 * weights are computed as the caller asked and converted once per plan; final values convert back.
 */
export function workRing<T>(plan: KernelPlan, semiring: Semiring<T>, weigher: Weigher<T>, cacheable: boolean): WorkRing<T> {
  const form = semiring.work?.();
  if (!form) return { semiring: semiring as Semiring<unknown>, weights: genericWeights(plan, semiring, weigher, cacheable) as GenericWeights<unknown>, out: (v) => v as T };
  const converted: Weigher<unknown> = (piece, triangle) => form.into(weigher(piece, triangle));
  return { semiring: form.semiring, weights: genericWeights(plan, form.semiring, converted, cacheable), out: (v) => form.out(v) };
}
