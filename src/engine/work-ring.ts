import { genericWeights } from './count-kernel.js';
import type { GenericWeights } from './generic-sweep.js';
import type { KernelPlan } from './kernel-plan.js';
import type { Semiring } from './semiring.js';
import type { Weigher } from './weigher.js';

/**
 * Live terms from which a generic sweep moves into its ring's work form. Below it the caller's form is
 * cheaper (measured: 5,040 Gr(3,7) counts of a few terms each took 1.5× the CPU when packed, since
 * every small packed value is three typed arrays); the n = 13 whole product holds millions.
 */
export const WORK_FORM_TERMS = 100_000;

/** A ring's work form with the sweep's weights in it (see `Semiring.work`). */
export interface WorkSwitch {
  readonly semiring: Semiring<unknown>;
  readonly weights: GenericWeights<unknown>;
  into(value: unknown): unknown;
  out(value: unknown): unknown;
}

/** The work form of a count's ring, built on first use (weights as the caller asked, converted once per plan); undefined when it has none. */
export function workSwitch<T>(plan: KernelPlan, semiring: Semiring<T>, weigher: Weigher<T>, cacheable: boolean): (() => WorkSwitch) | undefined {
  if (!semiring.work) return undefined;
  let built: WorkSwitch | undefined;
  return () => {
    if (built) return built;
    const form = semiring.work!();
    const converted: Weigher<unknown> = (piece, triangle) => form.into(weigher(piece, triangle));
    built = { semiring: form.semiring, weights: genericWeights(plan, form.semiring, converted, cacheable), into: (v) => form.into(v as T), out: (v) => form.out(v) };
    return built;
  };
}

/** The ring a generic sweep is in: the caller's until its tables hold `WORK_FORM_TERMS` terms, then the work form. */
export class SweepRing {
  semiring: Semiring<unknown>;
  weights: GenericWeights<unknown>;
  private back: ((value: unknown) => unknown) | null = null;

  constructor(
    semiring: Semiring<unknown>,
    weights: GenericWeights<unknown>,
    private readonly work: (() => WorkSwitch) | undefined,
    private readonly threshold = WORK_FORM_TERMS,
  ) {
    this.semiring = semiring;
    this.weights = weights;
  }

  /** The tables, moved into the work form once they have grown enough (values shared stay shared). */
  settle(tables: Map<number, unknown>[]): Map<number, unknown>[] {
    if (!this.work || this.back || !this.semiring.terms) return tables;
    let terms = 0;
    for (const t of tables) for (const v of t.values()) terms += this.semiring.terms(v);
    if (terms < this.threshold) return tables;
    const s = this.work();
    const seen = new Map<unknown, unknown>();
    const moved = tables.map((t) => {
      const m = new Map<number, unknown>();
      for (const [k, v] of t) {
        let w = seen.get(v);
        if (w === undefined) seen.set(v, (w = s.into(v)));
        m.set(k, w);
      }
      return m;
    });
    this.semiring = s.semiring;
    this.weights = s.weights;
    this.back = s.out;
    return moved;
  }

  /** A value in the caller's form. */
  out(value: unknown): unknown {
    return this.back ? this.back(value) : value;
  }
}
