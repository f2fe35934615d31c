import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  edgeKey,
  enumeratePuzzles,
  fillingCountSemiring,
  integerSemiring,
  makeRegion,
  sideEdges,
  theoryPieceSet,
  triangleEdges,
  type Puzzle,
} from '../../../src/engine/index.js';
import { labelings, regionShapes } from '../../support/boundaries.js';

// An independent validity check of one filling: every edge gets one label from all triangles that
// contain it, boundary edges carry the side strings, and every triangle of the region is covered once.
function checkPuzzle(p: Puzzle, triangles: number): void {
  const labels = new Map<string, string>();
  for (const placed of p.pieces) {
    triangleEdges(placed.triangle).forEach((e, slot) => {
      const key = edgeKey(e);
      const label = placed.piece.labels[slot]!;
      const old = labels.get(key);
      if (old !== undefined) expect(old, `edge ${key}`).toBe(label);
      labels.set(key, label);
    });
  }
  sideEdges(p.region).forEach((edges, side) => edges.forEach((e, k) => expect(labels.get(edgeKey(e))).toBe([...p.sides[side]!][k])));
  expect(new Set(p.pieces.map((q) => `${q.triangle.orientation}${q.triangle.x},${q.triangle.y}`)).size).toBe(triangles);
}

describe('enumeratePuzzles', () => {
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

  it('is lazy: taking one puzzle of a boundary with many does not build the rest', () => {
    const region = makeRegion([4, 2, 4, 4, 2, 4]);
    const sides = ['0101', '01', '0110', '1010', '10', '0011'];
    const first = enumeratePuzzles(region, sides, theoryPieceSet('cohomology')).next();
    expect(first.done === true || first.value.pieces.length > 0).toBe(true);
  });
});
