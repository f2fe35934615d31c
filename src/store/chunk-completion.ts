import { insertCounterexample, type CounterexampleRecord } from './counterexample-records.js';
import type { Store } from './open-store.js';

/** The tallies and findings of one finished chunk, as the worker reports them. */
export interface ChunkFindings {
  readonly checked: number;
  readonly holds: number;
  readonly fails: number;
  readonly skippedZero: number;
  readonly paired: number;
  /** Of `holds`: both compared values zero (vacuous), or some value nonzero. */
  readonly vacuous?: number | undefined;
  readonly nonzero?: number | undefined;
  /** Union bound on a false "holds" over the chunk's modular comparisons (0 when exact). */
  readonly errorBound: number;
  /** Every comparison of the chunk was exact: it then counts for --exact runs too. */
  readonly exact: boolean;
  readonly durationMs: number;
  readonly counterexamples: readonly CounterexampleRecord[];
  readonly permutations: readonly { readonly index: bigint; readonly permutation: readonly number[] }[];
  /** Permutations that serve every instance of the chunk (undefined when the claim searches none). */
  readonly commonPermutations?: readonly (readonly number[])[] | undefined;
  readonly permutationsTruncated?: boolean | undefined;
}

/** What a finished chunk reports; written together with its results in one transaction. */
export interface ChunkCompletion extends ChunkFindings {
  readonly chunkId: number;
  readonly runId: number;
  readonly fingerprint: string;
  readonly classKey: string;
}

// Prepared once per store (a statement's preparation costs about as much as a small chunk's writes).
const prepared = new WeakMap<Store, (c: ChunkCompletion) => number>();

function completion(db: Store): (c: ChunkCompletion) => number {
  let write = prepared.get(db);
  if (write) return write;
  const done = db.prepare(
    `UPDATE chunks SET state = 'done', method = CASE WHEN ? THEN 'exact' ELSE method END, checked = ?, holds = ?, fails = ?, skipped_zero = ?, paired = ?, vacuous = ?, nonzero = ?, error_bound = ?,
       duration_ms = ?, finished_at = ?, common_permutations = ?, permutations_truncated = ? WHERE chunk_id = ? AND run_id = ? AND state = 'leased'`,
  );
  const perm = db.prepare('INSERT OR REPLACE INTO permutations (fingerprint, class_key, instance_index, permutation) VALUES (?, ?, ?, ?)');
  const tally = db.prepare('UPDATE runs SET instances_checked = instances_checked + ?, holds = holds + ?, counterexamples = counterexamples + ?, heartbeat_at = ? WHERE run_id = ?');
  const transaction = db.transaction((c: ChunkCompletion) => {
    const updated = done.run(c.exact ? 1 : 0, c.checked, c.holds, c.fails, c.skippedZero, c.paired, c.vacuous ?? 0, c.nonzero ?? null, c.errorBound, c.durationMs, new Date().toISOString(), c.commonPermutations ? JSON.stringify(c.commonPermutations) : null, c.permutationsTruncated ? 1 : 0, c.chunkId, c.runId);
    if (updated.changes === 0) return -1;
    let added = 0;
    for (const ce of c.counterexamples) if (insertCounterexample(db, c.fingerprint, c.runId, ce)) added++;
    for (const p of c.permutations) perm.run(c.fingerprint, c.classKey, p.index, JSON.stringify(p.permutation));
    tally.run(c.checked, c.holds, added, new Date().toISOString(), c.runId);
    return added;
  });
  write = (c) => transaction.immediate(c);
  prepared.set(db, write);
  return write;
}

/**
 * Marks a leased chunk done and stores its counterexamples and permutations atomically, so a chunk
 * is either fully counted or not at all. Returns the number of new counterexamples, or -1 if the
 * lease was no longer ours (nothing is written then).
 */
export function completeChunk(db: Store, c: ChunkCompletion): number {
  return completion(db)(c);
}
