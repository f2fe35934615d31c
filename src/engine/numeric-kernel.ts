import { BOTTOM_OPEN, STEP_DOWN, STEP_END, STEP_START, STEP_UP, type KernelPlan } from './kernel-plan.js';
import { ProfileTable } from './profile-table.js';

/**
 * Value lanes of the numeric kernel. Integer lanes hold safe integers in float64 and raise
 * `NumericOverflow` the moment a product or sum would leave ±(2^53 − 1), so the caller can redo the
 * count in bigint (an integer never overflows silently). Modular lanes hold uint32 residues, one
 * modulus per lane (moduli below 2^26, so a product of two residues is exact in a double). Beside
 * residues, a modulus 0 marks a *bound lane*: nonnegative values in float64, multiplied and added as
 * they are, never raising. Such a lane is only ever compared with a bound far below 2^53, and rounding
 * a nonnegative sum or product is monotone, so a value past 2^53 is still read as past the bound.
 */
export interface Lanes {
  readonly count: number;
  /** One modulus per lane (0: a bound lane), or null for integer lanes. */
  readonly moduli: Float64Array | null;
  /** Weight of piece k on the triangle of step s in lane l at [(s·P + k)·lanes + l]. */
  readonly weights: Float64Array;
}

/** Thrown when an integer lane would leave the safe range; callers fall back to exact bigints. */
export class NumericOverflow extends Error {
  constructor() {
    super('numeric kernel: a value left the safe-integer range');
  }
}

const MAX = Number.MAX_SAFE_INTEGER;

/** Every lane a residue (stored as uint32); a bound lane or integer lanes need float64. */
export function residueLanes(lanes: Lanes): boolean {
  return lanes.moduli !== null && lanes.moduli.every((m) => m > 0);
}

export function newTable(lanes: Lanes, capacity = 16): ProfileTable {
  return new ProfileTable(lanes.count, residueLanes(lanes), capacity);
}

// Adds v·w (lane by lane) into entry `to` of `next`; `wb` indexes the weight row (−1: weight 1).
function accumulate(cv: Float64Array | Uint32Array, from: number, next: ProfileTable, to: number, lanes: Lanes, wb: number): void {
  const L = lanes.count;
  const nv = next.vals;
  const mod = lanes.moduli;
  const w = lanes.weights;
  for (let l = 0; l < L; l++) {
    let v = cv[from + l]!;
    if (wb >= 0) v *= w[wb + l]!;
    if (mod !== null) {
      const m = mod[l]!;
      if (m === 0) {
        nv[to + l] = nv[to + l]! + v;
        continue;
      }
      let r = v - Math.floor(v / m) * m;
      if (r < 0) r += m;
      let t = nv[to + l]! + r;
      if (t >= m) t -= m;
      nv[to + l] = t;
    } else {
      const t = nv[to + l]! + v;
      if (v > MAX || v < -MAX || t > MAX || t < -MAX) throw new NumericOverflow();
      nv[to + l] = t;
    }
  }
}

function allZero(cv: Float64Array | Uint32Array, from: number, L: number): boolean {
  for (let l = 0; l < L; l++) if (cv[from + l] !== 0) return false;
  return true;
}

/** One forward step s: every profile of `cur` (state s) to its successors in `next` (state s+1, cleared first). */
export function forwardStep(plan: KernelPlan, label: Int32Array, s: number, lanes: Lanes, cur: ProfileTable, next: ProfileTable): void {
  next.clear();
  const a = plan.alphabet;
  const L = lanes.count;
  const type = plan.type[s]!;
  const lab = label[s]!;
  const unit = plan.unit[s]!;
  const P = plan.pieceCount;
  const bc = plan.boundaryCount;
  const keys = cur.keys;
  const n = cur.count;
  for (let e = 0; e < n; e++) {
    const cv = cur.vals;
    const from = e * L;
    if (allZero(cv, from, L)) continue;
    const key = keys[e]!;
    if (type === STEP_START) {
      accumulate(cv, from, next, next.slot(lab + a * key) * L, lanes, -1);
      continue;
    }
    // Float `%` is a libm call (~100 ns); floor division with a correction is exact below 2^53.
    let p = Math.floor(key / a);
    let slant = key - p * a;
    if (slant < 0) (p--, (slant += a));
    if (type === STEP_END) {
      if (slant === lab) accumulate(cv, from, next, next.slot(p) * L, lanes, -1);
      continue;
    }
    let high = Math.floor(p / unit);
    let low = p - high * unit;
    if (low < 0) (high--, (low += unit));
    if (type === STEP_UP) {
      const end = plan.upStart[slant + 1]!;
      for (let o = plan.upStart[slant]!; o < end; o++) {
        const b = plan.upBottom[o]!;
        if (lab >= 0 ? b !== lab : lab === BOTTOM_OPEN && b >= bc) continue;
        const nk = plan.upRight[o]! + a * (low + unit * (b + a * high));
        accumulate(cv, from, next, next.slot(nk) * L, lanes, (s * P + plan.upPiece[o]!) * L);
      }
    } else {
      let above = Math.floor(high / a);
      let top = high - above * a;
      if (top < 0) (above--, (top += a));
      const rest = low + unit * above;
      const at = top * a + slant;
      const end = plan.downStart[at + 1]!;
      for (let o = plan.downStart[at]!; o < end; o++) {
        accumulate(cv, from, next, next.slot(plan.downRight[o]! + a * rest) * L, lanes, (s * P + plan.downPiece[o]!) * L);
      }
    }
  }
}

/**
 * One backward step s: `cur` holds state s+1 with the value of every way to finish from there; fills
 * `next` (state s, cleared first) with the predecessors' values.
 */
export function backwardStep(plan: KernelPlan, label: Int32Array, s: number, lanes: Lanes, cur: ProfileTable, next: ProfileTable): void {
  next.clear();
  const a = plan.alphabet;
  const L = lanes.count;
  const type = plan.type[s]!;
  const lab = label[s]!;
  const unit = plan.unit[s]!;
  const P = plan.pieceCount;
  const bc = plan.boundaryCount;
  const keys = cur.keys;
  const n = cur.count;
  for (let e = 0; e < n; e++) {
    const cv = cur.vals;
    const from = e * L;
    if (allZero(cv, from, L)) continue;
    const nk = keys[e]!;
    if (type === STEP_END) {
      accumulate(cv, from, next, next.slot(lab + a * nk) * L, lanes, -1);
      continue;
    }
    let q = Math.floor(nk / a);
    let right = nk - q * a;
    if (right < 0) (q--, (right += a));
    if (type === STEP_START) {
      if (right === lab) accumulate(cv, from, next, next.slot(q) * L, lanes, -1);
      continue;
    }
    let rest = Math.floor(q / unit);
    let low = q - rest * unit;
    if (low < 0) (rest--, (low += unit));
    if (type === STEP_UP) {
      let high = Math.floor(rest / a);
      let b = rest - high * a;
      if (b < 0) (high--, (b += a));
      if (lab >= 0 ? b !== lab : lab === BOTTOM_OPEN && b >= bc) continue;
      const at = right * a + b;
      const end = plan.upBackStart[at + 1]!;
      for (let o = plan.upBackStart[at]!; o < end; o++) {
        const key = plan.upBackLeft[o]! + a * (low + unit * high);
        accumulate(cv, from, next, next.slot(key) * L, lanes, (s * P + plan.upBackPiece[o]!) * L);
      }
    } else {
      const end = plan.downBackStart[right + 1]!;
      for (let o = plan.downBackStart[right]!; o < end; o++) {
        const key = plan.downBackLeft[o]! + a * (low + unit * (plan.downBackTop[o]! + a * rest));
        accumulate(cv, from, next, next.slot(key) * L, lanes, (s * P + plan.downBackPiece[o]!) * L);
      }
    }
  }
}

/** Σ_p F(p)·B(p) over the profiles both tables hold, lane by lane. */
export function meetTables(f: ProfileTable, b: ProfileTable, lanes: Lanes): number[] {
  const L = lanes.count;
  const out = new Array<number>(L).fill(0);
  const [small, large] = f.count <= b.count ? [f, b] : [b, f];
  const mod = lanes.moduli;
  for (let e = 0; e < small.count; e++) {
    const o = large.find(small.keys[e]!);
    if (o < 0) continue;
    for (let l = 0; l < L; l++) {
      const x = small.vals[e * L + l]!;
      const y = large.vals[o * L + l]!;
      if (mod !== null) {
        const m = mod[l]!;
        const v = x * y;
        if (m === 0) {
          out[l] = out[l]! + v;
          continue;
        }
        let r = v - Math.floor(v / m) * m;
        if (r < 0) r += m;
        r += out[l]!;
        out[l] = r >= m ? r - m : r;
      } else {
        const v = x * y;
        const t = out[l]! + v;
        if (v > MAX || v < -MAX || t > MAX || t < -MAX) throw new NumericOverflow();
        out[l] = t;
      }
    }
  }
  return out;
}

/** Sweep direction when side 5 is fixed: forward only, backward only, or both meeting where the cheaper frontier stops. */
export type SweepStrategy = 'forward' | 'backward' | 'meet';

/** Progress of a long count: steps taken out of all steps, and the live profiles now held. */
export type ProgressCallback = (progress: {
  readonly done: number;
  readonly total: number;
  readonly profiles: number;
  /** Of a fixed side 5's count: the live profiles swept down from the top, and up from side 5 (the one that changed was just extended). */
  readonly fromTop?: number;
  readonly fromBottom?: number;
}) => void;

/** Hooks a sweep calls between steps: progress, and a check of the memory the tables hold. */
export interface SweepHooks {
  readonly onProgress?: ProgressCallback | undefined;
  /** Called with the bytes the live tables hold; may throw to stop the sweep. */
  readonly checkMemory?: ((bytes: number, step: number) => void) | undefined;
}

/** The value lanes of one fixed boundary: forward, backward, or meeting in the middle. */
export function countFixed(plan: KernelPlan, label: Int32Array, initial: number, target: number, lanes: Lanes, strategy: SweepStrategy, hooks: SweepHooks = {}): number[] {
  const L = lanes.count;
  let f = newTable(lanes);
  let fNext = newTable(lanes);
  let b = newTable(lanes);
  let bNext = newTable(lanes);
  const one = (t: ProfileTable, key: number) => {
    const e = t.slot(key);
    for (let l = 0; l < L; l++) t.vals[e * L + l] = 1;
  };
  one(f, initial);
  one(b, target);
  let lo = 0;
  let hi = plan.stepCount;
  const total = plan.stepCount;
  while (lo < hi) {
    const forward = strategy === 'forward' || (strategy === 'meet' && f.count <= b.count);
    if (forward) {
      forwardStep(plan, label, lo++, lanes, f, fNext);
      [f, fNext] = [fNext, f];
    } else {
      backwardStep(plan, label, --hi, lanes, b, bNext);
      [b, bNext] = [bNext, b];
    }
    hooks.checkMemory?.(f.bytes + fNext.bytes + b.bytes + bNext.bytes, lo + total - hi);
    hooks.onProgress?.({ done: lo + total - hi, total, profiles: f.count + b.count, fromTop: f.count, fromBottom: b.count });
    if (f.count === 0 || b.count === 0) return new Array<number>(L).fill(0);
  }
  return meetTables(f, b, lanes);
}

/** Forward sweep with side 5 open: the final table maps each line-0 profile (side 5 reversed, packed) to its lanes. */
export function sweepOpen(plan: KernelPlan, label: Int32Array, initial: number, lanes: Lanes, hooks: SweepHooks = {}): ProfileTable {
  let f = newTable(lanes);
  let fNext = newTable(lanes);
  const e = f.slot(initial);
  for (let l = 0; l < lanes.count; l++) f.vals[e * lanes.count + l] = 1;
  for (let s = 0; s < plan.stepCount; s++) {
    forwardStep(plan, label, s, lanes, f, fNext);
    [f, fNext] = [fNext, f];
    hooks.checkMemory?.(f.bytes + fNext.bytes, s + 1);
    hooks.onProgress?.({ done: s + 1, total: plan.stepCount, profiles: f.count });
  }
  return f;
}
