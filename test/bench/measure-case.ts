/**
 * Runs one engine benchmark case in a fresh process so that its peak memory is its own; prints JSON
 * `{ ms, maxRssMB, ...details }`. Invoked by engine-benchmark.ts as `node --import tsx measure-case.ts <json>`.
 */
import {
  countBoundary,
  countCompletions,
  integerSemiring,
  modularSemiring,
  polynomialSemiring,
  theoryPieceSet,
  triangleRegion,
  type Semiring,
} from '../../src/engine/index.js';
import { naiveCount } from '../../src/reference/naive-count.js';

export type BenchCase =
  | { kind: 'dp-single' | 'naive-single'; theory: string; sides: string[] }
  | { kind: 'dp-product'; theory: string; lambda: string; mu: string; ring: 'integer' | 'modular' | 'polynomial' }
  | { kind: 'naive-product'; theory: string; lambda: string; mu: string; nus: string[] };

function timeRepeated(f: () => void, minMs = 300): number {
  let reps = 0;
  const start = performance.now();
  do {
    f();
    reps++;
  } while (performance.now() - start < minMs);
  return (performance.now() - start) / reps;
}

function run(c: BenchCase): Record<string, unknown> {
  const pieces = theoryPieceSet(c.theory);
  const naivePieces = pieces.pieces.map((p) => ({ orientation: p.orientation, labels: [...p.labels] as [string, string, string], weight: p.weight }));
  switch (c.kind) {
    case 'dp-single': {
      const n = c.sides[0]!.length;
      let value = '';
      const ms = timeRepeated(() => {
        value = String(countBoundary(triangleRegion(n), c.sides, pieces, { semiring: integerSemiring }));
      });
      return { ms, value };
    }
    case 'naive-single': {
      const n = c.sides[0]!.length;
      const start = performance.now();
      const r = naiveCount([n, 0, n, 0, n, 0], c.sides, naivePieces);
      return { ms: performance.now() - start, value: String(r.fillings) };
    }
    case 'dp-product': {
      const n = c.lambda.length;
      const ring: Semiring<unknown> = (c.ring === 'integer' ? integerSemiring : c.ring === 'modular' ? modularSemiring(1) : polynomialSemiring(n)) as Semiring<unknown>;
      let terms = 0;
      const ms = timeRepeated(() => {
        terms = countCompletions(triangleRegion(n), [c.lambda, '', c.mu, '', null, ''], pieces, { semiring: ring }).size;
      }, 200);
      return { ms, terms };
    }
    case 'naive-product': {
      const n = c.lambda.length;
      const start = performance.now();
      let terms = 0;
      for (const nu of c.nus) if (naiveCount([n, 0, n, 0, n, 0], [c.lambda, '', c.mu, '', [...nu].reverse().join(''), ''], naivePieces).fillings > 0n) terms++;
      return { ms: performance.now() - start, terms };
    }
  }
}

const result = run(JSON.parse(process.argv[2]!) as BenchCase);
process.stdout.write(JSON.stringify({ ...result, maxRssMB: Math.round(process.resourceUsage().maxRSS / 1024) }));
