import type { ClaimPlan, Evaluator, Instance, InstanceResult, SharedTables, SizeClass } from '../claims/claim-api.js';
import type { CounterexampleRecord } from '../store/index.js';
import { intersectPermutations } from '../store/permutation-records.js';
import type { ChunkResult } from './worker-task.js';

/** The stored row of a confirmed failing boundary (`partnerOf`: found through its pair's representative). */
export function counterexampleRecord(cls: SizeClass, r: InstanceResult, partnerOf?: bigint): CounterexampleRecord {
  return {
    classKey: cls.key,
    index: r.index,
    size: cls.size,
    lengths: cls.lengths,
    left: r.left,
    right: r.right,
    ...(r.substituted ? { substituted: r.substituted, substitution: r.substitution } : {}),
    permutation: r.permutation,
    ...(partnerOf !== undefined ? { partnerOf } : {}),
  };
}

function* unranked(plan: ClaimPlan, cls: SizeClass, start: bigint, end: bigint): Generator<Instance> {
  for (let i = start; i < end; i++) yield plan.instanceAt(cls, i);
}

/**
 * Evaluates instances [start, end) of a class. Counts are of boundaries: the representative of a pair
 * {b, T(b)} decides both, so it adds 2 to `holds` or `fails` (or to `skippedZero`) and its partner,
 * met later as `paired`, adds nothing. A failing pair gives two counterexample rows, the partner's marked
 * `partnerOf`; both are recomputed exactly first. `keepPermutations`: also list each instance's permutation.
 */
export function evaluateChunk(plan: ClaimPlan, evaluator: Evaluator, cls: SizeClass, start: bigint, end: bigint, keepPermutations = true, tables?: SharedTables): ChunkResult {
  const began = performance.now();
  const out = { checked: 0, holds: 0, fails: 0, skippedZero: 0, paired: 0, overturned: 0, vacuous: 0, nonzero: 0, errorBound: 0, exact: true };
  const counterexamples: CounterexampleRecord[] = [];
  const permutations: { index: bigint; permutation: readonly number[] }[] = [];
  let common: Map<string, number[]> | undefined;
  let truncated = false;
  const held = (vacuous: boolean | undefined) => {
    out.holds++;
    if (vacuous) out.vacuous++;
    else out.nonzero++;
  };
  // One boundary's outcome; `failing` gives its confirmed counterexample row (or undefined if it holds after all).
  const decide = (status: 'holds' | 'fails' | 'skipped_zero', vacuous: boolean | undefined, failing: () => InstanceResult | undefined, partnerOf?: bigint) => {
    if (status === 'skipped_zero') out.skippedZero++;
    else if (status === 'holds') held(vacuous);
    else {
      const c = failing();
      if (c) {
        out.fails++;
        counterexamples.push(counterexampleRecord(cls, c, partnerOf));
      } else {
        out.overturned++;
        held(false);
      }
    }
  };
  const confirmed = (instance: Instance) => {
    const c = evaluator.confirm(instance);
    return c.status === 'fails' ? c : undefined;
  };
  const one = (instance: Instance) => {
    const r = evaluator.evaluate(instance);
    out.checked++;
    if (r.method === 'modular') {
      out.exact = false;
      out.errorBound += r.errorBound ?? 0;
    }
    if (r.status === 'paired') {
      out.paired++;
      return;
    }
    // Only an exact recomputation may turn a "fails" into a stored counterexample.
    decide(r.status, r.vacuous, () => confirmed(instance));
    if (r.partnerStatus !== undefined && r.partnerIndex !== undefined) {
      const p = r.partnerIndex;
      decide(r.partnerStatus, r.vacuous, () => confirmed(plan.instanceAt(cls, p)), instance.index);
    }
    if (r.status === 'holds') {
      if (r.permutation && keepPermutations) permutations.push({ index: instance.index, permutation: r.permutation });
      if (r.permutations) {
        common = intersectPermutations(common, r.permutations);
        truncated ||= r.permutationsTruncated === true;
      }
    }
  };
  // The bulk path decides what holds from class value tables; each instance it leaves (failures) is evaluated one by one.
  const scanned = evaluator.scan?.(cls, start, end, out, (index) => one(plan.instanceAt(cls, index)), tables) ?? false;
  if (!scanned) {
    const instances: Iterable<Instance> = plan.instancesFrom ? plan.instancesFrom(cls, start, end) : unranked(plan, cls, start, end);
    for (const instance of instances) one(instance);
  }
  const commonPermutations = common ? [...common.values()] : undefined;
  return { ...out, durationMs: performance.now() - began, counterexamples, permutations, commonPermutations, permutationsTruncated: truncated };
}
