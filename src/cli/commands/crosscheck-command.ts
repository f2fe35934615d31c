import cliProgress from 'cli-progress';
import type { CommandModule } from 'yargs';
import { resolveTheory } from '../../claims/resolve-theory.js';
import { CodedError } from '../../errors/index.js';
import { crosscheck, type CrosscheckSummary } from '../../run/crosscheck.js';
import type { ReferenceTheory } from '../../reference/crosscheck-tables.js';
import type { LocalizationTheory } from '../../run/localization-values.js';
import { runCommand } from '../run-command.js';
import { JSON_FORMAT_VERSION } from '../../report/value-json.js';

const THEORIES = ['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant', 'equivariant-k-theory', 'ssm', 'ssm-chern'] as const;

interface CrosscheckArgs {
  theory: ReferenceTheory | LocalizationTheory;
  'max-n': number;
  pieces?: string;
  points?: number;
  seed?: number;
  json: boolean;
}

function summaryText(s: CrosscheckSummary): string {
  const rows = s.rows.map((r) => `  ${String(r.n).padStart(3)} ${String(r.k).padStart(3)} ${String(r.triples).padStart(9)} ${String(r.agreements).padStart(11)}`);
  const d = s.firstDisagreement;
  return [
    `crosscheck ${s.theory}: engine against the independent reference, every triple of Gr(k, n), n ≤ ${s.maxN}`,
    '    n   k   triples  agreements',
    ...rows,
    `  all ${String(s.triples).padStart(13)} ${String(s.agreements).padStart(11)}   (${s.seconds.toFixed(1)} s)`,
    ...(s.points
      ? [`values compared exactly at ${s.points.count} random integer point${s.points.count === 1 ? '' : 's'} in [0, 2^64)^n (seed ${s.points.seed}); a false agreement anywhere has probability ≤ ${s.points.errorBound.toExponential(1)} (Schwartz–Zippel)`]
      : []),
    d ? `first disagreement: λ=${d.lambda} μ=${d.mu} ν=${d.nu}\n  engine:    ${d.engine}\n  reference: ${d.reference}` : 'every triple agrees',
  ].join('\n');
}

export const crosscheckCommand: CommandModule<object, CrosscheckArgs> = {
  command: 'crosscheck',
  describe: 'Compare the engine with independent computations (LR rule, localization, Grothendieck polynomials, Möbius inversion); equivariant-k-theory and ssm-chern need --pieces',
  builder: (y) =>
    y
      .option('theory', { choices: THEORIES, demandOption: true, describe: 'which structure constants to check' })
      .option('max-n', { type: 'number', default: 5, describe: 'check every Gr(k, n) with n up to this' })
      .option('pieces', { type: 'string', describe: 'check this piece-set JSON file against the theory instead of the built-in pieces' })
      .option('points', { type: 'number', describe: 'ssm, ssm-chern: compare exact values at this many random integer points instead of as rational functions (feasible at n = 6)' })
      .option('seed', { type: 'number', describe: 'seed of the random points (default 1)' })
      .option('json', { type: 'boolean', default: false, describe: 'print the summary as JSON' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const maxN = args['max-n'];
      if (!Number.isInteger(maxN) || maxN < 1 || maxN > 9) {
        throw new CodedError('invalid_argument', { what: '--max-n', expected: 'an integer from 1 to 9', received: `${maxN}` }, { path: '--max-n', hint: 'the reference tables grow fast; 7 takes seconds, 9 minutes' });
      }
      const bar = process.stderr.isTTY && !args.json ? new cliProgress.SingleBar({ format: 'crosscheck {bar} {percentage}% | {value}/{total} products | ETA {eta}s', stream: process.stderr }, cliProgress.Presets.shades_classic) : undefined;
      let started = false;
      const summary = crosscheck({
        theory: args.theory,
        maxN,
        ...(args.pieces ? { pieces: resolveTheory(args.pieces) } : {}),
        ...(args.points !== undefined ? { points: args.points, ...(args.seed !== undefined ? { seed: args.seed } : {}) } : {}),
        onProgress: (done, total) => {
          if (!bar) return;
          if (!started) bar.start(total, 0);
          started = true;
          bar.update(done);
        },
      });
      bar?.stop();
      if (args.json) process.stdout.write(`${JSON.stringify({ formatVersion: JSON_FORMAT_VERSION, ...summary, firstDisagreement: summary.firstDisagreement ?? null })}\n`);
      else process.stdout.write(`${summaryText(summary)}\n`);
      return summary.agreements === summary.triples ? 0 : 1;
    }),
};
