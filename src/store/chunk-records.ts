import type { Store } from './open-store.js';

export type SweepMethod = 'exact' | 'modular';

/** A half-open index range [start, end) of one side-length class. */
export interface IndexRange {
  readonly start: bigint;
  readonly end: bigint;
}

/** A chunk leased to this run. */
export interface LeasedChunk extends IndexRange {
  readonly chunkId: number;
}

export interface LeaseRequest {
  readonly fingerprint: string;
  readonly classKey: string;
  readonly method: SweepMethod;
  readonly runId: number;
  /** Look for work at or after this index. */
  readonly from: bigint;
  /** Number of instances of the class. */
  readonly count: bigint;
  readonly size: bigint;
}

// Rows that make a range unavailable: finished work that counts for this method, and every live lease.
const BLOCKING = `fingerprint = ? AND class_key = ? AND end_index > ?
  AND (state = 'leased' OR method = 'exact' OR method = ?)`;

/**
 * Leases the first free range at or after `from` (at most `size` long), in one write transaction so two
 * processes never lease overlapping work; undefined when the rest of the class is done or leased.
 */
export function leaseChunk(db: Store, req: LeaseRequest): LeasedChunk | undefined {
  const rows = db.prepare(`SELECT start_index, end_index FROM chunks WHERE ${BLOCKING} ORDER BY start_index`).safeIntegers(true);
  const insert = db.prepare(
    `INSERT INTO chunks (fingerprint, class_key, method, start_index, end_index, state, run_id) VALUES (?, ?, ?, ?, ?, 'leased', ?)`,
  );
  return db
    .transaction((): LeasedChunk | undefined => {
      let cursor = req.from;
      for (const r of rows.iterate(req.fingerprint, req.classKey, req.from, req.method) as Iterable<{ start_index: bigint; end_index: bigint }>) {
        if (r.start_index > cursor) break;
        if (r.end_index > cursor) cursor = r.end_index;
      }
      if (cursor >= req.count) return undefined;
      const next = db.prepare(`SELECT MIN(start_index) AS s FROM chunks WHERE ${BLOCKING} AND start_index >= ?`).safeIntegers(true);
      const bound = (next.get(req.fingerprint, req.classKey, cursor, req.method, cursor) as { s: bigint | null }).s ?? req.count;
      let end = cursor + req.size;
      if (end > bound) end = bound;
      if (end > req.count) end = req.count;
      const info = insert.run(req.fingerprint, req.classKey, req.method, cursor, end, req.runId);
      return { chunkId: Number(info.lastInsertRowid), start: cursor, end };
    })
    .immediate();
}

/** Gives a lease back (the chunk failed or the run stopped before sending it). */
export function releaseChunk(db: Store, chunkId: number): void {
  db.prepare(`DELETE FROM chunks WHERE chunk_id = ? AND state = 'leased'`).run(chunkId);
}

/** Coverage of a class by finished chunks usable for `method`: complete or not, with the method it proves. */
export function classCoverage(
  db: Store,
  fingerprint: string,
  classKey: string,
  method: SweepMethod,
  count: bigint,
): { complete: boolean; method: SweepMethod; errorBound: number } {
  const scan = (methods: readonly SweepMethod[]) => {
    const rows = db
      .prepare(
        `SELECT start_index, end_index, error_bound FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done'
         AND method IN (${methods.map(() => '?').join(',')}) ORDER BY start_index`,
      )
      .safeIntegers(true)
      .all(fingerprint, classKey, ...methods) as { start_index: bigint; end_index: bigint; error_bound: number }[];
    let cursor = 0n;
    let errorBound = 0;
    for (const r of rows) {
      if (r.start_index > cursor) break;
      if (r.end_index > cursor) {
        cursor = r.end_index;
        errorBound += Number(r.error_bound);
      }
    }
    return { complete: cursor >= count, errorBound };
  };
  const exact = scan(['exact']);
  if (exact.complete || method === 'exact') return { complete: exact.complete, method: 'exact', errorBound: 0 };
  const any = scan(['exact', 'modular']);
  return { complete: any.complete, method: 'modular', errorBound: Math.min(1, any.errorBound) };
}

/** Instances of a class already swept by finished chunks usable for `method` (for progress totals). */
export function doneInstances(db: Store, fingerprint: string, classKey: string, method: SweepMethod): bigint {
  const row = db
    .prepare(
      `SELECT COALESCE(SUM(end_index - start_index), 0) AS n FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done'
       AND (method = 'exact' OR method = ?)`,
    )
    .safeIntegers(true)
    .get(fingerprint, classKey, method) as { n: bigint };
  return row.n;
}
