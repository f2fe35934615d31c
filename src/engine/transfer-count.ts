import { checkBoundary, reverseString } from './boundary.js';
import type { PieceSet } from './piece-set.js';
import type { Region } from './region.js';
import type { Semiring } from './semiring.js';
import { compilePlan, expandStep, type TransferPlan } from './transfer-plan.js';
import { fitsNumeric, sweepNumeric, type WeightTable } from './transfer-numeric.js';
import { declaredWeigher, type Weigher } from './weigher.js';

export interface CountOptions<T> {
  readonly semiring: Semiring<T>;
  /** Defaults to the weights the piece set declares. */
  readonly weigher?: Weigher<T>;
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

/** Runs the sweep (packed numeric profiles when they fit, strings otherwise) and returns the final profiles (line 0, left to right) with their values. */
export function sweep<T>(plan: TransferPlan, options: CountOptions<T>, profiles: 'auto' | 'strings' = 'auto'): Map<string, T> {
  const { semiring } = options;
  const weights = weightTable(plan, semiring, options.weigher ?? declaredWeigher(semiring));
  if (profiles === 'auto' && fitsNumeric(plan)) return sweepNumeric(plan, semiring, weights);
  // String profiles: any alphabet and any width (and the reference the packed path is tested against).
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

/** The value of one boundary: the weighted sum over the puzzles filling the region itself. */
export function countBoundary<T>(region: Region, sides: readonly string[], pieces: PieceSet, options: CountOptions<T>): T {
  const plan = compilePlan(region, checkBoundary(region, sides, pieces), pieces);
  const final = sweep(plan, options);
  const want = [...reverseString(sides[4]!)].map((c) => String.fromCharCode(pieces.labels.indexOf(c))).join('');
  return final.get(want) ?? options.semiring.zero;
}

/**
 * Values for every labeling of side 5 at once, from one sweep: keys are side-5 strings read
 * clockwise; labelings with value zero are absent. Side 5 of `sides` is ignored.
 */
export function countCompletions<T>(region: Region, sides: readonly (string | null)[], pieces: PieceSet, options: CountOptions<T>): Map<string, T> {
  const open = [sides[0]!, sides[1]!, sides[2]!, sides[3]!, null, sides[5]!];
  const plan = compilePlan(region, checkBoundary(region, open, pieces), pieces);
  const out = new Map<string, T>();
  for (const [profile, value] of sweep(plan, options)) out.set(reverseString(decode(plan, profile)), value);
  return out;
}
