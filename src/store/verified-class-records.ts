import type { SweepMethod } from './chunk-records.js';
import type { Store } from './open-store.js';
import { preparedStatement } from './prepared-statement.js';

/** A class fully swept with no counterexample; `instances` is its size. */
export interface VerifiedClass {
  readonly classKey: string;
  readonly method: SweepMethod;
  readonly size: number;
  readonly lengths: readonly number[];
  readonly variables: Readonly<Record<string, number>>;
  readonly instances: bigint;
  readonly errorBound: number;
}

/** Records a verified class (idempotent per claim, class and method). */
export function markVerified(db: Store, fingerprint: string, runId: number, v: VerifiedClass): void {
  preparedStatement(
    db,
    `INSERT OR REPLACE INTO verified_classes (fingerprint, class_key, method, size, lengths, variables, instances, error_bound, verified_run, verified_at)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
  ).run(fingerprint, v.classKey, v.method, v.size, JSON.stringify(v.lengths), JSON.stringify(v.variables), v.instances, v.errorBound, runId, new Date().toISOString());
}

/** Verified classes of one claim in sweep order. */
export function listVerified(db: Store, fingerprint: string): VerifiedClass[] {
  const rows = db.prepare('SELECT * FROM verified_classes WHERE fingerprint = ? ORDER BY size, lengths, class_key, method').safeIntegers(true).all(fingerprint) as Record<string, unknown>[];
  return rows.map((r) => ({
    classKey: r.class_key as string,
    method: r.method as SweepMethod,
    size: Number(r.size),
    lengths: JSON.parse(r.lengths as string) as number[],
    variables: JSON.parse(r.variables as string) as Record<string, number>,
    instances: r.instances as bigint,
    errorBound: Number(r.error_bound),
  }));
}
