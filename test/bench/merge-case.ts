/**
 * Merge benchmark steps, each in a fresh process (so peak memory is its own); prints JSON. Invoked by
 * merge-benchmark.ts as `node --import tsx merge-case.ts <json>`; the shards' workers run the built dist/ files.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { ClaimInput } from '../../src/claims/index.js';
import { loadSweepClaim } from '../../src/run/load-sweep-claim.js';
import { mergeStoreFiles } from '../../src/run/merge-store-files.js';
import { parseRunOptions } from '../../src/run/run-options.js';
import { runSweep } from '../../src/run/run-sweep.js';

export type MergeCase =
  | { kind: 'shards'; dir: string; claim: ClaimInput; shards: number; workers: number }
  | { kind: 'merge'; dir: string; shards: number; into: string };

const c = JSON.parse(process.argv[2]!) as MergeCase;
const start = performance.now();
let out: Record<string, unknown>;
if (c.kind === 'shards') {
  const file = join(c.dir, 'claim.json');
  writeFileSync(file, JSON.stringify(c.claim));
  let checked = 0;
  for (let i = 0; i < c.shards; i++) {
    const s = await runSweep({ claims: [loadSweepClaim(file)], options: parseRunOptions({ db: join(c.dir, `shard-${i}.sqlite`), workers: c.workers, shard: `${i}/${c.shards}` }) });
    checked += s.claims[0]!.instancesChecked;
  }
  out = { checked };
} else {
  const stores = Array.from({ length: c.shards }, (_, i) => join(c.dir, `shard-${i}.sqlite`));
  const r = mergeStoreFiles(stores, join(c.dir, c.into));
  const claim = r.claims[0]!;
  out = { complete: r.complete, addedChunks: claim.added.chunks, duplicateChunks: claim.duplicates.chunks, verified: claim.verifiedClasses, counterexamples: claim.counterexamples };
}
process.stdout.write(`${JSON.stringify({ ...out, ms: performance.now() - start, maxRssMB: process.resourceUsage().maxRSS / 1024 })}\n`);
