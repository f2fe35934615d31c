import type { Measured } from '../claims/claim-api.js';
import type { ClassTally, RunStatus, StopReason, SweepMethod } from '../store/index.js';

/** The outcome of one side-length class in this run. */
export interface ClassSummary {
  readonly key: string;
  readonly size: number;
  readonly lengths: readonly number[];
  /** Instances in the class (decimal string: counts may exceed 2^53). */
  readonly instances: string;
  /** Instances of the class covered by finished chunks (this run and earlier ones), decimal string. */
  readonly done: string;
  readonly checked: number;
  readonly holds: number;
  readonly fails: number;
  /** The class over every run in the store: boundaries checked, holding (vacuous or nonzero), failing. */
  readonly stored?: ClassTally | undefined;
  /** `verified`: fully swept, no counterexample; `counterexample`: one is stored; `incomplete`: not fully swept yet. */
  readonly state: 'verified' | 'counterexample' | 'incomplete';
  readonly method?: SweepMethod | undefined;
  readonly errorBound?: number | undefined;
  /** "Up to some permutation" claims: permutations that serve every instance swept in the class so far. */
  readonly commonPermutations?: { readonly common: readonly (readonly number[])[]; readonly lowerBound: boolean } | undefined;
}

/** The first counterexample of a claim in sweep order, with a command that recomputes it. */
export interface FirstCounterexample {
  readonly classKey: string;
  readonly index: string;
  readonly size: number;
  readonly left: Measured;
  /** T(b)'s own value; for substitution relations `substituted` is σ(value), with σ written out. */
  readonly right: Measured;
  readonly substituted?: Measured | undefined;
  readonly substitution?: string | undefined;
  readonly replay: string;
}

/** Everything one claim's sweep produced; the CLI prints it, programs read it with --json. */
export interface ClaimSummary {
  readonly claimId: string;
  readonly fingerprint: string;
  readonly file?: string | undefined;
  readonly runId: number;
  readonly status: Exclude<RunStatus, 'running'>;
  readonly stopReason: StopReason;
  readonly instancesChecked: number;
  /** Boundaries this run found to hold (a pair's representative decides its partner too). */
  readonly holds: number;
  /** Of `holds`: both compared values zero (vacuous), or some value nonzero (null: not counted by an older store). */
  readonly vacuous: number;
  readonly nonzero: number | null;
  readonly skippedZero: number;
  readonly paired: number;
  /** Modular "fails" that exact recomputation overturned. */
  readonly overturned: number;
  readonly newCounterexamples: number;
  /** Confirmed counterexamples in the store for this claim after the run (old and new). */
  readonly counterexamples: number;
  readonly rechecked: { readonly checked: number; readonly stillFail: number; readonly nowHold: number; readonly pending: number; readonly partnersStored: number };
  /** `modular` when any comparison of this run used modular evaluation. */
  readonly method: SweepMethod;
  /** Union bound on a false "holds" over this run's modular comparisons. */
  readonly errorBound: number;
  /**
   * `holds`: every requested class verified; `counterexample`: one is known; `incomplete`: part of the requested
   * classes is unfinished (time limit, signal, a peer's lease); `empty`: the family has no instance in its bounds.
   */
  readonly outcome: 'holds' | 'counterexample' | 'incomplete' | 'empty';
  /** What is left when not every requested class is settled: class keys, unfinished instances, stored counterexamples not re-checked. */
  readonly remaining?: { readonly classes: readonly string[]; readonly instances: string; readonly rechecks: number } | undefined;
  readonly classes: readonly ClassSummary[];
  readonly firstCounterexample?: FirstCounterexample | undefined;
  /** For "up to some permutation" claims: permutations found, and the single one if one serves all. */
  readonly permutations?: { readonly instances: number; readonly distinct: number; readonly common?: readonly number[] | undefined } | undefined;
  /**
   * "Up to some permutation" claims: one rule (block reversal or shift with affine endpoints) serving the
   * class-wide permutations of every class, as a relation ready to paste; null when none fits.
   */
  readonly permutationRule?: { readonly relation: object; readonly text: string } | null | undefined;
  readonly elapsedMs: number;
}

/** A whole `run` invocation. */
export interface SweepSummary {
  readonly db: string;
  readonly claims: readonly ClaimSummary[];
  readonly interrupted: boolean;
  readonly elapsedMs: number;
  /** Worker threads that died mid-task (each task retried, up to the bound). */
  readonly workerCrashes: number;
  /** 0 every claim holds on every requested class (a --shard: on its part), 1 a counterexample is known, 4 incomplete (or empty), 130 interrupted. */
  readonly exitCode: 0 | 1 | 4 | 130;
}

const shellQuote = (s: string) => (/^[\w./=:,+-]+$/.test(s) ? s : `'${s.replace(/'/g, `'\\''`)}'`);

/** The ready-to-paste command that recomputes one instance. */
export function replayCommand(claim: string, classKey: string, index: bigint | string, db?: string): string {
  const parts = ['puzzlesweep', 'replay', shellQuote(claim), '--instance', shellQuote(`${classKey}:${index}`)];
  if (db) parts.push('--db', shellQuote(db));
  return parts.join(' ');
}
