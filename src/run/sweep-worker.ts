import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { isMainThread, threadId } from 'node:worker_threads';
import type { SizeClass } from '../claims/claim-api.js';
import { claimCompileCounts } from '../claims/compile-counts.js';
import { CodedError } from '../errors/index.js';
import { counterexampleRecord, evaluateChunk } from './evaluate-chunk.js';
import * as claimRuntime from './claim-runtime.js';
import { importClaimRuntime, type ClaimRuntime, type ClaimRuntimeModule } from './claim-runtime-module.js';
import { serializeError } from './serialize-error.js';
import type { ChunkResult, ChunkTask, ConfirmTask, DerivedPartner, WorkerReply, WorkerTask } from './worker-task.js';

interface Loaded {
  readonly runtime: ClaimRuntime;
  readonly classes: Map<string, SizeClass>;
}

// One runtime per claim, option set and bound per worker: the evaluator's completion cache lives across chunks.
const loaded = new Map<string, Promise<Loaded>>();

function load(task: WorkerTask): Promise<Loaded> {
  // The real runtime is imported statically (loaded while the worker starts, and one copy of every module
  // in the worker's bundle); a test double comes by URL.
  const module = task.runtimeModule;
  const key = `${module ?? '(claims runtime)'}\n${task.fingerprint}\n${task.exact}\n${JSON.stringify(task.max)}`;
  let entry = loaded.get(key);
  if (!entry) {
    const runtime: Promise<ClaimRuntimeModule> = module !== undefined ? importClaimRuntime(module) : Promise.resolve(claimRuntime);
    entry = runtime.then((m) => {
      const runtime = m.createClaimRuntime(task.canonicalJson, { exact: task.exact }, task.max);
      const classes = new Map(runtime.plan.classes(task.max).map((c) => [c.key, c]));
      return { runtime, classes };
    });
    loaded.set(key, entry);
  }
  return entry;
}

function sizeClass(l: Loaded, key: string): SizeClass {
  const cls = l.classes.get(key);
  if (!cls) throw new CodedError('internal_error', { what: 'Side-length class', expected: "one of the plan's classes", received: `'${key}'` });
  return cls;
}

// Test hook: PUZZLESWEEP_TEST_CRASH=<class key>:<start index>[@<attempts>] kills this worker thread on that chunk.
function maybeCrash(task: ChunkTask): void {
  const spec = process.env.PUZZLESWEEP_TEST_CRASH;
  if (!spec || isMainThread) return;
  const [where, times] = spec.split('@') as [string, string | undefined];
  if (where === `${task.classKey}:${task.start}` && task.attempt < Number(times ?? 1)) process.exit(70);
}

function sweepChunk(l: Loaded, task: ChunkTask): ChunkResult {
  const cls = sizeClass(l, task.classKey);
  return evaluateChunk(l.runtime.plan, l.runtime.evaluator, cls, task.start, task.end, task.keepPermutations ?? false, task.tables);
}

function confirmAll(l: Loaded, task: ConfirmTask): WorkerReply {
  const cls = sizeClass(l, task.classKey);
  const { plan, evaluator } = l.runtime;
  const confirmed = task.indices.map((index) => {
    const r = evaluator.confirm(plan.instanceAt(cls, index));
    return { index, status: r.status === 'fails' ? ('fails' as const) : ('holds' as const), left: r.left, right: r.right };
  });
  // The pair's evaluation names T(b) (for a representative and for a paired boundary alike); T(b) = b or
  // outside the class, or a transform that is not paired, has no partner to derive.
  const partners = (task.partnersOf ?? []).map((of): DerivedPartner => {
    const p = evaluator.evaluate(plan.instanceAt(cls, of)).partnerIndex;
    if (p === undefined || p === of) return { of, row: undefined };
    const c = evaluator.confirm(plan.instanceAt(cls, p));
    return { of, row: c.status === 'fails' ? counterexampleRecord(cls, c) : undefined };
  });
  return { ok: true, confirmed, partners };
}

// Test hook: PUZZLESWEEP_TEST_COMPILE_COUNTS=<folder> writes this thread's claim parse and compile counts
// there after every task, so a test can check that each worker compiles its claim once.
function recordCompileCounts(): void {
  const folder = process.env.PUZZLESWEEP_TEST_COMPILE_COUNTS;
  if (folder) writeFileSync(join(folder, `worker-${threadId}.json`), JSON.stringify(claimCompileCounts));
}

/** Piscina entry: sweeps one chunk or re-checks counterexamples; errors come back as data with code and stack. */
export default async function runWorkerTask(task: WorkerTask): Promise<WorkerReply> {
  try {
    const l = await load(task);
    if (task.kind === 'prepare') return { ok: true, prepared: true };
    // Two tasks may be queued on this thread (worker-pool.ts): yield once, so the one before this has posted
    // its reply before this one's synchronous work begins.
    await new Promise<void>((resolve) => setImmediate(resolve));
    if (task.kind === 'confirm') return confirmAll(l, task);
    maybeCrash(task);
    return { ok: true, chunk: sweepChunk(l, task) };
  } catch (e) {
    return { ok: false, error: serializeError(e) };
  } finally {
    recordCompileCounts();
  }
}
