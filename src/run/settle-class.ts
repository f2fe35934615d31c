import type { SizeClass } from '../claims/claim-api.js';
import { classCoverage, classHasCounterexample, markVerified, otherLeases, rangeCovered, reapDeadRuns, type Store, type SweepMethod } from '../store/index.js';
import type { SettleOutcome } from './sweep-scheduler.js';

export interface SettleInput {
  readonly db: Store;
  readonly fingerprint: string;
  readonly runId: number;
  readonly method: SweepMethod;
  readonly cls: SizeClass;
  readonly count: bigint;
  /** The part of the class this run sweeps (all of it unless --shard narrows it). */
  readonly part: { readonly first: bigint; readonly limit: bigint };
}

/**
 * Decides a class with nothing left to lease and nothing in flight, from the store: covered by finished
 * chunks (verified, or counterexample), partly leased by a live peer (poll again), or not covered because a
 * dead process held part of it (its leases are freed here and the class is leased again).
 */
export function settleClass(i: SettleInput): SettleOutcome {
  const cov = classCoverage(i.db, i.fingerprint, i.cls.key, i.method, i.count);
  if (cov.complete) {
    // Read from the store, not from memory: a peer process may have stored one meanwhile.
    if (classHasCounterexample(i.db, i.fingerprint, i.cls.key)) return 'counterexample';
    markVerified(i.db, i.fingerprint, i.runId, { classKey: i.cls.key, method: cov.method, size: i.cls.size, lengths: i.cls.lengths, variables: i.cls.variables, instances: i.count, errorBound: cov.errorBound });
    return 'verified';
  }
  // A shard's part may be done while the class as a whole waits for other shards (merged later).
  if ((i.part.first > 0n || i.part.limit < i.count) && rangeCovered(i.db, i.fingerprint, i.cls.key, i.method, i.part.first, i.part.limit)) {
    return classHasCounterexample(i.db, i.fingerprint, i.cls.key) ? 'counterexample' : 'part-done';
  }
  reapDeadRuns(i.db, new Set([i.runId]));
  return otherLeases(i.db, i.fingerprint, i.cls.key, i.runId) > 0 ? 'peer' : 'reopen';
}
