/**
 * Sweep pipeline benchmark (issue 8, the pipeline): the cost of leasing a chunk as a class's chunk rows
 * grow. 1 vs 2 workers is measured in family-yardstick-benchmark.ts, CLI start-up in single-count-benchmark.ts.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { ChunkLeaser, completeChunk, leaseChunk, openStore, saveClaim, startRun, type Store } from '../../src/store/index.js';

// A class with `rows` finished chunks of 16 instances, inserted in bulk (what a long sweep leaves behind).
function storeWithChunks(dir: string, rows: number, name: string): { db: Store; runId: number } {
  const db = openStore(join(dir, `lease-${rows}-${name}.sqlite`));
  saveClaim(db, { fingerprint: 'fp', claimId: 'bench', canonicalJson: '{}', engineVersion: 'bench' });
  const runId = startRun(db, 'fp', {});
  const insert = db.prepare(`INSERT INTO chunks (fingerprint, class_key, method, start_index, end_index, state, run_id) VALUES ('fp', 'n=1', 'modular', ?, ?, 'done', ?)`);
  db.transaction(() => {
    for (let i = 0; i < rows; i++) insert.run(i * 16, i * 16 + 16, runId);
  })();
  return { db, runId };
}

const done = (db: Store, runId: number, chunkId: number) =>
  completeChunk(db, { chunkId, runId, fingerprint: 'fp', classKey: 'n=1', checked: 16, holds: 16, fails: 0, skippedZero: 0, paired: 0, errorBound: 0, exact: true, durationMs: 1, counterexamples: [], permutations: [] });

/** Milliseconds per lease + completion, over `n` chunks leased after `rows` finished ones. */
function leaseCost(dir: string, rows: number, n: number, fresh: boolean): number {
  const { db, runId } = storeWithChunks(dir, rows, fresh ? 'old' : 'new');
  const count = BigInt((rows + n) * 16);
  const leaser = new ChunkLeaser(db, { fingerprint: 'fp', classKey: 'n=1', method: 'modular', runId, count });
  let from = BigInt(rows * 16);
  const t = performance.now();
  for (let i = 0; i < n; i++) {
    // `fresh`: the one-shot lease, which reads every blocking row of the class each time (the old behaviour).
    const lease = fresh ? leaseChunk(db, { fingerprint: 'fp', classKey: 'n=1', method: 'modular', runId, from: 0n, count, size: 16n }) : leaser.lease(from, 16n);
    if (!lease) throw new Error('nothing to lease');
    from = lease.end;
    done(db, runId, lease.chunkId);
  }
  const ms = (performance.now() - t) / n;
  db.close();
  return ms;
}

export default async function pipelineBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-pipeline-'));
  const load = loadavg()[0]!.toFixed(1);
  try {
    const lease = [5_000, 40_000].map((rows) => ({ rows, now: leaseCost(dir, rows, 2_000, false), old: leaseCost(dir, rows, 200, true) }));
    return [
      '## Sweep pipeline (test/bench/pipeline-benchmark.ts)',
      '',
      `Load average when this section ran: ${load} on 2 cores (other work inflates the times; compare the two columns with each other).`,
      '',
      '### Leasing a chunk as a class fills up (lease + store one chunk of 16, same process)',
      '',
      '| finished chunks in the class | per chunk now (ChunkLeaser: rows added since the last lease) | per chunk reading every row of the class (before) |',
      '|---:|---:|---:|',
      ...lease.map((l) => `| ${l.rows.toLocaleString('en-US')} | ${l.now.toFixed(3)} ms | ${l.old.toFixed(3)} ms |`),
      '',
      `Growth from 5,000 to 40,000 chunks: ${(lease[1]!.now / lease[0]!.now).toFixed(2)}× now, ${(lease[1]!.old / lease[0]!.old).toFixed(2)}× before (goal: flat).`,
    ].join('\n');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
