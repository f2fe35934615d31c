import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, cliAsync, query } from './cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-kill-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const CLAIM = 'conjectures/k-theory-equals-cohomology.json';
const SWEEP = [CLAIM, '--max', 'n=5', '--chunk-size', '16', '--json'];
const ARGS = [...SWEEP, '--workers', '2'];

// The parts of a store that must not depend on how the sweep was cut: verified classes and counterexamples.
function outcome(db: string) {
  return {
    verified: query<{ k: string }>(db, 'SELECT class_key || \'/\' || method AS k FROM verified_classes ORDER BY k').map((r) => r.k),
    counterexamples: query<{ k: string }>(db, "SELECT class_key || ':' || instance_index AS k FROM counterexamples ORDER BY k").map((r) => r.k),
  };
}

// Done chunks of one class must tile [0, count) exactly: no gap, no overlap, so nothing is counted twice.
function tiling(db: string): Record<string, string> {
  const rows = query<{ class_key: string; start_index: number; end_index: number }>(
    db,
    "SELECT class_key, start_index, end_index FROM chunks WHERE state = 'done' ORDER BY class_key, start_index",
  );
  const out: Record<string, string> = {};
  for (const r of rows) {
    const prev = out[r.class_key] ?? '0';
    out[r.class_key] = Number(prev) === r.start_index ? String(r.end_index) : `gap-or-overlap at ${r.start_index}`;
  }
  return out;
}

// One uninterrupted single-process sweep with ARGS: the store the killed, resumed and shared runs must end
// with. Built on first use, once for the whole file.
let referenceDb: string | undefined;
function referenceStore(): string {
  if (referenceDb === undefined) {
    const db = join(dir, 'reference.sqlite');
    expect(cli(['run', ...ARGS, '--db', db]).status).toBe(1);
    referenceDb = db;
  }
  return referenceDb;
}

describe('kill -9 and worker crashes (built CLI, real store files)', () => {
  it('a sweep killed with SIGKILL resumes to the same store as an uninterrupted one', async () => {
    const reference = referenceStore();

    const killed = join(dir, 'killed.sqlite');
    const child = cliAsync(['run', ...ARGS, '--db', killed]);
    const exited = new Promise((resolve) => child.on('exit', resolve));
    let doneAtKill = 0;
    for (let waited = 0; waited < 60_000; waited += 20) {
      await new Promise((r) => setTimeout(r, 20));
      try {
        doneAtKill = query<{ n: number }>(killed, "SELECT COUNT(*) AS n FROM chunks WHERE state = 'done'")[0]!.n;
      } catch {
        continue; // the store is not created yet
      }
      if (doneAtKill >= 40) break;
    }
    child.kill('SIGKILL');
    await exited;
    const atKill = query<{ status: string }>(killed, 'SELECT status FROM runs')[0]!;
    expect(atKill.status).toBe('running'); // killed mid-sweep, so the kill really interrupted work
    expect(doneAtKill).toBeGreaterThanOrEqual(40);
    // status tells the killed run apart from a live one [definition of the status command]
    expect(cli(['status', CLAIM, '--db', killed]).stdout).toContain('its process is gone');

    const resumed = cli(['run', ...ARGS, '--db', killed]);
    expect(resumed.status).toBe(1);
    const summary = JSON.parse(resumed.stdout) as { claims: { instancesChecked: number }[] };
    // 2^3 + 2^6 + 2^9 + 2^12 + 2^15 labelings in classes n = 1..5 (common practice, no source).
    const total = [1, 2, 3, 4, 5].reduce((a, n) => a + 2 ** (3 * n), 0);
    expect(summary.claims[0]!.instancesChecked).toBeLessThan(total);
    expect(summary.claims[0]!.instancesChecked).toBeGreaterThan(0);
    expect(outcome(killed)).toEqual(outcome(reference));
    expect(tiling(killed)).toEqual(tiling(reference));
    expect(query<{ status: string }>(killed, 'SELECT status FROM runs ORDER BY run_id').map((r) => r.status)).toEqual(['interrupted', 'completed']);
    expect(query(killed, "SELECT * FROM chunks WHERE state = 'leased'")).toEqual([]);
  });

  it('SIGTERM stores finished chunks, marks the run interrupted and exits 130', async () => {
    const db = join(dir, 'term.sqlite');
    const child = cliAsync(['run', ...ARGS, '--db', db]);
    const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
    for (let waited = 0; waited < 60_000; waited += 20) {
      await new Promise((r) => setTimeout(r, 20));
      try {
        if (query<{ n: number }>(db, "SELECT COUNT(*) AS n FROM chunks WHERE state = 'done'")[0]!.n >= 20) break;
      } catch {
        continue;
      }
    }
    child.kill('SIGTERM');
    expect(await exited).toBe(130);
    expect(query(db, 'SELECT status, stop_reason FROM runs')).toEqual([{ status: 'interrupted', stop_reason: 'signal' }]);
    expect(query(db, "SELECT * FROM chunks WHERE state = 'leased'")).toEqual([]);
    expect(query<{ k: string }>(db, 'SELECT class_key AS k FROM verified_classes').map((r) => r.k)).not.toContain('n=5');
  });

  it('an injected worker crash is retried and the run completes with the full result', () => {
    const db = join(dir, 'crash.sqlite');
    const r = cli(['run', CLAIM, '--workers', '2', '--chunk-size', '64', '--json', '--db', db], { PUZZLESWEEP_TEST_CRASH: 'n=4:1600' });
    expect(r.status).toBe(1);
    const summary = JSON.parse(r.stdout) as { workerCrashes: number; claims: { status: string; instancesChecked: number }[] };
    expect(summary.workerCrashes).toBe(1);
    expect(summary.claims[0]!.status).toBe('completed');
    // 8 + 64 + 512 + 4096 labelings for n = 1..4 (common practice, no source).
    expect(summary.claims[0]!.instancesChecked).toBe(4680);
    expect(tiling(db)['n=4']).toBe('4096');
  });

  it('two processes sweeping one store at once end with the store of one process, nothing counted twice', async () => {
    const reference = referenceStore();
    const shared = join(dir, 'shared.sqlite');
    // One worker each (the flag given once: a repeated --workers is not what this test is about).
    const one = cliAsync(['run', ...SWEEP, '--workers', '1', '--db', shared]);
    const two = cliAsync(['run', ...SWEEP, '--workers', '1', '--db', shared]);
    // Both stderr streams go into the failure message, so a rare bad exit can be diagnosed from the CI log.
    const stderr = ['', ''];
    [one, two].forEach((c, k) => c.stderr.on('data', (d: Buffer) => (stderr[k] += d.toString())));
    const codes = await Promise.all([one, two].map((c) => new Promise<number | null>((resolve) => c.on('close', (code) => resolve(code)))));
    expect(codes, `stderr of the two runs:\n${stderr.join('\n---\n')}`).toEqual([1, 1]);
    expect(outcome(shared)).toEqual(outcome(reference));
    expect(tiling(shared)).toEqual(tiling(reference));
    // both runs did part of the work: the chunks were shared, not swept twice
    const perRun = query<{ n: number }>(shared, "SELECT COUNT(*) AS n FROM chunks WHERE state = 'done' GROUP BY run_id");
    expect(perRun.length).toBeGreaterThanOrEqual(2);
    expect(query(shared, "SELECT * FROM chunks WHERE state = 'leased'")).toEqual([]);
  });
});
