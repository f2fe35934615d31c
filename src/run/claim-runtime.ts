import { createEvaluator, parseClaim, planClaim } from '../claims/index.js';
import type { EvaluateOptions } from '../claims/claim-api.js';
import type { ClaimRuntime } from './claim-runtime-module.js';

/** The real runtime: parse the canonical claim once, plan it and build its evaluator (with its caches). */
export function createClaimRuntime(canonicalJson: string, options: EvaluateOptions): ClaimRuntime {
  const claim = parseClaim(JSON.parse(canonicalJson) as unknown);
  return { plan: planClaim(claim), evaluator: createEvaluator(claim, options) };
}
