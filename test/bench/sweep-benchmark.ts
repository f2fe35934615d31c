/** Sweep benchmarks (issue 3): batched vs one DP per instance, 1 vs 2 workers, modular vs exact, memory of 1M instances. */
import { execFileSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { ClaimInput } from '../../src/claims/index.js';
import type { SweepCase } from './sweep-case.js';

const here = dirname(fileURLToPath(import.meta.url));

interface Measured {
  instances: number;
  ms: number;
  perSecond: number;
  maxRssMB: number;
  rssSamplesMB?: number[];
}

function measure(c: SweepCase): Measured {
  const out = execFileSync(process.execPath, ['--import', 'tsx', join(here, 'sweep-case.ts'), JSON.stringify(c)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  return JSON.parse(out) as Measured;
}

const claim = (id: string, theory: string, sides: (number | string)[], transform: object[], variables: object[] = []): ClaimInput =>
  ({ id, statement: 'benchmark', theory, family: { sides, variables }, transform, compare: { measure: { type: 'value' }, relation: { type: 'equal' } } }) as ClaimInput;

const rate = (m: Measured) => `${Math.round(m.perSecond).toLocaleString('en-US')}/s`;
const ratio = (a: Measured, b: Measured) => `${(a.perSecond / b.perSecond).toFixed(2)}×`;

export default async function sweepBenchmark(): Promise<string> {
  const parallelogram = claim('bench-parallelogram', 'cohomology', [3, 7, 0, 3, 7, 0], [{ type: 'exchange', sides: [1, 4] }]);
  const batched = measure({ kind: 'batched', claim: parallelogram, limit: 200000 });
  const single = measure({ kind: 'per-instance', claim: parallelogram, limit: 200000 });

  // 1 vs 2 workers on the million-instance sweep, so start-up (process, threads, claim plan) is amortised.
  const million = claim('bench-million', 'cohomology', [5, 5, 0, 5, 5, 0], [{ type: 'exchange', sides: [1, 4] }]);
  const one = measure({ kind: 'pool', claim: million, workers: 1, chunkSize: 2000 });
  const two = measure({ kind: 'pool', claim: million, workers: 2, chunkSize: 2000 });

  const equivariant = claim('bench-equivariant', 'equivariant', [7, 0, 7, 0, 7, 0], [{ type: 'rotate', degrees: 120 }]);
  const modular = measure({ kind: 'evaluate', claim: equivariant, exact: false, limit: 20000 });
  const exact = measure({ kind: 'evaluate', claim: equivariant, exact: true, limit: 20000 });

  const big = two;

  return [
    '## Sweeps (test/bench/sweep-benchmark.ts)',
    '',
    '| case | instances | time | rate | ratio | goal |',
    '|---|---:|---:|---:|---:|---|',
    `| parallelogram 3,7,0,3,7,0 cohomology, exchange sides 1↔4: evaluator with cached one-sweep completions | ${batched.instances} | ${batched.ms.toFixed(0)} ms | ${rate(batched)} | ${ratio(batched, single)} vs one DP per instance | ≥ 20× |`,
    `| same, one closed DP for b and one for T(b) per instance | ${single.instances} | ${single.ms.toFixed(0)} ms | ${rate(single)} | 1× | |`,
    `| parallelogram 5,5,0,5,5,0 cohomology, exchange 1↔4, full sweep into SQLite, 1 worker | ${one.instances} | ${one.ms.toFixed(0)} ms | ${rate(one)} | 1× | |`,
    `| same, 2 workers | ${two.instances} | ${two.ms.toFixed(0)} ms | ${rate(two)} | ${ratio(two, one)} vs 1 worker | ≥ 1.8× on 2 cores |`,
    `| equivariant triangle n = 7, rotation by 120°: modular identity test | ${modular.instances} | ${modular.ms.toFixed(0)} ms | ${rate(modular)} | ${ratio(modular, exact)} vs exact | |`,
    `| same, exact polynomials (--exact) | ${exact.instances} | ${exact.ms.toFixed(0)} ms | ${rate(exact)} | 1× | |`,
    '',
    `Peak resident memory of the million-instance sweep (whole process, main thread and workers): ${big.maxRssMB.toFixed(0)} MB (goal ≤ 300 MB, flat).`,
    `Resident memory at each tenth of that sweep: ${(big.rssSamplesMB ?? []).join(', ')} MB.`,
  ].join('\n');
}
