/** Engine benchmarks (issue: puzzle engine): DP vs naive backtracking, whole products, modular vs exact. */
import { execFileSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { countCompletions, integerSemiring, theoryPieceSet, triangleRegion } from '../../src/engine/index.js';
import { grassmannianStrings } from '../../src/reference/grassmannian-strings.js';
import { stringOfPartition } from '../helpers/boundaries.js';
import type { BenchCase } from './measure-case.js';

const here = dirname(fileURLToPath(import.meta.url));

function measure(c: BenchCase): { ms: number; maxRssMB: number; [k: string]: unknown } {
  const out = execFileSync(process.execPath, ['--import', 'tsx', join(here, 'measure-case.ts'), JSON.stringify(c)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  return JSON.parse(out) as { ms: number; maxRssMB: number };
}

// Partitions in the middle of the k×(n−k) box, where Littlewood–Richardson coefficients are largest.
const CANDIDATES: Record<number, number[][]> = {
  8: [[2, 2, 1, 0], [3, 2, 1, 0], [2, 1, 1, 0]],
  9: [[3, 2, 1, 0], [2, 2, 1, 0], [3, 2, 2, 1]],
  10: [[3, 2, 2, 1, 0], [4, 3, 2, 1, 0], [3, 3, 2, 1, 0]],
  11: [[3, 3, 2, 1, 0], [4, 3, 2, 1, 0], [4, 3, 2, 2, 1]],
  12: [[4, 3, 2, 2, 1, 0], [4, 3, 3, 2, 1, 0], [5, 4, 3, 2, 1, 0], [4, 4, 3, 2, 1, 1], [4, 3, 2, 1, 0, 0]],
};

/** The triple (λ, μ, ν) with the largest cohomology coefficient among the candidates (chosen, not timed). */
function largestTriple(n: number): { lambda: string; mu: string; side5: string; value: number } {
  let best = { lambda: '', mu: '', side5: '', value: -1 };
  for (const a of CANDIDATES[n]!)
    for (const b of CANDIDATES[n]!) {
      const lambda = stringOfPartition(a, n);
      const mu = stringOfPartition(b, n);
      for (const [side5, v] of countCompletions(triangleRegion(n), [lambda, '', mu, '', null, ''], theoryPieceSet('cohomology'), { semiring: integerSemiring })) {
        if (Number(v) > best.value) best = { lambda, mu, side5, value: Number(v) };
      }
    }
  return best;
}

const fmt = (ms: number) => (ms >= 100 ? ms.toFixed(0) : ms >= 1 ? ms.toFixed(2) : ms.toFixed(3));

export default async function engineBenchmark(): Promise<string> {
  const lines: string[] = ['## Engine', ''];
  lines.push('### One coefficient: transfer-matrix DP vs naive backtracking (cohomology, upright triangles)', '');
  lines.push('| n | λ | μ | ν | c | DP ms | naive ms | naive / DP | DP peak MB | naive peak MB |', '|---|---|---|---|---|---|---|---|---|---|');
  const products: string[] = ['| n | λ = μ | nonzero ν | DP ms (one sweep) | naive ms (one count per ν) | naive / DP |', '|---|---|---|---|---|---|'];
  for (const n of [8, 9, 10, 11, 12]) {
    const t = largestTriple(n);
    const sides = [t.lambda, '', t.mu, '', t.side5, ''];
    const dp = measure({ kind: 'dp-single', theory: 'cohomology', sides });
    const naive = measure({ kind: 'naive-single', theory: 'cohomology', sides });
    const nu = [...t.side5].reverse().join('');
    lines.push(`| ${n} | ${t.lambda} | ${t.mu} | ${nu} | ${t.value} | ${fmt(dp.ms)} | ${fmt(naive.ms)} | ${(naive.ms / dp.ms).toFixed(0)}× | ${dp.maxRssMB} | ${naive.maxRssMB} |`);
    const k = [...t.lambda].filter((c) => c === '1').length;
    const dpAll = measure({ kind: 'dp-product', theory: 'cohomology', lambda: t.lambda, mu: t.lambda, ring: 'integer' });
    const naiveAll = measure({ kind: 'naive-product', theory: 'cohomology', lambda: t.lambda, mu: t.lambda, nus: grassmannianStrings(k, n) });
    products.push(`| ${n} | ${t.lambda} | ${String(dpAll.terms)} | ${fmt(dpAll.ms)} | ${fmt(naiveAll.ms)} | ${(naiveAll.ms / dpAll.ms).toFixed(0)}× |`);
  }
  lines.push('', '### The whole product σ_λ·σ_μ: one DP sweep vs one naive count per ν (cohomology)', '', ...products);

  lines.push('', '### The whole product σ_λ·σ_μ at n = 16 and n = 20 (one sweep, exact integers)', '');
  lines.push('| theory | n | λ = μ | nonzero ν | ms | peak MB |', '|---|---|---|---|---|---|');
  const big: [number, number[]][] = [
    [16, [4, 3, 3, 2, 2, 1, 1, 0]],
    [20, [5, 4, 4, 3, 3, 2, 2, 1, 1, 0]],
  ];
  for (const theory of ['cohomology', 'k-theory']) {
    for (const [n, part] of big) {
      const lambda = stringOfPartition(part, n);
      const r = measure({ kind: 'dp-product', theory, lambda, mu: lambda, ring: 'integer' });
      lines.push(`| ${theory} | ${n} | ${lambda} | ${String(r.terms)} | ${fmt(r.ms)} | ${r.maxRssMB} |`);
    }
  }

  lines.push('', '### Equivariant whole product: modular identity test vs exact polynomials', '');
  lines.push('| n | λ = μ | nonzero ν | exact ms | exact peak MB | modular ms (3 primes) | modular peak MB | exact / modular |', '|---|---|---|---|---|---|---|---|');
  const eq: [number, number[]][] = [
    [8, [2, 2, 1, 0]],
    [10, [3, 2, 1, 1, 0]],
    [12, [3, 2, 2, 1, 1, 0]],
    [13, [4, 3, 2, 2, 1, 0]],
  ];
  for (const [n, part] of eq) {
    const lambda = stringOfPartition(part, n);
    const exact = measure({ kind: 'dp-product', theory: 'equivariant', lambda, mu: lambda, ring: 'polynomial' });
    const mod = measure({ kind: 'dp-product', theory: 'equivariant', lambda, mu: lambda, ring: 'modular' });
    lines.push(`| ${n} | ${lambda} | ${String(exact.terms)} | ${fmt(exact.ms)} | ${exact.maxRssMB} | ${fmt(mod.ms)} | ${mod.maxRssMB} | ${(exact.ms / mod.ms).toFixed(1)}× |`);
  }
  return lines.join('\n');
}
