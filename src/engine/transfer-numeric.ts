import type { Semiring } from './semiring.js';
import { labelChar, type TransferPlan } from './transfer-plan.js';

/** The weight of every piece on the triangle of every step; `isOne` skips a multiplication. */
export type WeightTable<T> = readonly (readonly ({ readonly w: T; readonly isOne: boolean } | undefined)[])[];

// The longest profile (placed bottoms + pending tops + the slanted edge) any step holds.
function longestProfile(plan: TransferPlan): number {
  let longest = plan.initial.length;
  let pending = plan.initial.length;
  let placed = 0;
  for (const step of plan.steps) {
    if (step.type === 'start') {
      pending = placed + pending;
      placed = 0;
    } else if (step.type === 'up') placed++;
    else if (step.type === 'down') pending--;
    else if (step.type === 'end') {
      pending = placed;
      placed = 0;
    }
    longest = Math.max(longest, placed + pending + 1);
  }
  return longest;
}

/** True when every profile fits in a safe integer written in base A (the fast path). */
export function fitsNumeric(plan: TransferPlan): boolean {
  return Math.pow(plan.alphabetSize, longestProfile(plan) + 1) < Number.MAX_SAFE_INTEGER;
}

/**
 * The sweep of `sweep()` with profiles packed into numbers: key = slant + A·Σ d_i A^i, where d_i is
 * the label at profile position i. Inserting or removing a label is arithmetic instead of string
 * building, which is most of the cost of a sweep.
 */
export function sweepNumeric<T>(plan: TransferPlan, semiring: Semiring<T>, weights: WeightTable<T>): Map<string, T> {
  const a = plan.alphabetSize;
  const pow: number[] = [1];
  for (let k = 1; k <= longestProfile(plan) + 1; k++) pow.push(pow[k - 1]! * a);
  let initial = 0;
  for (let i = plan.initial.length - 1; i >= 0; i--) initial = initial * a + plan.initial.charCodeAt(i);
  let state = new Map<number, T>([[initial, semiring.one]]);
  const { add, mul, isZero } = semiring;
  const addInPlace = semiring.addInPlace?.bind(semiring);
  // Values this step allocated itself (sums), which may therefore be added into in place; a value
  // passed through unchanged may be shared by several states and is copied on its first sum.
  let owned = new Set<T>();
  const put = (next: Map<number, T>, key: number, v: T, fresh: boolean) => {
    const old = next.get(key);
    if (old === undefined) {
      next.set(key, v);
      if (fresh && addInPlace) owned.add(v);
    } else {
      let sum: T;
      if (addInPlace && owned.has(old)) sum = addInPlace(old, v);
      else {
        sum = add(old, v);
        if (addInPlace && sum !== old && sum !== v) owned.add(sum);
      }
      if (isZero(sum)) next.delete(key);
      else next.set(key, sum);
    }
  };
  plan.steps.forEach((step, s) => {
    const next = new Map<number, T>();
    owned = new Set<T>();
    const row = weights[s]!;
    if (step.type === 'start') {
      for (const [p, v] of state) next.set(step.label + a * p, v);
    } else if (step.type === 'end') {
      for (const [key, v] of state) if (key % a === step.label) next.set((key - step.label) / a, v);
    } else {
      const unit = pow[step.placed]!;
      for (const [key, value] of state) {
        const slant = key % a;
        const p = (key - slant) / a;
        const low = p % unit;
        const high = (p - low) / unit;
        if (step.type === 'up') {
          for (const o of plan.upByLeft[slant]!) {
            if (step.bottom !== null ? o.bottom !== step.bottom : step.onBoundary && o.bottom >= plan.boundaryCount) continue;
            const e = row[o.piece]!;
            const v = e.isOne ? value : mul(value, e.w);
            if (!isZero(v)) put(next, o.right + a * (low + unit * (o.bottom + a * high)), v, !e.isOne);
          }
        } else {
          const top = high % a;
          const rest = low + unit * ((high - top) / a);
          for (const o of plan.downByTopLeft[top * a + slant]!) {
            const e = row[o.piece]!;
            const v = e.isOne ? value : mul(value, e.w);
            if (!isZero(v)) put(next, o.right + a * rest, v, !e.isOne);
          }
        }
      }
    }
    state = next;
  });
  // Line 0 holds one label per bottom edge of the region, i.e. side 5.
  const length = plan.region.lengths[4];
  const out = new Map<string, T>();
  for (const [p, v] of state) {
    let profile = '';
    let rest = p;
    for (let k = 0; k < length; k++) {
      const d = rest % a;
      profile += labelChar(d);
      rest = (rest - d) / a;
    }
    out.set(profile, v);
  }
  return out;
}
