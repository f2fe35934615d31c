import { applySideMap } from '../claims/boundary-transform.js';
import { equalValues, findFractionPermutations, findPermutations, isZeroValue, relationHolds } from '../claims/compare-values.js';
import type { ClaimPlanExt } from '../claims/plan-claim.js';
import type { Instance, SizeClass } from '../claims/index.js';
import { substituteValue, type Value } from '../claims/measure.js';
import type { Candidate } from './candidate-space.js';
import type { ValueTable } from './value-table.js';

type Permutation = readonly number[];

/** The first instance where a candidate fails, with both values. */
export interface FoundCounterexample {
  readonly instance: Instance;
  readonly left: Value;
  readonly rightLengths: readonly number[];
  readonly rightSides: readonly string[];
  readonly right: Value;
}

/** What one class did to one candidate. */
export interface ClassOutcome {
  readonly candidate: number;
  /** Instances compared (the failing one included). */
  readonly checked: number;
  /** Compared instances where the left or the right value is nonzero. */
  readonly nonzero: number;
  readonly skippedZero: number;
  readonly failure?: FoundCounterexample | undefined;
  /** Polynomial candidates: the permutations of the search space that serve every instance of the class. */
  readonly common?: readonly Permutation[] | undefined;
  readonly durationMs: number;
}

export interface EliminationProgress {
  readonly classKey: string;
  readonly done: number;
  readonly total: number;
  readonly alive: number;
}

export interface EliminationHooks {
  /** The candidate's result for this class is already known (resume): skip it there. */
  readonly isDone: (candidate: number, cls: SizeClass) => boolean;
  /** Candidates dropped before this run started. */
  readonly dropped: ReadonlySet<number>;
  readonly onClass: (cls: SizeClass, outcomes: readonly ClassOutcome[]) => void;
  readonly onProgress?: ((p: EliminationProgress) => void) | undefined;
  readonly signal?: AbortSignal | undefined;
  readonly nonzeroOnly: boolean;
  readonly permutations: 'blockReversals' | 'allPermutations';
}

const sizeOf = (lengths: readonly number[]) => lengths[5]! + lengths[0]! + lengths[1]!;

/** One comparison: b against T(b); `common` narrows the permutations serving the class so far. */
export function compareOne(
  c: Candidate,
  table: ValueTable,
  lengths: readonly number[],
  sides: readonly string[],
  common: Map<string, Permutation> | undefined,
  permutations: 'blockReversals' | 'allPermutations',
  nonzeroOnly: boolean,
  images?: Map<string, { lengths: number[]; sides: string[] }>,
): 'skipped' | { holds: boolean; nonzero: boolean; left: Value; right: Value; t: { lengths: number[]; sides: string[] }; common: Map<string, Permutation> | undefined } {
  const left = table.value(c.left.name, lengths, sides);
  if (nonzeroOnly && isZeroValue(left)) return 'skipped';
  let t = images?.get(c.mapKey);
  if (!t) {
    t = applySideMap(c.map, lengths, sides);
    images?.set(c.mapKey, t);
  }
  const right = table.value(c.right.name, t.lengths, t.sides);
  const nonzero = !isZeroValue(left) || !isZeroValue(right);
  // Polynomials and quotients (Laurent values of equivariant K-theory) alike: σ renames y_m or t_m.
  const bothPoly = left.kind === 'poly' && right.kind === 'poly';
  if (!(c.polynomial && (bothPoly || (left.kind === 'frac' && right.kind === 'frac')))) return { holds: relationHolds({ type: 'equal' }, left, right), nonzero, left, right, t, common };
  const m = Math.max(sizeOf(lengths), sizeOf(t.lengths));
  // Narrow the class's common permutations first; search the whole space only when none is left.
  const narrowed = common ? [...common].filter(([, p]) => p.length === m && equalValues(left, substituteValue(right, p))) : [];
  if (narrowed.length > 0) return { holds: true, nonzero, left, right, t, common: new Map(narrowed) };
  const found =
    left.kind === 'poly' && right.kind === 'poly'
      ? findPermutations(permutations, m, left.v, right.v).found
      : left.kind === 'frac' && right.kind === 'frac'
        ? findFractionPermutations(permutations, m, left.v, right.v).found
        : [];
  return { holds: found.length > 0, nonzero, left, right, t, common: common === undefined ? new Map(found.map((p) => [p.join(','), p])) : new Map() };
}

/**
 * Tests every live candidate on every boundary of each class, smallest class first, and drops a
 * candidate at its first counterexample. Values come from the shared table, so a boundary's value is
 * computed once per theory however many candidates need it. Returns false when interrupted (the
 * unfinished class is not reported).
 */
export function eliminateCandidates(plan: ClaimPlanExt, classes: readonly SizeClass[], candidates: readonly Candidate[], table: ValueTable, hooks: EliminationHooks): boolean {
  const dropped = new Set(hooks.dropped);
  const total = classes.reduce((n, cls) => n + Number(plan.instanceCount(cls)), 0);
  let done = 0;
  for (const cls of classes) {
    const count = plan.instanceCount(cls);
    const active = candidates.map((_, i) => i).filter((i) => !dropped.has(i) && !hooks.isDone(i, cls));
    if (active.length === 0) {
      done += Number(count);
      continue;
    }
    const began = performance.now();
    const before = done;
    const state = active.map((i) => ({ candidate: i, checked: 0, nonzero: 0, skippedZero: 0, failure: undefined as FoundCounterexample | undefined, common: undefined as Map<string, Permutation> | undefined }));
    let alive = state.length;
    hooks.onProgress?.({ classKey: cls.key, done, total, alive: candidates.length - dropped.size });
    const images = new Map<string, { lengths: number[]; sides: string[] }>();
    for (const instance of plan.instancesFrom(cls, 0n, count)) {
      if (hooks.signal?.aborted) return false;
      if (alive === 0) break;
      images.clear();
      const lengths = cls.lengths;
      for (const s of state) {
        if (s.failure) continue;
        const c = candidates[s.candidate]!;
        const r = compareOne(c, table, lengths, instance.sides, s.common, hooks.permutations, hooks.nonzeroOnly, images);
        if (r === 'skipped') {
          s.skippedZero++;
          continue;
        }
        s.checked++;
        if (r.nonzero) s.nonzero++;
        s.common = r.common;
        const { holds, left, right, t } = r;
        if (!holds) {
          s.failure = { instance, left, rightLengths: t.lengths, rightSides: t.sides, right };
          dropped.add(s.candidate);
          alive--;
        }
      }
      done++;
      if ((done & 255) === 0) hooks.onProgress?.({ classKey: cls.key, done, total, alive: candidates.length - dropped.size });
    }
    done = before + Number(count);
    const durationMs = performance.now() - began;
    hooks.onClass(
      cls,
      state.map((s) => ({
        candidate: s.candidate,
        checked: s.checked,
        nonzero: s.nonzero,
        skippedZero: s.skippedZero,
        failure: s.failure,
        common: s.common ? [...s.common.values()] : undefined,
        durationMs: durationMs / state.length,
      })),
    );
  }
  hooks.onProgress?.({ classKey: '', done: total, total, alive: candidates.length - dropped.size });
  return true;
}
