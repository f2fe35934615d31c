import type { ClaimPlan, SizeClass } from '../claims/claim-api.js';
import { AppError, toAppError } from '../errors.js';
import {
  classCoverage,
  completeChunk,
  doneInstances,
  finishRun,
  leaseChunk,
  listCounterexamples,
  markVerified,
  reapDeadRuns,
  releaseChunk,
  saveClaim,
  startRun,
  touchRun,
  type LeasedChunk,
  type Store,
  type StopReason,
  type SweepMethod,
} from '../store/index.js';
import { buildClaimSummary, type RunTally } from './build-claim-summary.js';
import type { SweepClaim } from './claim-runtime-module.js';
import { recheckCounterexamples } from './recheck-counterexamples.js';
import type { RunOptions } from './run-options.js';
import { shardPlan } from './shard-plan.js';
import { deserializeError } from './serialize-error.js';
import type { ClaimSummary } from './sweep-summary.js';
import type { WorkerPool } from './worker-pool.js';
import type { ChunkTask } from './worker-task.js';

/** Progress of the claim being swept, for a progress bar. */
export interface SweepProgress {
  readonly claimId: string;
  readonly checked: number;
  readonly total: number;
  readonly counterexamples: number;
}

/** What a claim's sweep needs from the invocation around it. */
export interface SweepContext {
  readonly db: Store;
  readonly pool: WorkerPool;
  readonly options: RunOptions;
  readonly runtimeModule?: string | undefined;
  readonly signal?: AbortSignal | undefined;
  /** Epoch milliseconds after which no new chunk is handed out. */
  readonly deadline?: number | undefined;
  readonly onProgress?: ((p: SweepProgress) => void) | undefined;
  /** The --db value when it is not the default, for replay commands. */
  readonly dbArg?: string | undefined;
}

interface ClassState {
  readonly cls: SizeClass;
  readonly count: bigint;
  /** Work of this run in the class: [first, limit) (the whole class unless --shard narrows it). */
  readonly first: bigint;
  readonly limit: bigint;
  cursor: bigint;
  exhausted: boolean;
  outstanding: number;
  checked: number;
  holds: number;
  fails: number;
}

/** Sweeps one claim: re-check stored counterexamples, lease and run chunks in class order, store each as it ends. */
export async function sweepClaim(ctx: SweepContext, claim: SweepClaim, plan: ClaimPlan): Promise<ClaimSummary> {
  const began = Date.now();
  const { db, options } = ctx;
  const method: SweepMethod = options.exact ? 'exact' : 'modular';
  saveClaim(db, { fingerprint: claim.fingerprint, claimId: claim.id, canonicalJson: claim.canonicalJson, engineVersion: claim.engineVersion, sourceFile: claim.file });
  reapDeadRuns(db);
  const sharded = shardPlan(plan, options);
  const runId = startRun(db, claim.fingerprint, { ...options, file: claim.file ?? null, ...(sharded ? { shard: sharded.record } : {}) });
  const heartbeat = setInterval(() => touchRun(db, runId), 5_000);
  heartbeat.unref();
  const base = { runtimeModule: ctx.runtimeModule, canonicalJson: claim.canonicalJson, fingerprint: claim.fingerprint, exact: options.exact, max: options.max };
  const states: ClassState[] = (sharded?.classes ?? plan.classes(options.max).map((cls) => ({ cls, first: 0n, limit: plan.instanceCount(cls) }))).map(({ cls, first, limit }) => ({
    cls,
    count: plan.instanceCount(cls),
    first,
    limit,
    cursor: first,
    exhausted: false,
    outstanding: 0,
    checked: 0,
    holds: 0,
    fails: 0,
  }));
  const tally: RunTally = { checked: 0, holds: 0, skippedZero: 0, paired: 0, overturned: 0, added: 0, errorBound: 0, exact: true };
  let fatal: AppError | undefined;
  let stop: StopReason | undefined;
  try {
    const rechecked = await recheckCounterexamples(db, ctx.pool, base, states.map((s) => s.cls), runId);
    const standing = listCounterexamples(db, claim.fingerprint).filter((c) => c.recheck !== 'holds');
    const failing = new Set(standing.map((c) => c.classKey));
    let known = standing.length;
    let firstFail = states.findIndex((s) => failing.has(s.cls.key));
    if (firstFail < 0) firstFail = Infinity;
    const total = states.reduce((acc, s) => acc + Math.max(0, Number(s.limit - s.first - doneInstances(db, claim.fingerprint, s.cls.key, method))), 0);
    const progress = () => ctx.onProgress?.({ claimId: claim.id, checked: tally.checked, total, counterexamples: known });
    progress();

    const verifyIfDone = (s: ClassState) => {
      if (!s.exhausted || s.outstanding > 0 || stop === 'signal' || fatal) return;
      const cov = classCoverage(db, claim.fingerprint, s.cls.key, method, s.count);
      const failed = listCounterexamples(db, claim.fingerprint).some((c) => c.classKey === s.cls.key);
      if (cov.complete && !failed) {
        markVerified(db, claim.fingerprint, runId, { classKey: s.cls.key, method: cov.method, size: s.cls.size, lengths: s.cls.lengths, variables: s.cls.variables, instances: s.count, errorBound: cov.errorBound });
      }
    };
    let longestChunkMs = 0;
    const checkStops = () => {
      if (stop || fatal) return;
      if (ctx.signal?.aborted) stop = 'signal';
      // Stop early enough that the chunks still running are likely to end before the deadline.
      else if (ctx.deadline !== undefined && Date.now() + longestChunkMs >= ctx.deadline) stop = 'time_limit';
      else if (options.maxCounterexamples !== undefined && known >= options.maxCounterexamples) stop = 'max_counterexamples';
    };

    let ci = 0;
    const nextLease = (): { s: ClassState; lease: LeasedChunk } | undefined => {
      while (ci < states.length) {
        if (options.stopAtFirst && ci > firstFail) {
          stop = 'stop_at_first';
          return undefined;
        }
        const s = states[ci]!;
        const lease = leaseChunk(db, { fingerprint: claim.fingerprint, classKey: s.cls.key, method, runId, from: s.cursor, count: s.limit, size: BigInt(options.chunkSize) });
        if (lease) {
          s.cursor = lease.end;
          return { s, lease };
        }
        s.exhausted = true;
        verifyIfDone(s);
        ci++;
      }
      return undefined;
    };

    const dispatch = async (s: ClassState, lease: LeasedChunk): Promise<void> => {
      const task: ChunkTask = { ...base, kind: 'chunk', classKey: s.cls.key, start: lease.start, end: lease.end, attempt: 0 };
      const what = `chunk ${s.cls.key}:${lease.start}-${lease.end}`;
      const startedAt = Date.now();
      try {
        const reply = await ctx.pool.run(task, what);
        longestChunkMs = Math.max(longestChunkMs, Date.now() - startedAt);
        if (!reply.ok) throw deserializeError(reply.error, what);
        if (!('chunk' in reply)) throw new Error(`${what}: reply without results`);
        const r = reply.chunk;
        const added = completeChunk(db, { chunkId: lease.chunkId, runId, fingerprint: claim.fingerprint, classKey: s.cls.key, ...r });
        if (added < 0) return;
        Object.assign(tally, {
          checked: tally.checked + r.checked,
          holds: tally.holds + r.holds,
          skippedZero: tally.skippedZero + r.skippedZero,
          paired: tally.paired + r.paired,
          overturned: tally.overturned + r.overturned,
          added: tally.added + added,
          errorBound: tally.errorBound + r.errorBound,
          exact: tally.exact && r.exact,
        });
        s.checked += r.checked;
        s.holds += r.holds;
        s.fails += r.fails;
        known += added;
        if (r.fails > 0) firstFail = Math.min(firstFail, states.indexOf(s));
        progress();
      } catch (e) {
        releaseChunk(db, lease.chunkId);
        fatal ??= toAppError(e);
      } finally {
        s.outstanding--;
        verifyIfDone(s);
      }
    };

    const inflight = new Set<Promise<void>>();
    const capacity = options.workers * 2;
    for (;;) {
      checkStops();
      while (!stop && !fatal && inflight.size < capacity) {
        const next = nextLease();
        if (!next) break;
        next.s.outstanding++;
        const p: Promise<void> = dispatch(next.s, next.lease).finally(() => inflight.delete(p));
        inflight.add(p);
      }
      if (inflight.size === 0) break;
      await Promise.race(inflight);
    }
    if (fatal) throw fatal;
    const status = stop === 'signal' ? 'interrupted' : 'completed';
    finishRun(db, runId, status, stop ?? 'finished');
    return buildClaimSummary({ db, claim, plan, runId, status, stopReason: stop ?? 'finished', tally, rechecked, classes: states, began, dbArg: ctx.dbArg });
  } catch (e) {
    const err = toAppError(e);
    finishRun(db, runId, 'failed', 'error', { code: err.code, message: err.message });
    throw err;
  } finally {
    clearInterval(heartbeat);
  }
}
