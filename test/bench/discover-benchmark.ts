/** discover benchmark (issue 12): the whole built CLI in a fresh process, store included. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { hexagonFamily } from '../helpers/hexagon-family.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

interface Run {
  ms: number;
  candidates: number;
  classes: number;
  values: number;
  survivors: number;
  dropped: number;
}

function discover(dir: string, family: object, theory: string, db: string, extra: string[] = []): Run {
  const file = join(dir, `family-${Math.random().toString(36).slice(2)}.json`);
  writeFileSync(file, JSON.stringify({ id: 'bench', family }));
  const began = performance.now();
  const out = execFileSync(process.execPath, [join(root, 'dist/cli/main.js'), 'discover', file, '--theory', theory, '--db', db, '--out', join(dir, 'out'), ...extra], { encoding: 'utf8', maxBuffer: 1 << 24 });
  const ms = performance.now() - began;
  const head = /(\d+) candidates on (\d+) classes.*?, (\d+) values computed/.exec(out)!;
  return { ms, candidates: Number(head[1]), classes: Number(head[2]), values: Number(head[3]), survivors: Number(/survivors: (\d+)/.exec(out)![1]), dropped: Number(/dropped: (\d+)/.exec(out)![1]) };
}

const parallelogram = (max: number) => ({
  sides: ['a', 'b', 0, 'a', 'b', 0],
  variables: [
    { name: 'a', min: 1, max },
    { name: 'b', min: 1, max },
  ],
  conditions: [
    { type: 'sameContent', sides: [1, 4] },
    { type: 'sameContent', sides: [2, 5] },
  ],
});

const hexagon = hexagonFamily(3);

export default async function discoverBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-bench-discover-'));
  try {
    const first = discover(dir, parallelogram(3), 'cohomology', join(dir, 'a.sqlite'));
    const resumed = discover(dir, parallelogram(3), 'cohomology', join(dir, 'a.sqlite'));
    const larger = discover(dir, parallelogram(4), 'cohomology', join(dir, 'b.sqlite'));
    const k = discover(dir, parallelogram(3), 'k-theory', join(dir, 'c.sqlite'), ['--theory', 'dual-k-theory']);
    const equivariant = discover(dir, hexagon, 'equivariant', join(dir, 'd.sqlite'));
    const row = (name: string, r: Run, goal = '') =>
      `| ${name} | ${r.candidates} | ${r.classes} | ${r.values} | ${r.survivors} / ${r.dropped} | ${(r.ms / 1000).toFixed(1)} s | ${goal} |`;
    return [
      '## discover (test/bench/discover-benchmark.ts)',
      '',
      'Wall time of `puzzlesweep discover` in a fresh process (start-up, SQLite store and claim files included).',
      '',
      '| family | candidates | classes | values computed | survivors / dropped | time | goal |',
      '|---|---:|---:|---:|---:|---:|---|',
      row('(a,b,0,a,b,0), equal content on opposite sides, a, b ≤ 3, cohomology', first, '< 60 s on 2 cores'),
      row('same, second run on the same store (resumes: nothing left to sweep)', resumed),
      row('same family, a, b ≤ 4', larger),
      row('(a,b,0,a,b,0), a, b ≤ 3, K-theory and dual K-theory (each against both)', k),
      row('(a,0,b,a,0,b), equal content on opposite sides, a, b ≤ 3, equivariant (block reversals of y)', equivariant),
    ].join('\n');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
