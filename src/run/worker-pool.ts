import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Piscina } from 'piscina';
import { CodedError } from '../errors/index.js';
import type { PrepareTask, WorkerReply, WorkerTask } from './worker-task.js';

/** How often a task is tried before the run gives up with `worker_crashed`. */
export const MAX_ATTEMPTS = 3;
/** Tasks queued per worker thread at once (src/run/sweep-worker.ts runs them one after another). */
export const TASKS_PER_THREAD = 2;

// The worker always runs compiled JavaScript: under vitest this module is a .ts source in src/, so point at dist/.
// The build's loader of its one-file worker bundle with a code cache (src/build/bundle-worker.mjs) starts faster than ~60 modules.
// '../run/' resolves to dist/run/ both from this module (dist/run/) and from the CLI's bundle (dist/cli/).
function workerEntryUrl(): string {
  const here = fileURLToPath(import.meta.url);
  const dir = here.endsWith('.ts') ? here.replace(/[\\/]src[\\/]run[\\/][^\\/]+\.ts$/, '/dist/run') : join(dirname(here), '..', 'run');
  const bundle = join(dir, 'sweep-worker.loader.mjs');
  return pathToFileURL(existsSync(bundle) ? bundle : join(dir, 'sweep-worker.js')).href;
}

/** Heap limits of each worker thread (a test starts a thread with the same ones to check its code cache). */
export const WORKER_RESOURCE_LIMITS = { maxYoungGenerationSizeMb: 16 } as const;

/** Where a sweep's tasks run: worker threads (`WorkerPool`) or the main thread (`InProcessRunner`). */
export interface TaskRunner {
  /** Tasks that may run at once (the worker count; 1 on the main thread). */
  readonly size: number;
  crashes: number;
  run(task: WorkerTask, what: string): Promise<WorkerReply>;
  /** Threads only: load a claim's runtime ahead of its first task. */
  prepare?(task: PrepareTask): void;
  destroy(): Promise<void>;
}

/** A piscina pool that retries a task whose worker died, a bounded number of times. */
export class WorkerPool implements TaskRunner {
  private readonly pool: Piscina<WorkerTask, WorkerReply>;
  /** Crashes seen so far (each one retried or reported). */
  crashes = 0;
  // A dead thread fails every task queued on it with one error: one crash, however many tasks it held.
  private readonly seen = new WeakSet<object>();

  constructor(readonly size: number) {
    // Two tasks per thread: the next chunk already waits in the thread's own queue when one finishes, so the
    // thread never idles until the main thread (busy storing, or descheduled on a loaded machine) hands it one.
    this.pool = new Piscina({ filename: workerEntryUrl(), minThreads: size, maxThreads: size, concurrentTasksPerWorker: TASKS_PER_THREAD, idleTimeout: 60_000, resourceLimits: WORKER_RESOURCE_LIMITS });
  }

  /** Runs one task; a dead worker means another try on a fresh one, up to MAX_ATTEMPTS. */
  async run(task: WorkerTask, what: string): Promise<WorkerReply> {
    let last: unknown;
    for (let attempt = 0; attempt < MAX_ATTEMPTS; attempt++) {
      try {
        return await this.pool.run({ ...task, attempt });
      } catch (e) {
        last = e;
        if (typeof e !== 'object' || e === null || !this.seen.has(e)) this.crashes++;
        if (typeof e === 'object' && e !== null) this.seen.add(e);
      }
    }
    throw new CodedError('worker_crashed', { what: 'Worker', expected: `${what} to finish`, received: `${MAX_ATTEMPTS} crashed attempts (${(last as Error)?.message ?? String(last)})` }, {
      cause: last,
      hint: 'the chunk is left unfinished in the store; rerun the same command to resume, or try fewer --workers if memory is short',
    });
  }

  /** Has every thread load the claim's runtime now (not awaited; a failure shows again on the first chunk). */
  prepare(task: PrepareTask): void {
    // Each thread takes one: piscina hands a task to the least busy thread.
    for (let i = 0; i < this.size; i++) this.pool.run(task).catch(() => undefined);
  }

  async destroy(): Promise<void> {
    await this.pool.destroy();
  }
}
