import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cliAsync, query } from './cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-peer-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// A claim that holds (120° rotation maps the cohomology pieces to themselves), so exit 0 would mean "holds".
const CLAIM = 'conjectures/cohomology-triangle-rotation.json';
// 2^(3n) labelings of the triangle with sides n (common practice, no source).
const SIZES: Record<string, number> = { 'n=1': 8, 'n=2': 64, 'n=3': 512, 'n=4': 4096, 'n=5': 32768 };

const exitOf = (c: ReturnType<typeof cliAsync>) => new Promise<number | null>((resolve) => c.on('exit', (code) => resolve(code)));

describe('a peer process killed mid-chunk (built CLI, two real processes on one store)', () => {
  it('the surviving run sweeps what the dead peer held, or exits 4; it never passes with work unchecked', async () => {
    const db = join(dir, 'shared.sqlite');
    const victim = cliAsync(['run', CLAIM, '--max', 'n=5', '--workers', '1', '--chunk-size', '4000', '--db', db]);
    const victimExit = exitOf(victim);
    const survivor = cliAsync(['run', CLAIM, '--max', 'n=5', '--workers', '1', '--chunk-size', '256', '--json', '--db', db]);
    let out = '';
    survivor.stdout!.on('data', (d: Buffer) => (out += d.toString()));
    const survivorExit = exitOf(survivor);
    let held = 0;
    for (let waited = 0; waited < 120_000 && !held; waited += 20) {
      await new Promise((r) => setTimeout(r, 20));
      try {
        held = query<{ n: number }>(db, `SELECT COUNT(*) AS n FROM chunks JOIN runs USING (run_id) WHERE state = 'leased' AND class_key = 'n=5' AND pid = ${victim.pid}`)[0]!.n;
      } catch {
        continue; // the store or its tables do not exist yet
      }
    }
    victim.kill('SIGKILL');
    await victimExit;
    expect(held).toBeGreaterThan(0); // the peer really died holding unchecked work
    const code = await survivorExit;
    const tiles = query<{ class_key: string; start_index: number; end_index: number }>(
      db,
      "SELECT class_key, start_index, end_index FROM chunks WHERE state = 'done' ORDER BY class_key, start_index",
    );
    const covered: Record<string, number> = {};
    for (const t of tiles) if ((covered[t.class_key] ?? 0) >= t.start_index) covered[t.class_key] = Math.max(covered[t.class_key] ?? 0, t.end_index);
    const complete = Object.entries(SIZES).every(([k, n]) => covered[k] === n);
    if (code === 0) {
      expect(complete).toBe(true);
      expect(query<{ k: string }>(db, 'SELECT class_key AS k FROM verified_classes ORDER BY k').map((r) => r.k)).toEqual(Object.keys(SIZES));
      expect((JSON.parse(out) as { claims: { outcome: string }[] }).claims[0]!.outcome).toBe('holds');
    } else {
      expect(code).toBe(4);
      expect((JSON.parse(out) as { claims: { outcome: string }[] }).claims[0]!.outcome).toBe('incomplete');
    }
    // This implementation takes the dead peer's work over, so the sweep ends complete.
    expect(code).toBe(0);
  });
});
