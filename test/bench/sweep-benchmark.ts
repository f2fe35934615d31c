/** Sweep benchmarks (issue 3): batched vs one DP per instance, 1 vs 2 workers (whole CLI processes), modular vs exact, memory of 1M instances. */
import { execFileSync, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { ClaimInput } from '../../src/claims/index.js';
import type { SweepCase } from './sweep-case.js';
import { root } from './timed-process.js';

const here = dirname(fileURLToPath(import.meta.url));

interface Measured {
  instances: number;
  ms: number;
  perSecond: number;
  maxRssMB: number;
}

function measure(c: SweepCase): Measured {
  const out = execFileSync(process.execPath, ['--import', 'tsx', join(here, 'sweep-case.ts'), JSON.stringify(c)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  return JSON.parse(out) as Measured;
}

// A whole `puzzlesweep run` process (CLI start-up, store and worker threads included) under /usr/bin/time,
// its resident memory read from /proc every 50 ms while it runs.
interface CliSweep {
  instances: number;
  wall: number;
  cpu: number;
  peakMB: number;
  /** Resident memory at each tenth of the run's wall time. */
  tenthsMB: number[];
}

const cli = join(root, 'dist', 'cli', 'main.js');

function residentKB(pid: number): number | undefined {
  try {
    const line = readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find((l) => l.startsWith('VmRSS:'));
    return line ? Number(line.split(/\s+/)[1]) : undefined;
  } catch {
    return undefined;
  }
}

function childOf(pid: number): number | undefined {
  try {
    const first = readFileSync(`/proc/${pid}/task/${pid}/children`, 'utf8').trim().split(' ')[0];
    return first ? Number(first) : undefined;
  } catch {
    return undefined;
  }
}

async function cliSweep(file: string, db: string, workers: number, chunkSize: number): Promise<CliSweep> {
  const child = spawn('/usr/bin/time', ['-f', 'TIME %e %U %S %M', process.execPath, cli, 'run', file, '--workers', String(workers), '--chunk-size', String(chunkSize), '--db', db, '--json'], { cwd: root });
  let out = '';
  let err = '';
  child.stdout.on('data', (d: Buffer) => (out += d.toString()));
  child.stderr.on('data', (d: Buffer) => (err += d.toString()));
  const samples: number[] = [];
  const poll = setInterval(() => {
    const node = childOf(child.pid!);
    const kb = node !== undefined ? residentKB(node) : undefined;
    if (kb !== undefined) samples.push(kb / 1024);
  }, 50);
  const status = await new Promise<number | null>((resolve) => child.on('close', resolve));
  clearInterval(poll);
  const [wall, user, sys, kb] = (err.split('\n').find((l) => l.startsWith('TIME ')) ?? 'TIME 0 0 0 0').split(' ').slice(1).map(Number) as [number, number, number, number];
  const instances = status === 0 ? (JSON.parse(out) as { claims: { instancesChecked: number }[] }).claims[0]!.instancesChecked : 0;
  const tenthsMB = Array.from({ length: 10 }, (_, k) => Math.round(samples[Math.min(samples.length - 1, Math.floor(((k + 1) * samples.length) / 10) - 1)] ?? 0));
  return { instances, wall, cpu: user + sys, peakMB: Math.round(kb / 1024), tenthsMB };
}

const claim = (id: string, theory: string, sides: (number | string)[], transform: object[], variables: object[] = []): ClaimInput =>
  ({ id, statement: 'benchmark', theory, family: { sides, variables }, transform, compare: { measure: { type: 'value' }, relation: { type: 'equal' } } }) as ClaimInput;

const rate = (m: Measured) => `${Math.round(m.perSecond).toLocaleString('en-US')}/s`;
const ratio = (a: Measured, b: Measured) => `${(a.perSecond / b.perSecond).toFixed(2)}×`;

export default async function sweepBenchmark(): Promise<string> {
  const parallelogram = claim('bench-parallelogram', 'cohomology', [3, 7, 0, 3, 7, 0], [{ type: 'exchange', sides: [1, 4] }]);
  const batched = measure({ kind: 'batched', claim: parallelogram, limit: 200000 });
  const single = measure({ kind: 'per-instance', claim: parallelogram, limit: 200000 });

  // 1 vs 2 workers on the million-instance sweep as whole CLI processes (what a user runs), alternating so a
  // change in the machine's load hits both alike; the median of 3 by wall time.
  const million = claim('bench-million', 'cohomology', [5, 5, 0, 5, 5, 0], [{ type: 'exchange', sides: [1, 4] }]);
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-sweep-bench-'));
  const runs: Record<1 | 2, CliSweep[]> = { 1: [], 2: [] };
  const loads = [loadavg()[0]!.toFixed(1)];
  try {
    const file = join(dir, 'million.json');
    writeFileSync(file, JSON.stringify(million));
    let n = 0;
    for (let i = 0; i < 3; i++) for (const w of [1, 2] as const) runs[w].push(await cliSweep(file, join(dir, `store-${n++}.sqlite`), w, 2000));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  loads.push(loadavg()[0]!.toFixed(1));
  const median = (r: CliSweep[]) => [...r].sort((a, b) => a.wall - b.wall)[1]!;
  const one = median(runs[1]);
  const two = median(runs[2]);
  const cliRate = (m: CliSweep) => `${Math.round(m.instances / m.wall).toLocaleString('en-US')}/s`;

  const equivariant = claim('bench-equivariant', 'equivariant', [7, 0, 7, 0, 7, 0], [{ type: 'rotate', degrees: 120 }]);
  const modular = measure({ kind: 'evaluate', claim: equivariant, exact: false, limit: 20000 });
  const exact = measure({ kind: 'evaluate', claim: equivariant, exact: true, limit: 20000 });

  return [
    '## Sweeps (test/bench/sweep-benchmark.ts)',
    '',
    '| case | instances | time | rate | ratio | goal |',
    '|---|---:|---:|---:|---:|---|',
    `| parallelogram 3,7,0,3,7,0 cohomology, exchange sides 1↔4: evaluator with cached one-sweep completions | ${batched.instances} | ${batched.ms.toFixed(0)} ms | ${rate(batched)} | ${ratio(batched, single)} vs one DP per instance | ≥ 20× |`,
    `| same, one closed DP for b and one for T(b) per instance | ${single.instances} | ${single.ms.toFixed(0)} ms | ${rate(single)} | 1× | |`,
    `| parallelogram 5,5,0,5,5,0 cohomology, exchange 1↔4: \`puzzlesweep run --chunk-size 2000\` into a fresh store, 1 worker (whole process, wall; CPU ${one.cpu.toFixed(2)} s) | ${one.instances} | ${(one.wall * 1000).toFixed(0)} ms | ${cliRate(one)} | 1× | |`,
    `| same, 2 workers (CPU ${two.cpu.toFixed(2)} s) | ${two.instances} | ${(two.wall * 1000).toFixed(0)} ms | ${cliRate(two)} | ${(one.wall / two.wall).toFixed(2)}× vs 1 worker | ≥ 1.8× on 2 cores |`,
    `| equivariant triangle n = 7, rotation by 120°: modular identity test | ${modular.instances} | ${modular.ms.toFixed(0)} ms | ${rate(modular)} | ${ratio(modular, exact)} vs exact | |`,
    `| same, exact polynomials (--exact) | ${exact.instances} | ${exact.ms.toFixed(0)} ms | ${rate(exact)} | 1× | |`,
    '',
    `The million-instance rows are \`run\` processes of the built CLI, medians of 3 by wall time, 1 and 2 workers alternating (wall times, 1 worker: ${runs[1].map((r) => r.wall.toFixed(2)).join(', ')} s; 2 workers: ${runs[2].map((r) => r.wall.toFixed(2)).join(', ')} s); load average (1 min) before and after: ${loads.join(', ')} on 2 cores.`,
    `Peak resident memory of the million-instance sweep (whole process, main thread and workers, /usr/bin/time): ${one.peakMB} MB with 1 worker, ${two.peakMB} MB with 2 (goal ≤ 300 MB, flat).`,
    `Resident memory at each tenth of the 2-worker run's wall time (/proc, every 50 ms): ${two.tenthsMB.join(', ')} MB.`,
  ].join('\n');
}
