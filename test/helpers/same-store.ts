import { expect } from 'vitest';
import { query } from '../e2e/cli-process.js';

// Bookkeeping that differs between any two runs: ids, times, hosts, options.
const bookkeeping = /(_run|_at|^run_id|^chunk_id|^duration_ms|^pid|^host|^process_start|^options_json|^heartbeat_at)$/;

/** The rows of one table of a store file, in `order`, without their bookkeeping columns. */
export function resultRows(db: string, table: string, order: string): Record<string, unknown>[] {
  return query<Record<string, unknown>>(db, `SELECT * FROM ${table} ORDER BY ${order}`).map((r) => Object.fromEntries(Object.entries(r).filter(([k]) => !bookkeeping.test(k))));
}

/** Two store files hold the same results: chunks and tallies, counterexample rows, verified classes, runs. */
export function expectSameStore(a: string, b: string): void {
  for (const [table, order] of [
    ['chunks', 'class_key, start_index'],
    ['counterexamples', 'class_key, instance_index'],
    ['verified_classes', 'class_key, method'],
    ['runs', 'run_id'],
  ] as const) {
    const x = resultRows(a, table, order);
    if (table === 'chunks') expect(x.length, 'a store without chunks compares nothing').toBeGreaterThan(0);
    expect(x, table).toEqual(resultRows(b, table, order));
  }
}
