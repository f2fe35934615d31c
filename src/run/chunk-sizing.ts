/** How chunks are sized: a fixed count (`--chunk-size`), or by estimated work aiming at `targetMs` each. */
export interface ChunkSizing {
  readonly fixed?: bigint | undefined;
  /** Worker milliseconds one chunk should take: long enough that storing it is cheap beside it. */
  readonly targetMs: number;
  readonly workers: number;
  readonly min: bigint;
  readonly max: bigint;
}

/** What is known when the next chunk of a class is sized. */
export interface SizingInput {
  /** Measured worker milliseconds per instance in this class, once a chunk of it finished. */
  readonly perInstanceMs?: number | undefined;
  /** The same for the nearest earlier class (instances grow in cost with size, so it is hedged). */
  readonly previousPerInstanceMs?: number | undefined;
  readonly classRemaining: bigint;
  readonly totalRemaining: bigint;
}

/** Default sizing for a run on `workers` threads. */
export function autoSizing(workers: number, fixed?: number): ChunkSizing {
  return { fixed: fixed !== undefined ? BigInt(fixed) : undefined, targetMs: 150, workers, min: 8n, max: 200_000n };
}

// Before anything is measured the first chunks are short, so the rate is known soon.
const FIRST_CHUNK = 64n;
// A larger class costs more per instance; until it is measured, assume 4× the previous class's rate.
const GROWTH_HEDGE = 4;

/** Instances in the next chunk: work-based, never above an even share of what is left (so workers finish together). */
export function chunkSizeFor(s: ChunkSizing, i: SizingInput): bigint {
  if (s.fixed !== undefined) return s.fixed;
  const rate = i.perInstanceMs ?? (i.previousPerInstanceMs !== undefined ? i.previousPerInstanceMs * GROWTH_HEDGE : undefined);
  let size = rate !== undefined && rate > 0 ? BigInt(Math.max(1, Math.floor(s.targetMs / rate))) : FIRST_CHUNK;
  if (size > s.max) size = s.max;
  // The tail: with 2 chunks per worker in flight, a share of a quarter of the rest per worker keeps the last chunks short.
  // One worker (or the main thread) has no one to finish with: halving its tail only added chunks, each a lease
  // and a write (a small family's last class went in 9 chunks instead of 2).
  if (s.workers > 1) {
    const share = (i.totalRemaining + BigInt(2 * s.workers) - 1n) / BigInt(2 * s.workers);
    if (size > share) size = share;
  }
  if (size < s.min) size = s.min;
  if (size > i.classRemaining && i.classRemaining > 0n) size = i.classRemaining;
  return size;
}
