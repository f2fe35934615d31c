import { describe, expect, it } from 'vitest';
import {
  completeToTriangle,
  countBoundary,
  integerSemiring,
  makeRegion,
  polynomialSemiring,
  theoryPieceSet,
} from '../../../src/engine/index.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';

// Compares a region's own value with its completed triangle's on every 0/1 labeling of every region
// whose completed triangle has side ≤ 4 (68 shapes, 28,224 labelings).
function measure(theory: string): { labelings: number; agree: number } {
  const pieces = theoryPieceSet(theory);
  let total = 0;
  let agree = 0;
  for (const lengths of regionShapes(4)) {
    const region = makeRegion(lengths);
    const ring = theory === 'equivariant' ? polynomialSemiring(region.size) : integerSemiring;
    for (const sides of labelings(lengths)) {
      total++;
      const own = countBoundary(region, sides, pieces, { semiring: ring as never });
      const c = completeToTriangle(region, sides, pieces);
      const completed = countBoundary(c.region, c.sides, pieces, { semiring: ring as never });
      if ((ring as { equals(a: unknown, b: unknown): boolean }).equals(own, completed)) agree++;
    }
  }
  return { labelings: total, agree };
}

describe('completion to a triangle', () => {
  // Each glued corner is the unique puzzle of c_{id,σ}^σ, so completion preserves the value in
  // cohomology and K-theory [common practice, no source].
  it.each(['cohomology', 'k-theory'])('preserves %s values on every labeling up to size 4', (theory) => {
    const m = measure(theory);
    expect(m.labelings).toBe(28224);
    expect(m.agree).toBe(m.labelings);
  });

  // Regression pins, measured by us (no outside source): the downward K-piece and the equivariant
  // rhombus can straddle a glued corner, so the completed triangle gains fillings.
  it('fails for dual K-theory on 112 of 28,224 labelings (measured, regression pin)', () => {
    expect(measure('dual-k-theory')).toEqual({ labelings: 28224, agree: 28224 - 112 });
  });
  it('fails for equivariant cohomology on 179 of 28,224 labelings (measured, regression pin)', () => {
    expect(measure('equivariant')).toEqual({ labelings: 28224, agree: 28224 - 179 });
  });
});
