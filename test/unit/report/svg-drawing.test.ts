import { describe, expect, it } from 'vitest';
import { enumeratePuzzles, makeRegion, theoryPieceSet, type PieceSet, type Puzzle } from '../../../src/engine/index.js';
import { drawPuzzlesSvg } from '../../../src/report/svg-drawing.js';
import { parseXml, type XmlElement } from '../../helpers/xml-check.js';

// The first boundary (in binary order) of a region that has at least one puzzle: found by search so the
// test does not depend on one hand-picked labeling.
function firstPuzzles(lengths: number[], pieces: PieceSet, want: (ps: Puzzle[]) => boolean = (ps) => ps.length > 0): Puzzle[] {
  const region = makeRegion(lengths);
  const perimeter = lengths.reduce((a, b) => a + b, 0);
  for (let code = 0; code < 2 ** perimeter; code++) {
    const bits = code.toString(2).padStart(perimeter, '0');
    let at = 0;
    const sides = lengths.map((len) => bits.slice(at, (at += len)));
    const ps = [...enumeratePuzzles(region, sides, pieces)];
    if (want(ps)) return ps;
  }
  throw new Error(`no boundary with puzzles for ${lengths.join(',')}`);
}

const children = (els: XmlElement[], parent: number) => els.filter((e) => e.parent === parent);
function descendants(els: XmlElement[], root: number): XmlElement[] {
  const out: XmlElement[] = [];
  const walk = (p: number) => els.forEach((e, i) => e.parent === p && (out.push(e), walk(i)));
  walk(root);
  return out;
}

// Areas in unit triangles from elementary geometry (common practice, no source): a triangle of side n has
// n², a parallelogram a×b has 2ab, a hexagon cut from a triangle of side N loses the three corner triangles.
const SHAPES: { name: string; lengths: number[]; area: number }[] = [
  { name: 'triangle of side 3', lengths: [3, 0, 3, 0, 3, 0], area: 9 },
  { name: 'inverted triangle of side 2', lengths: [0, 2, 0, 2, 0, 2], area: 4 },
  { name: 'parallelogram 2×1', lengths: [2, 1, 0, 2, 1, 0], area: 4 },
  { name: 'regular hexagon of side 1', lengths: [1, 1, 1, 1, 1, 1], area: 6 },
  { name: 'hexagon 2,1,1,2,1,1', lengths: [2, 1, 1, 2, 1, 1], area: 16 - 1 - 4 - 1 },
];

describe('drawPuzzlesSvg', () => {
  for (const shape of SHAPES) {
    it(`draws every unit triangle once and every boundary label: ${shape.name}`, () => {
      const puzzles = firstPuzzles(shape.lengths, theoryPieceSet('equivariant'));
      const els = parseXml(drawPuzzlesSvg(puzzles, { title: shape.name }));
      expect(els[0]!.name).toBe('svg');
      const groups = els.map((e, i) => [e, i] as const).filter(([e]) => e.attributes['data-puzzle'] !== undefined);
      expect(groups.length).toBe(puzzles.length);
      groups.forEach(([, gi], k) => {
        const inner = descendants(els, gi);
        expect(inner.filter((e) => e.attributes['data-piece'] !== undefined).length).toBe(shape.area);
        // Boundary labels, read in document order per side, spell the side strings the puzzle was given.
        shape.lengths.forEach((_, s) => {
          const text = inner.filter((e) => e.attributes['data-side'] === String(s + 1)).map((e) => e.text).join('');
          expect(text).toBe(puzzles[k]!.sides[s]);
        });
      });
    });
  }

  it('marks each equivariant rhombus with its weight y_j − y_i as indices', () => {
    const puzzles = firstPuzzles([3, 0, 3, 0, 3, 0], theoryPieceSet('equivariant'), (ps) => ps.some((p) => p.pieces.some((q) => q.piece.kind === 'equivariant')));
    const els = parseXml(drawPuzzlesSvg(puzzles));
    const rhombi = puzzles.flatMap((p) => p.pieces.filter((q) => q.piece.kind === 'equivariant'));
    expect(els.filter((e) => e.attributes.class === 'pz-rhombus').length).toBe(rhombi.length);
    // The weight `y5 - y2` (stated in DEVELOPERS.md, "Theories") must be typeset as y, index, minus, y, index.
    const weights = els.map((e, i) => [e, i] as const).filter(([e]) => e.attributes.class === 'pz-weight');
    const first = children(els, weights[0]![1]).map((e) => e.text);
    const [, i, j] = /^y(\d+) - y(\d+)$/.exec(rhombi[0]!.weight)!;
    expect(first).toEqual(['y', i, ' \u2212 y', j]);
  });

  it('marks each K-piece with its sign', () => {
    const puzzles = firstPuzzles([4, 0, 4, 0, 4, 0], theoryPieceSet('k-theory'), (ps) => ps.some((p) => p.pieces.some((q) => q.piece.kind === 'k-piece')));
    const els = parseXml(drawPuzzlesSvg(puzzles));
    const kPieces = puzzles.flatMap((p) => p.pieces.filter((q) => q.piece.kind === 'k-piece'));
    expect(els.filter((e) => e.attributes.class === 'pz-sign').length).toBe(kPieces.length);
  });

  it('says so when a boundary has no puzzles', () => {
    const svg = drawPuzzlesSvg([]);
    expect(parseXml(svg)[0]!.attributes['data-puzzles']).toBe('0');
    expect(svg).toContain('no puzzles');
  });
});

describe('parseXml (the checker the tests above rely on)', () => {
  it('rejects malformed documents', () => {
    for (const bad of ['<a><b></a></b>', '<a x="1" x="2"/>', '<a>1 < 2</a>', '<a>&nope</a>', '<a/><b/>', '<a>']) expect(() => parseXml(bad)).toThrow();
    expect(parseXml('<?xml version="1.0"?>\n<a k="v"><b>t &amp; u</b></a>\n').map((e) => e.name)).toEqual(['a', 'b']);
  });
});

describe('drawPuzzlesSvg grid', () => {
  it('lays wide puzzles out in a grid, not one tall column', () => {
    // c_{21,21}^{321} has two puzzles [value from memory]; at 600 px per edge each is wider than a sheet line.
    const ps = [...enumeratePuzzles(makeRegion([6, 0, 6, 0, 6, 0]), ['010101', '', '010101', '', '010101', ''], theoryPieceSet('cohomology'))];
    const many = [...ps, ...ps, ...ps, ...ps];
    const svg = drawPuzzlesSvg(many, { unit: 600 });
    const xs = new Set([...svg.matchAll(/data-puzzle="\d+" transform="translate\(([\d.]+),/g)].map((m) => m[1]));
    // 8 triangles in about a square sheet: 3 columns (⌈√(8·height/width)⌉, the layout rule itself).
    expect(xs.size).toBeGreaterThanOrEqual(2);
  });
});
