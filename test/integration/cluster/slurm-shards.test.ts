/**
 * End to end on a real Slurm cluster: the scripts of `cluster-script` sweep a claim as a 4-task job array,
 * one shard fails on its first try (its store file is damaged) and is resubmitted, the merge job runs after
 * the array, and the merged store must equal a local single-process run of the same claim.
 * CI starts a single-node cluster first (.ci/slurm/start-cluster.sh). Elsewhere the test is skipped, loudly,
 * when no cluster answers; under CI=true a missing cluster is a failure.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, unlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli, query } from '../../e2e/cli-process.js';

const CLAIM = 'conjectures/k-theory-equals-cohomology.json';
const SHARDS = 4;
const FAILING = 2;

function clusterUp(): { up: boolean; why: string } {
  const r = spawnSync('sinfo', ['-h', '-o', '%T'], { encoding: 'utf8', timeout: 10_000 });
  if (r.error) return { up: false, why: `sinfo: ${r.error.message}` };
  if (r.status !== 0) return { up: false, why: `sinfo exited ${r.status}: ${r.stderr.trim()}` };
  const states = r.stdout.split('\n').filter(Boolean);
  return states.some((s) => /^(idle|mixed|allocated)/.test(s)) ? { up: true, why: '' } : { up: false, why: `no usable node (sinfo says: ${states.join(', ') || 'nothing'})` };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
/** Runs one of the generated scripts; a failure carries its output. */
function bash(script: string): string {
  const r = spawnSync('bash', [script], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`${script} exited ${r.status}:\n${r.stdout}${r.stderr}`);
  return r.stdout;
}
// squeue may time out while slurmctld is busy on a loaded machine: try again a few times.
function squeue(...args: string[]): string {
  for (let attempt = 1; ; attempt++) {
    const r = spawnSync('squeue', ['-h', ...args], { encoding: 'utf8' });
    if (r.status === 0) return r.stdout.trim();
    if (attempt === 5) throw new Error(`squeue ${args.join(' ')} failed: ${r.stderr}`);
  }
}

/** Waits until the job leaves the queue, polling squeue (sbatch --wait polls with long back-off). */
async function waitGone(jobId: string, limitMs = 150_000): Promise<void> {
  const until = Date.now() + limitMs;
  while (squeue('-j', jobId) !== '') {
    if (Date.now() > until) throw new Error(`job ${jobId} still queued after ${limitMs / 1000} s: ${squeue('-j', jobId)}`);
    await sleep(300);
  }
}

function jobIds(dir: string): { array: string; merge: string } {
  const last = readFileSync(join(dir, 'jobs.txt'), 'utf8').trim().split('\n').pop()!;
  const [array, merge] = last.split(' ');
  return { array: array!, merge: merge! };
}

// The outcome a sweep must have whatever its cut into shards and chunks.
function outcome(db: string) {
  return {
    verified: query<{ k: string }>(db, `SELECT class_key || '/' || method AS k FROM verified_classes ORDER BY k`).map((r) => r.k),
    counterexamples: query<{ k: string }>(db, `SELECT class_key || ':' || instance_index || ' ' || left_value || ' vs ' || right_value AS k FROM counterexamples ORDER BY k`).map((r) => r.k),
    counts: query<{ class_key: string; checked: number; holds: number; fails: number }>(
      db,
      `SELECT class_key, SUM(checked) AS checked, SUM(holds) AS holds, SUM(fails) AS fails FROM chunks WHERE state = 'done' GROUP BY class_key ORDER BY class_key`,
    ),
  };
}

function dumpLogs(dir: string): void {
  const out: string[] = [];
  for (const f of existsSync(join(dir, 'logs')) ? readdirSync(join(dir, 'logs')).sort() : []) out.push(`--- ${f}\n${readFileSync(join(dir, 'logs', f), 'utf8')}`);
  const base = process.env.SLURM_BASE ?? '/tmp/slurm';
  for (const f of ['slurmctld.log', 'slurmd.log']) {
    const p = join(base, 'log', f);
    if (existsSync(p)) out.push(`--- ${p} (last lines)\n${readFileSync(p, 'utf8').split('\n').slice(-30).join('\n')}`);
  }
  process.stderr.write(`Slurm test failed; files kept in ${dir}\n${out.join('\n')}\n`);
}

const cluster = clusterUp();
const mustRun = process.env.CI === 'true';
if (!cluster.up && !mustRun) {
  process.stderr.write(`\n⚠ SKIPPED the Slurm end-to-end test: no Slurm cluster answers (${cluster.why}). Start one with 'bash .ci/slurm/start-cluster.sh' (root, Debian).\n\n`);
}

describe('sharded sweep on a real Slurm cluster', () => {
  it.runIf(!cluster.up && mustRun)('needs a running cluster under CI', () => {
    throw new Error(`CI=true but no Slurm cluster answers (${cluster.why}); .ci/run must start one with .ci/slurm/start-cluster.sh`);
  });

  it.skipIf(!cluster.up)(`runs ${SHARDS} shards as a job array, resubmits a failed one, and merges to the store of a local run`, async () => {
    const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-slurm-'));
    const submitted: string[] = [];
    try {
      const reference = join(dir, 'reference.sqlite');
      // 1: the claim has a counterexample (it is false on purpose).
      expect(cli(['run', CLAIM, '--db', reference, '--workers', '2', '--json']).status).toBe(1);

      const out = join(dir, 'job');
      const made = cli(['cluster-script', CLAIM, '--shards', String(SHARDS), '--out', out, '--time', '00:05:00', '--cpus-per-task', '1']);
      expect(made.status, made.stderr).toBe(0);
      expect(made.stdout).toContain('submit.sh');
      const script = readFileSync(join(out, 'shard.sbatch'), 'utf8');
      expect(script).toContain(`#SBATCH --array=0-${SHARDS - 1}`);
      expect(readFileSync(join(out, 'submit.sh'), 'utf8')).toContain('--dependency=afterok:');

      // A damaged store makes one shard fail on its first try, as a broken disk or a bad copy would.
      const damaged = join(out, 'stores', `shard-${FAILING}-of-${SHARDS}.sqlite`);
      writeFileSync(damaged, 'not a database');

      bash(join(out, 'submit.sh'));
      const first = jobIds(out);
      submitted.push(first.array, first.merge);
      await waitGone(first.array);
      for (let i = 0; i < SHARDS; i++) expect(existsSync(join(out, 'status', `shard-${i}.ok`)), `shard ${i} succeeded`).toBe(i !== FAILING);
      const failedLog = readdirSync(join(out, 'logs')).find((f) => f.startsWith(`shard-${FAILING}.job-${first.array}`))!;
      expect(readFileSync(join(out, 'logs', failedLog), 'utf8')).toMatch(/ended with status [23]\b/);
      // afterok: the merge job never runs after a failed task (Slurm's dependency rule).
      expect(squeue('-j', first.merge, '-o', '%T')).toBe('PENDING');
      expect(existsSync(join(out, 'merged.sqlite'))).toBe(false);

      unlinkSync(damaged);
      const again = bash(join(out, 'resubmit-failed.sh'));
      expect(again).toContain(`resubmitted shards ${FAILING} `);
      const second = jobIds(out);
      submitted.push(second.array, second.merge);
      await waitGone(second.merge);
      expect(squeue('-j', first.merge)).toBe(''); // the stale merge job was cancelled
      const state = execFileSync('scontrol', ['show', 'job', second.merge], { encoding: 'utf8' });
      expect(state).toMatch(/JobState=COMPLETED/);
      expect(state).toMatch(/ExitCode=0:0/);

      const merged = join(out, 'merged.sqlite');
      const got = outcome(merged);
      expect(got).toEqual(outcome(reference));
      // Instances per class: three sides of length n, 2^n strings each, so 2^(3n) (common practice, no source).
      expect(got.counts.map((c) => c.checked)).toEqual([1, 2, 3, 4].map((n) => 2 ** (3 * n)));
      // The claim is false on purpose (README, "Writing a claim"), so the comparison above covers counterexamples.
      expect(got.counterexamples.length).toBeGreaterThan(0);
      expect(existsSync(join(out, 'report.html'))).toBe(true);
      rmSync(dir, { recursive: true, force: true });
    } catch (e) {
      dumpLogs(join(dir, 'job'));
      throw e;
    } finally {
      // Only the jobs this test submitted, by id.
      const live = submitted.filter((j) => spawnSync('squeue', ['-h', '-j', j], { encoding: 'utf8' }).stdout.trim() !== '');
      if (live.length) spawnSync('scancel', live);
    }
  });
});
