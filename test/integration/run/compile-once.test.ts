import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { claimCompileCounts } from '../../../src/claims/compile-counts.js';
import { loadSweepClaim } from '../../../src/run/load-sweep-claim.js';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-compile-once-'));
afterAll(() => {
  delete process.env.PUZZLESWEEP_TEST_COMPILE_COUNTS;
  rmSync(dir, { recursive: true, force: true });
});

// Issue 7 ("Structure"): one 2-worker run parsed the claim with zod 4 times and compiled it 13 times.
// The goal (not a measured value): zod once per process and per worker, one compile per worker.
describe('a 2-worker run compiles its claim once per worker', () => {
  for (const max of [[], ['n=5']]) {
    it(`parses once in this process and once per worker, compiles once per worker${max.length ? ' (raised bound)' : ''}`, async () => {
      const counts = join(dir, `counts-${max.length}`);
      rmSync(counts, { recursive: true, force: true });
      mkdirSync(counts);
      // Workers inherit the environment when the pool starts them, so the hook is set before the run.
      process.env.PUZZLESWEEP_TEST_COMPILE_COUNTS = counts;
      claimCompileCounts.parses = 0;
      claimCompileCounts.compiles = 0;
      const s = await runSweep({
        claims: [loadSweepClaim('conjectures/cohomology-triangle-mirror-complement.json')],
        options: parseRunOptions({ db: join(dir, `store-${max.length}.sqlite`), workers: 2, chunkSize: 32, max }),
      });
      expect(s.claims[0]!.outcome).toBe('holds');
      // This process: one parse; one compile, and one more for the raised bounds (the load checks the file as written).
      expect(claimCompileCounts).toEqual({ parses: 1, compiles: 1 + (max.length ? 1 : 0) });
      const workers = readdirSync(counts).map((f) => JSON.parse(readFileSync(join(counts, f), 'utf8')) as { parses: number; compiles: number });
      expect(workers.length).toBeGreaterThanOrEqual(1); // a worker given no task writes nothing
      expect(workers.length).toBeLessThanOrEqual(2);
      for (const w of workers) expect(w).toEqual({ parses: 1, compiles: 1 });
    });
  }
});
