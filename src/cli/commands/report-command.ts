import type { CommandModule } from 'yargs';
import { CodedError } from '../../errors/index.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { writeClaimReport } from '../write-claim-report.js';
import { VALUE_FORMS, type ValueForm } from '../../report/root-form.js';

interface ReportArgs {
  claim: string;
  db: string;
  out?: string;
  draw: number;
  form: ValueForm;
}

export const reportCommand: CommandModule<object, ReportArgs> = {
  command: 'report <claim>',
  describe: 'Write one self-contained HTML page of a claim: classes swept, counterexamples drawn with all their puzzles',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, id or fingerprint' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file' })
      .option('out', { type: 'string', describe: 'HTML file to write (default results/<claim id>.html)' })
      .option('draw', { type: 'number', default: 6, describe: 'draw this many counterexamples, list the rest' })
      .option('form', { choices: VALUE_FORMS, default: 'expanded' as const, describe: 'polynomial values: expanded in y (as stored), in z_m = y_{m+1} - y_m when positive there (roots), or factored' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      if (!Number.isInteger(args.draw) || args.draw < 0) {
        throw new CodedError('invalid_argument', { what: '--draw', expected: 'a nonnegative integer', received: `${args.draw}` }, { path: '--draw' });
      }
      const { out, found, drawn } = writeClaimReport(args.db, args.claim, { out: args.out, draw: args.draw, form: args.form });
      process.stdout.write(`wrote ${out} (${found} counterexample${found === 1 ? '' : 's'}, ${drawn} drawn)\n`);
    }),
};
