import { availableParallelism } from 'node:os';
import type { ClaimPlan } from '../claims/claim-api.js';
import { instanceWeight } from './shard-partition.js';

/**
 * Without --workers, a family whose estimated work (instances × unit triangles, summed over the requested
 * classes) is at most this is swept in the main thread: starting a worker thread and loading the claims
 * and engine there costs about 0.1 s of CPU, more than such a sweep's chunks (test/bench/results.md,
 * "Family sweeps against the Python yardstick").
 */
export const IN_PROCESS_WORK = 250_000n;

/** Worker threads for a run: --workers as given (0: the main thread), else 0 for a small family, else one per core. */
export function workerThreads(requested: number | undefined, plans: readonly ClaimPlan[], max: Readonly<Record<string, number>>, cores = availableParallelism()): number {
  if (requested !== undefined) return requested;
  let work = 0n;
  for (const plan of plans) for (const cls of plan.classes(max)) work += plan.instanceCount(cls) * instanceWeight(cls.lengths);
  return work <= IN_PROCESS_WORK ? 0 : cores;
}
