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

// The quick loop; test/math/engine/completion.test.ts checks every labeling with N ≤ 4 in every theory.
describe('completion to a triangle', () => {
  it('glues sorted corners: sides sort(σ6)+σ1+σ2, sort(σ2)+σ3+σ4, sort(σ4)+σ5+σ6', () => {
    const region = makeRegion([1, 2, 1, 0, 3, 0]);
    const c = completeToTriangle(region, ['0', '10', '0', '', '001', ''], theoryPieceSet('cohomology'));
    expect(c.region.lengths).toEqual([3, 0, 3, 0, 3, 0]);
    expect(c.sides).toEqual(['010', '', '010', '', '001', '']);
  });

  // Each glued corner is the unique puzzle of c_{id,σ}^σ, so completion preserves the value in
  // cohomology [common practice, no source].
  it('preserves cohomology values on every labeling with N ≤ 3', () => {
    const pieces = theoryPieceSet('cohomology');
    let total = 0;
    let expectedTotal = 0;
    for (const lengths of regionShapes(3)) {
      const region = makeRegion(lengths);
      // 2^(perimeter) 0/1 labelings of one shape [common practice, no source]
      expectedTotal += 2 ** lengths.reduce((a, b) => a + b, 0);
      for (const sides of labelings(lengths)) {
        total++;
        const c = completeToTriangle(region, sides, pieces);
        expect(c.region.lengths[0]).toBe(lengths[5]! + lengths[0]! + lengths[1]!);
        expect(countBoundary(c.region, c.sides, pieces, { semiring: integerSemiring })).toBe(
          countBoundary(region, sides, pieces, { semiring: integerSemiring }),
        );
      }
    }
    expect(total).toBe(expectedTotal);
  });

  it('a straddling rhombus: region 1,2,1,0,3,0 with sides 0|10|0|-|010|- has value 0, its completion y3 − y2', () => {
    // The completion is the triangle (010, 010, 010) of Gr(1,3), whose value c_{λλ}^λ = [X_λ]|_λ is the
    // product of the tangent weights at λ: y3 − y2 [localization; Knutson–Tao, Duke 2003]. The region
    // alone has no filling: its only candidate rhombus would straddle the glued top corner.
    const region = makeRegion([1, 2, 1, 0, 3, 0]);
    const sides = ['0', '10', '0', '', '010', ''];
    const pieces = theoryPieceSet('equivariant');
    const ring = polynomialSemiring(3);
    expect(ring.isZero(countBoundary(region, sides, pieces, { semiring: ring }))).toBe(true);
    const c = completeToTriangle(region, sides, pieces);
    expect(ring.toText(countBoundary(c.region, c.sides, pieces, { semiring: ring }))).toBe('y3 - y2');
  });
});
