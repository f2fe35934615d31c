import { compileClaimProgram, createEvaluator, planClaim } from '../claims/index.js';
import type { EvaluateOptions } from '../claims/claim-api.js';
import type { ClaimRuntime } from './claim-runtime-module.js';

/** The real runtime: compile the canonical claim once (per worker), plan it and build its evaluator (with its caches). */
export function createClaimRuntime(canonicalJson: string, options: EvaluateOptions, max?: Readonly<Record<string, number>>): ClaimRuntime {
  const program = compileClaimProgram(JSON.parse(canonicalJson) as unknown, undefined, max);
  // PUZZLESWEEP_PER_INSTANCE=1 turns the bulk path off, so tests can compare the stores both paths write.
  const tuning = process.env.PUZZLESWEEP_PER_INSTANCE === '1' ? { bulk: false } : {};
  return { plan: planClaim(program), evaluator: createEvaluator(program, options, tuning) };
}
