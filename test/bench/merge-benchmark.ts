/** Merge benchmark (issue 10): 256 shard stores of a real million-instance sweep merged into one store. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { ClaimInput } from '../../src/claims/index.js';
import type { MergeCase } from './merge-case.js';

const here = dirname(fileURLToPath(import.meta.url));
const SHARDS = 256;

function step<T>(c: MergeCase): T & { ms: number; maxRssMB: number } {
  const out = execFileSync(process.execPath, ['--import', 'tsx', join(here, 'merge-case.ts'), JSON.stringify(c)], { encoding: 'utf8', maxBuffer: 1 << 24 });
  return JSON.parse(out) as T & { ms: number; maxRssMB: number };
}

export default async function mergeBenchmark(): Promise<string> {
  const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-merge-bench-'));
  try {
    const claim = {
      id: 'bench-merge',
      statement: 'benchmark',
      theory: 'cohomology',
      family: { sides: [5, 5, 0, 5, 5, 0], variables: [] },
      transform: [{ type: 'exchange', sides: [1, 4] }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    } as unknown as ClaimInput;
    const swept = step<{ checked: number }>({ kind: 'shards', dir, claim, shards: SHARDS, workers: 2 });
    let bytes = 0;
    for (let i = 0; i < SHARDS; i++) bytes += statSync(join(dir, `shard-${i}.sqlite`)).size;
    type Merged = { complete: boolean; addedChunks: number; duplicateChunks: number; verified: number };
    const first = step<Merged>({ kind: 'merge', dir, shards: SHARDS, into: 'merged.sqlite' });
    const again = step<Merged>({ kind: 'merge', dir, shards: SHARDS, into: 'merged.sqlite' });
    return [
      '## Merging shard stores (test/bench/merge-benchmark.ts)',
      '',
      `A real sweep, cohomology parallelogram 5,5,0,5,5,0 with sides 1 ↔ 4 exchanged (${swept.checked.toLocaleString('en-US')} instances), run as ${SHARDS} shards (\`run --shard i/${SHARDS}\`, 2 workers each, one after another: ${(swept.ms / 1000).toFixed(1)} s), gives ${SHARDS} store files of ${(bytes / 2 ** 20).toFixed(1)} MB together. Each merge runs in a fresh process.`,
      '',
      '| merge | time | peak memory | chunks added | duplicates kept once | complete | verified classes |',
      '|---|---:|---:|---:|---:|---|---:|',
      `| ${SHARDS} stores into a new store | ${first.ms.toFixed(0)} ms | ${first.maxRssMB.toFixed(0)} MB | ${first.addedChunks} | ${first.duplicateChunks} | ${first.complete ? 'yes' : 'no'} | ${first.verified} |`,
      `| the same ${SHARDS} stores again (idempotent: nothing added) | ${again.ms.toFixed(0)} ms | ${again.maxRssMB.toFixed(0)} MB | ${again.addedChunks} | ${again.duplicateChunks} | ${again.complete ? 'yes' : 'no'} | ${again.verified} |`,
    ].join('\n');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
