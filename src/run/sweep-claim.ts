import type { ClaimPlan, SharedTables, SizeClass } from '../claims/claim-api.js';
import { CodedError, toCodedError } from '../errors/index.js';
import {
  ChunkLeaser,
  completeChunk,
  counterexampleKeys,
  doneInstances,
  finishRun,
  reapDeadRuns,
  releaseChunk,
  saveClaim,
  storeFault,
  startRun,
  touchRun,
  type LeasedChunk,
  type Store,
  type SweepMethod,
} from '../store/index.js';
import { buildClaimSummary, type RunTally } from './build-claim-summary.js';
import { autoSizing } from './chunk-sizing.js';
import type { SweepClaim } from './claim-runtime-module.js';
import { recheckCounterexamples } from './recheck-counterexamples.js';
import type { RunOptions } from './run-options.js';
import { shardPlan } from './shard-plan.js';
import { deserializeError } from './serialize-error.js';
import { settleClass } from './settle-class.js';
import type { ClaimSummary } from './sweep-summary.js';
import { createScheduler, type SweepScheduler } from './sweep-scheduler.js';
import type { TaskRunner } from './worker-pool.js';
import type { ChunkTask } from './worker-task.js';

/** Progress of the claim being swept, for a progress bar. */
export interface SweepProgress {
  readonly claimId: string;
  readonly checked: number;
  readonly total: number;
  readonly counterexamples: number;
  /** The class whose chunk finished last (e.g. `n=5`), absent before the first chunk. */
  readonly classKey?: string;
}

/** What a claim's sweep needs from the invocation around it. */
export interface SweepContext {
  readonly db: Store;
  readonly pool: TaskRunner;
  readonly options: RunOptions;
  readonly runtimeModule?: string | undefined;
  readonly signal?: AbortSignal | undefined;
  /** Epoch milliseconds after which no new chunk is handed out. */
  readonly deadline?: number | undefined;
  readonly onProgress?: ((p: SweepProgress) => void) | undefined;
  /** The --db value when it is not the default, for replay commands. */
  readonly dbArg?: string | undefined;
}

const HEARTBEAT_MS = 5_000;
// A class that reopens this often without a single new lease has a coverage the leaser cannot see: a bug.
const MAX_IDLE_REOPENS = 3;

// Not unref'd: while this run only waits for a peer's lease, this timer is all that keeps the process alive
// (an unref'd one let Node exit with status 13, an unsettled top-level await, mid-sweep).
const sleep = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, Math.max(0, ms)));

/**
 * Sweeps one claim: re-check stored counterexamples never re-checked, then let the scheduler hand out
 * chunks in class order while this (main) thread only leases, stores results and settles classes.
 */
export async function sweepClaim(ctx: SweepContext, claim: SweepClaim, plan: ClaimPlan): Promise<ClaimSummary> {
  const began = Date.now();
  const { db, options } = ctx;
  const method: SweepMethod = options.exact ? 'exact' : 'modular';
  saveClaim(db, { fingerprint: claim.fingerprint, claimId: claim.id, canonicalJson: claim.canonicalJson, engineVersion: claim.engineVersion, sourceFile: claim.file, sourceJson: claim.sourceJson });
  reapDeadRuns(db);
  const sharded = shardPlan(plan, options);
  const runId = startRun(db, claim.fingerprint, { ...options, file: claim.file ?? null, ...(sharded ? { shard: sharded.record } : {}) });
  const heartbeat = setInterval(() => touchRun(db, runId), HEARTBEAT_MS);
  heartbeat.unref();
  const base = { runtimeModule: ctx.runtimeModule, canonicalJson: claim.canonicalJson, fingerprint: claim.fingerprint, exact: options.exact, max: options.max, keepPermutations: options.keepPermutations };
  // Each class with the part of it this run sweeps: [first, limit), the whole class unless --shard narrows it.
  const parts = sharded?.classes ?? plan.classes(options.max).map((cls) => ({ cls, first: 0n, limit: plan.instanceCount(cls) }));
  const classes: SizeClass[] = parts.map((p) => p.cls);
  const counts = classes.map((c) => plan.instanceCount(c));
  const tally: RunTally = { checked: 0, holds: 0, skippedZero: 0, paired: 0, overturned: 0, added: 0, errorBound: 0, exact: true };
  let longestChunkMs = 0;
  // Stop early enough that the chunks still running are likely to end before the deadline.
  const stopCause = () => (ctx.signal?.aborted ? 'signal' : ctx.deadline !== undefined && Date.now() + longestChunkMs >= ctx.deadline ? 'time_limit' : undefined);
  const inflight = new Set<Promise<void>>();
  let sched: SweepScheduler | undefined;
  try {
    const rechecked = await recheckCounterexamples(db, ctx.pool, base, classes, runId, () => stopCause() !== undefined);
    const standing = counterexampleKeys(db, claim.fingerprint).filter((c) => c.recheck !== 'holds');
    const s = createScheduler({
      classes: parts.map((p) => ({ key: p.cls.key, count: p.limit, first: p.first })),
      capacity: ctx.pool.size * 2,
      stopAtFirst: options.stopAtFirst,
      maxCounterexamples: options.maxCounterexamples,
      sizing: autoSizing(ctx.pool.size, options.chunkSize),
      failingClasses: new Set(standing.map((c) => c.classKey)),
      knownCounterexamples: standing.length,
    });
    sched = s;
    const total = parts.reduce((acc, p) => acc + Math.max(0, Number(p.limit - p.first - doneInstances(db, claim.fingerprint, p.cls.key, method))), 0);
    const progress = (classKey?: string) => ctx.onProgress?.({ claimId: claim.id, checked: tally.checked, total, counterexamples: s.counterexamples, ...(classKey ? { classKey } : {}) });
    progress();

    const leasers = new Map<number, ChunkLeaser>();
    const leaser = (ci: number) => {
      let l = leasers.get(ci);
      if (!l) {
        l = new ChunkLeaser(db, { fingerprint: claim.fingerprint, classKey: classes[ci]!.key, method, runId, count: parts[ci]!.limit });
        leasers.set(ci, l);
      }
      return l;
    };
    const idleReopens = new Map<number, number>();
    // One listener for the whole sweep: a stop wakes the loop even while it only waits for a peer's lease.
    const aborted = ctx.signal && !ctx.signal.aborted ? new Promise<void>((resolve) => ctx.signal!.addEventListener('abort', () => resolve(), { once: true })) : undefined;
    let fatal: CodedError | undefined;

    // Value tables shared by the workers, one allocation per class (each cell is then computed once).
    const tables = new Map<number, SharedTables | undefined>();
    const tablesOf = (ci: number) => {
      if (!tables.has(ci)) tables.set(ci, plan.sharedTables?.(classes[ci]!));
      return tables.get(ci);
    };
    const dispatch = async (ci: number, lease: LeasedChunk): Promise<void> => {
      const classKey = classes[ci]!.key;
      const task: ChunkTask = { ...base, kind: 'chunk', classKey, start: lease.start, end: lease.end, attempt: 0, tables: tablesOf(ci) };
      const what = `chunk ${classKey}:${lease.start}-${lease.end}`;
      const startedAt = Date.now();
      try {
        const reply = await ctx.pool.run(task, what);
        longestChunkMs = Math.max(longestChunkMs, Date.now() - startedAt);
        if (!reply.ok) throw deserializeError(reply.error, what);
        if (!('chunk' in reply)) throw new CodedError('internal_error', { what: 'Worker reply', expected: 'chunk results', received: `another reply (${what})` });
        const r = reply.chunk;
        const added = completeChunk(db, { chunkId: lease.chunkId, runId, fingerprint: claim.fingerprint, classKey, ...r });
        if (added < 0) {
          // Our lease was freed by another process meanwhile: nothing was stored, and settling the class re-leases it.
          s.completed(ci, { checked: 0, holds: 0, fails: 0, added: 0, durationMs: 0 });
          return;
        }
        tally.checked += r.checked;
        tally.holds += r.holds;
        tally.skippedZero += r.skippedZero;
        tally.paired += r.paired;
        tally.overturned += r.overturned;
        tally.added += added;
        tally.errorBound += r.errorBound;
        tally.exact &&= r.exact;
        s.completed(ci, { checked: r.checked, holds: r.holds, fails: r.fails, added, durationMs: r.durationMs });
        progress(classKey);
      } catch (e) {
        releaseChunk(db, lease.chunkId);
        s.abandoned(ci);
        fatal ??= toCodedError(e);
      }
    };

    for (;;) {
      const cause = stopCause();
      if (cause) s.halt(cause);
      let action = s.next(Date.now());
      while (action.kind === 'lease' || action.kind === 'settle') {
        const ci = action.classIndex;
        if (action.kind === 'lease') {
          const lease = leaser(ci).lease(action.from, action.size);
          s.leased(ci, lease);
          if (lease) {
            idleReopens.delete(ci);
            const p: Promise<void> = dispatch(ci, lease).finally(() => inflight.delete(p));
            inflight.add(p);
          }
        } else {
          const outcome = settleClass({ db, fingerprint: claim.fingerprint, runId, method, cls: classes[ci]!, count: counts[ci]!, part: parts[ci]! });
          if (outcome === 'reopen') {
            const n = (idleReopens.get(ci) ?? 0) + 1;
            if (n > MAX_IDLE_REOPENS) throw new CodedError('internal_error', { what: `Class ${classes[ci]!.key}`, expected: 'its unfinished part to be free or leased', received: 'neither' });
            idleReopens.set(ci, n);
            leaser(ci).reload();
          }
          s.settled(ci, outcome, Date.now());
          if (outcome !== 'reopen' && outcome !== 'peer') tables.delete(ci);
        }
        action = s.next(Date.now());
      }
      if (action.kind === 'finished') break;
      const wakeups: Promise<unknown>[] = [...inflight];
      if (action.until !== undefined) wakeups.push(sleep(action.until - Date.now()));
      // Once aborted the promise stays resolved: racing it again would spin without yielding to the workers.
      if (aborted && !ctx.signal!.aborted) wakeups.push(aborted);
      await Promise.race(wakeups);
    }
    if (fatal) throw fatal;
    const stopReason = s.stopReason ?? 'finished';
    const status = stopReason === 'signal' ? 'interrupted' : 'completed';
    finishRun(db, runId, status, stopReason);
    return buildClaimSummary({
      db,
      claim,
      plan,
      runId,
      status,
      stopReason,
      tally,
      rechecked,
      classes: classes.map((cls, i) => {
        const c = s.classes[i]!;
        return { cls, count: counts[i]!, checked: c.checked, holds: c.holds, fails: c.fails, phase: c.phase };
      }),
      complete: s.complete && rechecked.pending === 0,
      method,
      began,
      dbArg: ctx.dbArg,
    });
  } catch (e) {
    sched?.halt('error');
    await Promise.allSettled([...inflight]);
    const err = storeFault(e, options.db) ?? toCodedError(e);
    try {
      finishRun(db, runId, 'failed', 'error', { code: err.code, message: err.message });
    } catch {
      // The store itself failed (e.g. its folder was removed): the error above says so.
    }
    throw err;
  } finally {
    clearInterval(heartbeat);
  }
}
