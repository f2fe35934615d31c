import { theoryPieceSet } from '../engine/index.js';
import { classChartSvg } from './class-chart.js';
import { counterexampleCardHtml, counterexampleTableHtml, type PieceSetResolver } from './counterexample-html.js';
import { REPORT_CSS } from './report-css.js';
import { compareClasses, compareCounterexamples, type ReportClass, type ReportData } from './report-data.js';
import { escapeXml } from './value-markup.js';

/** How much of the report is drawn: the first `drawCount` counterexamples, `puzzleLimit` puzzles per boundary. */
export interface HtmlReportOptions {
  readonly drawCount?: number;
  readonly puzzleLimit?: number;
  /** Piece sets by theory name (default: the built-in theories). */
  readonly resolve?: PieceSetResolver;
}

const fmt = (n: bigint | number) => n.toLocaleString('en-US');

function secondsText(s: number | null): string {
  if (s === null) return '–';
  if (s < 1) return `${(s * 1000).toFixed(0)} ms`;
  return s < 120 ? `${s.toFixed(1)} s` : `${(s / 60).toFixed(1)} min`;
}

function permutationCell(c: ReportClass): string {
  const p = c.permutations;
  if (!p) return '';
  const list = p.common.length ? p.common.slice(0, 4).map((x) => `<code>${escapeXml(x)}</code>`).join(' ') + (p.common.length > 4 ? ` +${p.common.length - 4}` : '') : 'none';
  const notes = [p.incomplete ? 'class incomplete: unchecked instances may rule some out' : '', p.truncated ? 'an instance had more than 720 permutations; only 720 kept, so more may serve all' : ''].filter(Boolean);
  return `<td>${list}${notes.map((n) => `<br><small>${n}</small>`).join('')}</td>`;
}

function classTable(classes: readonly ReportClass[]): string {
  const withPerms = classes.some((c) => c.permutations);
  const rows = classes.map(
    (c) =>
      `<tr data-class="${escapeXml(c.key)}"><td>${escapeXml(c.key)}</td><td><code>${c.lengths.join(',')}</code></td><td class="num">${fmt(c.instances)}</td><td class="num">${fmt(c.checked)}</td><td class="num">${fmt(c.holds)}</td><td class="num" data-nonzero>${c.nonzero === null || c.nonzero === undefined ? '–' : fmt(c.nonzero)}</td><td class="num">${fmt(c.counterexamples)}</td><td class="num">${secondsText(c.seconds)}</td><td class="status-${c.status}">${c.status}${c.method === 'modular' ? ' (modular)' : ''}</td>${withPerms ? permutationCell(c) || '<td></td>' : ''}</tr>`,
  );
  return `<table><thead><tr><th>class</th><th>side lengths</th><th class="num">instances</th><th class="num">checked</th><th class="num">holds</th><th class="num">of which nonzero</th><th class="num">counterexamples</th><th class="num">time</th><th>status</th>${withPerms ? '<th>permutations serving the whole class</th>' : ''}</tr></thead><tbody>${rows.join('')}</tbody></table>`;
}

// Every symbol the report uses, defined once.
function symbolsHtml(data: ReportData): string {
  const items = [
    '<dt>b, T(b)</dt><dd>a boundary of the family, and its image under the claim\'s transform</dd>',
    '<dt>L, R</dt><dd>L is the measure of b in the claim\'s theory; R is the measure of T(b), each exactly what <code>puzzlesweep count</code> prints for that boundary</dd>',
    data.claim.relation ? `<dt>claim</dt><dd>${escapeXml(data.claim.relation)} for every b; a counterexample has ${escapeXml(data.claim.failure ?? 'L ≠ R')}</dd>` : '',
    data.counterexamples.some((c) => c.substituted) || /σ/.test(data.claim.relation ?? '')
      ? '<dt>σ(R)</dt><dd>R with y<sub>m</sub> replaced by y<sub>σ(m)</sub>; rev[p..q] maps y<sub>m</sub> to y<sub>p+q−m</sub> for p ≤ m ≤ q; shift[p..q] by s maps y<sub>m</sub> to y<sub>p+(m−p+s) mod (q−p+1)</sub>; (i j k) is a cycle</dd>'
      : '',
    '<dt>holds, of which nonzero</dt><dd>boundaries where the relation holds; "nonzero" counts those where some compared value is not 0 (the others hold vacuously, 0 = 0)</dd>',
    '<dt>found through its pair</dt><dd>for an involution T, b and T(b) are decided by one comparison; both are listed when it fails</dd>',
  ];
  return `<h2>Symbols</h2><dl class="symbols">${items.filter(Boolean).join('')}</dl>`;
}

function tally(data: ReportData): string {
  const checked = data.classes.reduce((s, c) => s + c.checked, 0n);
  const verified = data.classes.filter((c) => c.status === 'verified').length;
  const holds = data.classes.reduce((s, c) => s + c.holds, 0n);
  const nonzero = data.classes.every((c) => c.nonzero !== null && c.nonzero !== undefined) ? fmt(data.classes.reduce((s, c) => s + (c.nonzero ?? 0n), 0n)) : '–';
  const n = data.counterexamples.length;
  const verdict = n ? '<div class="bad"><strong>refuted</strong>by a confirmed counterexample</div>' : '<div class="ok"><strong>no counterexample</strong>in the swept classes</div>';
  return `<section class="tally">${verdict}<div><strong>${fmt(checked)}</strong>instances checked</div><div><strong>${fmt(holds)}</strong>hold, ${nonzero} with a nonzero value</div><div><strong>${verified} / ${data.classes.length}</strong>classes verified</div><div><strong>${fmt(n)}</strong>counterexamples</div></section>`;
}

// How a counterexample's two values fail the claim's relation: ≠ for equalities, > for ≤, < for ≥.
function failureSymbol(json: unknown): string {
  const type = (json as { compare?: { relation?: { type?: string } } } | null)?.compare?.relation?.type;
  if (type === 'lessOrEqual') return '>';
  if (type === 'greaterOrEqual') return '<';
  if (type === 'equalAfterSubstitution') return '≠ σ';
  if (type === 'equalUpToPermutation') return '≠ any σ';
  return '≠';
}

/** The whole report as one self-contained HTML page: inline style, inline SVG, no scripts, no external assets. */
export function renderHtmlReport(data: ReportData, options: HtmlReportOptions = {}): string {
  const drawCount = options.drawCount ?? 6;
  const resolve = options.resolve ?? theoryPieceSet;
  const classes = [...data.classes].sort(compareClasses);
  const cxs = [...data.counterexamples].sort(compareCounterexamples);
  const shown = cxs.slice(0, drawCount);
  const rest = cxs.slice(drawCount);
  const { claim } = data;
  const body = [
    `<header><h1>${escapeXml(claim.id)}</h1><p class="statement">${escapeXml(claim.statement)}</p>`,
    `<div class="meta"><span>theory <b>${escapeXml(claim.theory)}</b></span><span>family <b>${escapeXml(claim.family)}</b></span>${claim.fingerprint ? `<span>fingerprint <code>${escapeXml(claim.fingerprint.slice(0, 16))}</code></span>` : ''}</div></header>`,
    tally(data),
    '<h2>Side-length classes</h2>',
    classes.length ? `<div class="classes">${classTable(classes)}${classChartSvg(classes)}</div>` : '<p class="note">no class swept yet</p>',
    `<h2>Counterexamples${cxs.length ? `, smallest first` : ''}</h2>`,
    cxs.length ? '' : '<p class="note">none found</p>',
    ...shown.map((c, k) => counterexampleCardHtml(c, k + 1, resolve, options.puzzleLimit ?? 24, claim.failure ?? failureSymbol(claim.json))),
    rest.length ? `<h2>${fmt(rest.length)} more counterexamples</h2>${counterexampleTableHtml(rest, drawCount + 1)}` : '',
    symbolsHtml(data),
    `<h2>Claim</h2><details open><summary>the claim as written</summary><pre>${escapeXml(JSON.stringify(claim.json, null, 2))}</pre></details>`,
    `<footer>puzzlesweep report${data.generatedAt ? ` · data read ${escapeXml(data.generatedAt)}` : ''} · puzzle drawings: pieces filled by kind, boundary labels outside the region in clockwise order, rhombus weights y<sub>j</sub> − y<sub>i</sub>, K-piece signs in discs</footer>`,
  ];
  return [
    '<!DOCTYPE html>',
    '<html lang="en"><head><meta charset="utf-8">',
    // The page needs nothing from outside; the policy makes any accidental fetch fail loudly.
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'">`,
    `<meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeXml(claim.id)} · puzzlesweep report</title>`,
    `<style>${REPORT_CSS}</style></head>`,
    `<body><main>${body.join('\n')}</main></body></html>`,
    '',
  ].join('\n');
}
