import { expect } from 'vitest';
import { edgeKey, sideEdges, triangleEdges, type Puzzle } from '../../src/engine/index.js';

// An independent validity check of one filling: every edge gets one label from all triangles that
// contain it, boundary edges carry the side strings, and every triangle of the region is covered once.
/** Expects `p` to be a valid filling of its region with its boundary and `triangles` unit triangles. */
export function checkPuzzle(p: Puzzle, triangles: number): void {
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
