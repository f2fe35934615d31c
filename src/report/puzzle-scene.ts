import { edgeKey, RHOMBUS_LABEL, sideEdges, triangleEdges, type Edge, type Puzzle, type Region, type UnitTriangle } from '../engine/index.js';

/** A point in the plane, unit edge length, y pointing up. */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** One unit triangle of a puzzle as it is drawn. */
export interface SceneTriangle {
  readonly triangle: UnitTriangle;
  readonly corners: readonly [Point, Point, Point];
  readonly kind: string;
  /** Half of an equivariant rhombus: drawn without the edge between the halves. */
  readonly rhombus: boolean;
}

/** One lattice edge with its label; boundary edges carry the outward unit normal of their side. */
export interface SceneEdge {
  readonly from: Point;
  readonly to: Point;
  readonly mid: Point;
  readonly label: string;
  readonly side?: { readonly index: number; readonly outward: Point };
}

/** A weight written on a piece: `rhombus` sits on the middle of an equivariant rhombus. */
export interface SceneMark {
  readonly at: Point;
  readonly text: string;
  readonly kind: string;
  readonly rhombus: boolean;
  /** For a rhombus: its four corners pulled slightly inwards, for an inner ring that marks it as one piece. */
  readonly ring?: readonly Point[];
}

/** Everything a renderer needs: pieces, visible edges (the rhombus' inner edge left out), weights, outline. */
export interface PuzzleScene {
  readonly triangles: readonly SceneTriangle[];
  readonly edges: readonly SceneEdge[];
  readonly marks: readonly SceneMark[];
  readonly outline: readonly Point[];
  readonly bounds: { readonly minX: number; readonly maxX: number; readonly minY: number; readonly maxY: number };
}

const H = Math.sqrt(3) / 2;

/** Lattice vertex (x, y) in the plane: x·(1,0) + y·(1/2, √3/2). */
export function latticePoint(x: number, y: number): Point {
  return { x: x + y / 2, y: y * H };
}

function cornersOf(t: UnitTriangle): [Point, Point, Point] {
  const { x, y } = t;
  return t.orientation === 'up'
    ? [latticePoint(x, y), latticePoint(x + 1, y), latticePoint(x, y + 1)]
    : [latticePoint(x + 1, y), latticePoint(x, y + 1), latticePoint(x + 1, y + 1)];
}

function edgeEnds(e: Edge): [Point, Point] {
  if (e.dir === 'h') return [latticePoint(e.x, e.y), latticePoint(e.x + 1, e.y)];
  if (e.dir === 'r') return [latticePoint(e.x, e.y), latticePoint(e.x, e.y + 1)];
  return [latticePoint(e.x + 1, e.y), latticePoint(e.x, e.y + 1)];
}

// Clockwise steps of the six sides in lattice coordinates (DEVELOPERS.md, "Lattice").
const SIDE_STEPS: readonly (readonly [number, number])[] = [[0, 1], [1, 0], [1, -1], [0, -1], [-1, 0], [-1, 1]];

/** The region's outline, clockwise from the start of side 1, without repeated corners. */
export function regionOutline(region: Region): Point[] {
  let x = 0;
  let y = region.lengths[5];
  const out: Point[] = [];
  region.lengths.forEach((len, s) => {
    if (len === 0) return;
    out.push(latticePoint(x, y));
    x += SIDE_STEPS[s]![0] * len;
    y += SIDE_STEPS[s]![1] * len;
  });
  return out;
}

function outwardNormal(side: number): Point {
  const [dx, dy] = SIDE_STEPS[side]!;
  const d = latticePoint(dx, dy);
  // Walking clockwise, the outside lies to the left: rotate the step by +90°.
  return { x: -d.y, y: d.x };
}

function isRhombusKind(t: UnitTriangle, labels: readonly string[]): boolean {
  return labels.includes(RHOMBUS_LABEL) && (t.orientation === 'up' ? labels[2] : labels[0]) === RHOMBUS_LABEL;
}

function sceneEdges(puzzle: Puzzle): SceneEdge[] {
  const sideOf = new Map<string, { index: number; outward: Point }>();
  sideEdges(puzzle.region).forEach((edges, s) => edges.forEach((e) => sideOf.set(edgeKey(e), { index: s, outward: outwardNormal(s) })));
  const seen = new Set<string>();
  const edges: SceneEdge[] = [];
  for (const placed of puzzle.pieces) {
    triangleEdges(placed.triangle).forEach((e, slot) => {
      const key = edgeKey(e);
      const label = placed.piece.labels[slot]!;
      if (seen.has(key) || label === RHOMBUS_LABEL) return;
      seen.add(key);
      const [from, to] = edgeEnds(e);
      const side = sideOf.get(key);
      edges.push({ from, to, mid: { x: (from.x + to.x) / 2, y: (from.y + to.y) / 2 }, label, ...(side ? { side } : {}) });
    });
  }
  return edges;
}

// Rhombus Down(x,y) ∪ Up(x,y+1): corners (x+1,y), (x+1,y+1), (x,y+2), (x,y+1), inset by 14%.
function rhombusRing(lower: UnitTriangle): Point[] {
  const { x, y } = lower;
  const c = [latticePoint(x + 1, y), latticePoint(x + 1, y + 1), latticePoint(x, y + 2), latticePoint(x, y + 1)];
  const mid = latticePoint(x + 0.5, y + 1);
  return c.map((p) => ({ x: mid.x + (p.x - mid.x) * 0.86, y: mid.y + (p.y - mid.y) * 0.86 }));
}

function sceneMarks(puzzle: Puzzle): SceneMark[] {
  return puzzle.pieces
    .filter((p) => p.weight !== '1')
    .map((p) => {
      const rhombus = isRhombusKind(p.triangle, p.piece.labels);
      const c = cornersOf(p.triangle);
      // A rhombus' weight sits on its hidden middle edge, the top of its lower (down) half.
      const at = rhombus && p.triangle.orientation === 'down'
        ? { x: (c[1].x + c[2].x) / 2, y: c[1].y }
        : { x: (c[0].x + c[1].x + c[2].x) / 3, y: (c[0].y + c[1].y + c[2].y) / 3 };
      const ring = rhombus && p.triangle.orientation === 'down' ? rhombusRing(p.triangle) : undefined;
      return { at, text: p.weight, kind: p.piece.kind, rhombus, ...(ring ? { ring } : {}) };
    });
}

/** Lays out one puzzle in the plane; renderers only translate and scale it. */
export function puzzleScene(puzzle: Puzzle): PuzzleScene {
  const triangles = puzzle.pieces.map((p): SceneTriangle => ({
    triangle: p.triangle,
    corners: cornersOf(p.triangle),
    kind: p.piece.kind,
    rhombus: isRhombusKind(p.triangle, p.piece.labels),
  }));
  const outline = regionOutline(puzzle.region);
  const xs = outline.length ? outline.map((p) => p.x) : [0];
  const ys = outline.length ? outline.map((p) => p.y) : [0];
  return {
    triangles,
    edges: sceneEdges(puzzle),
    marks: sceneMarks(puzzle),
    outline,
    bounds: { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) },
  };
}
