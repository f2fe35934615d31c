import { describe, expect, it } from 'vitest';
import { renderHtmlReport } from '../../../src/report/html-report.js';
import { reportFixture } from '../../fixtures/report-fixture.js';

const data = reportFixture(10); // 4 genuine counterexamples plus 10 repeats under new indices

describe('renderHtmlReport', () => {
  const html = renderHtmlReport(data, { drawCount: 5, puzzleLimit: 2 });

  it('is one self-contained page: no scripts, no external assets (README, "Pictures and reports")', () => {
    expect(html).not.toMatch(/<script|<link|<iframe|<img/i);
    expect(html).not.toMatch(/(src|href)\s*=\s*["']?(https?:)?\/\//i);
    expect(html).not.toMatch(/url\(/i);
    expect(html).toContain("default-src 'none'");
  });

  it('prints tallies a reader can re-derive from the class table: 4,680 instances, 2 / 4 classes verified, 14 counterexamples', () => {
    // 8 + 64 + 512 + 4096 = 4,680 labelings of the triangles n = 1..4 (2^(3n), common practice, no source)
    const checked = data.classes.reduce((s, c) => s + c.checked, 0n);
    expect(checked).toBe(4680n);
    expect(html).toContain('<strong>4,680</strong>instances checked');
    expect(html).toContain(`<strong>${data.classes.filter((c) => c.status === 'verified').length} / 4</strong>classes verified`);
    expect(html).toContain(`<strong>${data.counterexamples.length}</strong>counterexamples`);
    expect(data.counterexamples).toHaveLength(14);
  });

  it('draws the first --draw counterexamples, smallest first, and lists the rest in a table', () => {
    const drawn = [...html.matchAll(/data-counterexample="(\d+)"/g)].map((m) => Number(m[1]));
    const listed = [...html.matchAll(/data-listed="(\d+)"/g)].map((m) => Number(m[1]));
    expect(drawn).toEqual([1, 2, 3, 4, 5]);
    expect(listed).toEqual([6, 7, 8, 9, 10, 11, 12, 13, 14]);
    // The n = 3 counterexamples (size 9) come before the n = 4 one (size 12).
    const classes = [...html.matchAll(/class (n=\d) · instance/g)].map((m) => m[1]);
    expect(classes.every((k) => k === 'n=3')).toBe(true);
    expect(html).toContain('<h2>9 more counterexamples</h2>');
  });

  it('escapes what the claim says', () => {
    const out = renderHtmlReport({ ...data, claim: { ...data.claim, statement: 'a < b & "c"' } }, { drawCount: 0 });
    expect(out).toContain('a &lt; b &amp; &quot;c&quot;');
  });
});
