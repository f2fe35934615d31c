import type { SizeClass } from '../claims/claim-api.js';
import { toAppError } from '../errors.js';
import { listCounterexamples, recordRecheck, type Store } from '../store/index.js';
import { deserializeError } from './serialize-error.js';
import type { WorkerPool } from './worker-pool.js';
import type { ConfirmTask } from './worker-task.js';

/** Result of re-checking a claim's stored counterexamples at the start of a run. */
export interface RecheckOutcome {
  readonly checked: number;
  readonly stillFail: number;
  readonly nowHold: number;
}

/**
 * Recomputes every stored counterexample of the claim exactly (those whose class lies inside this run's
 * bounds) and records the outcome; a "now holds" means the stored result can no longer be trusted.
 */
export async function recheckCounterexamples(
  db: Store,
  pool: WorkerPool,
  base: Omit<ConfirmTask, 'kind' | 'classKey' | 'indices' | 'attempt'>,
  classes: readonly SizeClass[],
  runId: number,
): Promise<RecheckOutcome> {
  const keys = new Set(classes.map((c) => c.key));
  const byClass = new Map<string, bigint[]>();
  for (const c of listCounterexamples(db, base.fingerprint)) {
    if (!keys.has(c.classKey)) continue;
    const list = byClass.get(c.classKey);
    if (list) list.push(c.index);
    else byClass.set(c.classKey, [c.index]);
  }
  let checked = 0;
  let stillFail = 0;
  await Promise.all(
    [...byClass].map(async ([classKey, indices]) => {
      const reply = await pool.run({ ...base, kind: 'confirm', classKey, indices, attempt: 0 }, `re-check of class ${classKey}`);
      if (!reply.ok) throw deserializeError(reply.error, `re-check of class ${classKey}`);
      if (!('confirmed' in reply)) throw toAppError(new Error('re-check reply without results'));
      for (const r of reply.confirmed) {
        recordRecheck(db, base.fingerprint, classKey, r.index, runId, r.status);
        checked++;
        if (r.status === 'fails') stillFail++;
      }
    }),
  );
  return { checked, stillFail, nowHold: checked - stillFail };
}
