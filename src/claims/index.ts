/** The claims layer's public surface: what a claim means, for the runner, the store and the CLI. */
export * from './claim-api.js';
export { claimSchema, claimJsonSchema, CLAIM_SCHEMA_FILE } from './claim-schema.js';
export type { Claim, ClaimInput, TransformStep, ContentCondition, SubstitutionStep, Measure, Relation, TheoryInput } from './claim-schema.js';
export { loadClaim, loadClaimProgram, parseClaim } from './load-claim.js';
export { compileClaimProgram, type ClaimProgram } from './compile-claim-program.js';
export { permutationText, cycleText } from './permutation-text.js';
export { claimFingerprint, canonicalClaimJson, mathematicalClaimJson, ENGINE_VERSION } from './claim-fingerprint.js';
export { planClaim, type ClaimPlanExt } from './plan-claim.js';
export { applyTransform } from './boundary-transform.js';
export { createEvaluator, type EvaluatorTuning } from './create-evaluator.js';
export { inferPermutationRule, type PermutationRule, type ClassPermutations } from './permutation-rule.js';
export { claimCompileCounts } from './compile-counts.js';
