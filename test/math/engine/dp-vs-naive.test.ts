import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  fillingCountSemiring,
  makeRegion,
  polynomialSemiring,
  polyTerms,
  theoryPieceSet,
  fractionDenominator,
  fractionSemiring,
  pointFraction,
  pointSemiring,
  substitutePoly,
  valueRing,
  type Polynomial,
} from '../../../src/engine/index.js';
import { rationalEquals } from '../../../src/reference/naive-formula.js';
import { RefPolynomial } from '../../../src/reference/ref-polynomial.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { naiveCountAtPoints } from '../../../src/reference/naive-count-at-point.js';
import { toTerms } from '../../../src/reference/ref-polynomial.js';
import { resolveTheory } from '../../../src/claims/resolve-theory.js';
import { CodedError } from '../../../src/errors/index.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';

const canonical = (terms: readonly { coefficient: bigint; exponents: readonly number[] }[]) =>
  terms.map((t) => `${t.coefficient}*${t.exponents.join(',')}`).sort().join(' + ');

// The transfer-matrix sweep against plain backtracking over unit triangles (src/reference), on every
// 0/1 labeling of every region whose completed triangle has side ≤ maxN [common practice, no source:
// two algorithms for one finite sum].
function compare(theory: string, maxN: number): number {
  const pieces = theory.endsWith('.json') ? resolveTheory(theory) : theoryPieceSet(theory);
  const naivePieces = pieces.pieces.map((p) => ({ orientation: p.orientation, labels: [...p.labels] as [string, string, string], weight: p.weight }));
  let checked = 0;
  for (const lengths of regionShapes(maxN)) {
    const region = makeRegion(lengths);
    const ring = polynomialSemiring(region.size);
    for (const sides of labelings(lengths)) {
      const naive = naiveCount(lengths, sides, naivePieces);
      expect(BigInt(countBoundary(region, sides, pieces, { semiring: fillingCountSemiring }))).toBe(naive.fillings);
      // Small values sweep as Maps; workFormTerms 0 sweeps them packed from the first step (typed arrays).
      for (const workFormTerms of [undefined, 0]) {
        const dp = countBoundary(region, sides, pieces, { semiring: ring, ...(workFormTerms === undefined ? {} : { workFormTerms }) });
        expect(canonical(polyTerms(dp, region.size + naive.variableNames.length)), `${lengths} ${sides} ${workFormTerms}`).toBe(
          canonical(toTerms(naive.value, region.size + naive.variableNames.length)),
        );
      }
      checked++;
    }
  }
  return checked;
}

// Formula weights with quotients: the engine's exact fractions against the naive counter's own reading of
// the formula text, compared by cross-multiplication [common practice, no source].
function compareFractions(file: string, maxN: number): number {
  const pieces = resolveTheory(file);
  const { letter } = valueRing(pieces);
  const naivePieces = pieces.pieces.map((p) => ({
    orientation: p.orientation,
    labels: [...p.labels] as [string, string, string],
    weight: p.weight.type === 'formula' ? { type: 'formula' as const, text: p.weight.text } : p.weight,
  }));
  let checked = 0;
  for (const lengths of regionShapes(maxN)) {
    const region = makeRegion(lengths);
    for (const sides of labelings(lengths)) {
      const ring = fractionSemiring(region.size, letter);
      const dp = countBoundary(region, sides, pieces, { semiring: ring });
      const naive = naiveCount(lengths, sides, naivePieces);
      // Named parameters: the engine numbers them in the order met, the naive counter by name.
      const rename = (k: number) => (k < region.size ? k : region.size + naive.variableNames.indexOf(ring.variableNames[k - region.size]!));
      const asRef = (p: Polynomial) => RefPolynomial.fromTerms(polyTerms(substitutePoly(p, rename), 0).map((t) => ({ coefficient: t.coefficient, exponents: t.exponents })));
      const engine = { num: asRef(dp.num), den: asRef(fractionDenominator(dp)) };
      expect(rationalEquals(engine, naive.quotient), `${lengths} ${sides}`).toBe(true);
      checked++;
    }
  }
  return checked;
}

// The same comparison at integer points, for piece sets whose naive quotient sums grow too large to compare
// exactly (ssm at N = 4: the naive sum adds fractions without a common denominator). The engine sweeps in
// its point semiring (exact rationals at the point), the naive counter sums reduced bigint rationals weight
// by weight (src/reference/naive-count-at-point.ts); the coordinates y_1..y_N are drawn uniformly from
// S = [−10^6, 10^6]. Soundness [Schwartz–Zippel lemma]: a nonzero polynomial of degree d vanishes at a
// uniform point of S^N with probability ≤ d/|S|. Each side is a ℤ-combination of products of at most
// N(N−1)/2 = 6 piece weights (one per down triangle, the ssm weights sit on lower halves), each weight an
// integer or a quotient of polynomials of degree ≤ 1, so each side is X/D with deg X, deg D ≤ 6; if the
// sides differ as rational functions, P = X·D' − X'·D ≠ 0 has degree ≤ 12. Two independent points both
// miss P with probability ≤ (12/2,000,001)² < 4·10^−11 per boundary, < 10^−6 over the 28,224 boundaries.
// Point pairs where a denominator vanishes (probability ≤ 2·12/|S|) are redrawn.
const SPREAD = 1_000_000n;
function lcg(seed: bigint): () => bigint {
  let state = seed;
  return () => {
    state = (state * 6364136223846793005n + 1442695040888963407n) & ((1n << 64n) - 1n);
    return ((state >> 16n) % (2n * SPREAD + 1n)) - SPREAD;
  };
}

function compareAtPoints(theory: string, maxN: number): number {
  const pieces = theoryPieceSet(theory);
  const naivePieces = pieces.pieces.map((p) => ({
    orientation: p.orientation,
    labels: [...p.labels] as [string, string, string],
    weight: p.weight.type === 'formula' ? { type: 'formula' as const, text: p.weight.text } : p.weight,
  }));
  const random = lcg(20261202n);
  let checked = 0;
  for (const lengths of regionShapes(maxN)) {
    const region = makeRegion(lengths);
    for (const sides of labelings(lengths)) {
      for (let draws = 0; ; draws++) {
        expect(draws, 'points drawn').toBeLessThan(10);
        const points = [0, 1].map(() => Array.from({ length: region.size }, () => random()));
        let engine: { num: bigint; den: bigint }[];
        let naive: { num: bigint; den: bigint }[];
        try {
          engine = points.map((y) => pointFraction(countBoundary(region, sides, pieces, { semiring: pointSemiring(y) })));
          naive = naiveCountAtPoints(lengths, sides, naivePieces, points.map((y) => ({ y: (t: number) => y[t - 1]!, parameter: () => 0n }))).values;
        } catch (e) {
          if (e instanceof CodedError && e.code === 'division_by_zero') continue; // a weight's denominator vanishes here
          throw e;
        }
        expect(engine, `${lengths} ${sides} at y = ${points.map((y) => y.join(',')).join(' and ')}`).toEqual(naive);
        break;
      }
      checked++;
    }
  }
  return checked;
}

describe('DP = naive backtracking on every boundary with N ≤ 4', () => {
  it.each(['conjectures/pieces/quotient-weights-demo.json', 'conjectures/pieces/equivariant-k-theory-rhombi.json'])('formula weights: %s', (file) => {
    expect(compareFractions(file, 4)).toBe(28224);
  });
  it('the built-in ssm pieces (quotient weights on composite rhombi), N ≤ 3', () => {
    expect(compareFractions('ssm', 3)).toBe(2816);
  });
  it('the built-in ssm pieces at two random points per boundary, N ≤ 4', () => {
    expect(compareAtPoints('ssm', 4)).toBe(28224);
  });
  it('formula weights with negative powers of t, N ≤ 3', () => {
    expect(compareFractions('conjectures/pieces/laurent-weights-demo.json', 3)).toBe(2816);
  });
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant'])('%s', (theory) => {
    expect(compare(theory, 4)).toBe(28224);
  });
  it('a custom piece set with a named variable', () => {
    expect(compare('conjectures/pieces/two-step-demo.json', 3)).toBe(2816);
  });
});
