import { renderHtmlReport } from '../report/html-report.js';
import { reportDataFromStore } from '../report/store-report-data.js';
import { openExistingStore, storedClaims } from './stored-claims.js';
import { writeOutputFile } from './write-output-file.js';
import { valueInForm } from './value-in-form.js';
import type { ReportBoundary } from '../report/report-data.js';
import type { ValueForm } from '../report/root-form.js';

/** Renders a stored claim's HTML report and writes it (default results/<claim id>.html); returns what it wrote. */
export function writeClaimReport(dbPath: string, claim: string, options: { out?: string | undefined; draw: number; form?: ValueForm }): { out: string; found: number; drawn: number } {
  const db = openExistingStore(dbPath);
  let html: string;
  let id: string;
  let found: number;
  try {
    // A claim file names its current version; an id names the newest stored version.
    const record = storedClaims(db, claim).claims[0]!;
    const { data: stored, resolve } = reportDataFromStore(db, record);
    const form = options.form ?? 'expanded';
    const inForm = (b: ReportBoundary): ReportBoundary => ({ ...b, value: valueInForm(b.value, b.sides, b.theory, form) });
    const data = form === 'expanded' ? stored : { ...stored, counterexamples: stored.counterexamples.map((c) => ({ ...c, left: inForm(c.left), right: inForm(c.right) })) };
    html = renderHtmlReport(data, { drawCount: options.draw, resolve });
    id = record.claimId;
    found = data.counterexamples.length;
  } finally {
    db.close();
  }
  const out = options.out ?? `results/${id.replace(/[^\w.-]+/g, '_')}.html`;
  writeOutputFile(out, html, '--out');
  return { out, found, drawn: Math.min(found, options.draw) };
}
