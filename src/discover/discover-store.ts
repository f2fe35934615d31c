import type { SizeClass } from '../claims/index.js';
import {
  completeChunk,
  finishRun,
  leaseChunk,
  listCounterexamples,
  listDiscoverEvidence,
  listVerified,
  markVerified,
  releaseChunk,
  saveClaim,
  saveDiscoverEvidence,
  startRun,
  type CounterexampleRecord,
  type DiscoverEvidence,
  type StoredCounterexample,
  type Store,
} from '../store/index.js';

/** A candidate as the store knows it. */
export interface StoredCandidate {
  readonly id: string;
  readonly fingerprint: string;
  readonly canonicalJson: string;
  readonly engineVersion: string;
}

/** What one class did to one candidate, ready to store. */
export interface CandidateClassResult {
  readonly candidate: number;
  readonly checked: number;
  readonly nonzero: number;
  readonly skippedZero: number;
  readonly durationMs: number;
  readonly counterexample?: CounterexampleRecord | undefined;
  readonly common?: readonly (readonly number[])[] | undefined;
}

/** What the store already holds for a candidate. */
export interface CandidateProgress {
  readonly verified: ReadonlySet<string>;
  readonly counterexamples: readonly StoredCounterexample[];
  readonly evidence: readonly DiscoverEvidence[];
}

/**
 * Discover's results in the sweep store: each candidate is a claim; a class it passes is a done chunk
 * over the whole class and a verified class; a class where it fails is a done chunk up to its first
 * counterexample, stored with it. So `status`, `counterexamples` and a later `run` of the written claim
 * see exactly what discover checked.
 */
export class DiscoverStore {
  private readonly runs = new Map<number, number>();

  constructor(
    private readonly db: Store,
    private readonly candidates: readonly StoredCandidate[],
    private readonly options: object,
  ) {
    db.transaction(() => {
      for (const c of candidates) saveClaim(db, { fingerprint: c.fingerprint, claimId: c.id, canonicalJson: c.canonicalJson, engineVersion: c.engineVersion });
    }).immediate();
  }

  progress(candidate: number): CandidateProgress {
    const fp = this.candidates[candidate]!.fingerprint;
    return {
      verified: new Set(listVerified(this.db, fp).filter((v) => v.method === 'exact').map((v) => v.classKey)),
      counterexamples: listCounterexamples(this.db, fp).filter((c) => c.recheck !== 'holds'),
      evidence: listDiscoverEvidence(this.db, fp),
    };
  }

  /** The run row of a candidate in this invocation, opened on first use. */
  runOf(candidate: number): number {
    let id = this.runs.get(candidate);
    if (id === undefined) {
      id = startRun(this.db, this.candidates[candidate]!.fingerprint, { discover: true, ...this.options });
      this.runs.set(candidate, id);
    }
    return id;
  }

  /** Stores one class's results for every candidate tested there, in one transaction. */
  saveClass(cls: SizeClass, count: bigint, results: readonly CandidateClassResult[]): void {
    this.db
      .transaction(() => {
        for (const r of results) {
          const fp = this.candidates[r.candidate]!.fingerprint;
          const runId = this.runOf(r.candidate);
          const end = r.counterexample ? r.counterexample.index + 1n : count;
          const lease = leaseChunk(this.db, { fingerprint: fp, classKey: cls.key, method: 'exact', runId, from: 0n, count, size: end });
          // Another process (or a `run` of the same claim) already covers part of the class: keep its work.
          if (!lease) continue;
          if (lease.start !== 0n || lease.end !== end) {
            releaseChunk(this.db, lease.chunkId);
            continue;
          }
          completeChunk(this.db, {
            chunkId: lease.chunkId,
            runId,
            fingerprint: fp,
            classKey: cls.key,
            checked: r.checked + r.skippedZero,
            holds: r.checked - (r.counterexample ? 1 : 0),
            fails: r.counterexample ? 1 : 0,
            skippedZero: r.skippedZero,
            paired: 0,
            errorBound: 0,
            exact: true,
            durationMs: r.durationMs,
            counterexamples: r.counterexample ? [r.counterexample] : [],
            permutations: [],
            commonPermutations: r.common,
          });
          if (!r.counterexample) {
            markVerified(this.db, fp, runId, { classKey: cls.key, method: 'exact', size: cls.size, lengths: cls.lengths, variables: cls.variables, instances: count, errorBound: 0 });
            saveDiscoverEvidence(this.db, fp, runId, { classKey: cls.key, instances: r.checked, nonzero: r.nonzero, commonPermutations: r.common });
          }
        }
      })
      .immediate();
  }

  /** Closes this invocation's run rows. */
  finish(interrupted: boolean): void {
    for (const runId of this.runs.values()) finishRun(this.db, runId, interrupted ? 'interrupted' : 'completed', interrupted ? 'signal' : 'finished');
  }
}
