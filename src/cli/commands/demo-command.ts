import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join, relative } from 'node:path';
import type { CommandModule } from 'yargs';
import { loadSweepClaim } from '../../run/load-sweep-claim.js';
import { parseRunOptions } from '../../run/run-options.js';
import { runSweep } from '../../run/run-sweep.js';
import { DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { sweepProgressBar } from '../sweep-progress-bar.js';
import { sweepSummaryText } from '../sweep-summary-text.js';
import { writeClaimReport } from '../write-claim-report.js';

/** The demo sweeps into the default store, the one `status`, `counterexamples` and `replay` read without --db; a second demo resumes. */
export const DEMO_STORE = DEFAULT_STORE_PATH;

// dist/cli/commands/ → the package root, where conjectures/ ships.
const conjecturesDir = fileURLToPath(new URL('../../../conjectures/', import.meta.url));

export const demoCommand: CommandModule<object, { workers?: number }> = {
  command: 'demo',
  describe: `Sweep the shipped conjectures into ${DEMO_STORE} (under a minute; run again to resume) and say where the results are`,
  builder: (y) => y.option('workers', { type: 'number', describe: 'worker threads (default: available parallelism)' }) as never,
  handler: (args) =>
    runCommand(false, async () => {
      const files = readdirSync(conjecturesDir).filter((f) => f.endsWith('.json')).sort();
      const claims = files.map((f) => loadSweepClaim(relative(process.cwd(), join(conjecturesDir, f)) || f));
      const options = parseRunOptions({ db: DEMO_STORE, timeLimit: 50, ...(args.workers !== undefined ? { workers: args.workers } : {}) });
      process.stdout.write(`sweeping ${claims.length} claims from ${relative(process.cwd(), conjecturesDir) || conjecturesDir}/ …\n`);
      const bar = sweepProgressBar(true);
      const summary = await runSweep({ claims, options, onProgress: bar.onProgress });
      bar.stop();
      const failing = summary.claims.filter((c) => c.counterexamples > 0).map((c) => c.claimId);
      const reports = failing.map((id) => writeClaimReport(DEMO_STORE, id, { draw: 6 }).out);
      process.stdout.write(
        [
          sweepSummaryText(summary),
          '',
          `The results are in the SQLite store ${DEMO_STORE}. Look at them with`,
          `  npx puzzlesweep status`,
          ...failing.map((id) => `  npx puzzlesweep counterexamples ${id} --smallest`),
          `or with any SQLite client (tables are described in README.md, "The store").`,
          ...(reports.length ? ['', 'Reports with the counterexamples drawn (open them in a browser):', ...reports.map((r) => `  ${r}`)] : []),
          '',
        ].join('\n'),
      );
      // The demo ships a claim that is false on purpose, so finding its counterexample is success.
      return summary.exitCode === 130 ? 130 : 0;
    }),
};
