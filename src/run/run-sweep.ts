import { compileClaimProgram, planClaim } from '../claims/index.js';
import type { ClaimPlan } from '../claims/claim-api.js';
import { openStore, DEFAULT_STORE_PATH } from '../store/index.js';
import { importClaimRuntime, type SweepClaim } from './claim-runtime-module.js';
import { checkFamilyBounds, checkInstanceCount } from './family-size.js';
import type { RunOptions } from './run-options.js';
import { sweepClaim, type SweepProgress } from './sweep-claim.js';
import type { ClaimSummary, SweepSummary } from './sweep-summary.js';
import { InProcessRunner } from './in-process-runner.js';
import type { TaskRunner } from './worker-pool.js';
import { workerThreads } from './worker-threads.js';

/** Exit status of `run --shard` when the shard stopped before its work was done (run it again to resume). */
export const UNFINISHED_SHARD_EXIT = 4;

/** One `run` invocation: claims already loaded by the claims layer, options already validated. */
export interface SweepInput {
  readonly claims: readonly SweepClaim[];
  readonly options: RunOptions;
  /** Aborting stops handing out chunks; finished chunks are stored and the run is marked interrupted. */
  readonly signal?: AbortSignal | undefined;
  readonly onProgress?: ((p: SweepProgress) => void) | undefined;
  /** File URL of a claim runtime module; the compiled claims runtime when absent. */
  readonly runtimeModule?: string | undefined;
  /** Threads the caller started already (`startWorkers`, before compiling the claims); runSweep destroys them. */
  readonly pool?: TaskRunner | undefined;
}

// piscina and worker_threads load only for a sweep on worker threads: a small family is swept in the main thread.
const workerPool = async (threads: number): Promise<TaskRunner> => new (await import('./worker-pool.js')).WorkerPool(threads);

/**
 * Worker threads asked for by number, started at once so that their start-up (a thread, the worker's
 * bundle, its modules) overlaps the claims' compilation, the planning and the store's opening.
 */
export async function startWorkers(options: { readonly workers?: number | undefined }): Promise<TaskRunner | undefined> {
  return options.workers ? workerPool(options.workers) : undefined;
}

/** 130 interrupted, 1 a counterexample is known, 4 anything requested left unfinished (or nothing to check), else 0. */
export function sweepExitCode(claims: readonly ClaimSummary[], interrupted: boolean): 0 | 1 | 4 | 130 {
  if (interrupted) return 130;
  if (claims.some((c) => c.outcome === 'counterexample')) return 1;
  if (claims.some((c) => c.outcome !== 'holds')) return 4;
  return 0;
}

/** Sweeps each claim in turn on one worker pool and one store; returns data, prints nothing. */
export async function runSweep(input: SweepInput): Promise<SweepSummary> {
  const began = Date.now();
  let pool: TaskRunner | undefined = input.pool ?? (await startWorkers(input.options));
  try {
    return await sweepAll(input, began, async (threads) => (pool ??= threads === 0 ? new InProcessRunner() : await workerPool(threads)));
  } finally {
    await pool?.destroy();
  }
}

async function sweepAll(input: SweepInput, began: number, runner: (threads: number) => Promise<TaskRunner>): Promise<SweepSummary> {
  const { options: given } = input;
  // Every claim is planned and its size checked before the store is opened: an absurd bound writes nothing.
  const plans: ClaimPlan[] = [];
  if (input.runtimeModule === undefined) {
    for (const claim of input.claims) {
      const program = claim.program ?? compileClaimProgram(JSON.parse(claim.canonicalJson) as unknown, claim.file);
      checkFamilyBounds(program, given.max);
      const plan = planClaim(program);
      checkInstanceCount(plan, given.max);
      plans.push(plan);
    }
  } else {
    const runtime = await importClaimRuntime(input.runtimeModule);
    for (const claim of input.claims) plans.push(runtime.createClaimRuntime(claim.canonicalJson, { exact: given.exact }).plan);
  }
  const options = { ...given, workers: workerThreads(given.workers, plans, given.max) };
  const pool = await runner(options.workers);
  // The threads compile the first claim while this thread opens the store.
  const first = input.claims[0];
  if (first) pool.prepare?.({ kind: 'prepare', attempt: 0, runtimeModule: input.runtimeModule, canonicalJson: first.canonicalJson, fingerprint: first.fingerprint, exact: options.exact, max: options.max });
  const db = openStore(options.db);
  const deadline = options.timeLimit !== undefined ? began + options.timeLimit * 1000 : undefined;
  const claims: ClaimSummary[] = [];
  let workerCrashes = 0;
  try {
    for (const [i, claim] of input.claims.entries()) {
      if (input.signal?.aborted) break;
      const plan = plans[i]!;
      const ctx = {
        db,
        pool,
        options,
        runtimeModule: input.runtimeModule,
        signal: input.signal,
        deadline,
        onProgress: input.onProgress,
        dbArg: options.db === DEFAULT_STORE_PATH ? undefined : options.db,
      };
      claims.push(await sweepClaim(ctx, claim, plan));
    }
  } finally {
    workerCrashes = pool.crashes;
    db.close();
  }
  const interrupted = claims.some((c) => c.status === 'interrupted') || (input.signal?.aborted ?? false);
  // A shard that stopped before its part was done must not look done to a job scheduler, even when it found a
  // counterexample: its job is resubmitted until the shard is finished (README, "Sweeping on a cluster").
  const unfinishedShard = options.shard !== undefined && claims.some((c) => c.stopReason !== 'finished' || c.outcome === 'incomplete');
  const exitCode = !interrupted && unfinishedShard ? UNFINISHED_SHARD_EXIT : sweepExitCode(claims, interrupted);
  return { db: options.db, claims, interrupted, elapsedMs: Date.now() - began, workerCrashes, exitCode };
}
