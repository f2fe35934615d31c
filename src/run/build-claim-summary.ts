import type { ClaimPlan, SizeClass } from '../claims/claim-api.js';
import { inferPermutationRule } from '../claims/index.js';
import { classCommonPermutations, classTallies, doneInstances, runHoldTallies, listCounterexamples, listVerified, permutationSummary, type RunStatus, type StopReason, type Store, type SweepMethod } from '../store/index.js';
import type { SweepClaim } from './claim-runtime-module.js';
import type { RecheckOutcome } from './recheck-counterexamples.js';
import { replayCommand, type ClaimSummary, type ClassSummary } from './sweep-summary.js';

/** Running totals of one claim's sweep. */
export interface RunTally {
  checked: number;
  holds: number;
  skippedZero: number;
  paired: number;
  overturned: number;
  added: number;
  errorBound: number;
  exact: boolean;
}

export interface SummaryInput {
  readonly db: Store;
  readonly claim: SweepClaim;
  readonly plan: ClaimPlan;
  readonly runId: number;
  readonly status: Exclude<RunStatus, 'running'>;
  readonly stopReason: StopReason;
  readonly tally: RunTally;
  readonly rechecked: RecheckOutcome;
  readonly classes: readonly {
    readonly cls: SizeClass;
    readonly count: bigint;
    readonly checked: number;
    readonly holds: number;
    readonly fails: number;
    /** The scheduler's last word on the class: settled `verified`/`counterexample`, or anything else (unfinished). */
    readonly phase: string;
  }[];
  /** Every requested class was settled (and every stored counterexample re-checked). */
  readonly complete: boolean;
  readonly method: SweepMethod;
  readonly began: number;
  readonly dbArg?: string | undefined;
}

/** Reads the store back after a claim's sweep and assembles its summary (store state, not in-memory guesses). */
export function buildClaimSummary(i: SummaryInput): ClaimSummary {
  const counterexamples = listCounterexamples(i.db, i.claim.fingerprint).filter((c) => c.recheck !== 'holds');
  const failing = new Set(counterexamples.map((c) => c.classKey));
  const verified = new Map<string, { method: 'exact' | 'modular'; errorBound: number }>();
  // An exact verification outranks a modular one of the same class.
  for (const v of listVerified(i.db, i.claim.fingerprint)) if (!verified.has(v.classKey) || v.method === 'exact') verified.set(v.classKey, v);
  const tallies = classTallies(i.db, i.claim.fingerprint);
  let remainingInstances = 0n;
  const unsettled: string[] = [];
  const classes: ClassSummary[] = i.classes.map((s) => {
    const settled = s.phase === 'verified' || s.phase === 'counterexample' || s.phase === 'part-done';
    const v = s.phase === 'verified' || s.phase === 'counterexample' ? verified.get(s.cls.key) : undefined;
    const perms = classCommonPermutations(i.db, i.claim.fingerprint, s.cls.key);
    const done = v ? s.count : doneInstances(i.db, i.claim.fingerprint, s.cls.key, i.method);
    if (!settled && !failing.has(s.cls.key)) {
      unsettled.push(s.cls.key);
      remainingInstances += s.count - done;
    }
    return {
      key: s.cls.key,
      size: s.cls.size,
      lengths: s.cls.lengths,
      instances: s.count.toString(),
      checked: s.checked,
      holds: s.holds,
      fails: s.fails,
      ...(tallies.has(s.cls.key) ? { stored: tallies.get(s.cls.key) } : {}),
      done: done.toString(),
      state: failing.has(s.cls.key) ? 'counterexample' : v ? 'verified' : 'incomplete',
      ...(v && !failing.has(s.cls.key) ? { method: v.method, errorBound: v.errorBound } : {}),
      ...(perms ? { commonPermutations: perms } : {}),
    };
  });
  const first = counterexamples[0];
  const outcome: ClaimSummary['outcome'] =
    counterexamples.length > 0 ? 'counterexample' : i.classes.every((c) => c.count === 0n) ? 'empty' : unsettled.length > 0 || !i.complete ? 'incomplete' : 'holds';
  const perms = permutationSummary(i.db, i.claim.fingerprint);
  // One rule for the class-wide permutations of every class that has them, as a relation to paste.
  const withPerms = i.classes.flatMap((s, k) => (classes[k]!.commonPermutations ? [{ variables: s.cls.variables, common: classes[k]!.commonPermutations!.common }] : []));
  const rule = withPerms.length ? inferPermutationRule(Object.keys(withPerms[0]!.variables), withPerms) : undefined;
  return {
    claimId: i.claim.id,
    fingerprint: i.claim.fingerprint,
    file: i.claim.file,
    runId: i.runId,
    status: i.status,
    stopReason: i.stopReason,
    instancesChecked: i.tally.checked,
    holds: i.tally.holds,
    ...runHoldTallies(i.db, i.runId),
    skippedZero: i.tally.skippedZero,
    paired: i.tally.paired,
    overturned: i.tally.overturned,
    newCounterexamples: i.tally.added,
    counterexamples: counterexamples.length,
    rechecked: i.rechecked,
    method: i.tally.exact ? 'exact' : 'modular',
    errorBound: Math.min(1, i.tally.errorBound),
    outcome,
    ...(unsettled.length > 0 || (!i.complete && outcome !== 'counterexample')
      ? { remaining: { classes: unsettled, instances: remainingInstances.toString(), rechecks: i.rechecked.pending } }
      : {}),
    classes,
    ...(first
      ? {
          firstCounterexample: {
            classKey: first.classKey,
            index: first.index.toString(),
            size: first.size,
            left: first.left,
            right: first.right,
            ...(first.substituted ? { substituted: first.substituted, substitution: first.substitution } : {}),
            replay: replayCommand(i.claim.file ?? i.claim.id, first.classKey, first.index, i.dbArg),
          },
        }
      : {}),
    ...(perms ? { permutations: perms } : {}),
    ...(withPerms.length ? { permutationRule: rule ? { relation: rule.relation, text: rule.text } : null } : {}),
    elapsedMs: Date.now() - i.began,
  };
}
