import { availableParallelism } from 'node:os';
import type { CommandModule } from 'yargs';
import { loadSweepClaim } from '../../run/load-sweep-claim.js';
import { parseRunOptions } from '../../run/run-options.js';
import { runSweep, startWorkers } from '../../run/run-sweep.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { sweepProgressBar } from '../sweep-progress-bar.js';
import { summaryJson, sweepSummaryText } from '../sweep-summary-text.js';
import { JSON_FORMAT_VERSION } from '../../report/value-json.js';

interface RunArgs {
  claims: string[];
  max?: string[];
  workers?: number;
  db: string;
  'stop-at-first': boolean;
  'keep-permutations': boolean;
  'max-counterexamples'?: number;
  'time-limit'?: number;
  exact: boolean;
  json: boolean;
  'chunk-size'?: number;
  shard?: string;
}

/** Ctrl-C / SIGTERM abort the sweep once (finished chunks are kept); a second one exits at once. */
function interruptSignal(): { signal: AbortSignal; dispose: () => void } {
  const ctl = new AbortController();
  const handler = () => {
    if (ctl.signal.aborted) process.exit(130);
    ctl.abort();
  };
  process.on('SIGINT', handler);
  process.on('SIGTERM', handler);
  return {
    signal: ctl.signal,
    dispose: () => {
      process.off('SIGINT', handler);
      process.off('SIGTERM', handler);
    },
  };
}

export const runClaimsCommand: CommandModule<object, RunArgs> = {
  command: 'run <claims..>',
  describe: 'Sweep claim files over every boundary of their families, storing results as they finish',
  builder: (y) =>
    y
      .positional('claims', { type: 'string', array: true, describe: 'claim JSON files' })
      .option('max', { type: 'string', array: true, describe: "raise a variable's upper bound, e.g. --max n=5 (repeatable)" })
      .option('workers', { type: 'number', describe: 'worker threads (default: available parallelism)' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file (folder created if needed)' })
      .option('stop-at-first', { type: 'boolean', default: false, describe: 'finish the smallest class with a counterexample, then stop' })
      .option('max-counterexamples', { type: 'number', describe: 'stop handing out work once this many counterexamples are stored' })
      .option('time-limit', { type: 'number', describe: 'stop handing out work after this many seconds' })
      .option('exact', { type: 'boolean', default: false, describe: 'exact polynomials instead of modular identity tests' })
      .option('keep-permutations', { type: 'boolean', default: false, describe: 'store the permutation found for each instance (the ones serving a whole class are always kept)' })
      .option('json', { type: 'boolean', default: false, describe: 'print the summary as one JSON object, no progress bar' })
      .option('chunk-size', { type: 'number', describe: 'instances per chunk (the unit of resume; default: sized by measured work)' })
      .option('shard', { type: 'string', describe: "sweep only shard i of N (e.g. 0/4), balanced by estimated work; use one --db per shard; exit 4 if unfinished" }) as never,
  handler: (args) =>
    runCommand(args.json, async () => {
      const options = parseRunOptions({
        max: args.max ?? [],
        ...(args.workers !== undefined ? { workers: args.workers } : {}),
        db: args.db,
        stopAtFirst: args['stop-at-first'],
        ...(args['max-counterexamples'] !== undefined ? { maxCounterexamples: args['max-counterexamples'] } : {}),
        ...(args['time-limit'] !== undefined ? { timeLimit: args['time-limit'] } : {}),
        exact: args.exact,
        keepPermutations: args['keep-permutations'],
        json: args.json,
        ...(args['chunk-size'] !== undefined ? { chunkSize: args['chunk-size'] } : {}),
        ...(args.shard !== undefined ? { shard: args.shard } : {}),
      });
      const cores = availableParallelism();
      if ((options.workers ?? 0) > cores) {
        process.stderr.write(`⚠ --workers ${options.workers} is above this machine's ${cores} cores: the extra threads share cores and slow each other down (the default is ${cores})\n`);
      }
      // Threads asked for by number start before the claims compile; runSweep destroys them.
      const pool = await startWorkers(options);
      let claims;
      try {
        // Every claim is validated before the store is opened, so bad input never touches it.
        claims = args.claims.map((file) => loadSweepClaim(file));
      } catch (e) {
        await pool?.destroy();
        throw e;
      }
      const bar = sweepProgressBar(!options.json);
      const interrupt = interruptSignal();
      try {
        const summary = await runSweep({ claims, options, pool, signal: interrupt.signal, onProgress: bar.onProgress });
        bar.stop();
        process.stdout.write(`${options.json ? summaryJson({ formatVersion: JSON_FORMAT_VERSION, ...summary }) : sweepSummaryText(summary)}\n`);
        return summary.exitCode;
      } finally {
        bar.stop();
        interrupt.dispose();
      }
    }),
};
