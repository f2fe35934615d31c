import { describe, expect, it } from 'vitest';
import { countBoundary, enumeratePuzzles, fillingCountSemiring, integerSemiring, makeRegion, theoryPieceSet } from '../../../src/engine/index.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';
import { checkPuzzle } from '../../helpers/check-puzzle.js';

describe('enumeratePuzzles on every labeling with N ≤ 3', () => {
  it.each(['cohomology', 'k-theory', 'dual-k-theory', 'equivariant'])('yields exactly the counted, valid fillings in %s (every labeling, N ≤ 3)', (theory) => {
    const pieces = theoryPieceSet(theory);
    let seen = 0;
    for (const lengths of regionShapes(3)) {
      const region = makeRegion(lengths);
      const n = region.size;
      const triangles = n * n - lengths[1]! ** 2 - lengths[3]! ** 2 - lengths[5]! ** 2;
      for (const sides of labelings(lengths)) {
        const puzzles = [...enumeratePuzzles(region, sides, pieces)];
        expect(BigInt(puzzles.length)).toBe(BigInt(countBoundary(region, sides, pieces, { semiring: fillingCountSemiring })));
        for (const p of puzzles) checkPuzzle(p, triangles);
        if (theory !== 'equivariant') {
          // the value is the sum over puzzles of the product of integer weights
          const value = puzzles.reduce((s, p) => s + p.pieces.reduce((w, q) => w * BigInt(q.weight), 1n), 0n);
          expect(value).toBe(BigInt(countBoundary(region, sides, pieces, { semiring: integerSemiring })));
        }
        seen += puzzles.length;
      }
    }
    expect(seen).toBeGreaterThan(0);
  });
});
