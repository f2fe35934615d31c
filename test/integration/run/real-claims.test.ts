import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { loadSweepClaim } from '../../../src/run/load-sweep-claim.js';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';
import { listCounterexamples, openStore } from '../../../src/store/index.js';
import { cohomologyPieces, kTheoryPieces } from '../../unit/reference/puzzle-pieces.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-real-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// Every 0/1 labeling of the three sides of the triangle of side n, as clockwise side strings.
function* triangleBoundaries(n: number): Generator<string[]> {
  for (let i = 0; i < 2 ** (3 * n); i++) {
    const s = i.toString(2).padStart(3 * n, '0');
    yield [s.slice(0, n), '', s.slice(n, 2 * n), '', s.slice(2 * n), ''];
  }
}

describe('sweeps of shipped claims (real claims layer, workers and SQLite)', () => {
  it('mirror-and-complement of cohomology triangles holds on a full sweep, every class verified exactly', async () => {
    const claim = loadSweepClaim('conjectures/cohomology-triangle-mirror-complement.json');
    const s = await runSweep({ claims: [claim], options: parseRunOptions({ db: join(dir, 'theorem.sqlite'), workers: 2 }) });
    const c = s.claims[0]!;
    expect(s.exitCode).toBe(0);
    expect(c.counterexamples).toBe(0);
    // Mirror-and-complement maps cohomology pieces to pieces (DEVELOPERS.md, Theories; Knutson–Tao, Duke Math. J. 119 (2003)).
    expect(c.classes.map((k) => [k.key, k.state, k.method])).toEqual([1, 2, 3, 4].map((n) => [`n=${n}`, 'verified', 'exact']));
    // 2^(3n) labelings of three sides of length n (common practice, no source).
    expect(c.classes.map((k) => k.instances)).toEqual([1, 2, 3, 4].map((n) => String(2 ** (3 * n))));
  });

  it('a false claim yields exactly the counterexamples a brute-force count finds, smallest first', async () => {
    const claim = loadSweepClaim('conjectures/k-theory-equals-cohomology.json');
    const db = join(dir, 'false.sqlite');
    // n = 5 is in range for this run, but --stop-at-first must end the sweep after the class n = 4
    const s = await runSweep({ claims: [claim], options: parseRunOptions({ db, workers: 2, stopAtFirst: true, max: ['n=5'] }) });
    expect(s.exitCode).toBe(1);
    // Independent check: plain backtracking (src/reference/naive-count.ts) in both theories, every labeling n ≤ 4.
    const expected: { sides: string; coh: bigint; k: bigint }[] = [];
    for (let n = 1; n <= 4; n++) {
      for (const b of triangleBoundaries(n)) {
        const coh = BigInt(naiveCount([n, 0, n, 0, n, 0], b, cohomologyPieces()).value.toString());
        const k = BigInt(naiveCount([n, 0, n, 0, n, 0], b, kTheoryPieces()).value.toString());
        if (coh !== k) expected.push({ sides: b.join('|'), coh, k });
      }
    }
    expect(expected.length).toBeGreaterThan(0);
    const store = openStore(db);
    const stored = listCounterexamples(store, claim.fingerprint);
    store.close();
    const bySides = (a: { sides: string }, b: { sides: string }) => (a.sides < b.sides ? -1 : a.sides > b.sides ? 1 : 0);
    const found = stored.map((c) => ({ sides: c.left.sides.join('|'), coh: BigInt(c.left.text), k: BigInt(c.right.text) }));
    expect([...found].sort(bySides)).toEqual([...expected].sort(bySides));
    // smallest first: the first stored counterexample has the least total boundary length
    const size = (sides: string) => sides.replace(/\|/g, '').length;
    expect(size(s.claims[0]!.firstCounterexample!.left.sides.join('|'))).toBe(Math.min(...expected.map((e) => size(e.sides))));
    expect(s.claims[0]!.stopReason).toBe('stop_at_first');
    expect(s.claims[0]!.classes.find((k) => k.key === 'n=5')?.checked ?? 0).toBe(0);
  });
});
