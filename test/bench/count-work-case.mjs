// One coefficient under one sweep strategy, in its own process (plain JS on the built dist): CPU time, peak
// memory and the machine-independent work: profiles written (the new size of the frontier each step
// extended, summed over the steps) and the widest step (live profiles of both frontiers).
// Usage: node count-work-case.mjs THEORY STRATEGY|default λ μ ν [LIMIT_SECONDS] → one JSON line; past the
// limit the count stops and says how far it got.
import { countBoundary, defaultStrategy, integerSemiring, modularSemiring, structureConstantSides, theoryPieceSet, triangleRegion } from '../../dist/engine/index.js';

const [theory, asked, lambda, mu, nu, limit] = process.argv.slice(2);
const pieces = theoryPieceSet(theory);
const strategy = asked === 'default' ? defaultStrategy(pieces) : asked;
const semiring = pieces.pieces.every((p) => p.weight.type === 'integer') ? integerSemiring : modularSemiring(1);
const stopAt = performance.now() + Number(limit ?? 1e9) * 1000;
let work = 0;
let widest = 0;
let top = 1;
let bottom = 1;
let last = { done: 0, total: 0 };
const onProgress = (p) => {
  const down = strategy === 'forward' || (strategy === 'meet' && top <= bottom);
  work += down ? p.fromTop : p.fromBottom;
  top = p.fromTop;
  bottom = p.fromBottom;
  widest = Math.max(widest, p.profiles);
  last = p;
  if (performance.now() > stopAt) throw new Error('time limit');
};
const out = { theory, strategy, n: lambda.length };
try {
  out.value = String(countBoundary(triangleRegion(lambda.length), structureConstantSides(lambda, mu, nu), pieces, { semiring, strategy, onProgress }));
} catch (e) {
  if (e.message !== 'time limit') throw e;
  out.stopped = { done: last.done, total: last.total, profiles: last.profiles };
}
const cpu = process.cpuUsage();
Object.assign(out, { cpuMs: Math.round((cpu.user + cpu.system) / 1000), work, widest, peakMB: Math.round(process.resourceUsage().maxRSS / 1024) });
process.stdout.write(`${JSON.stringify(out)}\n`);
