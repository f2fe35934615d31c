import { join } from 'node:path';
import cliProgress from 'cli-progress';
import type { CommandModule } from 'yargs';
import { loadDiscoverInput, theoryInput } from '../../discover/discover-input.js';
import { runDiscover } from '../../discover/run-discover.js';
import { parseRunOptions } from '../../run/run-options.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { discoverText } from '../discover-text.js';

interface DiscoverArgs {
  family: string;
  theory: string[];
  max?: string[];
  db: string;
  out?: string;
  json: boolean;
}

export const discoverCommand: CommandModule<object, DiscoverArgs> = {
  command: 'discover <family>',
  describe: 'Search a family for the symmetries that hold (smallest classes first) and write each survivor as a claim file',
  builder: (y) =>
    y
      .positional('family', { type: 'string', describe: "JSON file with a claim's family object (and optionally a space narrowing the candidates)" })
      .option('theory', { type: 'string', array: true, demandOption: true, describe: 'one or more theories (names or piece-set files); several also compare each against the others' })
      .option('max', { type: 'string', array: true, describe: "a variable's upper bound for this run, e.g. --max a=4 (repeatable)" })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file; a second run resumes from it' })
      .option('out', { type: 'string', describe: 'folder for the survivors’ claim files (default results/discover/<family id>)' })
      .option('json', { type: 'boolean', default: false, describe: 'print { survivors, dropped } as JSON, no progress bar' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const { max } = parseRunOptions({ max: args.max ?? [] });
      const input = loadDiscoverInput(args.family, args.theory.map(theoryInput));
      const out = args.out ?? join('results', 'discover', input.prefix);
      const bar = !args.json && process.stderr.isTTY ? new cliProgress.SingleBar({ stream: process.stderr, format: 'discover {bar} {percentage}% | {value}/{total} boundaries | class {cls} | {alive} candidates alive', fps: 5, hideCursor: true }, cliProgress.Presets.shades_classic) : undefined;
      const ctl = new AbortController();
      const onSignal = () => (ctl.signal.aborted ? process.exit(130) : ctl.abort());
      process.on('SIGINT', onSignal);
      process.on('SIGTERM', onSignal);
      let started = false;
      try {
        const result = runDiscover(input, {
          max,
          db: args.db,
          out,
          signal: ctl.signal,
          onProgress: (p) => {
            if (!bar) return;
            if (!started) bar.start(Math.max(p.total, 1), 0, { cls: p.classKey, alive: p.alive });
            started = true;
            bar.update(p.done, { cls: p.classKey || 'done', alive: p.alive });
          },
        });
        bar?.stop();
        if (args.json) process.stdout.write(`${JSON.stringify({ survivors: result.survivors, dropped: result.dropped })}\n`);
        else process.stdout.write(`${discoverText(result, input.prefix, args.theory)}\n`);
        return result.interrupted ? 130 : 0;
      } finally {
        bar?.stop();
        process.off('SIGINT', onSignal);
        process.off('SIGTERM', onSignal);
      }
    }),
};
