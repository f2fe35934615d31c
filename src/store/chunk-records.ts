import type { Store } from './open-store.js';
import { preparedStatement } from './prepared-statement.js';

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
const BLOCKING = `(state = 'leased' OR method = 'exact' OR method = ?)`;

/**
 * Leases chunks of one class without rescanning its chunk rows: the rows that block a range are read once,
 * then each lease reads only the rows added since (by this or another process), in the same write
 * transaction that inserts the lease, so two processes never lease overlapping work. Rows another process
 * deletes (freed leases) are not seen until `reload`; the sweep reloads when it settles the class.
 */
export class ChunkLeaser {
  // Blocking ranges sorted by start; those before `head` lie wholly below the last cursor.
  private blocks: { start: bigint; end: bigint }[] = [];
  private head = 0;
  private lastSeen = 0;
  private readonly newRows;
  private readonly allRows;
  private readonly maxId;
  private readonly insert;

  constructor(
    private readonly db: Store,
    private readonly req: Omit<LeaseRequest, 'from' | 'size'>,
  ) {
    // The unary + keeps SQLite on the rowid range (rows added since) rather than the class's index.
    this.newRows = preparedStatement(db, `SELECT chunk_id, start_index, end_index FROM chunks WHERE chunk_id > ? AND +fingerprint = ? AND +class_key = ? AND ${BLOCKING}`, true);
    this.allRows = preparedStatement(db, `SELECT start_index, end_index FROM chunks WHERE fingerprint = ? AND class_key = ? AND ${BLOCKING} ORDER BY start_index`, true);
    this.maxId = preparedStatement(db, `SELECT COALESCE(MAX(chunk_id), 0) AS m FROM chunks`);
    this.insert = preparedStatement(db, `INSERT INTO chunks (fingerprint, class_key, method, start_index, end_index, state, run_id) VALUES (?, ?, ?, ?, ?, 'leased', ?)`);
    this.reload();
  }

  /** Reads the class's blocking rows afresh (after leases were freed). */
  reload(): void {
    this.blocks = [];
    this.head = 0;
    this.db.transaction(() => {
      const rows = this.allRows.all(this.req.fingerprint, this.req.classKey, this.req.method) as { start_index: bigint; end_index: bigint }[];
      this.blocks = rows.map((r) => ({ start: r.start_index, end: r.end_index }));
      this.lastSeen = (this.maxId.get() as { m: number }).m;
    })();
  }

  private catchUp(): void {
    const rows = this.newRows.all(this.lastSeen, this.req.fingerprint, this.req.classKey, this.req.method) as { chunk_id: bigint; start_index: bigint; end_index: bigint }[];
    for (const r of rows) this.add(r.start_index, r.end_index);
    this.lastSeen = (this.maxId.get() as { m: number }).m;
  }

  private add(start: bigint, end: bigint): void {
    let lo = this.head;
    let hi = this.blocks.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (this.blocks[mid]!.start <= start) lo = mid + 1;
      else hi = mid;
    }
    this.blocks.splice(lo, 0, { start, end });
  }

  /** Leases the first free range at or after `from` (at most `size` long); undefined when the rest is done or leased. */
  lease(from: bigint, size: bigint): LeasedChunk | undefined {
    return this.db
      .transaction((): LeasedChunk | undefined => {
        this.catchUp();
        let cursor = from;
        while (this.head < this.blocks.length && this.blocks[this.head]!.start <= cursor) {
          const b = this.blocks[this.head++]!;
          if (b.end > cursor) cursor = b.end;
        }
        if (this.head > 4096) {
          this.blocks = this.blocks.slice(this.head);
          this.head = 0;
        }
        if (cursor >= this.req.count) return undefined;
        let end = cursor + size;
        const bound = this.head < this.blocks.length ? this.blocks[this.head]!.start : this.req.count;
        if (end > bound) end = bound;
        if (end > this.req.count) end = this.req.count;
        const info = this.insert.run(this.req.fingerprint, this.req.classKey, this.req.method, cursor, end, this.req.runId);
        this.lastSeen = Number(info.lastInsertRowid);
        this.add(cursor, end);
        return { chunkId: Number(info.lastInsertRowid), start: cursor, end };
      })
      .immediate();
  }
}

/**
 * Leases the first free range at or after `from` (at most `size` long), in one write transaction so two
 * processes never lease overlapping work; undefined when the rest of the class is done or leased.
 * Reads every blocking row of the class: a sweep keeps one `ChunkLeaser` per class instead.
 */
export function leaseChunk(db: Store, req: LeaseRequest): LeasedChunk | undefined {
  return new ChunkLeaser(db, req).lease(req.from, req.size);
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
    const rows = preparedStatement(
      db,
      `SELECT start_index, end_index, error_bound FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done'
         AND method IN (${methods.map(() => '?').join(',')}) ORDER BY start_index`,
      true,
    ).all(fingerprint, classKey, ...methods) as { start_index: bigint; end_index: bigint; error_bound: number }[];
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

/** Leased chunks of a class held by runs other than `runId` (live peers once dead runs are reaped). */
export function otherLeases(db: Store, fingerprint: string, classKey: string, runId: number): number {
  const row = preparedStatement(db, `SELECT COUNT(*) AS n FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'leased' AND run_id != ?`).get(fingerprint, classKey, runId) as { n: number };
  return row.n;
}

/** Finished chunks usable for `method` cover [first, limit) of a class (a --shard run's part). */
export function rangeCovered(db: Store, fingerprint: string, classKey: string, method: SweepMethod, first: bigint, limit: bigint): boolean {
  const rows = db
    .prepare(`SELECT start_index, end_index FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done' AND (method = 'exact' OR method = ?) AND end_index > ? AND start_index < ? ORDER BY start_index`)
    .safeIntegers(true)
    .all(fingerprint, classKey, method, first, limit) as { start_index: bigint; end_index: bigint }[];
  let cursor = first;
  for (const r of rows) {
    if (r.start_index > cursor) break;
    if (r.end_index > cursor) cursor = r.end_index;
  }
  return cursor >= limit;
}
