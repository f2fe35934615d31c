import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { countBoundary, fillingCountSemiring, makeRegion, theoryPieceSet } from '../../src/engine/index.js';
import { renderHtmlReport } from '../../src/report/html-report.js';
import type { ReportBoundary } from '../../src/report/report-data.js';
import { reportFixture } from '../fixtures/report-fixture.js';
import { cli } from './cli-process.js';

const CHROMIUM = '/usr/bin/chromium';
const present = existsSync(CHROMIUM);
const ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];
const work = mkdtempSync(join(tmpdir(), 'puzzlesweep-report-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function engineCount(b: ReportBoundary): number {
  return Number(countBoundary(makeRegion(b.sides.map((s) => s.length)), b.sides, theoryPieceSet(b.theory), { semiring: fillingCountSemiring }));
}

describe('HTML report in a real browser', () => {
  // CI must have the browser (.ci/run installs it); a developer machine without it may skip.
  it.runIf(!present && process.env.CI === 'true')('has chromium in CI', () => {
    expect(existsSync(CHROMIUM), `${CHROMIUM} is missing; .ci/run installs Debian's chromium`).toBe(true);
  });

  it.skipIf(!present)('draws as many puzzles as the engine counts, with no console errors and no network', async () => {
    const drawCount = 4;
    const data = reportFixture(200);
    const file = join(work, 'report.html');
    writeFileSync(file, renderHtmlReport(data, { drawCount }));
    const url = pathToFileURL(file).href;
    const context = await chromium.launchPersistentContext(join(work, 'profile'), { executablePath: CHROMIUM, args: ARGS, headless: true });
    try {
      const page = await context.newPage();
      const problems: string[] = [];
      const requests: string[] = [];
      page.on('console', (m) => m.type() === 'error' && problems.push(m.text()));
      page.on('pageerror', (e) => problems.push(e.message));
      context.on('request', (r) => requests.push(r.url()));
      await page.goto(url, { waitUntil: 'load' });
      const drawn = await page.$$eval('article[data-counterexample]', (cards) =>
        cards.map((card) => ['left', 'right'].map((role) => card.querySelectorAll(`figure[data-boundary="${role}"] [data-puzzle]`).length)),
      );
      // Expected counts come from the engine's transfer-matrix count, independent of the enumeration that draws.
      const sorted = [...data.counterexamples].sort((a, b) => a.size - b.size || (a.index < b.index ? -1 : 1)).slice(0, drawCount);
      expect(drawn).toEqual(sorted.map((c) => [engineCount(c.left), engineCount(c.right)]));
      expect(drawn.flat().some((n) => n > 0)).toBe(true);
      // The rest are listed, not drawn (200 extra + the fixture's own, minus the drawn ones).
      expect(await page.locator('tr[data-listed]').count()).toBe(data.counterexamples.length - drawCount);
      expect(problems).toEqual([]);
      expect(requests).toEqual([url]);
      mkdirSync('test-artifacts', { recursive: true });
      await page.setViewportSize({ width: 1280, height: 1600 });
      await page.screenshot({ path: join('test-artifacts', 'report-browser.png'), fullPage: false });
    } finally {
      await context.close();
    }
  });

  it.skipIf(!present)('a report after run --max shows the raised classes beside the claim file\'s own (issue 7)', async () => {
    const db = join(work, 'raised.sqlite');
    const claim = 'conjectures/cohomology-triangle-mirror-complement.json'; // n from 1 to 4 in the file
    expect(cli(['run', claim, '--db', db, '--workers', '1']).status).toBe(0);
    expect(cli(['run', claim, '--db', db, '--workers', '1', '--max', 'n=5']).status).toBe(0);
    const file = join(work, 'raised.html');
    expect(cli(['report', claim, '--db', db, '--out', file]).status).toBe(0);
    const context = await chromium.launchPersistentContext(join(work, 'profile-raised'), { executablePath: CHROMIUM, args: ARGS, headless: true });
    try {
      const page = await context.newPage();
      await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
      const rows = await page.$$eval('tr[data-class]', (trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent ?? '')));
      // Every boundary of the triangle (n,0,n,0,n,0) labels three sides of n edges by 0/1: 2^(3n) = 8^n
      // instances (counting labelings, common practice, no source); all of them were checked.
      expect(rows.map((r) => r[0])).toEqual(['n=1', 'n=2', 'n=3', 'n=4', 'n=5']);
      for (const [n, r] of rows.entries()) {
        const instances = String(8 ** (n + 1));
        expect(r[2]!.replace(/\D/g, ''), r[0]).toBe(instances);
        expect(r[3]!.replace(/\D/g, ''), r[0]).toBe(instances);
        expect(r[8], r[0]).toMatch(/^verified/);
      }
      expect(await page.locator('[data-bar="n=5"]').count()).toBe(1);
    } finally {
      await context.close();
    }
  });
});
