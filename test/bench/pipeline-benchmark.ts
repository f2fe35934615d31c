/**
 * Sweep pipeline benchmarks (issue 8, the pipeline): the cost of leasing a chunk as a class's chunk rows
 * grow, 1 vs 2 workers on the 6×6 parallelogram sweep (whole processes, wall and CPU), and CLI start-up.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { ChunkLeaser, completeChunk, leaseChunk, openStore, saveClaim, startRun, type Store } from '../../src/store/index.js';

const CLI = 'dist/cli/main.js';

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

interface Timed {
  wallMs: number;
  cpuMs: number;
  status: number | null;
  stdout: string;
}

// Whole process under /usr/bin/time: wall and CPU (user + system, every thread).
function timed(args: string[]): Timed {
  const t = performance.now();
  const r = spawnSync('/usr/bin/time', ['-f', '%U %S', process.execPath, ...args], { encoding: 'utf8', maxBuffer: 1 << 26 });
  const wallMs = performance.now() - t;
  const last = r.stderr.trim().split('\n').at(-1) ?? '0 0';
  const [u, s] = last.split(' ').map(Number) as [number, number];
  return { wallMs, cpuMs: (u + s) * 1000, status: r.status, stdout: r.stdout };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function startup(args: string[], reps: number): { wall: number; cpu: number } {
  const runs = Array.from({ length: reps }, () => timed(args));
  return { wall: median(runs.map((r) => r.wallMs)), cpu: median(runs.map((r) => r.cpuMs)) };
}

export default async function pipelineBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-pipeline-'));
  const load = loadavg()[0]!.toFixed(1);
  try {
    const lease = [5_000, 40_000].map((rows) => ({ rows, now: leaseCost(dir, rows, 2_000, false), old: leaseCost(dir, rows, 200, true) }));

    // The 6×6 parallelogram with opposite sides of equal content: 853,776 labelings (issue 8).
    const claimFile = join(dir, 'six.json');
    writeFileSync(
      claimFile,
      JSON.stringify({
        id: 'bench-six',
        statement: 'exchanging sides 1 and 4 keeps the cohomology value',
        theory: 'cohomology',
        family: { sides: [6, 6, 0, 6, 6, 0], variables: [], conditions: [{ type: 'sameContent', sides: [1, 4] }, { type: 'sameContent', sides: [2, 5] }] },
        transform: [{ type: 'exchange', sides: [1, 4] }],
        compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
      }),
    );
    const sweep = (workers: number) => {
      const r = timed([CLI, 'run', claimFile, '--workers', String(workers), '--db', join(dir, `six-${workers}.sqlite`), '--json']);
      const instances = (JSON.parse(r.stdout) as { claims: { instancesChecked: number }[] }).claims[0]!.instancesChecked;
      return { ...r, instances };
    };
    const one = sweep(1);
    const two = sweep(2);

    const small = join(dir, 'small.sqlite');
    timed([CLI, 'run', 'conjectures/cohomology-triangle-rotation.json', '--max', 'n=2', '--db', small, '--json']);
    const base = startup(['-e', '0'], 9);
    const help = startup([CLI, '--help'], 9);
    const count = startup([CLI, 'count', '--theory', 'cohomology', '--triangle', '0101,0101,1010'], 9);
    const status = startup([CLI, 'status', '--db', small], 9);
    const ms = (x: number) => `${x.toFixed(0)} ms`;
    const row = (name: string, s: { wall: number; cpu: number }) => `| ${name} | ${ms(s.wall)} | ${ms(s.wall - base.wall)} | ${ms(s.cpu)} | ${ms(s.cpu - base.cpu)} |`;

    return [
      '## Sweep pipeline (test/bench/pipeline-benchmark.ts)',
      '',
      `Load average when this section ran: ${load} on ${2} cores shared with other work, so wall times are inflated; compare ratios within a table.`,
      '',
      '### Leasing a chunk as a class fills up (lease + store one chunk of 16, same process)',
      '',
      '| finished chunks in the class | per chunk now (ChunkLeaser: rows added since the last lease) | per chunk reading every row of the class (before) |',
      '|---:|---:|---:|',
      ...lease.map((l) => `| ${l.rows.toLocaleString('en-US')} | ${l.now.toFixed(3)} ms | ${l.old.toFixed(3)} ms |`),
      '',
      `Growth from 5,000 to 40,000 chunks: ${(lease[1]!.now / lease[0]!.now).toFixed(2)}× now, ${(lease[1]!.old / lease[0]!.old).toFixed(2)}× before (goal: flat).`,
      '',
      '### 1 vs 2 workers: the 6×6 parallelogram sweep (6,6,0,6,6,0), opposite sides of equal content, into a fresh store (whole process)',
      '',
      '| workers | instances | wall | CPU (all threads) | exit |',
      '|---:|---:|---:|---:|---:|',
      `| 1 | ${one.instances.toLocaleString('en-US')} | ${(one.wallMs / 1000).toFixed(1)} s | ${(one.cpuMs / 1000).toFixed(1)} s | ${one.status} |`,
      `| 2 | ${two.instances.toLocaleString('en-US')} | ${(two.wallMs / 1000).toFixed(1)} s | ${(two.cpuMs / 1000).toFixed(1)} s | ${two.status} |`,
      '',
      `2 workers vs 1: ${(one.wallMs / two.wallMs).toFixed(2)}× in wall time (goal ≥ 1.8× on 2 idle cores).`,
      '',
      '### CLI start-up (median of 9 whole processes)',
      '',
      '| command | wall | wall − `node -e 0` | CPU | CPU − `node -e 0` |',
      '|---|---:|---:|---:|---:|',
      row('`node -e 0`', base),
      row('`puzzlesweep --help`', help),
      row('`puzzlesweep count` (Gr(2,4) triple)', count),
      row('`puzzlesweep status` (small store)', status),
      '',
      'Goal: `--help`, `count` and `status` within 120 ms of `node -e 0`. Only the invoked command is loaded (src/cli/command-registry.ts); dist/cli/main.js is an esbuild bundle (src/build/bundle-cli.mjs) and `--help` prints the copy yargs rendered at build time.',
    ].join('\n');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
