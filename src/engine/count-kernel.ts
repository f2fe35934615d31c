import type { KernelPlan } from './kernel-plan.js';
import type { Lanes } from './numeric-kernel.js';
import type { GenericWeights } from './generic-sweep.js';
import type { Semiring } from './semiring.js';
import type { Weigher } from './weigher.js';

/** Residues times residues must stay exact in a double. */
const MODULUS_LIMIT = 2 ** 26;

// Weight tables per kernel plan and semiring, for the declared weights (the common case).
const genericCache = new WeakMap<KernelPlan, WeakMap<object, GenericWeights<unknown>>>();
const lanesCache = new WeakMap<KernelPlan, WeakMap<object, Lanes | null>>();

/** Weight of every piece on every step's triangle (undefined: weight 1 or piece of the other orientation). */
export function genericWeights<T>(plan: KernelPlan, semiring: Semiring<T>, weigher: Weigher<T>, cacheable: boolean): GenericWeights<T> {
  let byRing = genericCache.get(plan);
  const hit = cacheable ? byRing?.get(semiring) : undefined;
  if (hit) return hit as GenericWeights<T>;
  const P = plan.pieceCount;
  const out = new Array<T | undefined>(plan.stepCount * P);
  for (let s = 0; s < plan.stepCount; s++) {
    const t = plan.triangles[s];
    if (!t) continue;
    plan.pieces.pieces.forEach((p, k) => {
      if (p.orientation !== t.orientation) return;
      const w = weigher(p, t);
      out[s * P + k] = semiring.equals(w, semiring.one) ? undefined : w;
    });
  }
  if (cacheable) {
    if (!byRing) genericCache.set(plan, (byRing = new WeakMap()));
    byRing.set(semiring, out);
  }
  return out;
}

/**
 * The numeric lanes of several semirings counted in one sweep (all integer, or one modular), or null
 * when some value cannot live in typed arrays (a bigint weight, a generic semiring).
 */
export function numericLanes(plan: KernelPlan, rings: readonly { semiring: Semiring<unknown>; weigher: Weigher<unknown>; cacheable: boolean }[]): Lanes | null {
  const single = rings.length === 1 && rings[0]!.cacheable ? rings[0]!.semiring : null;
  if (single) {
    const hit = lanesCache.get(plan)?.get(single);
    if (hit !== undefined) return hit;
  }
  const lanes = buildLanes(plan, rings);
  if (single) {
    let byRing = lanesCache.get(plan);
    if (!byRing) lanesCache.set(plan, (byRing = new WeakMap()));
    byRing.set(single, lanes);
  }
  return lanes;
}

function buildLanes(plan: KernelPlan, rings: readonly { semiring: Semiring<unknown>; weigher: Weigher<unknown> }[]): Lanes | null {
  const forms = rings.map((r) => r.semiring.numeric);
  if (forms.some((f) => f === undefined)) return null;
  const modular = forms.filter((f) => f!.kind === 'modular');
  if (modular.length > 0 && rings.length > 1) return null;
  const moduli = modular.length === 1 && modular[0]!.kind === 'modular' ? modular[0]!.moduli : null;
  // A modulus 0 is a bound lane (numeric-kernel.ts).
  if (moduli && moduli.some((m) => m !== 0 && (!Number.isInteger(m) || m <= 1 || m >= MODULUS_LIMIT))) return null;
  const L = moduli ? moduli.length : rings.length;
  const P = plan.pieceCount;
  const weights = new Float64Array(plan.stepCount * P * L);
  for (let s = 0; s < plan.stepCount; s++) {
    const t = plan.triangles[s];
    if (!t) continue;
    for (let k = 0; k < P; k++) {
      const p = plan.pieces.pieces[k]!;
      if (p.orientation !== t.orientation) continue;
      const at = (s * P + k) * L;
      if (moduli) {
        const w = rings[0]!.weigher(p, t) as readonly number[];
        for (let l = 0; l < L; l++) {
          // a bound lane's weights must be nonnegative numbers (its rounding argument needs it)
          if (moduli[l] === 0 && !(w[l]! >= 0)) return null;
          weights[at + l] = w[l]!;
        }
      } else {
        for (let l = 0; l < L; l++) {
          const w = rings[l]!.weigher(p, t);
          if (typeof w !== 'number' || !Number.isSafeInteger(w)) return null;
          weights[at + l] = w;
        }
      }
    }
  }
  return { count: L, moduli: moduli ? Float64Array.from(moduli) : null, weights };
}
