import type { Store } from './open-store.js';

/** A class with finished work that is neither verified nor known to fail: how much of it is done. */
export interface PartialClass {
  readonly classKey: string;
  /** Instances covered by finished chunks (either method), counted once. */
  readonly done: bigint;
  readonly chunks: number;
}

/** Classes of a claim that were begun but are not settled (no verification, no standing counterexample). */
export function partialClasses(db: Store, fingerprint: string): PartialClass[] {
  const rows = db
    .prepare(
      `SELECT class_key, start_index, end_index FROM chunks WHERE fingerprint = ? AND state = 'done'
         AND class_key NOT IN (SELECT class_key FROM verified_classes WHERE fingerprint = ?)
         AND class_key NOT IN (SELECT class_key FROM counterexamples WHERE fingerprint = ? AND (recheck IS NULL OR recheck = 'fails'))
       ORDER BY class_key, start_index`,
    )
    .safeIntegers(true)
    .all(fingerprint, fingerprint, fingerprint) as { class_key: string; start_index: bigint; end_index: bigint }[];
  const out: PartialClass[] = [];
  let cur: { classKey: string; done: bigint; chunks: number; reach: bigint } | undefined;
  for (const r of rows) {
    if (!cur || cur.classKey !== r.class_key) {
      if (cur) out.push({ classKey: cur.classKey, done: cur.done, chunks: cur.chunks });
      cur = { classKey: r.class_key, done: 0n, chunks: 0, reach: 0n };
    }
    cur.chunks++;
    // Ranges sorted by start: count only the part beyond what earlier ranges reached.
    const from = r.start_index > cur.reach ? r.start_index : cur.reach;
    if (r.end_index > from) {
      cur.done += r.end_index - from;
      cur.reach = r.end_index;
    }
  }
  if (cur) out.push({ classKey: cur.classKey, done: cur.done, chunks: cur.chunks });
  return out;
}
