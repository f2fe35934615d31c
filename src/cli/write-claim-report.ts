import { renderHtmlReport } from '../report/html-report.js';
import { reportDataFromStore } from '../report/store-report-data.js';
import { openExistingStore, storedClaims } from './stored-claims.js';
import { writeOutputFile } from './write-output-file.js';

/** Renders a stored claim's HTML report and writes it (default results/<claim id>.html); returns what it wrote. */
export function writeClaimReport(dbPath: string, claim: string, options: { out?: string | undefined; draw: number }): { out: string; found: number; drawn: number } {
  const db = openExistingStore(dbPath);
  let html: string;
  let id: string;
  let found: number;
  try {
    // A claim file names its current version; an id names the newest stored version.
    const record = storedClaims(db, claim).claims[0]!;
    const { data, resolve } = reportDataFromStore(db, record);
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
