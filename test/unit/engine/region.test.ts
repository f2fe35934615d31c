import { describe, expect, it } from 'vitest';
import { makeRegion, regionTriangles, sideEdges, triangleEdges, edgeKey, unitTriangleCount } from '../../../src/engine/index.js';
import { CodedError } from '../../../src/errors/index.js';

function shapes(max: number): number[][] {
  const out: number[][] = [];
  for (let s1 = 0; s1 <= max; s1++)
    for (let s2 = 0; s2 <= max; s2++)
      for (let s3 = 0; s3 <= max; s3++)
        for (let s4 = 0; s4 <= max; s4++) {
          // s5 and s6 follow from the closing conditions
          const s5 = s1 + s2 - s4;
          const s6 = s2 + s3 - s5;
          const n = s6 + s1 + s2;
          if (s5 >= 0 && s6 >= 0 && n * n > s2 * s2 + s4 * s4 + s6 * s6) out.push([s1, s2, s3, s4, s5, s6]);
        }
  return out;
}

describe('makeRegion', () => {
  it('accepts closing hexagons and rejects the others with a coded error', () => {
    expect(makeRegion([2, 0, 2, 0, 2, 0]).size).toBe(2);
    expect(makeRegion([0, 2, 0, 2, 0, 2]).size).toBe(4);
    expect(makeRegion([1, 2, 3, 1, 2, 3]).size).toBe(3 + 1 + 2);
    const err = (() => {
      try {
        makeRegion([2, 1, 2, 1, 1, 0]);
      } catch (e) {
        return e as CodedError;
      }
      return undefined;
    })();
    expect(err?.code).toBe('invalid_region');
    expect(err?.message).toMatch(/^Side lengths do not close: expected .*, received 2,1,2,1,1,0/);
    expect(() => makeRegion([1, 1, 1])).toThrow(/expected 6 numbers, received 3/);
    expect(() => makeRegion([-1, 0, 0, -1, 0, 0])).toThrow(/nonnegative integer/);
    // A closing but flat hexagon has no unit triangle to fill [common practice, no source].
    expect(() => makeRegion([0, 2, 0, 0, 2, 0])).toThrow(/at least one unit triangle/);
  });
});

describe('lattice geometry', () => {
  // A lattice hexagon with sides s1..s6 is a triangle of side N minus three corner triangles, so it has
  // N² − s2² − s4² − s6² unit triangles [common practice, no source].
  it.each(shapes(3).map((s) => [s.join(',')]))('region %s has the expected area and a closed boundary', (key) => {
    const lengths = key.split(',').map(Number);
    const region = makeRegion(lengths);
    const triangles = regionTriangles(region);
    const n = region.size;
    expect(triangles.length).toBe(n * n - lengths[1]! ** 2 - lengths[3]! ** 2 - lengths[5]! ** 2);
    expect(unitTriangleCount(region)).toBe(triangles.length);
    // Every edge of a tiling lies in one triangle (boundary) or two (interior) [common practice, no source].
    const uses = new Map<string, number>();
    for (const t of triangles) for (const e of triangleEdges(t)) uses.set(edgeKey(e), (uses.get(edgeKey(e)) ?? 0) + 1);
    const boundary = sideEdges(region).flat().map(edgeKey);
    expect(new Set(boundary).size).toBe(boundary.length);
    expect(boundary.length).toBe(lengths.reduce((a, b) => a + b, 0));
    for (const [e, count] of uses) expect(count, e).toBe(boundary.includes(e) ? 1 : 2);
  });

  it('reads each side in clockwise order: consecutive sides meet at a corner', () => {
    const region = makeRegion([2, 1, 3, 2, 1, 3]);
    const sides = sideEdges(region);
    const ends = (e: { dir: string; x: number; y: number }): [number, number][] =>
      e.dir === 'h' ? [[e.x, e.y], [e.x + 1, e.y]] : e.dir === 'r' ? [[e.x, e.y], [e.x, e.y + 1]] : [[e.x + 1, e.y], [e.x, e.y + 1]];
    for (let i = 0; i < 6; i++) {
      const last = sides[i]![sides[i]!.length - 1]!;
      const first = sides[(i + 1) % 6]![0]!;
      const shared = ends(last).some(([x, y]) => ends(first).some(([u, v]) => u === x && v === y));
      expect(shared, `side ${i + 1} meets side ${((i + 1) % 6) + 1}`).toBe(true);
    }
  });
});
