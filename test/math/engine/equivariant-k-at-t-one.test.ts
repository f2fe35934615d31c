import { describe, expect, it } from 'vitest';
import { countBoundary, fractionDenominator, fractionSemiring, makeRegion, theoryPieceSet } from '../../../src/engine/index.js';
import { resolveTheory } from '../../../src/claims/resolve-theory.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { toTerms } from '../../../src/reference/ref-polynomial.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';

// A value at t_1 = … = t_N = 1: its numerator's coefficients summed over the denominator's.
const atOne = (p: ReadonlyMap<string, bigint>) => [...p.values()].reduce((a, c) => a + c, 0n);

describe('equivariant K-theory puzzles at t = 1 are K-theory puzzles, on regions as well as triangles', () => {
  it('every boundary of every region with s2 = 0 and N ≤ 4: the rhombus file at t = 1 = naive backtracking with the k-theory pieces [K_T → K at t = 1, common practice]', () => {
    const eqk = resolveTheory('conjectures/pieces/equivariant-k-theory-rhombi.json');
    const k = theoryPieceSet('k-theory').pieces.map((p) => ({ orientation: p.orientation, labels: [...p.labels] as [string, string, string], weight: p.weight }));
    let checked = 0;
    let nonzero = 0;
    let regions = 0;
    for (const lengths of regionShapes(4)) {
      // Only down triangles under an up triangle carry a piece, so a horizontal top side (s2 > 0) has none.
      if (lengths[1] !== 0) continue;
      regions++;
      const region = makeRegion(lengths);
      for (const sides of labelings(lengths)) {
        const v = countBoundary(region, sides, eqk, { semiring: fractionSemiring(region.size, 't') });
        const value = atOne(v.num) / atOne(fractionDenominator(v));
        const reference = toTerms(naiveCount(lengths, sides, k).value, region.size).reduce((a, t) => a + t.coefficient, 0n);
        expect(value, `${lengths} ${sides}`).toBe(reference);
        if (reference !== 0n) nonzero++;
        checked++;
      }
    }
    expect(regions).toBeGreaterThan(3);
    expect(nonzero).toBeGreaterThan(20);
    expect(checked).toBeGreaterThan(200);
  });
});
