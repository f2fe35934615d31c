import type { CommandModule } from 'yargs';
import { AppError } from '../../errors.js';
import { renderHtmlReport } from '../../report/html-report.js';
import { reportDataFromStore } from '../../report/store-report-data.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { openExistingStore, storedClaims } from '../stored-claims.js';
import { writeOutputFile } from '../write-output-file.js';

interface ReportArgs {
  claim: string;
  db: string;
  out?: string;
  draw: number;
}

export const reportCommand: CommandModule<object, ReportArgs> = {
  command: 'report <claim>',
  describe: 'Write one self-contained HTML page of a claim: classes swept, counterexamples drawn with all their puzzles',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, id or fingerprint' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file' })
      .option('out', { type: 'string', describe: 'HTML file to write (default results/<claim id>.html)' })
      .option('draw', { type: 'number', default: 6, describe: 'draw this many counterexamples, list the rest' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      if (!Number.isInteger(args.draw) || args.draw < 0) {
        throw new AppError('invalid_argument', `--draw: expected a nonnegative integer, received ${args.draw}`, { path: '--draw' });
      }
      const db = openExistingStore(args.db);
      let html: string;
      let id: string;
      let found: number;
      try {
        // A claim file names its current version; an id names the newest stored version.
        const record = storedClaims(db, args.claim).claims[0]!;
        const { data, resolve } = reportDataFromStore(db, record);
        html = renderHtmlReport(data, { drawCount: args.draw, resolve });
        id = record.claimId;
        found = data.counterexamples.length;
      } finally {
        db.close();
      }
      const out = args.out ?? `results/${id.replace(/[^\w.-]+/g, '_')}.html`;
      writeOutputFile(out, html, '--out');
      process.stdout.write(`wrote ${out} (${found} counterexample${found === 1 ? '' : 's'}, ${Math.min(found, args.draw)} drawn)\n`);
    }),
};
