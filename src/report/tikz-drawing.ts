import type { Puzzle } from '../engine/index.js';
import { puzzleScene, type Point, type PuzzleScene } from './puzzle-scene.js';
import { INK, kindStyle } from './puzzle-style.js';
import { puzzleWeightText } from './puzzle-weight.js';
import { valueTex } from './value-markup.js';

/** Options of the LaTeX document. */
export interface TikzOptions {
  /** Centimetres per unit edge (default 1.05). */
  readonly unitCm?: number;
  /** Heading above the pictures (plain text). */
  readonly title?: string;
  /** Only the colour and style definitions and the tikzpictures, for `\input` into a document of one's own. */
  readonly pictureOnly?: boolean;
}

const f = (v: number) => (Math.round(v * 1000) / 1000).toString();
const at = (p: Point) => `(${f(p.x)},${f(p.y)})`;
const hex = (c: string) => c.slice(1).toUpperCase();

/** Plain text for a LaTeX body: specials escaped, dashes and bars spelled so OT1 fonts print them. */
export function texText(text: string): string {
  const map: Record<string, string> = {
    '\\': '\\textbackslash{}', '{': '\\{', '}': '\\}', $: '\\$', '&': '\\&', '#': '\\#', '%': '\\%', _: '\\_',
    '^': '\\textasciicircum{}', '~': '\\textasciitilde{}', '|': '\\textbar{}', '<': '\\textless{}', '>': '\\textgreater{}',
    '\u2013': '--', '\u2014': '---', '\u2212': '$-$',
  };
  return [...text].map((c) => map[c] ?? (c.charCodeAt(0) < 128 ? c : '?')).join('');
}

const DIGITS = ['Zero', 'One', 'Two', 'Three', 'Four', 'Five', 'Six', 'Seven', 'Eight', 'Nine'];

// Colour names say which piece they fill and are letters only (safe in every xcolor version):
// the built-in kinds get short names; a custom kind `my-2-piece` becomes `pieceMyTwoPiece`.
const BUILTIN_COLOURS: Readonly<Record<string, string>> = {
  '0-triangle': 'pieceZero',
  '1-triangle': 'pieceOne',
  '10-triangle': 'pieceTen',
  equivariant: 'pieceRhombus',
  'equivariant-upper': 'pieceRhombus',
  'k-piece': 'pieceK',
};
function kindColourNames(kinds: readonly string[]): Map<string, string> {
  const out = new Map<string, string>();
  const used = new Set<string>();
  for (const kind of kinds) {
    const base =
      BUILTIN_COLOURS[kind] ??
      `piece${kind
          .split(/[^A-Za-z0-9]+/)
          .map((w) => [...w].map((c) => (/\d/.test(c) ? DIGITS[Number(c)]! : c)).join(''))
          .map((w) => w.charAt(0).toUpperCase() + w.slice(1))
          .join('')}`;
    let name = base;
    for (let i = 0; used.has(name) && kindStyle(kind).fill !== kindStyleOfName(out, name); i++) name = `${base}${String.fromCharCode(65 + (i % 26))}`;
    used.add(name);
    out.set(kind, name);
  }
  return out;
}

function kindStyleOfName(names: Map<string, string>, name: string): string | undefined {
  for (const [kind, n] of names) if (n === name) return kindStyle(kind).fill;
  return undefined;
}

function definitions(kinds: readonly string[], names: Map<string, string>): string[] {
  const defined = new Set<string>();
  return [
    '% Our palette: warm paper for 0, sage for 1, apricot for the 10-pieces, mustard rhombi, raspberry K-pieces.',
    ...Object.entries(INK).map(([name, c]) => `\\definecolor{psw${name}}{HTML}{${hex(c)}}`),
    ...kinds.flatMap((kind) => {
      const name = names.get(kind)!;
      if (defined.has(name)) return [];
      defined.add(name);
      return [`\\definecolor{${name}}{HTML}{${hex(kindStyle(kind).fill)}}`, `\\definecolor{${name}Ink}{HTML}{${hex(kindStyle(kind).ink)}}`];
    }),
    '\\tikzset{',
    '  psw edge/.style={draw=pswedge, line width=0.25pt},',
    '  psw outline/.style={draw=pswoutline, line width=0.9pt, line join=round},',
    '  psw label/.style={font=\\scriptsize, text=pswlabel, inner sep=0.6pt, fill=pswpaper, fill opacity=0.75, text opacity=1, rounded corners=0.8pt},',
    '  psw side/.style={font=\\scriptsize\\bfseries, text=pswboundary, inner sep=0pt},',
    '  psw weight/.style={font=\\tiny, inner sep=0pt},',
    '  psw ring/.style={line width=0.35pt, dash pattern=on 1.2pt off 0.8pt},',
    '  psw sign/.style={circle, fill=pswpaper, inner sep=0.4pt, font=\\scriptsize\\bfseries},',
    '  psw caption/.style={font=\\footnotesize, text=pswcaption},',
    '}',
  ];
}

function pictureTex(scene: PuzzleScene, colour: (kind: string) => string, number: number, weight: string, unit: number): string[] {
  const out = [`\\begin{tikzpicture}[x=${unit}cm, y=${unit}cm, baseline=(current bounding box.south)]`];
  for (const t of scene.triangles) out.push(`\\fill[${colour(t.kind)}] ${t.corners.map(at).join(' -- ')} -- cycle;`);
  for (const e of scene.edges) if (!e.side) out.push(`\\draw[psw edge] ${at(e.from)} -- ${at(e.to)};`);
  out.push(`\\draw[psw outline] ${scene.outline.map(at).join(' -- ')} -- cycle;`);
  for (const e of scene.edges) {
    if (e.side) out.push(`\\node[psw side] at ${at({ x: e.mid.x + e.side.outward.x * 0.28, y: e.mid.y + e.side.outward.y * 0.28 })} {${texText(e.label)}};`);
    else out.push(`\\node[psw label] at ${at(e.mid)} {${texText(e.label)}};`);
  }
  for (const m of scene.marks) {
    if (m.ring) out.push(`\\draw[psw ring, draw=${colour(m.kind)}Ink] ${m.ring.map(at).join(' -- ')} -- cycle;`);
    if (m.text === '-1' && !m.rhombus) out.push(`\\node[psw sign, text=${colour(m.kind)}] at ${at(m.at)} {$-$};`);
    else out.push(`\\node[psw weight, text=${colour(m.kind)}Ink] at ${at(m.at)} {$${valueTex(m.text)}$};`);
  }
  const b = scene.bounds;
  out.push(`\\node[psw caption, anchor=north] at (${f((b.minX + b.maxX) / 2)},${f(b.minY - 0.45)}) {\\textbf{\\#${number}}\\quad $${valueTex(weight)}$};`);
  out.push('\\end{tikzpicture}');
  return out;
}

/**
 * A `standalone` LaTeX document (the pictures wrap like words within 40 cm), or with `pictureOnly` just the
 * definitions and the tikzpictures, to `\\input` after `\\usepackage{tikz}`.
 */
export function drawPuzzlesTikz(puzzles: readonly Puzzle[], options: TikzOptions = {}): string {
  const kinds = [...new Set(puzzles.flatMap((p) => p.pieces.map((q) => q.piece.kind)))];
  const names = kindColourNames(kinds);
  const colour = (kind: string) => names.get(kind)!;
  const unit = options.unitCm ?? 1.05;
  const body = puzzles.flatMap((p, k) => [...pictureTex(puzzleScene(p), colour, k + 1, puzzleWeightText(p), unit), '\\hspace{6mm plus 4mm}']);
  if (options.pictureOnly) return [...definitions(kinds, names), ...body, ''].join('\n');
  return [
    '\\documentclass[border=6pt, varwidth=40cm]{standalone}',
    '\\usepackage{tikz}',
    ...definitions(kinds, names),
    '\\begin{document}',
    '\\setlength{\\parindent}{0pt}',
    ...(options.title ? [`\\textbf{${texText(options.title)}}\\par\\medskip`] : []),
    ...(puzzles.length ? [] : ['No puzzles with this boundary.']),
    ...body,
    '\\end{document}',
    '',
  ].join('\n');
}
