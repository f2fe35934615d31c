import { describe, expect, it } from 'vitest';
import { renderHtmlReport } from '../../../src/report/html-report.js';
import type { ReportData } from '../../../src/report/report-data.js';

const side = (sides: string[], value: string) => ({ theory: 'equivariant', lengths: sides.map((s) => s.length), sides, value });

// A hand-made report: two classes (one beyond the claim's own bound), one substitution counterexample and its partner.
const data: ReportData = {
  claim: {
    id: 'golden',
    statement: 'Exchanging sides 1 and 4 reverses the first block of y.',
    json: { id: 'golden', theory: 'equivariant' },
    theory: 'equivariant',
    family: 'sides a,0,b,a,0,b with 1 ≤ a ≤ 3, 1 ≤ b ≤ 1',
    relation: 'L = σ(R), σ = rev[1..a]',
    failure: 'L ≠ σ(R)',
    fingerprint: '0123456789abcdef0123',
  },
  classes: [
    { key: 'a=2,b=1', lengths: [2, 0, 1, 2, 0, 1], instances: 24n, checked: 24n, holds: 22n, nonzero: 5n, counterexamples: 2, seconds: 0.5, status: 'refuted', permutations: { common: ['rev[2..3]'], truncated: false, incomplete: false } },
    { key: 'a=3,b=1', lengths: [3, 0, 1, 3, 0, 1], instances: 80n, checked: 40n, holds: 40n, nonzero: null, counterexamples: 0, seconds: 1, status: 'partial', permutations: { common: [], truncated: true, incomplete: true } },
  ],
  counterexamples: [
    { classKey: 'a=2,b=1', index: 8n, size: 6, left: side(['01', '', '1', '10', '', '1'], 'y2 - y1'), right: side(['10', '', '1', '01', '', '1'], 'y3 - y1'), substituted: { value: 'y3 - y2', sigma: 'rev[1..2]' } },
    { classKey: 'a=2,b=1', index: 12n, size: 6, left: side(['10', '', '1', '01', '', '1'], 'y3 - y1'), right: side(['01', '', '1', '10', '', '1'], 'y2 - y1'), substituted: { value: 'y1 - y2', sigma: 'rev[1..2]' }, partnerOf: 8n },
  ],
};

// The page without its drawings and values: headings, table heads, row keys, data attributes and symbol terms.
function skeleton(html: string): string {
  const out: string[] = [];
  for (const m of html.matchAll(/<(h[1-3])[^>]*>(.*?)<\/\1>|<th[^>]*>(.*?)<\/th>|<(tr|article|figure|p) ([^>]*data-[^>]*)>|<dt>(.*?)<\/dt>/g)) {
    if (m[1]) out.push(`${m[1]}: ${m[2]!.replace(/<[^>]+>/g, '')}`);
    else if (m[3] !== undefined) out.push(`  th: ${m[3]}`);
    else if (m[4]) out.push(`  <${m[4]} ${m[5]!.replace(/data-puzzle-total="\d+"/, 'data-puzzle-total')}>`);
    else out.push(`  dt: ${m[6]!.replace(/<[^>]+>/g, '')}`);
  }
  return `${out.join('\n')}\n`;
}

describe('report skeleton', () => {
  it('keeps its sections, columns and symbols (golden file: a regression pin of the layout, not of any value)', async () => {
    await expect(skeleton(renderHtmlReport(data, { drawCount: 1, puzzleLimit: 1 }))).toMatchFileSnapshot('golden/report-skeleton.txt');
  });
});
