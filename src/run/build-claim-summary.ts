import type { ClaimPlan, SizeClass } from '../claims/claim-api.js';
import { classCommonPermutations, listCounterexamples, listVerified, permutationSummary, type RunStatus, type StopReason, type Store } from '../store/index.js';
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
  readonly classes: readonly { readonly cls: SizeClass; readonly count: bigint; readonly checked: number; readonly holds: number; readonly fails: number }[];
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
  const classes: ClassSummary[] = i.classes.map((s) => {
    const v = verified.get(s.cls.key);
    const perms = classCommonPermutations(i.db, i.claim.fingerprint, s.cls.key);
    return {
      key: s.cls.key,
      size: s.cls.size,
      lengths: s.cls.lengths,
      instances: s.count.toString(),
      checked: s.checked,
      holds: s.holds,
      fails: s.fails,
      state: failing.has(s.cls.key) ? 'counterexample' : v ? 'verified' : 'incomplete',
      ...(v && !failing.has(s.cls.key) ? { method: v.method, errorBound: v.errorBound } : {}),
      ...(perms ? { commonPermutations: perms } : {}),
    };
  });
  const first = counterexamples[0];
  const perms = permutationSummary(i.db, i.claim.fingerprint);
  return {
    claimId: i.claim.id,
    fingerprint: i.claim.fingerprint,
    file: i.claim.file,
    runId: i.runId,
    status: i.status,
    stopReason: i.stopReason,
    instancesChecked: i.tally.checked,
    holds: i.tally.holds,
    skippedZero: i.tally.skippedZero,
    paired: i.tally.paired,
    overturned: i.tally.overturned,
    newCounterexamples: i.tally.added,
    counterexamples: counterexamples.length,
    rechecked: i.rechecked,
    method: i.tally.exact ? 'exact' : 'modular',
    errorBound: Math.min(1, i.tally.errorBound),
    classes,
    ...(first
      ? {
          firstCounterexample: {
            classKey: first.classKey,
            index: first.index.toString(),
            size: first.size,
            left: first.left,
            right: first.right,
            replay: replayCommand(i.claim.file ?? i.claim.id, first.classKey, first.index, i.dbArg),
          },
        }
      : {}),
    ...(perms ? { permutations: perms } : {}),
    elapsedMs: Date.now() - i.began,
  };
}
