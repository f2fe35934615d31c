import { describe, expect, it } from 'vitest';
import { countBoundary, countBoundaryValues, fillingCountSemiring, generatingSemiring, integerSemiring, polyEquals, polynomialSemiring, statisticWeigher, structureConstantSides, theoryPieceSet, triangleRegion, type Polynomial } from '../../../src/engine/index.js';
import { CodedError } from '../../../src/errors/index.js';

const sides = structureConstantSides('010101', '010101', '101010');

// One sweep with several semirings must give what one sweep per semiring gives [definition].
describe('countBoundaryValues', () => {
  it('integer lanes: puzzles and K-theory value in one sweep', () => {
    const pieces = theoryPieceSet('k-theory');
    const [f, v] = countBoundaryValues(triangleRegion(6), sides, pieces, [{ semiring: fillingCountSemiring }, { semiring: integerSemiring }]);
    expect(f).toBe(countBoundary(triangleRegion(6), sides, pieces, { semiring: fillingCountSemiring }));
    expect(v).toBe(countBoundary(triangleRegion(6), sides, pieces, { semiring: integerSemiring }));
  });

  it('a tuple sweep: puzzles, equivariant polynomial and a statistic', () => {
    const pieces = theoryPieceSet('equivariant');
    const ring = polynomialSemiring(6);
    const weigher = statisticWeigher(new Set(['equivariant']));
    const [f, p, g] = countBoundaryValues(triangleRegion(6), sides, pieces, [
      { semiring: fillingCountSemiring },
      { semiring: ring as never },
      { semiring: generatingSemiring as never, weigher: weigher as never },
    ]);
    expect(f).toBe(countBoundary(triangleRegion(6), sides, pieces, { semiring: fillingCountSemiring }));
    expect(polyEquals(p as Polynomial, countBoundary(triangleRegion(6), sides, pieces, { semiring: ring }))).toBe(true);
    expect(g).toEqual(countBoundary(triangleRegion(6), sides, pieces, { semiring: generatingSemiring, weigher }));
  });

  it('stops with limit_exceeded, naming the limit, when the tables would outgrow it', () => {
    const pieces = theoryPieceSet('equivariant');
    const run = () => countBoundary(triangleRegion(6), sides, pieces, { semiring: polynomialSemiring(6), memoryLimitBytes: 1000 });
    expect(run).toThrow(CodedError);
    expect(run).toThrow(/expected the sweep's tables to stay within 1 MB/);
    try {
      run();
    } catch (e) {
      expect((e as CodedError).code).toBe('limit_exceeded');
    }
  });
});
