import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  fillingCountSemiring,
  makeRegion,
  polynomialSemiring,
  polyTerms,
  theoryPieceSet,
} from '../../../src/engine/index.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { toTerms } from '../../../src/reference/ref-polynomial.js';
import { resolveTheory } from '../../../src/claims/resolve-theory.js';
import { labelings, regionShapes } from '../../support/boundaries.js';

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
      const dp = countBoundary(region, sides, pieces, { semiring: ring });
      expect(canonical(polyTerms(dp, region.size + naive.variableNames.length)), `${lengths} ${sides}`).toBe(
        canonical(toTerms(naive.value, region.size + naive.variableNames.length)),
      );
      checked++;
    }
  }
  return checked;
}

describe('DP = naive backtracking on every boundary with N ≤ 4', () => {
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory'])('%s', (theory) => {
    expect(compare(theory, 4)).toBe(28224);
  });
  it('a custom piece set with a named variable', () => {
    expect(compare('conjectures/pieces/two-step-demo.json', 3)).toBe(2816);
  });
});
