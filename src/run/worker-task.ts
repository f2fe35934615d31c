import type { Measured, SharedTables } from '../claims/claim-api.js';
import type { ChunkFindings, CounterexampleRecord } from '../store/index.js';
import type { ErrorParts } from '../errors/index.js';

interface TaskBase {
  /** File URL of a runtime module; the compiled claims runtime next to the worker when absent. */
  readonly runtimeModule?: string | undefined;
  readonly canonicalJson: string;
  readonly fingerprint: string;
  readonly exact: boolean;
  /** Raised variable bounds, so classes beyond the claim's own range can be found by key. */
  readonly max: Readonly<Record<string, number>>;
  readonly classKey: string;
  /** 0 on the first try; the crash injection of tests reads it. */
  readonly attempt: number;
}

/** Sweep instances [start, end) of one class. */
export interface ChunkTask extends TaskBase {
  readonly kind: 'chunk';
  readonly start: bigint;
  readonly end: bigint;
  /** Store each instance's permutation too (default false); class-wide intersections are always kept. */
  readonly keepPermutations?: boolean | undefined;
  /** The class's value tables in memory shared by all workers of this run (absent: each worker keeps its own). */
  readonly tables?: SharedTables | undefined;
}

/** Re-check stored counterexamples exactly. */
export interface ConfirmTask extends TaskBase {
  readonly kind: 'confirm';
  readonly indices: readonly bigint[];
  /** Of these, the ones whose failing partner T(b) an older store did not keep: derive and confirm it too. */
  readonly partnersOf?: readonly bigint[] | undefined;
}

/** The partner T(b) of a re-checked counterexample b: its confirmed row when it fails, else undefined. */
export interface DerivedPartner {
  readonly of: bigint;
  readonly row: CounterexampleRecord | undefined;
}

/** Load the claim's runtime (compile the claim, plan its classes) ahead of the first chunk, while the main thread opens the store. */
export interface PrepareTask extends Omit<TaskBase, 'classKey'> {
  readonly kind: 'prepare';
}

export type WorkerTask = ChunkTask | ConfirmTask | PrepareTask;

/** Tallies and findings of one chunk. */
export interface ChunkResult extends ChunkFindings {
  /** Modular "fails" that the exact recomputation found to hold (counted as holds). */
  readonly overturned: number;
  readonly permutationsTruncated: boolean;
}

/** An error as it crosses the thread boundary: structured clone would drop the code and hint. */
export interface SerializedError {
  readonly code: string;
  readonly message: string;
  readonly stack?: string | undefined;
  readonly path?: string | undefined;
  readonly hint?: string | undefined;
  /** The message parts of a coded error (absent for anything else, which the main thread frames). */
  readonly parts?: ErrorParts | undefined;
}

export type WorkerReply =
  | { readonly ok: true; readonly chunk: ChunkResult }
  | { readonly ok: true; readonly prepared: true }
  | {
      readonly ok: true;
      readonly confirmed: readonly { readonly index: bigint; readonly status: 'fails' | 'holds'; readonly left: Measured; readonly right: Measured }[];
      readonly partners?: readonly DerivedPartner[] | undefined;
    }
  | { readonly ok: false; readonly error: SerializedError };
