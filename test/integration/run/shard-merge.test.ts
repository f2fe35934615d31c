/**
 * `run --shard i/N` and `merge` through the built CLI on real claims: the merged shards equal one local run,
 * and a shard stopped by its time limit exits 4, is reported unfinished by merge, and resumes when run again.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, query } from '../../e2e/cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-shards-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// A false claim whose transform is an involution: pairs {b, T(b)} are evaluated once, by their lower index, and
// a failing pair stores both rows even when T(b) falls in another shard. (Mirroring alone does not keep
// cohomology values; the true symmetry also complements the labels; common practice, no source.)
const mirrorOnly = join(dir, 'mirror-only.json');
writeFileSync(
  mirrorOnly,
  JSON.stringify({
    id: 'test-mirror-only',
    statement: 'Mirroring a triangle keeps its cohomology value (false).',
    theory: 'cohomology',
    family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 4 }] },
    transform: [{ type: 'mirror' }],
    compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
  }),
);

// What a sweep must end with whatever its cut into shards and chunks.
function outcome(db: string) {
  return {
    verified: query<{ k: string }>(db, `SELECT class_key || '/' || method AS k FROM verified_classes ORDER BY k`).map((r) => r.k),
    counterexamples: query<{ k: string }>(db, `SELECT class_key || ':' || instance_index || ' ' || left_value || ' vs ' || right_value AS k FROM counterexamples ORDER BY k`).map((r) => r.k),
    checked: query<{ class_key: string; n: number }>(db, `SELECT class_key, SUM(checked) AS n FROM chunks WHERE state = 'done' GROUP BY class_key ORDER BY class_key`),
  };
}

describe('sharded runs merged (built CLI, real store files)', () => {
  it.each([
    ['conjectures/k-theory-equals-cohomology.json', 3],
    ['conjectures/cohomology-parallelogram-mirror-complement.json', 4],
    [mirrorOnly, 3],
  ])('%s in %i shards merges to the store of one run', (claim, n) => {
    const name = claim.replace(/\W/g, '_').slice(-60);
    const reference = join(dir, `${name}-ref.sqlite`);
    const single = cli(['run', claim, '--db', reference, '--workers', '2', '--json']);
    expect([0, 1]).toContain(single.status);
    const stores: string[] = [];
    for (let i = 0; i < n; i++) {
      const db = join(dir, `${name}-${i}.sqlite`);
      const r = cli(['run', claim, '--shard', `${i}/${n}`, '--db', db, '--workers', '1', '--chunk-size', '37', '--json']);
      expect([0, 1], r.stderr).toContain(r.status);
      stores.push(db);
    }
    const merged = join(dir, `${name}-merged.sqlite`);
    const m = cli(['merge', ...stores.reverse(), '--into', merged, '--json']);
    expect(m.status, m.stderr).toBe(0);
    expect(JSON.parse(m.stdout).complete).toBe(true);
    expect(outcome(merged)).toEqual(outcome(reference));
    // status reads the union: the same verified classes and counterexample count as the single run.
    const status = (db: string) => JSON.parse(cli(['status', claim, '--db', db, '--json']).stdout)[0] as { verified: unknown[]; counterexamples: number };
    expect(status(merged).verified).toEqual(status(reference).verified);
    expect(status(merged).counterexamples).toBe(status(reference).counterexamples);
  });

  it('a shard stopped early exits 4 even when it found a counterexample, so a scheduler runs it again', () => {
    const claim = 'conjectures/k-theory-equals-cohomology.json';
    const stores = [0, 1].map((i) => join(dir, `mc-${i}.sqlite`));
    const exits = stores.map((db, i) => {
      const r = cli(['run', claim, '--shard', `${i}/2`, '--db', db, '--workers', '1', '--chunk-size', '16', '--max-counterexamples', '1', '--json']);
      const summary = JSON.parse(r.stdout) as { claims: { stopReason: string }[] };
      // exit 4 exactly when the shard stopped before its part was done (README, exit codes)
      expect(r.status === 4, r.stdout).toBe(summary.claims[0]!.stopReason !== 'finished');
      return r.status;
    });
    // The claim's one counterexample with n ≤ 4 lies in one shard, which then stops early.
    expect(exits).toContain(4);
    const m = cli(['merge', ...stores, '--into', join(dir, 'mc-merged.sqlite'), '--json']);
    const unfinished = (JSON.parse(m.stdout) as { claims: { shards: { unfinished: { index: number }[] } }[] }).claims[0]!.shards.unfinished.map((u) => u.index);
    expect(unfinished).toEqual([0, 1].filter((i) => exits[i] === 4));
  });

  it('a shard stopped by --time-limit exits 4, merge reports it unfinished, and running it again completes it', () => {
    const claim = 'conjectures/k-theory-equals-cohomology.json';
    const a = join(dir, 'tl-0.sqlite');
    const b = join(dir, 'tl-1.sqlite');
    expect([0, 1]).toContain(cli(['run', claim, '--shard', '0/2', '--db', a, '--workers', '1']).status);
    const stopped = cli(['run', claim, '--shard', '1/2', '--db', b, '--workers', '1', '--time-limit', '0.001']);
    expect(stopped.status, stopped.stdout + stopped.stderr).toBe(4);
    const merged = join(dir, 'tl-merged.sqlite');
    const partial = cli(['merge', a, b, '--into', merged, '--json']);
    expect(partial.status).toBe(4);
    const report = JSON.parse(partial.stdout) as { complete: boolean; claims: { shards: { unfinished: { index: number }[]; missing: number[] } }[] };
    expect(report.complete).toBe(false);
    expect(report.claims[0]!.shards.unfinished.map((u) => u.index)).toEqual([1]);
    expect([0, 1]).toContain(cli(['run', claim, '--shard', '1/2', '--db', b, '--workers', '1']).status);
    expect(cli(['merge', a, b, '--into', merged]).status).toBe(0);
    const missing = cli(['merge', a, '--into', join(dir, 'half.sqlite'), '--json']);
    expect(missing.status).toBe(4);
    expect(JSON.parse(missing.stdout).claims[0].shards.missing).toEqual([1]);
  });
});
