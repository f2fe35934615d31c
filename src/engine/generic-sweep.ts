import { BOTTOM_OPEN, STEP_END, STEP_START, STEP_UP, type KernelPlan } from './kernel-plan.js';
import type { SweepHooks, SweepStrategy } from './numeric-kernel.js';
import type { Semiring } from './semiring.js';
import { SweepRing, type WorkSwitch } from './work-ring.js';

/**
 * The sweep over packed profiles for any semiring (polynomials, generating polynomials, bigints):
 * values are semiring objects in a Map, so arithmetic dominates and one callback per transition is
 * fine. Shares the kernel plan, and the forward / backward / meet strategies, with the numeric kernel.
 */
export type GenericWeights<T> = readonly (T | undefined)[];

/** Piece k on step s has weight weights[s·P + k]; `undefined` means 1 (no multiplication). */
type Emit = (key: number, piece: number) => void;

function forEachForward(plan: KernelPlan, label: Int32Array, s: number, key: number, emit: Emit): void {
  const a = plan.alphabet;
  const type = plan.type[s]!;
  const lab = label[s]!;
  if (type === STEP_START) return emit(lab + a * key, -1);
  const slant = key % a;
  if (type === STEP_END) {
    if (slant === lab) emit((key - lab) / a, -1);
    return;
  }
  const unit = plan.unit[s]!;
  const p = (key - slant) / a;
  const low = p % unit;
  const high = (p - low) / unit;
  if (type === STEP_UP) {
    for (let o = plan.upStart[slant]!; o < plan.upStart[slant + 1]!; o++) {
      const b = plan.upBottom[o]!;
      if (lab >= 0 ? b !== lab : lab === BOTTOM_OPEN && b >= plan.boundaryCount) continue;
      emit(plan.upRight[o]! + a * (low + unit * (b + a * high)), plan.upPiece[o]!);
    }
    return;
  }
  const top = high % a;
  const rest = low + unit * ((high - top) / a);
  const at = top * a + slant;
  for (let o = plan.downStart[at]!; o < plan.downStart[at + 1]!; o++) emit(plan.downRight[o]! + a * rest, plan.downPiece[o]!);
}

function forEachBackward(plan: KernelPlan, label: Int32Array, s: number, nk: number, emit: Emit): void {
  const a = plan.alphabet;
  const type = plan.type[s]!;
  const lab = label[s]!;
  if (type === STEP_END) return emit(lab + a * nk, -1);
  const right = nk % a;
  if (type === STEP_START) {
    if (right === lab) emit((nk - lab) / a, -1);
    return;
  }
  const unit = plan.unit[s]!;
  const q = (nk - right) / a;
  const low = q % unit;
  const rest = (q - low) / unit;
  if (type === STEP_UP) {
    const b = rest % a;
    if (lab >= 0 ? b !== lab : lab === BOTTOM_OPEN && b >= plan.boundaryCount) return;
    const high = (rest - b) / a;
    const at = right * a + b;
    for (let o = plan.upBackStart[at]!; o < plan.upBackStart[at + 1]!; o++) emit(plan.upBackLeft[o]! + a * (low + unit * high), plan.upBackPiece[o]!);
    return;
  }
  for (let o = plan.downBackStart[right]!; o < plan.downBackStart[right + 1]!; o++) {
    emit(plan.downBackLeft[o]! + a * (low + unit * (plan.downBackTop[o]! + a * rest)), plan.downBackPiece[o]!);
  }
}

/** One step of the generic sweep, forwards (state s to s+1) or backwards (s+1 to s). */
export function genericStep<T>(plan: KernelPlan, label: Int32Array, s: number, semiring: Semiring<T>, weights: GenericWeights<T>, cur: Map<number, T>, backward: boolean): Map<number, T> {
  const next = new Map<number, T>();
  // Sums this step created itself may be added into in place; values passed through may be shared.
  const owned = new Set<T>();
  const P = plan.pieceCount;
  const addInPlace = semiring.addInPlace?.bind(semiring);
  const addProduct = addInPlace && semiring.addProductInPlace?.bind(semiring);
  for (const [key, value] of cur) {
    const emit: Emit = (nk, piece) => {
      const w = piece < 0 ? undefined : weights[s * P + piece];
      if (w !== undefined && addProduct) {
        const old = next.get(nk);
        // An owned sum takes value·w directly, with no temporary product.
        if (old !== undefined && owned.has(old)) {
          const sum = addProduct(old, value, w);
          if (semiring.isZero(sum)) next.delete(nk);
          return;
        }
      }
      const v = w === undefined ? value : semiring.mul(value, w);
      if (semiring.isZero(v)) return;
      const old = next.get(nk);
      if (old === undefined) {
        next.set(nk, v);
        if (w !== undefined && addInPlace) owned.add(v);
        return;
      }
      let sum: T;
      if (addInPlace && owned.has(old)) sum = addInPlace(old, v);
      else {
        sum = semiring.add(old, v);
        if (addInPlace && sum !== old && sum !== v) owned.add(sum);
      }
      if (semiring.isZero(sum)) next.delete(nk);
      else next.set(nk, sum);
    };
    if (backward) forEachBackward(plan, label, s, key, emit);
    else forEachForward(plan, label, s, key, emit);
  }
  if (semiring.settle) for (const v of owned) semiring.settle(v);
  return next;
}

// Bytes a table of generic values holds, roughly: a Map entry per profile plus, for polynomials, a
// Map entry with a string key and a bigint per term (measured order of magnitude, not exact).
export const BYTES_PER_PROFILE = 80;
export const BYTES_PER_TERM = 120;
export function estimateBytes<T>(semiring: Semiring<T>, table: Map<number, T>): number {
  let terms = 0;
  if (semiring.terms) for (const v of table.values()) terms += semiring.terms(v);
  return table.size * BYTES_PER_PROFILE + terms * (semiring.termBytes ?? BYTES_PER_TERM);
}

/**
 * The value of one fixed boundary in any semiring (packed profiles). With `work`, the sweep moves into
 * the ring's work form once its tables grow (`SweepRing`); the value returned is in the caller's form.
 */
export function genericCountFixed<T>(
  plan: KernelPlan,
  label: Int32Array,
  initial: number,
  target: number,
  semiring: Semiring<T>,
  weights: GenericWeights<T>,
  strategy: SweepStrategy,
  hooks: SweepHooks = {},
  work?: () => WorkSwitch,
  workTerms?: number,
): T {
  const ring = new SweepRing(semiring as Semiring<unknown>, weights as GenericWeights<unknown>, work, workTerms);
  let f = new Map<number, unknown>([[initial, semiring.one]]);
  let b = new Map<number, unknown>([[target, semiring.one]]);
  let lo = 0;
  let hi = plan.stepCount;
  while (lo < hi) {
    if (strategy === 'forward' || (strategy === 'meet' && f.size <= b.size)) f = genericStep(plan, label, lo++, ring.semiring, ring.weights, f, false);
    else b = genericStep(plan, label, --hi, ring.semiring, ring.weights, b, true);
    [f, b] = ring.settle([f, b]) as [Map<number, unknown>, Map<number, unknown>];
    // The estimate walks every value, so it is taken every fourth step.
    if (hooks.checkMemory && (lo + plan.stepCount - hi) % 4 === 0) hooks.checkMemory(estimateBytes(ring.semiring, f) + estimateBytes(ring.semiring, b), lo + plan.stepCount - hi);
    hooks.onProgress?.({ done: lo + plan.stepCount - hi, total: plan.stepCount, profiles: f.size + b.size, fromTop: f.size, fromBottom: b.size });
    if (f.size === 0 || b.size === 0) return semiring.zero;
  }
  // Σ F(p)·B(p), summed in place where the ring allows (the first product is the sweep's own value).
  const r = ring.semiring;
  let total: unknown;
  const [small, large] = f.size <= b.size ? [f, b] : [b, f];
  for (const [key, x] of small) {
    const y = large.get(key);
    if (y === undefined) continue;
    if (total === undefined) total = r.mul(x, y);
    else if (r.addProductInPlace && r.addInPlace) total = r.addProductInPlace(total, x, y);
    else total = r.addInPlace ? r.addInPlace(total, r.mul(x, y)) : r.add(total, r.mul(x, y));
  }
  return total === undefined ? semiring.zero : (ring.out(total) as T);
}

/** Forward sweep with side 5 open in any semiring: final line-0 profiles (packed) to values (`work` as in `genericCountFixed`). */
export function genericSweepOpen<T>(plan: KernelPlan, label: Int32Array, initial: number, semiring: Semiring<T>, weights: GenericWeights<T>, hooks: SweepHooks = {}, work?: () => WorkSwitch, workTerms?: number): Map<number, T> {
  const ring = new SweepRing(semiring as Semiring<unknown>, weights as GenericWeights<unknown>, work, workTerms);
  let f = new Map<number, unknown>([[initial, semiring.one]]);
  for (let s = 0; s < plan.stepCount; s++) {
    f = genericStep(plan, label, s, ring.semiring, ring.weights, f, false);
    f = ring.settle([f])[0]!;
    if (hooks.checkMemory && s % 4 === 0) hooks.checkMemory(estimateBytes(ring.semiring, f), s + 1);
    hooks.onProgress?.({ done: s + 1, total: plan.stepCount, profiles: f.size });
  }
  const out = new Map<number, T>();
  for (const [k, v] of f) out.set(k, ring.out(v) as T);
  return out;
}
