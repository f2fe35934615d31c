/**
 * Single counts as a researcher runs them (issue 8): CLI start-up, one cohomology coefficient at n = 20
 * against the Python yardstick, and the exact equivariant Gr(6,12) coefficient (whole processes).
 * Strategy and scaling: count-scaling-benchmark.ts.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { cli, countArgs, median, pythonArgs, sec } from './count-commands.js';
import { timed, type TimedRun } from './timed-process.js';
import { TRIPLES } from './yardstick-triples.js';

type Run = TimedRun;

const ms = (x: number) => `${Math.round(x * 1000)}`;

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
    'Goal: `--help`, `count` and `status` within 120 ms of `node -e 0`. dist/cli/main.js is a loader that compiles the CLI, one esbuild bundle, from the V8 code cache the build made (src/build/bundle-cli.mjs, cli-loader.mjs);',
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

// The equivariant Gr(6,12) coefficient, exact: the answer within 2 GB, or a clean refusal.
function equivariantSection(): string[] {
  const triple: [string, string, string] = ['010101010101', '010101010101', '101010101010'];
  const node = timed(countArgs('equivariant', triple), 900);
  const py = timed(pythonArgs('equivariant', triple), 60);
  const out = node.out ? (JSON.parse(node.out) as { puzzles?: string; value?: { terms?: unknown[] } }) : undefined;
  const pyTerms = py.out ? (JSON.parse(py.out) as { terms: number }).terms : undefined;
  const pyCell = (key: 'wall' | 'cpu') => (py.stopped ? `stopped at ${sec(py[key])}` : sec(py[key]));
  return [
    '### Equivariant Gr(6,12): λ = μ = 010101010101, ν = 101010101010, exact polynomial (whole processes)',
    '',
    '| | puzzles | terms | wall s | CPU s | peak MB |',
    '|---|---:|---:|---:|---:|---:|',
    `| \`puzzlesweep count\` | ${out?.puzzles ?? (node.stopped ? 'stopped at 900 s' : 'failed')} | ${out?.value?.terms?.length ?? ''} | ${sec(node.wall)} | ${sec(node.cpu)} | ${node.rssMB} |`,
    `| python-dp.py (stopped after 60 s) | | ${pyTerms ?? ''} | ${pyCell('wall')} | ${pyCell('cpu')} | ${py.rssMB} |`,
    '',
    'Goal: an exact answer within 2 GB, or a clean, early, explained refusal.',
  ];
}

export default async function singleCountBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-single-'));
  try {
    const load = loadavg()[0]!.toFixed(1);
    const parts = [startupSection(dir), yardstickSection(), equivariantSection()];
    return [
      '## Single counts: start-up, the n = 20 coefficient, equivariant Gr(6,12) (test/bench/single-count-benchmark.ts)',
      '',
      `Load average when this section started: ${load} on 2 cores; CPU times are the numbers to read.`,
      '',
      ...parts.flatMap((p) => [...p, '']),
    ].join('\n').trimEnd();
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
