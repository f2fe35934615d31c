import { checkBoundary, reverseString, type Boundary } from './boundary.js';
import { genericWeights, numericLanes } from './count-kernel.js';
import { defaultStrategy } from './default-strategy.js';
import { BYTES_PER_PROFILE, BYTES_PER_TERM, genericCountFixed, genericSweepOpen } from './generic-sweep.js';
import { fillingCountSemiring } from './semirings/integer-semiring.js';
import { kernelPlan, stepLabels, type KernelPlan } from './kernel-plan.js';
import { countFixed, NumericOverflow, sweepOpen, type ProgressCallback, type SweepHooks, type SweepStrategy } from './numeric-kernel.js';
import type { PieceSet } from './piece-set.js';
import type { Region } from './region.js';
import type { Semiring } from './semiring.js';
import { compilePlan, expandStep, type TransferPlan } from './transfer-plan.js';
import { fitsNumeric, sweepNumeric, type WeightTable } from './transfer-numeric.js';
import { declaredWeigher, type Weigher } from './weigher.js';
import { tupleSemiring } from './semirings/tuple-semiring.js';
import { workSwitch } from './work-ring.js';
import { CodedError } from '../errors/index.js';

export type { ProgressCallback, SweepStrategy } from './numeric-kernel.js';

export interface CountOptions<T> {
  readonly semiring: Semiring<T>;
  /** Defaults to the weights the piece set declares. */
  readonly weigher?: Weigher<T>;
  /**
   * How a fixed side 5 is used: `meet` sweeps down from the top and up from side 5, always extending
   * the smaller frontier, so no state that cannot reach side 5 is carried far; `forward` is the plain
   * top-down sweep; `backward` the bottom-up one. Default: per theory, the one measured to do least
   * (`defaultStrategy`: `meet`, `backward` for ssm-nonequivariant).
   */
  readonly strategy?: SweepStrategy;
  /** Called after every step with the steps done and the live profiles (no I/O in the engine). */
  readonly onProgress?: ProgressCallback;
  /** Stops with `limit_exceeded` once the sweep's tables would hold more than this many bytes (estimated for generic values). */
  readonly memoryLimitBytes?: number;
  /** Live terms from which a generic sweep moves into its ring's work form (default `WORK_FORM_TERMS`; 0: from the first step). */
  readonly workFormTerms?: number;
}

// Weight of each piece on the triangle of each step, looked up once per sweep, with a flag for 1.
function weightTable<T>(plan: TransferPlan, semiring: Semiring<T>, weigher: Weigher<T>): WeightTable<T> {
  return plan.steps.map((step) => {
    if (step.type !== 'up' && step.type !== 'down') return [];
    return plan.pieces.pieces.map((p) => {
      if (p.orientation !== step.triangle.orientation) return undefined;
      const w = weigher(p, step.triangle);
      return { w, isOne: semiring.equals(w, semiring.one) };
    });
  });
}

/**
 * The unpruned top-down sweep of a compiled plan (packed profiles in a Map when they fit, strings
 * otherwise): the reference the kernel is tested against, and the path for profiles beyond 2^53.
 */
export function sweep<T>(plan: TransferPlan, options: CountOptions<T>, profiles: 'auto' | 'strings' = 'auto'): Map<string, T> {
  const { semiring } = options;
  const weights = weightTable(plan, semiring, options.weigher ?? declaredWeigher(semiring));
  if (profiles === 'auto' && fitsNumeric(plan)) return sweepNumeric(plan, semiring, weights);
  let state = new Map<string, T>([[plan.initial, semiring.one]]);
  plan.steps.forEach((step, s) => {
    const next = new Map<string, T>();
    const row = weights[s]!;
    for (const [key, value] of state) {
      expandStep(plan, step, key, (nk, piece) => {
        let v = value;
        if (piece >= 0) {
          const entry = row[piece]!;
          if (!entry.isOne) v = semiring.mul(value, entry.w);
        }
        if (semiring.isZero(v)) return;
        const old = next.get(nk);
        if (old === undefined) next.set(nk, v);
        else {
          const sum = semiring.add(old, v);
          if (semiring.isZero(sum)) next.delete(nk);
          else next.set(nk, sum);
        }
      });
    }
    state = next;
  });
  return state;
}

function decode(plan: TransferPlan, profile: string): string {
  return [...profile].map((c) => plan.pieces.labels[c.charCodeAt(0)]!).join('');
}

/** Side-5 string (clockwise) of a packed line-0 profile. */
export function side5OfKey(plan: KernelPlan, key: number): string {
  const a = plan.alphabet;
  let out = '';
  let rest = key;
  for (let k = 0; k < plan.region.lengths[4]; k++) {
    const d = rest % a;
    out = plan.pieces.labels[d]! + out;
    rest = (rest - d) / a;
  }
  return out;
}

/** The sweep hooks of a count: progress and the memory limit (numeric tables are measured exactly). */
export function sweepHooks(options: { onProgress?: ProgressCallback | undefined; memoryLimitBytes?: number | undefined }): SweepHooks {
  const limit = options.memoryLimitBytes;
  return {
    onProgress: options.onProgress,
    checkMemory:
      limit === undefined
        ? undefined
        : (bytes, step) => {
            if (bytes > limit) throw memoryLimitError(bytes, limit, step);
          },
  };
}

/** The coded error a sweep stops with when its tables would outgrow the memory limit. */
export function memoryLimitError(bytes: number, limit: number, step: number, total?: number): CodedError {
  const mb = (b: number) => `${Math.ceil(b / 2 ** 20)} MB`;
  const when = total === undefined ? `at step ${step}` : `estimated before starting (${step} live profiles at the widest of ${total} steps)`;
  return new CodedError('limit_exceeded', { what: 'Memory', expected: `the sweep's tables to stay within ${mb(limit)}`, received: `${mb(bytes)} ${when}` }, { path: 'memory limit', hint: 'count a smaller region, use a modular identity test (sweeps without --exact), or give Node more memory (node --max-old-space-size=MB)' });
}

function countOne<T>(region: Region, boundary: Boundary, pieces: PieceSet, options: CountOptions<T>): T {
  const plan = kernelPlan(region, pieces);
  const { semiring } = options;
  const strategy = options.strategy ?? defaultStrategy(pieces);
  if (!plan.fits) {
    const final = sweep(compilePlan(region, boundary, pieces), options);
    const want = [...reverseString(boundary[4]!)].map((c) => String.fromCharCode(pieces.labels.indexOf(c))).join('');
    return final.get(want) ?? semiring.zero;
  }
  const { label, initial, target } = stepLabels(plan, boundary);
  const weigher = options.weigher ?? declaredWeigher(semiring);
  const cacheable = options.weigher === undefined;
  const hooks = sweepHooks(options);
  const lanes = numericLanes(plan, [{ semiring: semiring as Semiring<unknown>, weigher: weigher as Weigher<unknown>, cacheable }]);
  if (lanes) {
    try {
      const v = countFixed(plan, label, initial, target, lanes, strategy, hooks);
      return (lanes.moduli ? v : v[0]!) as T;
    } catch (e) {
      if (!(e instanceof NumericOverflow)) throw e;
    }
  }
  const work = workSwitch(plan, semiring, weigher, cacheable);
  if (options.memoryLimitBytes !== undefined && semiring.terms) {
    // At least one term per live profile, in the cheaper of the two forms.
    const termBytes = Math.min(semiring.termBytes ?? BYTES_PER_TERM, work?.().semiring.termBytes ?? BYTES_PER_TERM);
    refuseEarly(plan, label, initial, target, strategy, options.memoryLimitBytes, termBytes);
  }
  return genericCountFixed(plan, label, initial, target, semiring, genericWeights(plan, semiring, weigher, cacheable), strategy, hooks, work, options.workFormTerms);
}

// A numeric pre-pass visits the same profiles as the generic sweep will; each holds at least one
// term, so if even that lower bound exceeds the limit, refuse before the long sweep starts.
function refuseEarly(plan: KernelPlan, label: Int32Array, initial: number, target: number, strategy: SweepStrategy, limit: number, termBytes: number): void {
  const probe = numericLanes(plan, [{ semiring: fillingCountSemiring as Semiring<unknown>, weigher: declaredWeigher(fillingCountSemiring) as Weigher<unknown>, cacheable: true }]);
  if (!probe) return;
  let peak = 0;
  try {
    countFixed(plan, label, initial, target, probe, strategy, { onProgress: (p) => (peak = Math.max(peak, p.profiles)) });
  } catch (e) {
    if (!(e instanceof NumericOverflow)) throw e;
  }
  const need = peak * (BYTES_PER_PROFILE + termBytes);
  if (need > limit) throw memoryLimitError(need, limit, peak, plan.stepCount);
}

/** The value of one boundary: the weighted sum over the puzzles filling the region itself. */
export function countBoundary<T>(region: Region, sides: readonly string[], pieces: PieceSet, options: CountOptions<T>): T {
  return countOne(region, checkBoundary(region, sides, pieces), pieces, options);
}

/**
 * Values for every labeling of side 5 at once, from one sweep: keys are side-5 strings read
 * clockwise; labelings with value zero are absent. Side 5 of `sides` is ignored.
 */
export function countCompletions<T>(region: Region, sides: readonly (string | null)[], pieces: PieceSet, options: CountOptions<T>): Map<string, T> {
  const open = checkBoundary(region, [sides[0]!, sides[1]!, sides[2]!, sides[3]!, null, sides[5]!], pieces);
  const plan = kernelPlan(region, pieces);
  const out = new Map<string, T>();
  if (!plan.fits) {
    const tp = compilePlan(region, open, pieces);
    for (const [profile, value] of sweep(tp, options)) out.set(reverseString(decode(tp, profile)), value);
    return out;
  }
  const { semiring } = options;
  const { label, initial } = stepLabels(plan, open);
  const weigher = options.weigher ?? declaredWeigher(semiring);
  const cacheable = options.weigher === undefined;
  const hooks = sweepHooks(options);
  const lanes = numericLanes(plan, [{ semiring: semiring as Semiring<unknown>, weigher: weigher as Weigher<unknown>, cacheable }]);
  if (lanes) {
    try {
      const final = sweepOpen(plan, label, initial, lanes, hooks);
      const L = lanes.count;
      for (let e = 0; e < final.count; e++) {
        if (lanes.moduli) {
          const r = Array.from(final.vals.subarray(e * L, e * L + L));
          if (r.some((x) => x !== 0)) out.set(side5OfKey(plan, final.keys[e]!), r as T);
        } else if (final.vals[e] !== 0) out.set(side5OfKey(plan, final.keys[e]!), final.vals[e] as T);
      }
      return out;
    } catch (e) {
      if (!(e instanceof NumericOverflow)) throw e;
    }
  }
  const work = workSwitch(plan, semiring, weigher, cacheable);
  for (const [key, v] of genericSweepOpen(plan, label, initial, semiring, genericWeights(plan, semiring, weigher, cacheable), hooks, work, options.workFormTerms)) out.set(side5OfKey(plan, key), v);
  return out;
}

/**
 * Several values of one boundary (e.g. the number of puzzles and the value): integer semirings share
 * one numeric sweep as lanes; the generic ones (polynomials, fractions, statistics) share one tuple
 * sweep. With both kinds, the numeric sweep costs little beside the generic one and keeps the generic
 * tuple small (a tuple sweep is about 1.5× a plain one, measured). Strategy, progress and memory limit
 * are taken from the first options.
 */
export function countBoundaryValues(region: Region, sides: readonly string[], pieces: PieceSet, list: readonly CountOptions<unknown>[]): unknown[] {
  const boundary = checkBoundary(region, sides, pieces);
  const plan = kernelPlan(region, pieces);
  const first = list[0]!;
  const shared = { ...(first.strategy ? { strategy: first.strategy } : {}), ...(first.onProgress ? { onProgress: first.onProgress } : {}), ...(first.memoryLimitBytes !== undefined ? { memoryLimitBytes: first.memoryLimitBytes } : {}) };
  const rings = list.map((o) => ({ semiring: o.semiring, weigher: o.weigher ?? declaredWeigher(o.semiring), cacheable: false }));
  const out = new Array<unknown>(list.length);
  let generic = list.map((_, k) => k);
  if (plan.fits) {
    const integer = generic.filter((k) => list[k]!.semiring.numeric?.kind === 'integer');
    const lanes = integer.length > 0 ? numericLanes(plan, integer.map((k) => rings[k]!)) : null;
    if (lanes) {
      const { label, initial, target } = stepLabels(plan, boundary);
      try {
        const values = countFixed(plan, label, initial, target, lanes, first.strategy ?? defaultStrategy(pieces), sweepHooks(first));
        integer.forEach((k, l) => (out[k] = values[l]));
        generic = generic.filter((k) => !integer.includes(k));
      } catch (e) {
        if (!(e instanceof NumericOverflow)) throw e;
      }
    }
  }
  if (generic.length === 1) out[generic[0]!] = countOne(region, boundary, pieces, { ...list[generic[0]!]!, ...shared });
  else if (generic.length > 1) {
    const semiring = tupleSemiring(generic.map((k) => list[k]!.semiring));
    const weigher: Weigher<unknown[]> = (piece, triangle) => generic.map((k) => rings[k]!.weigher(piece, triangle));
    const values = countOne(region, boundary, pieces, { ...shared, semiring, weigher }) as unknown[];
    generic.forEach((k, l) => (out[k] = values[l]));
  }
  return out;
}
