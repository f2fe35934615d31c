import type { TaskRunner } from './worker-pool.js';
import type { WorkerReply, WorkerTask } from './worker-task.js';

type RunTask = (task: WorkerTask) => Promise<WorkerReply>;

// Loaded on first use, so a run on worker threads never loads the engine's counting modules here.
let entry: Promise<RunTask> | undefined;
const taskEntry = () => (entry ??= import('./sweep-worker.js').then((m) => m.default));

/**
 * Runs a sweep's tasks on the main thread, one at a time, through the worker's own entry (the same
 * `evaluateChunk` and the same replies, hence the same store): for a family too small to repay starting a
 * thread and loading the claims and engine there (README, "Run options").
 */
export class InProcessRunner implements TaskRunner {
  readonly size = 1;
  crashes = 0;
  private queue: Promise<unknown> = Promise.resolve();

  run(task: WorkerTask): Promise<WorkerReply> {
    // One task at a time, each in a macrotask of its own, so the store's writes, the progress bar and a
    // stop signal get their turn between chunks.
    const next = this.queue.then(() => new Promise<void>((resolve) => setImmediate(resolve))).then(async () => (await taskEntry())(task));
    this.queue = next.catch(() => undefined);
    return next;
  }

  async destroy(): Promise<void> {
    await this.queue;
  }
}
