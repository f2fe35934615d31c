import type { Region } from './region.js';

/**
 * Triangular-lattice geometry in completed-triangle coordinates: vertex (x, y) sits at
 * x·(1,0) + y·(1/2, √3/2). Three edge directions:
 *   'h' (x,y)–(x+1,y)   horizontal
 *   'r' (x,y)–(x,y+1)   up-right (parallel to side 1)
 *   'l' (x+1,y)–(x,y+1) up-left  (parallel to side 6)
 */
export type EdgeDirection = 'h' | 'r' | 'l';

export interface Edge {
  readonly dir: EdgeDirection;
  readonly x: number;
  readonly y: number;
}

export type Orientation = 'up' | 'down';

/** Up(x,y) has vertices (x,y),(x+1,y),(x,y+1); Down(x,y) has (x+1,y),(x,y+1),(x+1,y+1). */
export interface UnitTriangle {
  readonly orientation: Orientation;
  readonly x: number;
  readonly y: number;
}

export function edgeKey(e: Edge): string {
  return `${e.dir}${e.x},${e.y}`;
}

/** Edges of a unit triangle in clockwise order: up = (left, right, bottom), down = (top, right, left). */
export function triangleEdges(t: UnitTriangle): [Edge, Edge, Edge] {
  const { x, y } = t;
  return t.orientation === 'up'
    ? [{ dir: 'r', x, y }, { dir: 'l', x, y }, { dir: 'h', x, y }]
    : [{ dir: 'h', x, y: y + 1 }, { dir: 'r', x: x + 1, y }, { dir: 'l', x, y }];
}

/** Unit triangles of row y (between heights y and y+1), left to right. */
export function rowTriangles(region: Region, y: number): UnitTriangle[] {
  const n = region.size;
  const [, , , s4, , s6] = region.lengths;
  const upFrom = Math.max(0, s6 - y);
  const upTo = Math.min(n - 1 - y, n - s4 - 1);
  const downFrom = Math.max(0, s6 - y - 1);
  const downTo = Math.min(n - 2 - y, n - s4 - 1);
  const row: UnitTriangle[] = [];
  const from = Math.min(upFrom, downFrom);
  const to = Math.max(upTo, downTo);
  for (let x = from; x <= to; x++) {
    if (x >= upFrom && x <= upTo) row.push({ orientation: 'up', x, y });
    if (x >= downFrom && x <= downTo) row.push({ orientation: 'down', x, y });
  }
  return row;
}

/** Number of rows: the region spans heights 0 .. size − s2. */
export function rowCount(region: Region): number {
  return region.size - region.lengths[1];
}

/** All unit triangles of the region, row by row from the bottom. */
export function regionTriangles(region: Region): UnitTriangle[] {
  const all: UnitTriangle[] = [];
  for (let y = 0; y < rowCount(region); y++) all.push(...rowTriangles(region, y));
  return all;
}

/** The boundary edges of each side, in clockwise reading order (the order of the side's string). */
export function sideEdges(region: Region): Edge[][] {
  const [s1, s2, s3, s4, s5, s6] = region.lengths;
  const n = region.size;
  const range = (len: number) => Array.from({ length: len }, (_, k) => k);
  return [
    range(s1).map((k): Edge => ({ dir: 'r', x: 0, y: s6 + k })),
    range(s2).map((k): Edge => ({ dir: 'h', x: k, y: n - s2 })),
    range(s3).map((k): Edge => ({ dir: 'l', x: s2 + k, y: n - s2 - k - 1 })),
    range(s4).map((k): Edge => ({ dir: 'r', x: n - s4, y: s4 - k - 1 })),
    range(s5).map((k): Edge => ({ dir: 'h', x: n - s4 - k - 1, y: 0 })),
    range(s6).map((k): Edge => ({ dir: 'l', x: s6 - k - 1, y: k })),
  ];
}
