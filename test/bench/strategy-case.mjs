// One coefficient under each sweep strategy in one process (plain JS on the built dist): time and the
// machine-independent work, the sum over steps of the live profiles, and the widest step.
// Usage: node strategy-case.mjs THEORY λ μ ν → prints JSON { forward: {...}, backward: {...}, meet: {...}, value }.
import { countBoundary, fillingCountSemiring, integerSemiring, modularSemiring, structureConstantSides, theoryPieceSet, triangleRegion } from '../../dist/engine/index.js';

const [theory, lambda, mu, nu] = process.argv.slice(2);
const pieces = theoryPieceSet(theory);
const region = triangleRegion(lambda.length);
const sides = structureConstantSides(lambda, mu, nu);
const semiring = pieces.pieces.every((p) => p.weight.type === 'integer') ? integerSemiring : modularSemiring(1);
const out = {};
let value;
for (const strategy of ['forward', 'backward', 'meet']) {
  let work = 0;
  let widest = 0;
  countBoundary(region, sides, pieces, { semiring: fillingCountSemiring, strategy, onProgress: (p) => ((work += p.profiles), (widest = Math.max(widest, p.profiles))) });
  const start = performance.now();
  value = countBoundary(region, sides, pieces, { semiring, strategy });
  out[strategy] = { ms: Math.round(performance.now() - start), work, widest };
}
out.value = String(value);
process.stdout.write(JSON.stringify(out) + '\n');
