import { edgeKey, triangleEdges, type Edge, type Puzzle } from '../engine/index.js';

// Vertex (x, y) is drawn at column 6x + 3y on line 2(N − y); slanted edges sit on the odd lines between.
function edgeSpot(e: Edge, n: number): { line: number; mid: number } {
  const base = 6 * e.x + 3 * e.y;
  if (e.dir === 'h') return { line: 2 * (n - e.y), mid: base + 3 };
  return { line: 2 * (n - e.y) - 1, mid: base + (e.dir === 'r' ? 1.5 : 4.5) };
}

/** A puzzle as a text picture: every edge label at its place, then the pieces whose weight is not 1. */
export function drawPuzzleText(puzzle: Puzzle): string {
  const n = puzzle.region.size;
  const grid: string[][] = Array.from({ length: 2 * n + 1 }, () => []);
  const put = (line: number, col: number, text: string) => {
    const row = grid[line]!;
    for (let k = 0; k < text.length; k++) row[col + k] = text[k]!;
  };
  const done = new Set<string>();
  for (const placed of puzzle.pieces) {
    triangleEdges(placed.triangle).forEach((e, slot) => {
      const key = edgeKey(e);
      if (done.has(key)) return;
      done.add(key);
      const label = placed.piece.labels[slot]!;
      const { line, mid } = edgeSpot(e, n);
      put(line, Math.floor(mid - label.length / 2 + 0.5), label);
      if (e.dir === 'h') {
        put(line, 6 * e.x + 3 * e.y, '·');
        put(line, 6 * (e.x + 1) + 3 * e.y, '·');
      }
    });
  }
  const lines = grid.map((row) => Array.from({ length: row.length }, (_, k) => row[k] ?? ' ').join('').trimEnd());
  while (lines.length && lines[0] === '') lines.shift();
  while (lines.length && lines[lines.length - 1] === '') lines.pop();
  const marks = puzzle.pieces
    .filter((p) => p.weight !== '1')
    .map((p) => `  ${p.triangle.orientation === 'up' ? 'Up' : 'Down'}(${p.triangle.x},${p.triangle.y}) ${p.piece.kind}: ${p.weight}`);
  return [...lines, ...(marks.length ? ['weights:', ...marks] : [])].join('\n');
}
