import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  enumeratePuzzles,
  fillingCountSemiring,
  integerSemiring,
  makeRegion,
  theoryPieceSet,
  type Puzzle,
} from '../../../src/engine/index.js';
import { labelings, regionShapes } from '../../helpers/boundaries.js';
import { expectDeterministicEnumeration } from '../../helpers/contracts.js';
import { checkPuzzle } from '../../helpers/check-puzzle.js';

describe('enumeratePuzzles', () => {
  // Every labeling with N ≤ 2 here; test/math/engine/puzzle-enumeration.test.ts goes to N ≤ 3.
  it.each(['cohomology', 'k-theory', 'dual-k-theory', 'equivariant'])('yields exactly the counted, valid fillings in %s (every labeling, N ≤ 2)', (theory) => {
    const pieces = theoryPieceSet(theory);
    let seen = 0;
    for (const lengths of regionShapes(2)) {
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

  it('enumerates deterministically, each filling once, on every labeling of the triangle of side 3 (cohomology, equivariant)', () => {
    const key = (p: Puzzle) => p.pieces.map((q) => `${q.triangle.orientation}${q.triangle.x},${q.triangle.y}:${q.piece.labels.join('/')}`).join(' ');
    let fillings = 0;
    for (const theory of ['cohomology', 'equivariant']) {
      const pieces = theoryPieceSet(theory);
      const region = makeRegion([3, 0, 3, 0, 3, 0]);
      for (const sides of labelings(region.lengths)) fillings += expectDeterministicEnumeration(() => enumeratePuzzles(region, sides, pieces), key).length;
    }
    expect(fillings).toBeGreaterThan(0);
  });

  it('is lazy: taking one puzzle of a boundary with many does not build the rest', () => {
    const region = makeRegion([4, 2, 4, 4, 2, 4]);
    const sides = ['0101', '01', '0110', '1010', '10', '0011'];
    const first = enumeratePuzzles(region, sides, theoryPieceSet('cohomology')).next();
    expect(first.done === true || first.value.pieces.length > 0).toBe(true);
  });
});
