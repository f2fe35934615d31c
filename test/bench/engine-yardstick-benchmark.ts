/**
 * The engine against a plain Python transfer-matrix DP (python-dp.py, standard library only), as whole
 * processes measured side by side in the same run: wall time, CPU time (user + system) and peak
 * resident memory from /usr/bin/time. On a shared machine the CPU times and the ratios are the
 * numbers to read. Also: the three sweep strategies' work (live profiles summed over steps).
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { timed, type TimedRun } from './timed-process.js';
import { TRIPLES } from './yardstick-triples.js';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const cli = join(root, 'dist', 'cli', 'main.js');
const python = join(here, 'python-dp.py');

type Run = TimedRun;


const reverse = (s: string) => [...s].reverse().join('');
const s = (x: number) => (x >= 10 ? x.toFixed(1) : x.toFixed(2));
const ratio = (py: Run, node: Run, key: 'wall' | 'cpu') => (py.stopped ? `> ${(py[key] / Math.max(node[key], 0.01)).toFixed(1)}×` : `${(py[key] / Math.max(node[key], 0.01)).toFixed(1)}×`);
const pyText = (r: Run, key: 'wall' | 'cpu') => (r.stopped ? `stopped at ${s(r[key])}` : s(r[key]));

const countNode = (theory: string, l: string, m: string, n: string, limit = 600) => timed(['node', cli, 'count', '--theory', theory, '--triangle', `${l},${m},${n}`, '--form', 'expanded', '--json'], limit);
const countPython = (theory: string, l: string, m: string, n: string, limit: number) => timed(['python3', python, 'count', theory, `${l},-,${m},-,${reverse(n)},-`], limit);


export default async function yardstickBenchmark(): Promise<string> {
  const lines = ['## Engine against a Python yardstick', ''];
  lines.push('Whole processes, same run: `puzzlesweep count` (built CLI, Node startup included) against `python3 test/bench/python-dp.py` (one DP per boundary, dictionaries of profile tuples).');
  lines.push('Times in seconds; CPU = user + system. Python runs are stopped at a time limit where noted.', '');

  // The n = 20 coefficient, three times each, alternating; the median of each.
  const [l20, m20, n20] = TRIPLES[20]!;
  const nodeRuns: Run[] = [];
  const pyRuns: Run[] = [];
  for (let k = 0; k < 3; k++) {
    nodeRuns.push(countNode('cohomology', l20, m20, n20));
    pyRuns.push(countPython('cohomology', l20, m20, n20, 300));
  }
  const median = (rs: Run[], key: 'wall' | 'cpu') => [...rs].sort((a, b) => a[key] - b[key])[1]![key];
  const value20 = (JSON.parse(nodeRuns[0]!.out) as { value: string }).value;
  const py20 = (JSON.parse(pyRuns[0]!.out) as { value: string }).value;
  lines.push('### One cohomology coefficient at n = 20 (median of 3 runs each)', '');
  lines.push('| | value | wall s | CPU s | peak MB |', '|---|---|---|---|---|');
  lines.push(`| puzzlesweep count | ${value20} | ${s(median(nodeRuns, 'wall'))} | ${s(median(nodeRuns, 'cpu'))} | ${nodeRuns[1]!.rssMB} |`);
  lines.push(`| Python DP | ${py20} | ${s(median(pyRuns, 'wall'))} | ${s(median(pyRuns, 'cpu'))} | ${pyRuns[1]!.rssMB} |`);
  const cpu20 = median(pyRuns, 'cpu') / median(nodeRuns, 'cpu');
  lines.push(`| ratio Python / puzzlesweep | | ${(median(pyRuns, 'wall') / median(nodeRuns, 'wall')).toFixed(1)}× | ${cpu20.toFixed(1)}× | |`, '');
  lines.push(`Goal ≥ 10× (aim 30×): ${cpu20.toFixed(1)}× in CPU time, ${(median(pyRuns, 'wall') / median(nodeRuns, 'wall')).toFixed(1)}× in wall time.`, '');

  // Scaling of single counts, cohomology and K-theory.
  lines.push('### Single counts n = 12 … 30 (one run each; Python stopped after 120 s)', '');
  lines.push('| theory | n | value | count wall s | count CPU s | count peak MB | Python wall s | Python CPU s | Python peak MB | CPU ratio |', '|---|---|---|---|---|---|---|---|---|---|');
  for (const theory of ['cohomology', 'k-theory']) {
    for (const n of [12, 16, 20, 24, 28, 30]) {
      const [l, m, nu] = TRIPLES[n]!;
      const node = countNode(theory, l, m, nu);
      const py = countPython(theory, l, m, nu, 120);
      const value = node.out ? (JSON.parse(node.out) as { value: string }).value : 'failed';
      lines.push(`| ${theory} | ${n} | ${value} | ${s(node.wall)} | ${s(node.cpu)} | ${node.rssMB} | ${pyText(py, 'wall')} | ${pyText(py, 'cpu')} | ${py.rssMB} | ${ratio(py, node, 'cpu')} |`);
    }
  }

  // The equivariant Gr(6,12) coefficient (exact polynomial).
  lines.push('', '### Equivariant Gr(6,12): c for λ = μ = 010101010101, ν = 101010101010 (exact)', '');
  const eqNode = countNode('equivariant', '010101010101', '010101010101', '101010101010', 900);
  const eqPy = countPython('equivariant', '010101010101', '010101010101', '101010101010', 300);
  const eq = eqNode.out ? (JSON.parse(eqNode.out) as { puzzles: string; value: { terms: unknown[] } }) : undefined;
  const pyTerms = eqPy.out ? (JSON.parse(eqPy.out) as { terms: number }).terms : undefined;
  lines.push('| | puzzles | terms | wall s | CPU s | peak MB |', '|---|---|---|---|---|---|');
  lines.push(`| puzzlesweep count | ${eq?.puzzles ?? 'failed'} | ${eq?.value.terms.length ?? ''} | ${s(eqNode.wall)} | ${s(eqNode.cpu)} | ${eqNode.rssMB} |`);
  lines.push(`| Python DP | | ${pyTerms ?? ''} | ${pyText(eqPy, 'wall')} | ${pyText(eqPy, 'cpu')} | ${eqPy.rssMB} |`);

  // Families: every labeling with opposite sides of equal content, claim "exchanging sides 1 and 4 keeps the value".
  lines.push('', '### Families, engine half: the claim "exchanging sides 1 and 4 keeps the cohomology value"', '');
  lines.push('puzzlesweep: `node test/bench/family-case.mjs` (countFamily tables per content class, compared by index). Python: one open-bottom DP per top part.', '');
  lines.push('| family | labelings | engine wall s | engine CPU s | engine peak MB | Python wall s | Python CPU s | Python peak MB | CPU ratio |', '|---|---|---|---|---|---|---|---|---|');
  const small: string[] = [];
  for (let a = 1; a <= 4; a++) for (let b = 1; b <= 3; b++) small.push(`${a},${b},0,${a},${b},0`);
  for (const [name, spec] of [['(a,b,0,a,b,0), a ≤ 4, b ≤ 3', small.join(';')], ['(6,6,0,6,6,0)', '6,6,0,6,6,0']] as const) {
    const node = timed(['node', join(here, 'family-case.mjs'), 'cohomology', spec, '1', '4'], 600);
    const py = timed(['python3', python, 'family', 'cohomology', spec, '1', '4'], 600);
    const checked = node.out ? (JSON.parse(node.out) as { checked: number }).checked : 0;
    lines.push(`| ${name} | ${checked} | ${s(node.wall)} | ${s(node.cpu)} | ${node.rssMB} | ${pyText(py, 'wall')} | ${pyText(py, 'cpu')} | ${py.rssMB} | ${ratio(py, node, 'cpu')} |`);
  }

  // Which strategy uses a fixed side 5 best: work = live profiles summed over all steps (machine-independent).
  lines.push('', '### Using the fixed side 5: work of the three sweep strategies', '');
  lines.push('Work = live profiles summed over the steps of one count (independent of the machine); widest = most live profiles at one step; ms in one warm process.', '');
  lines.push('| theory | n | forward work | backward work | meet work | forward / meet | widest forward | widest meet | forward ms | backward ms | meet ms |', '|---|---|---|---|---|---|---|---|---|---|---|');
  const cases: [string, number][] = [['cohomology', 20], ['cohomology', 24], ['k-theory', 20], ['dual-k-theory', 20], ['equivariant', 12]];
  for (const [theory, n] of cases) {
    const [l, m, nu] = n === 12 && theory === 'equivariant' ? ['010101010101', '010101010101', '101010101010'] : TRIPLES[n]!;
    const out = execFileSync('node', [join(here, 'strategy-case.mjs'), theory, l, m, nu], { encoding: 'utf8', cwd: root });
    const r = JSON.parse(out) as Record<'forward' | 'backward' | 'meet', { ms: number; work: number; widest: number }>;
    lines.push(
      `| ${theory} | ${n} | ${r.forward.work} | ${r.backward.work} | ${r.meet.work} | ${(r.forward.work / r.meet.work).toFixed(1)}× | ${r.forward.widest} | ${r.meet.widest} | ${r.forward.ms} | ${r.backward.ms} | ${r.meet.ms} |`,
    );
  }
  return lines.join('\n');
}
