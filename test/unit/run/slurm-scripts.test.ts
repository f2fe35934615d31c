import { describe, expect, it } from 'vitest';
import { sh, shardTimeLimit, slurmScripts, slurmSeconds, submitOneLiner, type SlurmScriptInput } from '../../../src/run/slurm-scripts.js';

const input: SlurmScriptInput = {
  claimId: 'my-claim',
  fingerprint: 'a'.repeat(64),
  claimFile: '/home/me/claims/my claim.json',
  shards: 8,
  dir: '/scratch/me/run-1',
  node: '/usr/bin/node',
  cli: '/opt/puzzlesweep/dist/cli/main.js',
  partition: 'short',
  time: '02:00:00',
  cpusPerTask: 4,
  runArgs: ['--max', 'a=6'],
};
const file = (name: string) => slurmScripts(input).find((f) => f.name === name)!.text;

describe('Slurm scripts (sbatch options as documented in the sbatch manual page)', () => {
  it('reads Slurm time limits', () => {
    // [D-]HH:MM:SS in seconds (arithmetic; common practice, no source).
    expect(slurmSeconds('02:00:00')).toBe(7200);
    expect(slurmSeconds('1-00:00:30')).toBe(86430);
    for (const bad of ['2h', '00:61:00', '1:2:3', '']) expect(() => slurmSeconds(bad)).toThrow(expect.objectContaining({ code: 'invalid_argument', path: '--time' }));
  });

  it('stops a shard a margin before the limit: 10 %, at least 30 s, at most half', () => {
    expect(shardTimeLimit(7200)).toBe(6480);
    expect(shardTimeLimit(120)).toBe(90);
    expect(shardTimeLimit(40)).toBe(20);
  });

  it('quotes shell words only when needed, so nothing expands', () => {
    expect(sh('/a/b.json')).toBe('/a/b.json');
    expect(sh("it's $HOME")).toBe(`'it'\\''s $HOME'`);
  });

  it('writes a job array of one task per shard with its log, store, CPUs and time', () => {
    const shard = file('shard.sbatch');
    expect(shard).toContain('#SBATCH --array=0-7');
    expect(shard).toContain('#SBATCH --cpus-per-task=4');
    expect(shard).toContain('#SBATCH --partition=short');
    expect(shard).toContain('#SBATCH --time=02:00:00');
    expect(shard).toContain('#SBATCH --output=/scratch/me/run-1/logs/shard-%a.job-%A.out');
    expect(shard).toContain('WORKERS="${SLURM_CPUS_PER_TASK:-1}"');
    expect(shard).toContain('SLURM_ARRAY_TASK_COUNT');
    expect(shard).toContain('--shard "$i/$SHARDS"');
    expect(shard).toContain(`CLAIM='/home/me/claims/my claim.json'`);
    expect(shard).toContain('--max a=6 --time-limit 6480');
    // Every #SBATCH line comes before the first command, or sbatch ignores it.
    const lines = shard.split('\n');
    const lastDirective = lines.map((l, k) => (l.startsWith('#SBATCH') ? k : -1)).reduce((a, b) => Math.max(a, b));
    expect(lines.slice(1, lastDirective).every((l) => l.startsWith('#'))).toBe(true);
  });

  it('submits the merge after the array with afterok, and resubmits only failed shards', () => {
    expect(file('submit.sh')).toContain('--dependency=afterok:"${array%%;*}"');
    expect(file('resubmit-failed.sh')).toContain('sbatch --parsable --array="$list"');
    expect(file('merge.sbatch')).toContain('merge "${stores[@]}" --into "$LOCAL"');
    expect(submitOneLiner('/d')).toBe(`sbatch --dependency=afterok:$(sbatch --parsable /d/shard.sbatch | cut -d';' -f1) /d/merge.sbatch`);
  });

  it('names the flag of bad scheduler options', () => {
    expect(() => slurmScripts({ ...input, shards: 0 })).toThrow(expect.objectContaining({ path: '--shards' }));
    expect(() => slurmScripts({ ...input, cpusPerTask: 1.5 })).toThrow(expect.objectContaining({ path: '--cpus-per-task' }));
    expect(() => slurmScripts({ ...input, partition: 'a b' })).toThrow(expect.objectContaining({ path: '--partition' }));
    expect(() => slurmScripts({ ...input, dir: '/my runs/x' })).toThrow(expect.objectContaining({ path: '--out' }));
  });
});
