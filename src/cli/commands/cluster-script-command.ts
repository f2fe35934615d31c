import { chmodSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { CommandModule } from 'yargs';
import { loadSweepClaim } from '../../run/load-sweep-claim.js';
import { parseRunOptions } from '../../run/run-options.js';
import { checkSlurmInput, slurmScripts, submitOneLiner, type SlurmScriptInput } from '../../run/slurm-scripts.js';
import { runCommand } from '../run-command.js';
import { writeOutputFile } from '../write-output-file.js';

interface ClusterArgs {
  claim: string;
  shards: number;
  out?: string;
  partition?: string;
  time?: string;
  'cpus-per-task': number;
  max?: string[];
  exact: boolean;
  'chunk-size'?: number;
}

// dist/cli/commands/ → dist/cli/main.js, the CLI the jobs run.
const cliMain = fileURLToPath(new URL('../main.js', import.meta.url));

export const clusterScriptCommand: CommandModule<object, ClusterArgs> = {
  command: 'cluster-script <claim>',
  describe: 'Write Slurm scripts that sweep a claim as a job array of shards, then merge their stores',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim JSON file' })
      .option('shards', { type: 'number', demandOption: true, describe: 'number of shards (array tasks)' })
      .option('out', { type: 'string', describe: 'folder for the scripts, logs and stores (default results/cluster/<claim id>/)' })
      .option('partition', { type: 'string', describe: 'Slurm partition of both jobs' })
      .option('time', { type: 'string', describe: "Slurm time limit of each task, HH:MM:SS; each shard stops in time to keep its work" })
      .option('cpus-per-task', { type: 'number', default: 1, describe: 'CPUs per shard; the shard runs one worker per CPU' })
      .option('max', { type: 'string', array: true, describe: 'variable bounds passed to every shard, e.g. --max n=6' })
      .option('exact', { type: 'boolean', default: false, describe: 'shards use exact polynomials' })
      .option('chunk-size', { type: 'number', describe: 'instances per chunk in every shard' }) as never,
  handler: (args) =>
    runCommand(false, () => {
      const claim = loadSweepClaim(args.claim);
      // The shards' options are validated here, on the login node, rather than in every task.
      parseRunOptions({ max: args.max ?? [], exact: args.exact, ...(args['chunk-size'] !== undefined ? { chunkSize: args['chunk-size'] } : {}) });
      const runArgs = [...(args.max ?? []).flatMap((m) => ['--max', m]), ...(args.exact ? ['--exact'] : []), ...(args['chunk-size'] !== undefined ? ['--chunk-size', String(args['chunk-size'])] : [])];
      const dir = resolve(args.out ?? join('results', 'cluster', claim.id));
      const input: SlurmScriptInput = {
        claimId: claim.id,
        fingerprint: claim.fingerprint,
        claimFile: resolve(args.claim),
        shards: args.shards,
        dir,
        node: process.execPath,
        cli: cliMain,
        partition: args.partition,
        time: args.time,
        cpusPerTask: args['cpus-per-task'],
        runArgs,
      };
      checkSlurmInput(input);
      for (const f of slurmScripts(input)) {
        const path = join(dir, f.name);
        writeOutputFile(path, f.text, '--out');
        if (f.executable) chmodSync(path, 0o755);
      }
      // Slurm does not create the folders of --output; a job with an unwritable log path fails before it starts.
      for (const d of ['logs', 'stores', 'status']) mkdirSync(join(dir, d), { recursive: true });
      process.stdout.write(
        [
          `wrote ${dir}/{shard.sbatch,merge.sbatch,submit.sh,resubmit-failed.sh} for ${args.shards} shards of ${claim.id}`,
          'submit both jobs (the merge runs after every shard succeeded):',
          `  bash ${join(dir, 'submit.sh')}`,
          `  or by hand: ${submitOneLiner(dir)}`,
          `then: merged store ${join(dir, 'merged.sqlite')}, report ${join(dir, 'report.html')}, logs ${join(dir, 'logs')}/`,
          `if shards fail or hit the time limit: bash ${join(dir, 'resubmit-failed.sh')} (reruns only those; they resume)`,
          '',
        ].join('\n'),
      );
    }),
};
