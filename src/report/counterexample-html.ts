import { countBoundary, enumeratePuzzles, fillingCountSemiring, makeRegion, type PieceSet, type Puzzle } from '../engine/index.js';
import type { ReportBoundary, ReportCounterexample } from './report-data.js';
import { boundaryTitle, drawPuzzlesSvg } from './svg-drawing.js';
import { escapeXml, valueHtml } from './value-markup.js';

/** Pixels per unit edge: a rhombus weight is then set at 0.2 × 76 ≈ 15 px, legible at 100% zoom. */
export const PUZZLE_UNIT = 76;

/** Finds the piece set of a theory named in the store. */
export type PieceSetResolver = (theory: string) => PieceSet;

const sidesHtml = (sides: readonly string[]) => `<span class="sides">${escapeXml(boundaryTitle(sides))}</span>`;

function puzzlesOf(b: ReportBoundary, pieces: PieceSet, limit: number): { drawn: Puzzle[]; total: bigint } {
  const region = makeRegion(b.sides.map((s) => [...s].length));
  const total = BigInt(countBoundary(region, b.sides, pieces, { semiring: fillingCountSemiring }));
  const drawn: Puzzle[] = [];
  for (const p of enumeratePuzzles(region, b.sides, pieces)) {
    if (drawn.length >= limit) break;
    drawn.push(p);
  }
  return { drawn, total };
}

function boundaryFigure(role: 'left' | 'right', b: ReportBoundary, resolve: PieceSetResolver, limit: number): string {
  const head = `<figcaption><span class="role">${role === 'left' ? 'b (value L)' : 'T(b) (value R)'}</span><span>${escapeXml(b.theory)}</span>${sidesHtml(b.sides)}<span>value <span class="value">${valueHtml(b.value)}</span></span>`;
  let drawing: string;
  let total = '';
  // A formula side is a sum of products of other boundaries' values: it has no puzzles of its own.
  if (b.theory === 'formula') return `<figure data-boundary="${role}">${head}</figcaption><p class="note">the claim's formula at this boundary: a sum of products of values of other boundaries</p></figure>`;
  try {
    const { drawn, total: n } = puzzlesOf(b, resolve(b.theory), limit);
    total = ` data-puzzle-total="${n}"`;
    const more = n > BigInt(drawn.length) ? `<p class="note">first ${drawn.length} of ${n} puzzles drawn</p>` : '';
    drawing = n === 0n ? '<p class="note">no puzzle has this boundary</p>' : `<div class="drawing">${drawPuzzlesSvg(drawn, { standalone: false, unit: PUZZLE_UNIT, maxWidth: 1080 })}</div>${more}`;
    return `<figure data-boundary="${role}"${total}>${head}<span>${n} puzzle${n === 1n ? '' : 's'}</span></figcaption>${drawing}</figure>`;
  } catch (e) {
    drawing = `<p class="note">not drawn: ${escapeXml((e as Error).message)}</p>`;
    return `<figure data-boundary="${role}">${head}</figcaption>${drawing}</figure>`;
  }
}

/** One counterexample drawn in full: both boundaries, both values, every puzzle (up to `puzzleLimit` each). */
export function counterexampleCardHtml(c: ReportCounterexample, number: number, resolve: PieceSetResolver, puzzleLimit: number, fails = '≠'): string {
  const perm = c.permutation ? `<span>permutation [${c.permutation.join(', ')}]</span>` : '';
  const sigma = c.substituted ? `<p class="substituted" data-substituted>σ(R) = <span class="value">${valueHtml(c.substituted.value)}</span>${c.substituted.sigma ? ` with σ = <code>${escapeXml(c.substituted.sigma)}</code>` : ''}: the value compared with L</p>` : '';
  const partner = c.partnerOf !== undefined ? `<span>found through its pair with instance ${c.partnerOf}</span>` : '';
  return [
    `<article class="cx" data-counterexample="${number}">`,
    `<header><h3>Counterexample ${number}: ${escapeXml(fails)}</h3>`,
    `<span>class ${escapeXml(c.classKey)} · instance ${c.index} · side lengths ${c.left.lengths.join(',')} · size ${c.size}</span>${perm}${partner}</header>`,
    `<p class="values">L = <span class="value">${valueHtml(c.left.value)}</span>, R = <span class="value">${valueHtml(c.right.value)}</span></p>${sigma}`,
    `<div class="pair">${boundaryFigure('left', c.left, resolve, puzzleLimit)}${boundaryFigure('right', c.right, resolve, puzzleLimit)}</div>`,
    '</article>',
  ].join('\n');
}

/** The counterexamples not drawn, one table row each; σ(R) gets a column when the relation substitutes. */
export function counterexampleTableHtml(rest: readonly ReportCounterexample[], firstNumber: number): string {
  const sigma = rest.some((c) => c.substituted);
  const rows = rest.map(
    (c, k) =>
      `<tr data-listed="${firstNumber + k}"><td class="num">${firstNumber + k}</td><td>${escapeXml(c.classKey)}</td><td class="num">${c.index}${c.partnerOf !== undefined ? ` <small>(pair of ${c.partnerOf})</small>` : ''}</td><td>${sidesHtml(c.left.sides)}</td><td class="value">${valueHtml(c.left.value)}</td><td>${sidesHtml(c.right.sides)}</td><td class="value">${valueHtml(c.right.value)}</td>${sigma ? `<td class="value">${c.substituted ? valueHtml(c.substituted.value) : ''}</td>` : ''}</tr>`,
  );
  return `<table class="rest"><thead><tr><th class="num">#</th><th>class</th><th class="num">instance</th><th>b</th><th>L</th><th>T(b)</th><th>R</th>${sigma ? '<th>σ(R)</th>' : ''}</tr></thead><tbody>${rows.join('')}</tbody></table>`;
}
