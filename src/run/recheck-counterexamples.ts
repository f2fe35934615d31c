import type { SizeClass } from '../claims/claim-api.js';
import { CodedError } from '../errors/index.js';
import { counterexampleKeys, recordPartner, recordRecheck, type Store } from '../store/index.js';
import { deserializeError } from './serialize-error.js';
import type { TaskRunner } from './worker-pool.js';
import type { ConfirmTask } from './worker-task.js';

/** Result of re-checking a claim's stored counterexamples at the start of a run. */
export interface RecheckOutcome {
  readonly checked: number;
  readonly stillFail: number;
  readonly nowHold: number;
  /** Counterexamples (or partners to derive) left because the run was stopped first (done next time). */
  readonly pending: number;
  /** Failing partners of an older store's counterexamples derived and stored by this re-check (migration 7). */
  readonly partnersStored: number;
}

// Indices per worker task: small enough that a stop is noticed quickly.
const BATCH = 64;

/**
 * Recomputes exactly, once, each stored counterexample that was never re-checked (those whose class lies
 * inside this run's bounds), and records the outcome; a "now holds" means the stored result was doubtful.
 * Batches run on the pool in parallel; `stopped` is asked between batches, so a stop is honoured at once.
 */
export async function recheckCounterexamples(
  db: Store,
  pool: TaskRunner,
  base: Omit<ConfirmTask, 'kind' | 'classKey' | 'indices' | 'attempt'>,
  classes: readonly SizeClass[],
  runId: number,
  stopped: () => boolean,
): Promise<RecheckOutcome> {
  const keys = new Set(classes.map((c) => c.key));
  const batches: { classKey: string; indices: bigint[]; partnersOf: bigint[] }[] = [];
  const open = new Map<string, { classKey: string; indices: bigint[]; partnersOf: bigint[] }>();
  for (const c of counterexampleKeys(db, base.fingerprint)) {
    if (!keys.has(c.classKey) || (c.recheck !== null && !c.partnerPending)) continue;
    let batch = open.get(c.classKey);
    if (!batch || batch.indices.length + batch.partnersOf.length >= BATCH) {
      batch = { classKey: c.classKey, indices: [], partnersOf: [] };
      open.set(c.classKey, batch);
      batches.push(batch);
    }
    if (c.recheck === null) batch.indices.push(c.index);
    if (c.partnerPending) batch.partnersOf.push(c.index);
  }
  let checked = 0;
  let stillFail = 0;
  let partnersStored = 0;
  let partnersDerived = 0;
  let next = 0;
  const lane = async () => {
    while (next < batches.length && !stopped()) {
      const { classKey, indices, partnersOf } = batches[next++]!;
      const what = `re-check of class ${classKey}`;
      const reply = await pool.run({ ...base, kind: 'confirm', classKey, indices, partnersOf, attempt: 0 }, what);
      if (!reply.ok) throw deserializeError(reply.error, what);
      if (!('confirmed' in reply)) throw new CodedError('internal_error', { what: 'Re-check', expected: 'confirmed results', received: `another reply (${what})` });
      db.transaction(() => {
        for (const r of reply.confirmed) {
          recordRecheck(db, base.fingerprint, classKey, r.index, runId, r.status);
          checked++;
          if (r.status === 'fails') stillFail++;
        }
        for (const p of reply.partners ?? []) {
          recordPartner(db, base.fingerprint, classKey, p.of, runId, p.row);
          partnersDerived++;
          if (p.row) partnersStored++;
        }
      })();
    }
  };
  await Promise.all(Array.from({ length: Math.max(1, pool.size * 2) }, lane));
  const total = batches.reduce((a, b) => a + b.indices.length + b.partnersOf.length, 0);
  return { checked, stillFail, nowHold: checked - stillFail, pending: total - checked - partnersDerived, partnersStored };
}
