import cliProgress from 'cli-progress';
import type { CommandModule } from 'yargs';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { CodedError } from '../../errors/index.js';
import { structureTable } from '../../products/parallel-table.js';
import { parseGrassmannian, type Grassmannian } from '../../products/partition-strings.js';
import type { TableEntry } from '../../products/structure-table.js';
import { TABLE_FORMATS, tableCsv, tableJson, tableTex, type TableFormat } from '../../products/table-formats.js';
import type { ValueForm } from '../../report/root-form.js';
import { formOption } from '../class-options.js';
import { runCommand } from '../run-command.js';
import { isLocalizationOnly, localizationTableRows } from '../../run/localization-values.js';
import { writeOutputFile } from '../write-output-file.js';

interface TableArgs {
  theory: string;
  grassmannian: string;
  format: TableFormat;
  form: ValueForm;
  out?: string;
  workers?: number;
}

export const tableCommand: CommandModule<object, TableArgs> = {
  command: 'table',
  describe: 'Every nonzero structure constant c_{λμ}^ν of Gr(k,n) in a theory, as CSV, JSON or a LaTeX table',
  builder: (y) =>
    formOption(y)
      .option('theory', { type: 'string', demandOption: true, describe: 'cohomology | equivariant | k-theory | dual-k-theory | ssm-nonequivariant | ssm | path to a piece-set JSON; by localization: equivariant-k-theory | ssm-chern' })
      .option('grassmannian', { type: 'string', demandOption: true, describe: 'k,n: the Grassmannian Gr(k,n)' })
      .option('format', { choices: TABLE_FORMATS, default: 'csv' as const, describe: 'csv (lambda,mu,nu,value, then partitions), json, or tex (a longtable)' })
      .option('out', { type: 'string', describe: 'write the table to this file instead of stdout' })
      .option('workers', { type: 'number', describe: 'worker threads (default: available parallelism)' }) as never,
  handler: (args) =>
    runCommand(args.format === 'json' && args.out === undefined, async () => {
      const g = parseGrassmannian(args.grassmannian);
      if (isLocalizationOnly(args.theory)) {
        // No puzzle rule is built in: the whole table at once by localization (no workers, no progress bar).
        writeTable(args, args.theory, g, localizationTableRows(args.theory, g), `Gr(${g.k},${g.n}) ${args.theory} (by localization)`);
        return;
      }
      const pieces = resolveTheory(args.theory);
      if (!pieces.boundaryLabels.includes('0') || !pieces.boundaryLabels.includes('1')) {
        throw new CodedError('invalid_argument', { what: '--theory', expected: 'a piece set with boundary labels 0 and 1', received: `${pieces.boundaryLabels.join(' ')}` }, { path: '--theory' });
      }
      if (args.workers !== undefined && (!Number.isInteger(args.workers) || args.workers < 1)) {
        throw new CodedError('invalid_argument', { what: '--workers', expected: 'a positive integer', received: `${args.workers}` }, { path: '--workers' });
      }
      const label = `Gr(${g.k},${g.n}) ${pieces.name}`;
      const bar = process.stderr.isTTY
        ? new cliProgress.SingleBar({ stream: process.stderr, format: `${label} {bar} {percentage}% | {value}/{total} products σ_λ·σ_μ | ETA {eta_formatted}`, hideCursor: true }, cliProgress.Presets.shades_classic)
        : undefined;
      let started = false;
      const rows = await structureTable(pieces, g, {
        ...(args.workers !== undefined ? { workers: args.workers } : {}),
        onProgress: (done, total) => {
          if (!bar) return;
          if (!started) bar.start(total, 0);
          started = true;
          bar.update(done);
        },
      });
      bar?.stop();
      writeTable(args, pieces.name, g, rows, label);
    }),
};

function writeTable(args: TableArgs, theory: string, g: Grassmannian, rows: readonly TableEntry[], label: string): void {
  const text = args.format === 'csv' ? tableCsv(rows, args.form) : args.format === 'tex' ? tableTex(theory, g, rows, args.form) : `${JSON.stringify(tableJson(theory, g, rows, args.form))}\n`;
  if (args.out === undefined) {
    process.stdout.write(text);
    return;
  }
  writeOutputFile(args.out, text, '--out');
  process.stdout.write(`wrote ${rows.length} nonzero structure constant${rows.length === 1 ? '' : 's'} of ${label} to ${args.out}\n`);
}
