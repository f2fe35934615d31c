import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  fillingCountSemiring,
  generatingSemiring,
  integerSemiring,
  makeRegion,
  modularSemiring,
  polynomialSemiring,
  polyTerms,
  statisticWeigher,
  theoryPieceSet,
  type PieceSet,
  type SweepStrategy,
} from '../../../src/engine/index.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { toTerms } from '../../../src/reference/ref-polynomial.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';

const STRATEGIES: readonly SweepStrategy[] = ['forward', 'backward', 'meet'];

const canonical = (terms: readonly { coefficient: bigint; exponents: readonly number[] }[]) =>
  terms.map((t) => `${t.coefficient}*${t.exponents.join(',')}`).sort().join(' + ');

const integerWeights = (pieces: PieceSet) => pieces.pieces.every((p) => p.weight.type === 'integer');

// The naive polynomial evaluated at the modular semiring's point. Every position weight is a difference
// y_j − y_i, so the value is unchanged by shifting all y's by −y_1: y_k ↦ position(1, k) = y_k − y_1.
function evaluateModular(terms: readonly { coefficient: bigint; exponents: readonly number[] }[], size: number, primes: readonly number[], ring: ReturnType<typeof modularSemiring>): number[] {
  const y = Array.from({ length: size }, (_, k) => (k === 0 ? primes.map(() => 0) : ring.position(1, k + 1)));
  return primes.map((p, l) => {
    let total = 0n;
    for (const t of terms) {
      let m = ((t.coefficient % BigInt(p)) + BigInt(p)) % BigInt(p);
      t.exponents.forEach((e, k) => {
        for (let r = 0; r < e; r++) m = (m * BigInt(y[k]![l]!)) % BigInt(p);
      });
      total = (total + m) % BigInt(p);
    }
    return Number(total);
  });
}

// Every strategy of the kernel (the unpruned forward sweep, the pruned backward sweep and the pruned
// meet-in-the-middle) against plain backtracking over unit triangles (src/reference), on every 0/1
// labeling of every region with N ≤ 4, in every semiring the engine offers [common practice, no
// source: two algorithms for one finite sum].
describe('every sweep strategy = naive backtracking on every boundary with N ≤ 4', () => {
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant'])('%s', (theory) => {
    const pieces = theoryPieceSet(theory);
    const naivePieces = pieces.pieces.map((p) => ({ orientation: p.orientation, labels: [...p.labels] as [string, string, string], weight: p.weight }));
    const modular = modularSemiring(7);
    const stat = statisticWeigher(new Set([pieces.pieces.find((p) => p.weight.type !== 'integer' || p.weight.value !== 1)?.kind ?? '10-triangle']));
    let checked = 0;
    const failures: string[] = [];
    for (const lengths of regionShapes(4)) {
      const region = makeRegion(lengths);
      const ring = polynomialSemiring(region.size);
      for (const sides of labelings(lengths)) {
        const naive = naiveCount(lengths, sides, naivePieces);
        const terms = toTerms(naive.value, region.size);
        const wantPoly = canonical(terms);
        const wantMod = evaluateModular(terms, region.size, modular.primes, modular);
        for (const strategy of STRATEGIES) {
          const wrong = (what: string) => failures.length < 5 && failures.push(`${what}: ${lengths} ${sides} ${strategy}`);
          if (BigInt(countBoundary(region, sides, pieces, { semiring: fillingCountSemiring, strategy })) !== naive.fillings) wrong('fillings');
          if (integerWeights(pieces)) {
            const v = countBoundary(region, sides, pieces, { semiring: integerSemiring, strategy });
            const want = terms.reduce((acc, t) => acc + t.coefficient, 0n);
            if (BigInt(v) !== want) wrong('integer');
          }
          if (canonical(polyTerms(countBoundary(region, sides, pieces, { semiring: ring, strategy }), region.size)) !== wantPoly) wrong('polynomial');
          const m = countBoundary(region, sides, pieces, { semiring: modular, strategy });
          if (m.some((r, l) => r !== wantMod[l])) wrong('modular');
          // The statistic's generating polynomial counts every filling once: its coefficients sum to the fillings.
          const g = countBoundary(region, sides, pieces, { semiring: generatingSemiring, weigher: stat, strategy });
          if (g.reduce((acc: bigint, c) => acc + BigInt(c), 0n) !== naive.fillings) wrong('statistic');
        }
        checked++;
      }
    }
    expect(failures).toEqual([]);
    expect(checked).toBe(28224);
  });
});
