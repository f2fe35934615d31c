import type { Puzzle } from '../engine/index.js';
import { puzzleScene, type Point, type PuzzleScene } from './puzzle-scene.js';
import { INK, kindStyle } from './puzzle-style.js';
import { escapeXml, valueSvg } from './value-markup.js';
import { puzzleWeightText } from './puzzle-weight.js';

/** Layout of a sheet of puzzles. */
export interface SvgOptions {
  /** Pixels per unit edge (default 52). */
  readonly unit?: number;
  /** Width the rows wrap at, in pixels (default 1080; wider when that keeps the sheet square); ignored when `columns` is given. */
  readonly maxWidth?: number;
  readonly columns?: number;
  /** Line written above the puzzles (e.g. the boundary). */
  readonly title?: string;
  /** Prefix the XML declaration, for a file of its own (default true). */
  readonly standalone?: boolean;
}

const FONT = "'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif";
const MATH_FONT = "'DejaVu Serif', Georgia, 'Times New Roman', serif";
const MARGIN = 0.62; // room for the boundary labels, in unit edges
const CAPTION = 22; // pixels under each puzzle

const f = (v: number) => (Math.round(v * 10) / 10).toString();

interface Cell {
  readonly width: number;
  readonly height: number;
  readonly place: (p: Point) => Point;
}

function cellOf(scene: PuzzleScene, unit: number): Cell {
  const b = scene.bounds;
  return {
    width: (b.maxX - b.minX + 2 * MARGIN) * unit,
    height: (b.maxY - b.minY + 2 * MARGIN) * unit + CAPTION,
    place: (p) => ({ x: (p.x - b.minX + MARGIN) * unit, y: (b.maxY - p.y + MARGIN) * unit }),
  };
}

const pts = (ps: readonly Point[]) => ps.map((p) => `${f(p.x)},${f(p.y)}`).join(' ');

function piecesSvg(scene: PuzzleScene, cell: Cell): string[] {
  return scene.triangles.map((t) => {
    const s = kindStyle(t.kind);
    const { orientation, x, y } = t.triangle;
    // A hairline in the fill colour closes the anti-aliasing seam between neighbours of one colour.
    return `<polygon data-piece="${escapeXml(t.kind)}" data-triangle="${orientation} ${x} ${y}" points="${pts(t.corners.map(cell.place))}" fill="${s.fill}" stroke="${s.fill}" stroke-width="0.6"/>`;
  });
}

function edgesSvg(scene: PuzzleScene, cell: Cell, unit: number): string[] {
  const out: string[] = [];
  const size = unit * 0.23;
  for (const e of scene.edges) {
    const [a, b] = [cell.place(e.from), cell.place(e.to)];
    if (!e.side) out.push(`<line x1="${f(a.x)}" y1="${f(a.y)}" x2="${f(b.x)}" y2="${f(b.y)}" stroke="${INK.edge}" stroke-width="0.9" stroke-opacity="0.55"/>`);
  }
  for (const e of scene.edges) {
    const at = e.side ? cell.place({ x: e.mid.x + e.side.outward.x * 0.3, y: e.mid.y + e.side.outward.y * 0.3 }) : cell.place(e.mid);
    const cls = e.side ? `class="pz-side" data-side="${e.side.index + 1}" font-weight="700" fill="${INK.boundary}"` : `class="pz-edge" fill="${INK.label}" stroke="${INK.paper}" stroke-width="2.6" paint-order="stroke" stroke-linejoin="round"`;
    out.push(`<text ${cls} x="${f(at.x)}" y="${f(at.y)}" font-size="${f(e.side ? size * 1.12 : size)}">${escapeXml(e.label)}</text>`);
  }
  return out;
}

function marksSvg(scene: PuzzleScene, cell: Cell, unit: number): string[] {
  return scene.marks.map((m) => {
    const at = cell.place(m.at);
    const s = kindStyle(m.kind);
    if (m.text === '-1' && !m.rhombus) {
      // A K-piece's sign: a paper disc with a bold minus, legible between three `10` labels.
      return `<circle class="pz-sign" cx="${f(at.x)}" cy="${f(at.y)}" r="${f(unit * 0.11)}" fill="${INK.paper}"/><rect x="${f(at.x - unit * 0.065)}" y="${f(at.y - unit * 0.016)}" width="${f(unit * 0.13)}" height="${f(unit * 0.032)}" fill="${s.fill}"/>`;
    }
    const size = unit * 0.2;
    const text = `<text class="pz-weight" x="${f(at.x)}" y="${f(at.y)}" font-family="${MATH_FONT}" font-size="${f(size)}" font-style="italic" fill="${s.ink}">${valueSvg(m.text, size)}</text>`;
    if (m.ring) return `<polygon class="pz-rhombus" points="${pts(m.ring.map(cell.place))}" fill="none" stroke="${s.ink}" stroke-opacity="0.7" stroke-width="1" stroke-dasharray="3 2"/>${text}`;
    return text;
  });
}

/** One puzzle as an SVG group of `cell` size, tagged `data-puzzle`; its pieces are tagged `data-piece`. */
export function puzzleGroupSvg(puzzle: Puzzle, number: number, unit: number): { svg: string; width: number; height: number } {
  const scene = puzzleScene(puzzle);
  const cell = cellOf(scene, unit);
  const outline = `<polygon points="${pts(scene.outline.map(cell.place))}" fill="none" stroke="${INK.outline}" stroke-width="1.8" stroke-linejoin="round"/>`;
  const weight = puzzleWeightText(puzzle);
  const caption = `<text class="pz-caption" x="${f(cell.width / 2)}" y="${f(cell.height - 6)}" font-size="12.5" fill="${INK.caption}"><tspan font-weight="700">#${number}</tspan><tspan dx="8" font-family="${MATH_FONT}" font-style="italic">${valueSvg(weight, 12.5)}</tspan></text>`;
  const body = [...piecesSvg(scene, cell), ...edgesSvg(scene, cell, unit), outline, ...marksSvg(scene, cell, unit), caption];
  return { svg: body.join(''), width: cell.width, height: cell.height };
}

const LEGEND_ORDER = ['0 triangle', '1 triangle', '10 piece', 'equivariant rhombus', 'K-piece'];

function legendSvg(puzzles: readonly Puzzle[], y: number): { svg: string; width: number } {
  const seen = new Map<string, string>();
  for (const p of puzzles) for (const placed of p.pieces) {
    const s = kindStyle(placed.piece.kind);
    if (!seen.has(s.legend)) seen.set(s.legend, s.fill);
  }
  const rank = (name: string) => (LEGEND_ORDER.includes(name) ? LEGEND_ORDER.indexOf(name) : LEGEND_ORDER.length);
  let x = 8;
  const items = [...seen].sort((a, b) => rank(a[0]) - rank(b[0]) || a[0].localeCompare(b[0])).map(([name, fill]) => {
    const item = `<rect x="${x}" y="${y - 9}" width="12" height="12" rx="2" fill="${fill}" stroke="${INK.outline}" stroke-width="0.6"/><text x="${x + 17}" y="${y - 3}" font-size="11.5" fill="${INK.caption}">${escapeXml(name)}</text>`;
    x += 30 + name.length * 6.6;
    return item;
  });
  return { svg: items.join(''), width: x };
}

/** A one-line name of a boundary: its six clockwise sides, an empty side written `–`. */
export function boundaryTitle(sides: readonly string[]): string {
  return sides.map((s) => s || '\u2013').join(' | ');
}

/** Every given puzzle side by side, wrapping into rows, with a title and a legend of the piece kinds. */
export function drawPuzzlesSvg(puzzles: readonly Puzzle[], options: SvgOptions = {}): string {
  const unit = options.unit ?? 52;
  const cells = puzzles.map((p, k) => puzzleGroupSvg(p, k + 1, unit));
  const cw = Math.max(1, ...cells.map((c) => c.width));
  const ch = Math.max(1, ...cells.map((c) => c.height));
  // Wide puzzles still go in a grid: at least as many columns as make the sheet roughly square.
  const square = Math.ceil(Math.sqrt((cells.length * ch) / cw));
  const columns = Math.max(1, options.columns ?? Math.max(Math.floor((options.maxWidth ?? 1080) / cw), square));
  const cols = Math.min(columns, Math.max(1, cells.length));
  const head = (options.title ? 26 : 0) + 22;
  const rows = Math.ceil(cells.length / cols);
  const legend = legendSvg(puzzles, head - 6);
  const width = Math.max(cols * cw, legend.width, 8 * (options.title?.length ?? 0) + 16);
  const height = head + rows * ch + 4;
  const title = options.title
    ? `<text x="8" y="18" font-size="14" font-weight="700" fill="${INK.outline}">${escapeXml(options.title)}</text>`
    : '';
  const groups = cells.map((c, k) => `<g data-puzzle="${k + 1}" transform="translate(${f((k % cols) * cw + (cw - c.width) / 2)},${f(head + Math.floor(k / cols) * ch)})">${c.svg}</g>`);
  const empty = cells.length ? '' : `<text x="8" y="${head + 16}" font-size="13" fill="${INK.caption}">no puzzles with this boundary</text>`;
  const svg = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(width)}" height="${f(height)}" viewBox="0 0 ${f(width)} ${f(height)}" font-family="${FONT}" text-anchor="middle" dominant-baseline="central" data-puzzles="${cells.length}">`,
    `<rect width="100%" height="100%" fill="${INK.paper}"/>`,
    `<g text-anchor="start" dominant-baseline="auto">${title}${legend.svg}</g>`,
    ...groups,
    empty,
    '</svg>',
  ].join('\n');
  return (options.standalone ?? true) ? `<?xml version="1.0" encoding="UTF-8"?>\n${svg}\n` : svg;
}
