/**
 * Single counts as a researcher runs them (issue 8): CLI start-up, one cohomology coefficient at n = 20
 * against the Python yardstick (whole processes), the sweep strategy per theory (work and CPU, one process
 * per case), and the scaling of single counts n = 12 … 30 in cohomology and K-theory with peak memory.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { timed, type TimedRun } from './timed-process.js';
import { TRIPLES } from './yardstick-triples.js';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const cli = join(root, 'dist', 'cli', 'main.js');
const python = join(here, 'python-dp.py');

type Run = TimedRun;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const reverse = (s: string) => [...s].reverse().join('');
const sec = (x: number) => (x >= 10 ? x.toFixed(1) : x.toFixed(2));
const ms = (x: number) => `${Math.round(x * 1000)}`;

const countArgs = (theory: string, [l, m, n]: [string, string, string]) => [process.execPath, cli, 'count', '--theory', theory, '--triangle', `${l},${m},${n}`, '--json'];
const pythonArgs = (theory: string, [l, m, n]: [string, string, string]) => ['python3', python, 'count', theory, `${l},-,${m},-,${reverse(n)},-`];

function startupSection(dir: string): string[] {
  const small = join(dir, 'small.sqlite');
  timed([process.execPath, cli, 'run', 'conjectures/cohomology-triangle-rotation.json', '--max', 'n=2', '--db', small, '--json']);
  const cases: [string, string[], Record<string, string>?][] = [
    ['`node -e 0`', [process.execPath, '-e', '0']],
    ['`puzzlesweep --help` (the build’s copy of the help)', [process.execPath, cli, '--help']],
    ['`puzzlesweep --help` rendered by yargs (`PUZZLESWEEP_RENDER_HELP=1`)', [process.execPath, cli, '--help'], { PUZZLESWEEP_RENDER_HELP: '1' }],
    ['`puzzlesweep count` (Gr(2,4) triple)', countArgs('cohomology', ['0101', '0101', '1010'])],
    ['`puzzlesweep count` (the n = 20 coefficient)', countArgs('cohomology', TRIPLES[20]!)],
    ['`puzzlesweep status` (small store)', [process.execPath, cli, 'status', '--db', small]],
  ];
  // Interleaved, 9 rounds, so that load changes hit every case alike.
  const runs = cases.map(() => [] as Run[]);
  for (let k = 0; k < 9; k++) cases.forEach(([, cmd, env], i) => runs[i]!.push(timed(cmd, 60, env)));
  const wall = runs.map((r) => median(r.map((x) => x.wall)));
  const cpu = runs.map((r) => median(r.map((x) => x.cpu)));
  return [
    '### CLI start-up (median of 9 whole processes, interleaved)',
    '',
    '| command | wall ms | wall − `node -e 0` | CPU ms | CPU − `node -e 0` |',
    '|---|---:|---:|---:|---:|',
    ...cases.map(([name], i) => `| ${name} | ${ms(wall[i]!)} | ${ms(wall[i]! - wall[0]!)} | ${ms(cpu[i]!)} | ${ms(cpu[i]! - cpu[0]!)} |`),
    '',
    'Goal: `--help`, `count` and `status` within 120 ms of `node -e 0`. dist/cli/main.js is an esbuild bundle (src/build/bundle-cli.mjs);',
    '`--help` prints the copy yargs rendered at build time; `count` of a built-in theory loads no zod, SQLite, piscina or localization references.',
    'The n = 20 row includes the count itself (12 ms warm; cold, before the JIT has compiled the kernel, several times that).',
  ];
}

function yardstickSection(): string[] {
  const node: Run[] = [];
  const py: Run[] = [];
  for (let k = 0; k < 3; k++) {
    node.push(timed(countArgs('cohomology', TRIPLES[20]!)));
    py.push(timed(pythonArgs('cohomology', TRIPLES[20]!), 300));
  }
  const m = (rs: Run[], key: 'wall' | 'cpu') => median(rs.map((r) => r[key]));
  const value = (JSON.parse(node[0]!.out) as { value: number }).value;
  const pyValue = (JSON.parse(py[0]!.out) as { value: string }).value;
  return [
    '### One cohomology coefficient at n = 20, whole processes (median of 3 each, alternating)',
    '',
    '| | value | wall s | CPU s | peak MB |',
    '|---|---|---:|---:|---:|',
    `| \`puzzlesweep count\` | ${value} | ${sec(m(node, 'wall'))} | ${sec(m(node, 'cpu'))} | ${node[1]!.rssMB} |`,
    `| python-dp.py | ${pyValue} | ${sec(m(py, 'wall'))} | ${sec(m(py, 'cpu'))} | ${py[1]!.rssMB} |`,
    '',
    `Python / puzzlesweep: ${(m(py, 'cpu') / m(node, 'cpu')).toFixed(1)}× in CPU time, ${(m(py, 'wall') / m(node, 'wall')).toFixed(1)}× in wall time (goal ≥ 10×, aim 30×).`,
  ];
}

interface Work {
  strategy: string;
  value?: string;
  stopped?: { done: number; total: number; profiles: number };
  cpuMs: number;
  work: number;
  widest: number;
  peakMB: number;
}

function workCase(theory: string, strategy: string, triple: [string, string, string], limit = 600): Work {
  const r = spawnSync(process.execPath, [join(here, 'count-work-case.mjs'), theory, strategy, ...triple, String(limit)], { encoding: 'utf8', cwd: root, maxBuffer: 1 << 24 });
  return JSON.parse(r.stdout) as Work;
}

function strategySection(): string[] {
  const eq12: [string, string, string] = ['010101010101', '010101010101', '101010101010'];
  const cases: [string, number, [string, string, string]][] = [
    ['cohomology', 20, TRIPLES[20]!],
    ['cohomology', 24, TRIPLES[24]!],
    ['equivariant', 12, eq12],
    ['equivariant', 16, TRIPLES[16]!],
    ['k-theory', 16, TRIPLES[16]!],
    ['k-theory', 20, TRIPLES[20]!],
    ['k-theory', 24, TRIPLES[24]!],
    ['dual-k-theory', 16, TRIPLES[16]!],
    ['dual-k-theory', 20, TRIPLES[20]!],
    ['ssm-nonequivariant', 12, TRIPLES[12]!],
    ['ssm-nonequivariant', 16, TRIPLES[16]!],
    ['ssm-nonequivariant', 20, TRIPLES[20]!],
  ];
  const lines = [
    '### Sweep strategy per theory (one process per case)',
    '',
    'Work = profiles written: the new size of the frontier each step extended, summed over the steps (machine-independent; an earlier table',
    'counted both frontiers at every step, which overstated meeting in the middle about twofold). Widest = live profiles of both frontiers at',
    'the widest step. CPU includes Node start-up (about 60 ms). Integer values in cohomology and K-theories, residues mod one prime otherwise.',
    '',
    '| theory | n | backward work | meet work | meet / backward | backward widest | meet widest | backward CPU ms | meet CPU ms | default |',
    '|---|---:|---:|---:|---:|---:|---:|---:|---:|---|',
  ];
  for (const [theory, n, triple] of cases) {
    const b = workCase(theory, 'backward', triple);
    const m = workCase(theory, 'meet', triple);
    const d = spawnSync(process.execPath, ['-e', `import('./dist/engine/index.js').then((e) => console.log(e.defaultStrategy(e.theoryPieceSet('${theory}'))))`], { encoding: 'utf8', cwd: root }).stdout.trim();
    lines.push(`| ${theory} | ${n} | ${b.work} | ${m.work} | ${(m.work / b.work).toFixed(2)} | ${b.widest} | ${m.widest} | ${b.cpuMs} | ${m.cpuMs} | ${d} |`);
  }
  return lines;
}

function scalingSection(): string[] {
  const lines = [
    '### Single counts n = 12 … 30: `puzzlesweep count` (whole process, default strategy) beside python-dp.py',
    '',
    'Python runs for n ≤ 24 only, stopped after 60 s; the K-theory count is stopped after 300 s. Work and widest come from',
    'count-work-case.mjs (same strategy, one more process) and say what a count at that size must touch.',
    '',
    '| theory | n | value | count wall s | count CPU s | count peak MB | work (profiles written) | widest | Python CPU s | Python peak MB | CPU ratio |',
    '|---|---:|---|---:|---:|---:|---:|---:|---:|---:|---:|',
  ];
  for (const theory of ['cohomology', 'k-theory']) {
    for (const n of [12, 16, 20, 24, 28, 30]) {
      const triple = TRIPLES[n]!;
      const limit = theory === 'k-theory' ? 300 : 600;
      const node = timed(countArgs(theory, triple), limit);
      const w = workCase(theory, 'default', triple, limit);
      const value = node.stopped ? `stopped at ${limit} s` : node.out ? String((JSON.parse(node.out) as { value: number | string }).value) : 'failed';
      const workText = w.stopped ? `> ${w.work} (step ${w.stopped.done} of ${w.stopped.total} at ${limit} s)` : String(w.work);
      let pyCpu = 'not run';
      let pyMB = '';
      let ratio = '';
      if (n <= 24) {
        const py = timed(pythonArgs(theory, triple), 60);
        pyCpu = py.stopped ? `stopped at ${sec(py.cpu)}` : sec(py.cpu);
        pyMB = String(py.rssMB);
        ratio = `${py.stopped ? '> ' : ''}${(py.cpu / Math.max(node.cpu, 0.01)).toFixed(1)}×`;
      }
      lines.push(`| ${theory} | ${n} | ${value} | ${sec(node.wall)} | ${sec(node.cpu)} | ${node.rssMB} | ${workText} | ${w.widest} | ${pyCpu} | ${pyMB} | ${ratio} |`);
    }
  }
  return lines;
}

export default async function singleCountBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-single-'));
  try {
    const only = (process.env.SINGLE_COUNT_PARTS ?? 'startup,yardstick,strategy,scaling').split(',');
    const load = loadavg()[0]!.toFixed(1);
    const parts: string[][] = [];
    if (only.includes('startup')) parts.push(startupSection(dir));
    if (only.includes('yardstick')) parts.push(yardstickSection());
    if (only.includes('strategy')) parts.push(strategySection());
    if (only.includes('scaling')) parts.push(scalingSection());
    return [
      '## Single counts: start-up, strategy per theory, scaling (test/bench/single-count-benchmark.ts)',
      '',
      `Load average when this section started: ${load} on 2 cores shared with other work; CPU times are the numbers to read.`,
      '',
      ...parts.flatMap((p) => [...p, '']),
    ].join('\n').trimEnd();
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
