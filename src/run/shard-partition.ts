import { createHash } from 'node:crypto';
import type { ClaimPlan, SizeClass } from '../claims/claim-api.js';
import { CodedError } from '../errors/index.js';

/** Shard `index` of `count` (0 ≤ index < count), as given by `--shard index/count`. */
export interface ShardSpec {
  readonly index: number;
  readonly count: number;
}

/** One class of a claim's plan as the partition sees it: its size and the estimated work of one instance. */
export interface ClassWork {
  readonly key: string;
  readonly instances: bigint;
  /** Estimated cost of one instance, in arbitrary units (≥ 1). */
  readonly weight: bigint;
}

/** The half-open index range [start, end) of one class that a shard sweeps. */
export interface ShardRange {
  readonly classKey: string;
  readonly start: bigint;
  readonly end: bigint;
}

/** Largest shard count accepted (a job array of this many tasks is already unusual). */
export const MAX_SHARDS = 100_000;

/** Parses `i/N`; the error names `--shard` and the accepted form. */
export function parseShard(text: string, flag = '--shard'): ShardSpec {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  const index = m ? Number(m[1]) : NaN;
  const count = m ? Number(m[2]) : NaN;
  if (!m || count < 1 || count > MAX_SHARDS || index >= count) {
    throw new CodedError('invalid_argument', { what: 'Shard', expected: `'i/N' with 0 ≤ i < N ≤ ${MAX_SHARDS}, e.g. '0/4'`, received: `'${text}'` }, {
      path: flag,
      hint: 'shards are numbered from 0, like SLURM_ARRAY_TASK_ID in a job array --array=0-(N-1)',
    });
  }
  return { index, count };
}

/**
 * Estimated work of one instance of a class with these side lengths: the number of unit triangles of the
 * region (the transfer-matrix sweep places one per step), at least 1.
 */
export function instanceWeight(lengths: readonly number[]): bigint {
  const [s1, s2, , s4, , s6] = lengths as [number, number, number, number, number, number];
  const n = s6 + s1 + s2;
  return BigInt(Math.max(1, n * n - s6 * s6 - s2 * s2 - s4 * s4));
}

/** The partition's view of a plan's classes (in sweep order). */
export function planWork(plan: ClaimPlan, classes: readonly SizeClass[]): ClassWork[] {
  return classes.map((c) => ({ key: c.key, instances: plan.instanceCount(c), weight: instanceWeight(c.lengths) }));
}

const ceilDiv = (a: bigint, b: bigint) => (a <= 0n ? 0n : (a + b - 1n) / b);

/**
 * The ranges of shard `spec` over classes in sweep order. The classes' work is laid end to end on one
 * line of total weight W, cut at ⌊W·k/N⌋ for k = 0..N; an instance belongs to the shard whose piece holds
 * its starting point. So every instance lies in exactly one shard, each shard's work is within one
 * instance's weight of W/N, and each shard sweeps consecutive indices (which keeps the evaluator's caches warm).
 */
export function shardRanges(classes: readonly ClassWork[], spec: ShardSpec): ShardRange[] {
  const total = classes.reduce((acc, c) => acc + c.instances * c.weight, 0n);
  const n = BigInt(spec.count);
  const lo = (total * BigInt(spec.index)) / n;
  const hi = (total * BigInt(spec.index + 1)) / n;
  const out: ShardRange[] = [];
  let offset = 0n;
  for (const c of classes) {
    const clamp = (x: bigint) => (x > c.instances ? c.instances : x);
    const start = clamp(ceilDiv(lo - offset, c.weight));
    const end = clamp(ceilDiv(hi - offset, c.weight));
    if (end > start) out.push({ classKey: c.key, start, end });
    offset += c.instances * c.weight;
  }
  return out;
}

/** A digest of the partitioned plan: shards of one sweep must agree on it (same classes, bounds and weights). */
export function planDigest(classes: readonly ClassWork[]): string {
  const text = classes.map((c) => `${c.key}:${c.instances}:${c.weight}`).join(';');
  return createHash('sha256').update(text).digest('hex').slice(0, 16);
}
