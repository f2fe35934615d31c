/**
 * Single counts, engine side (issue 8): the sweep strategy per theory (work and CPU, one process per case,
 * the unpruned forward sweep beside the two that use side 5) and the scaling of single counts n = 12 … 30
 * in cohomology and K-theory with peak memory, beside python-dp.py where it finishes.
 */
import { spawnSync } from 'node:child_process';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { countArgs, here, pythonArgs, root, sec } from './count-commands.js';
import { timed } from './timed-process.js';
import { TRIPLES } from './yardstick-triples.js';

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
    'Work = profiles written: the new size of the frontier each step extended, summed over the steps (machine-independent).',
    'Forward is the sweep that ignores the fixed side 5 until the end (what a whole product costs); backward starts from side 5;',
    'meet runs both and joins them. Widest = live profiles of both frontiers at the widest step. CPU includes Node start-up (about',
    '60 ms). Forward is stopped after 60 s. Integer values in cohomology and K-theories, residues mod one prime otherwise.',
    '',
    '| theory | n | forward work | backward work | meet work | forward / default | meet / backward | backward widest | meet widest | forward CPU ms | backward CPU ms | meet CPU ms | default |',
    '|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|',
  ];
  for (const [theory, n, triple] of cases) {
    const f = workCase(theory, 'forward', triple, 60);
    const b = workCase(theory, 'backward', triple);
    const m = workCase(theory, 'meet', triple);
    const d = spawnSync(process.execPath, ['-e', `import('./dist/engine/index.js').then((e) => console.log(e.defaultStrategy(e.theoryPieceSet('${theory}'))))`], { encoding: 'utf8', cwd: root }).stdout.trim();
    const best = d === 'backward' ? b.work : m.work;
    const fWork = f.stopped ? `> ${f.work} (stopped)` : String(f.work);
    lines.push(`| ${theory} | ${n} | ${fWork} | ${b.work} | ${m.work} | ${f.stopped ? '> ' : ''}${(f.work / best).toFixed(1)}× | ${(m.work / b.work).toFixed(2)} | ${b.widest} | ${m.widest} | ${f.cpuMs} | ${b.cpuMs} | ${m.cpuMs} | ${d} |`);
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

export default async function countScalingBenchmark(): Promise<string> {
  const load = loadavg()[0]!.toFixed(1);
  return [
    '## Single counts: strategy per theory, scaling n = 12 … 30 (test/bench/count-scaling-benchmark.ts)',
    '',
    `Load average when this section started: ${load} on 2 cores; CPU times are the numbers to read.`,
    '',
    ...strategySection(),
    '',
    ...scalingSection(),
  ].join('\n');
}
