import type { ClaimPlan, Instance, InstanceResult, SizeClass } from '../claims/claim-api.js';
import type { CounterexampleRecord } from '../store/index.js';
import { intersectPermutations } from '../store/permutation-records.js';
import { importClaimRuntime, type ClaimRuntime } from './claim-runtime-module.js';
import { serializeError } from './serialize-error.js';
import type { ChunkResult, ChunkTask, ConfirmTask, WorkerReply, WorkerTask } from './worker-task.js';

interface Loaded {
  readonly runtime: ClaimRuntime;
  readonly classes: Map<string, SizeClass>;
}

// One runtime per claim, option set and bound per worker: the evaluator's completion cache lives across chunks.
const loaded = new Map<string, Promise<Loaded>>();

function load(task: WorkerTask): Promise<Loaded> {
  const module = task.runtimeModule ?? new URL('./claim-runtime.js', import.meta.url).href;
  const key = `${module}\n${task.fingerprint}\n${task.exact}\n${JSON.stringify(task.max)}`;
  let entry = loaded.get(key);
  if (!entry) {
    entry = importClaimRuntime(module).then((m) => {
      const runtime = m.createClaimRuntime(task.canonicalJson, { exact: task.exact });
      const classes = new Map(runtime.plan.classes(task.max).map((c) => [c.key, c]));
      return { runtime, classes };
    });
    loaded.set(key, entry);
  }
  return entry;
}

function sizeClass(l: Loaded, key: string): SizeClass {
  const cls = l.classes.get(key);
  if (!cls) throw Object.assign(new Error(`Side-length class: expected one of the plan's classes, received '${key}'`), { code: 'internal_error' });
  return cls;
}

// Test hook: PUZZLESWEEP_TEST_CRASH=<class key>:<start index>[@<attempts>] kills this worker thread on that chunk.
function maybeCrash(task: ChunkTask): void {
  const spec = process.env.PUZZLESWEEP_TEST_CRASH;
  if (!spec) return;
  const [where, times] = spec.split('@') as [string, string | undefined];
  if (where === `${task.classKey}:${task.start}` && task.attempt < Number(times ?? 1)) process.exit(70);
}

function counterexample(cls: SizeClass, r: InstanceResult): CounterexampleRecord {
  return { classKey: cls.key, index: r.index, size: cls.size, lengths: cls.lengths, left: r.left, right: r.right, permutation: r.permutation };
}

function* unranked(plan: ClaimPlan, cls: SizeClass, start: bigint, end: bigint): Generator<Instance> {
  for (let i = start; i < end; i++) yield plan.instanceAt(cls, i);
}

function sweepChunk(l: Loaded, task: ChunkTask): ChunkResult {
  const began = performance.now();
  const cls = sizeClass(l, task.classKey);
  const { plan, evaluator } = l.runtime;
  const out = { checked: 0, holds: 0, fails: 0, skippedZero: 0, paired: 0, overturned: 0, errorBound: 0, exact: true };
  const counterexamples: CounterexampleRecord[] = [];
  const permutations: { index: bigint; permutation: readonly number[] }[] = [];
  let common: Map<string, number[]> | undefined;
  let truncated = false;
  const instances: Iterable<Instance> = plan.instancesFrom ? plan.instancesFrom(cls, task.start, task.end) : unranked(plan, cls, task.start, task.end);
  for (const instance of instances) {
    const i = instance.index;
    const r = evaluator.evaluate(instance);
    out.checked++;
    if (r.method === 'modular') out.exact = false;
    if (r.status === 'fails') {
      // Only an exact recomputation may turn a "fails" into a stored counterexample.
      const c = evaluator.confirm(instance);
      if (c.status === 'fails') {
        out.fails++;
        counterexamples.push(counterexample(cls, c));
      } else {
        out.overturned++;
        out.holds++;
      }
    } else if (r.status === 'holds') {
      out.holds++;
      if (r.method === 'modular') out.errorBound += r.errorBound ?? 0;
      if (r.permutation) permutations.push({ index: i, permutation: r.permutation });
      if (r.permutations) {
        common = intersectPermutations(common, r.permutations);
        truncated ||= r.permutationsTruncated === true;
      }
    } else if (r.status === 'skipped_zero') {
      out.skippedZero++;
      if (r.method === 'modular') out.errorBound += r.errorBound ?? 0;
    }
    else out.paired++;
  }
  const commonPermutations = common ? [...common.values()] : undefined;
  return { ...out, durationMs: performance.now() - began, counterexamples, permutations, commonPermutations, permutationsTruncated: truncated };
}

function confirmAll(l: Loaded, task: ConfirmTask): WorkerReply {
  const cls = sizeClass(l, task.classKey);
  const confirmed = task.indices.map((index) => {
    const r = l.runtime.evaluator.confirm(l.runtime.plan.instanceAt(cls, index));
    return { index, status: r.status === 'fails' ? ('fails' as const) : ('holds' as const), left: r.left, right: r.right };
  });
  return { ok: true, confirmed };
}

/** Piscina entry: sweeps one chunk or re-checks counterexamples; errors come back as data with code and stack. */
export default async function runWorkerTask(task: WorkerTask): Promise<WorkerReply> {
  try {
    const l = await load(task);
    if (task.kind === 'confirm') return confirmAll(l, task);
    maybeCrash(task);
    return { ok: true, chunk: sweepChunk(l, task) };
  } catch (e) {
    return { ok: false, error: serializeError(e) };
  }
}
