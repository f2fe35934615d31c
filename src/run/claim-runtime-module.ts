import type { ClaimPlan, EvaluateOptions, Evaluator } from '../claims/claim-api.js';
import type { ClaimProgram } from '../claims/compile-claim-program.js';
import { CodedError } from '../errors/index.js';

/** A claim ready to sweep: its plan (classes, index ↔ instance) and an evaluator with its caches. */
export interface ClaimRuntime {
  readonly plan: ClaimPlan;
  readonly evaluator: Evaluator;
}

/** The shape of a module that turns a claim's canonical JSON into a runtime (the real one or a test double). */
export interface ClaimRuntimeModule {
  /** `max`: the run's raised bounds, compiled in from the start (one compile per worker). */
  createClaimRuntime(canonicalJson: string, options: EvaluateOptions, max?: Readonly<Record<string, number>>): ClaimRuntime;
}

/** A claim as the runner receives it: already validated, canonical and fingerprinted by the claims layer. */
export interface SweepClaim {
  readonly id: string;
  readonly canonicalJson: string;
  readonly fingerprint: string;
  readonly engineVersion: string;
  /** The claim as the user wrote it (JSON text), kept for reports. */
  readonly sourceJson?: string | undefined;
  /** The claim file it came from, for replay commands. */
  readonly file?: string | undefined;
  /** The program the claims layer compiled when loading the file (reused, not compiled again). */
  readonly program?: ClaimProgram | undefined;
}

/** Imports a runtime module by URL and checks it has the expected export. */
export async function importClaimRuntime(url: string): Promise<ClaimRuntimeModule> {
  const mod = (await import(url)) as Partial<ClaimRuntimeModule>;
  if (typeof mod.createClaimRuntime !== 'function') throw new CodedError('internal_error', { what: 'Runtime module', expected: 'an export createClaimRuntime', received: `none in ${url}` });
  return mod as ClaimRuntimeModule;
}
