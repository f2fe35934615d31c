import { describe, expect, it } from 'vitest';
import { BUILTIN_THEORIES, countBoundary, defaultStrategy, integerSemiring, modularSemiring, structureConstantSides, theoryPieceSet, triangleRegion, type Semiring } from '../../../src/engine/index.js';

// The per-theory default only chooses how the sweep runs; the value is the plain forward sweep's
// [definition: the strategies sum the same paths of one transfer matrix]. test/math/engine checks it on
// every boundary with N ≤ 4 against backtracking and on random ones with N ≤ 5 against forward.
describe('default sweep strategy', () => {
  it.each([...BUILTIN_THEORIES])('%s: a count without a strategy equals the forward sweep', (theory) => {
    const pieces = theoryPieceSet(theory);
    expect(['forward', 'backward', 'meet']).toContain(defaultStrategy(pieces));
    const semiring = (pieces.pieces.every((p) => p.weight.type === 'integer') ? integerSemiring : modularSemiring(2)) as Semiring<unknown>;
    // A Gr(3,7) triple; only the agreement of the two sweeps is checked here.
    const sides = structureConstantSides('0101001', '0101001', '1010010');
    const region = triangleRegion(7);
    expect(countBoundary(region, sides, pieces, { semiring })).toEqual(countBoundary(region, sides, pieces, { semiring, strategy: 'forward' }));
  });
});
