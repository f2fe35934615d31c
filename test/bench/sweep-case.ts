/**
 * One sweep benchmark case in a fresh process (so peak memory is its own); prints JSON. Invoked by
 * sweep-benchmark.ts as `node --import tsx sweep-case.ts <json>`. Whole sweeps are timed as CLI processes there.
 */
import { applyTransform, compileClaimProgram, createEvaluator, parseClaim, planClaim, type ClaimInput } from '../../src/claims/index.js';
import { countBoundary, integerSemiring, makeRegion } from '../../src/engine/index.js';

export type SweepCase =
  | { kind: 'batched' | 'per-instance'; claim: ClaimInput; limit: number }
  | { kind: 'evaluate'; claim: ClaimInput; exact: boolean; limit: number };

// One process-local loop over the first `limit` instances of the claim's first class.
function inProcess(c: SweepCase): Record<string, unknown> {
  const claim = parseClaim(c.claim);
  const plan = planClaim(compileClaimProgram(claim));
  const cls = plan.classes()[0]!;
  const n = Math.min(c.limit, Number(plan.instanceCount(cls)));
  const pieces = plan.compiled.left;
  const region = makeRegion(cls.lengths);
  const evaluator = createEvaluator(compileClaimProgram(claim), { exact: c.kind === 'evaluate' ? c.exact : true }, { pairing: false });
  const start = performance.now();
  let holds = 0;
  // The batched path walks instances as a sweep's worker does; the baseline names each one afresh.
  const walk = c.kind === 'per-instance' ? Array.from({ length: n }, (_, i) => plan.instanceAt(cls, BigInt(i))) : plan.instancesFrom(cls, 0n, BigInt(n));
  for (const inst of walk) {
    if (c.kind === 'per-instance') {
      // The baseline: one closed-boundary DP for b and one for T(b), no shared sweeps.
      const t = applyTransform(claim.transform, cls.lengths, inst.sides, pieces);
      const a = countBoundary(region, inst.sides, pieces, { semiring: integerSemiring });
      const b = countBoundary(makeRegion(t.lengths), t.sides, pieces, { semiring: integerSemiring });
      if (a === b) holds++;
    } else if (evaluator.evaluate(inst).status === 'holds') holds++;
  }
  const ms = performance.now() - start;
  return { instances: n, holds, ms, perSecond: (n / ms) * 1000 };
}

const c = JSON.parse(process.argv[2]!) as SweepCase;
const out = inProcess(c);
process.stdout.write(`${JSON.stringify({ ...out, maxRssMB: process.resourceUsage().maxRSS / 1024 })}\n`);
