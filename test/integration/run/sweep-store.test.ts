import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseRunOptions, type RunOptionsInput } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';
import { listCounterexamples, listRuns, listVerified, openStore } from '../../../src/store/index.js';
import { FAKE_RUNTIME, fakeClaim, palindromeCount } from '../../fixtures/fake-claim.js';
import { expectCountsRederivable, expectSameMembers } from '../../helpers/contracts.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-sweep-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// Palindromic words of length n ≥ failFrom, listed by brute force over all 2^n words (the fake's rule).
function expectedFailures(maxN: number, failFrom: number): string[] {
  const out: string[] = [];
  for (let n = failFrom; n <= maxN; n++) {
    for (let i = 0; i < 2 ** n; i++) {
      const w = i.toString(2).padStart(n, '0');
      if (w === [...w].reverse().join('')) out.push(`n=${n}:${i}`);
    }
  }
  return out;
}

function sweep(db: string, claim: ReturnType<typeof fakeClaim>, extra: Partial<RunOptionsInput> = {}, signal?: AbortSignal) {
  return runSweep({ claims: [claim], options: parseRunOptions({ db, workers: 2, chunkSize: 16, ...extra }), runtimeModule: FAKE_RUNTIME, signal });
}

function storeState(db: string, fingerprint: string) {
  const store = openStore(db);
  try {
    return {
      verified: listVerified(store, fingerprint).map((v) => `${v.classKey}/${v.method}`),
      counterexamples: listCounterexamples(store, fingerprint).map((c) => `${c.classKey}:${c.index}`),
    };
  } finally {
    store.close();
  }
}

describe('sweep runner and store (fake claims layer, real workers and SQLite)', () => {
  const db = join(dir, 'main.sqlite');
  const claim = fakeClaim({ maxN: 8, failFrom: 5 });

  it('sweeps every class, stores exactly the failing instances and verifies the rest', async () => {
    const summary = await sweep(db, claim);
    expect(summary.exitCode).toBe(1);
    const total = Array.from({ length: 8 }, (_, k) => 2 ** (k + 1)).reduce((a, b) => a + b);
    expect(summary.claims[0]!.instancesChecked).toBe(total);
    const state = storeState(db, claim.fingerprint);
    expect(state.counterexamples.sort()).toEqual(expectedFailures(8, 5).sort());
    expect(state.verified).toEqual(['n=1/modular', 'n=2/modular', 'n=3/modular', 'n=4/modular']);
    expect(summary.claims[0]!.firstCounterexample?.replay).toContain("replay fake-claim --instance n=5:0");
  });

  it('prints only counts that a brute force over the family re-derives', async () => {
    const fresh = join(dir, 'counts.sqlite');
    const summary = await sweep(fresh, claim);
    const failing = (n: number) => (n >= 5 ? palindromeCount(n) : 0); // the fake's rule, counted directly
    const all = Array.from({ length: 8 }, (_, k) => k + 1);
    const total = all.reduce((a, n) => a + 2 ** n, 0);
    const fails = all.reduce((a, n) => a + failing(n), 0);
    const derived: Record<string, number | string> = {
      'claims[0].instancesChecked': total,
      'claims[0].holds': total - fails,
      'claims[0].skippedZero': 0,
      'claims[0].vacuous': 0, // the fake's left value is 1, never 0
      'claims[0].nonzero': total - fails,
      'claims[0].paired': 0,
      'claims[0].overturned': 0,
      'claims[0].newCounterexamples': fails,
      'claims[0].counterexamples': fails,
      'claims[0].rechecked.checked': 0,
      'claims[0].rechecked.stillFail': 0,
      'claims[0].rechecked.nowHold': 0,
      'claims[0].rechecked.pending': 0,
      'claims[0].rechecked.partnersStored': 0, // a store of today's schema has no partners left to derive
      'claims[0].firstCounterexample.index': 0, // n = 5: the word 00000 is the first palindrome
      'claims[0].firstCounterexample.left.sides[0]': '00000', // the word of index 0 in class n = 5
      'claims[0].firstCounterexample.right.sides[0]': '00000',
      'claims[0].firstCounterexample.left.text': 1, // the fake's values: 1 on the left, 2 on a failing right
      'claims[0].firstCounterexample.left.json': 1,
      'claims[0].firstCounterexample.right.text': 2,
      'claims[0].firstCounterexample.right.json': 2,
      workerCrashes: 0,
      exitCode: 1,
    };
    all.forEach((n, i) => {
      derived[`claims[0].classes[${i}].instances`] = 2 ** n;
      derived[`claims[0].classes[${i}].checked`] = 2 ** n;
      derived[`claims[0].classes[${i}].done`] = 2 ** n;
      // The store's tallies of the class equal this run's: the store was fresh.
      derived[`claims[0].classes[${i}].stored.checked`] = 2 ** n;
      derived[`claims[0].classes[${i}].stored.holds`] = 2 ** n - failing(n);
      derived[`claims[0].classes[${i}].stored.fails`] = failing(n);
      derived[`claims[0].classes[${i}].stored.skippedZero`] = 0;
      derived[`claims[0].classes[${i}].stored.vacuous`] = 0;
      derived[`claims[0].classes[${i}].stored.nonzero`] = 2 ** n - failing(n);
      derived[`claims[0].classes[${i}].holds`] = 2 ** n - failing(n);
      derived[`claims[0].classes[${i}].fails`] = failing(n);
    });
    expectCountsRederivable(summary, derived, [
      { path: /elapsedMs$/, why: 'a time' },
      { path: /runId$/, why: 'an id' },
      { path: /errorBound$/, why: 'a bound, not a count' },
      { path: /(size|lengths\[\d\]|firstCounterexample\.size)$/, why: 'the family shape, an input' },
    ]);
    expectSameMembers(storeState(fresh, claim.fingerprint).counterexamples, expectedFailures(8, 5));
  });

  it('resumes without redoing work, re-checks stored counterexamples first, and extends a raised bound', async () => {
    const again = await sweep(db, claim);
    expect(again.claims[0]!.instancesChecked).toBe(0);
    expect(again.claims[0]!.rechecked).toEqual({ checked: expectedFailures(8, 5).length, stillFail: expectedFailures(8, 5).length, nowHold: 0, pending: 0, partnersStored: 0 });
    const raised = await sweep(db, claim, { max: ['n=9'] });
    expect(raised.claims[0]!.instancesChecked).toBe(2 ** 9);
    // Re-checking is incremental: what was re-checked once is not recomputed by every later run.
    expect(raised.claims[0]!.rechecked.checked).toBe(0);
    expect(storeState(db, claim.fingerprint).counterexamples.sort()).toEqual(expectedFailures(9, 5).sort());
  });

  it('never reuses results of a changed claim', async () => {
    const changed = fakeClaim({ maxN: 8, failFrom: 6 });
    const s = await sweep(db, changed);
    expect(s.claims[0]!.instancesChecked).toBe(510);
    expect(storeState(db, changed.fingerprint).counterexamples.sort()).toEqual(expectedFailures(8, 6).sort());
  });

  it('retries a chunk whose worker crashed and completes the run', async () => {
    const crashDb = join(dir, 'crash.sqlite');
    process.env.PUZZLESWEEP_TEST_CRASH = 'n=7:32';
    try {
      const s = await sweep(crashDb, claim);
      expect(s.claims[0]!.status).toBe('completed');
      expect(s.workerCrashes).toBe(1);
    } finally {
      delete process.env.PUZZLESWEEP_TEST_CRASH;
    }
    const state = storeState(crashDb, claim.fingerprint);
    expect(state.verified).toEqual(['n=1/modular', 'n=2/modular', 'n=3/modular', 'n=4/modular']);
    expect(state.counterexamples.sort()).toEqual(expectedFailures(8, 5).sort());
  });

  it('gives up with worker_crashed after the bounded retries and marks the run failed', async () => {
    const failDb = join(dir, 'crash-always.sqlite');
    process.env.PUZZLESWEEP_TEST_CRASH = 'n=3:0@99';
    try {
      await expect(sweep(failDb, claim)).rejects.toMatchObject({ code: 'worker_crashed' });
    } finally {
      delete process.env.PUZZLESWEEP_TEST_CRASH;
    }
    const store = openStore(failDb);
    expect(listRuns(store, claim.fingerprint)[0]!.status).toBe('failed');
    expect(listVerified(store, claim.fingerprint).map((v) => v.classKey)).not.toContain('n=3');
    store.close();
  });

  it('stops after the smallest class with a counterexample under --stop-at-first', async () => {
    const s = await sweep(join(dir, 'first.sqlite'), claim, { stopAtFirst: true });
    const c = s.claims[0]!;
    expect(c.stopReason).toBe('stop_at_first');
    expect(c.classes.find((k) => k.key === 'n=5')!.state).toBe('counterexample');
    expect(c.classes.find((k) => k.key === 'n=5')!.checked).toBe(32);
    // Workers may already have finished chunks of n = 6 when n = 5 ends. The expected counterexamples are
    // derived apart from the summary: the palindromes (brute force, the fake's rule) whose index lies in a
    // chunk the store records as done.
    const store = openStore(join(dir, 'first.sqlite'));
    const done = store
      .prepare(`SELECT class_key AS k, start_index AS a, end_index AS b FROM chunks WHERE fingerprint = ? AND state = 'done'`)
      .all(claim.fingerprint) as { k: string; a: number; b: number }[];
    const stored = listCounterexamples(store, claim.fingerprint).map((x) => `${x.classKey}:${x.index}`);
    store.close();
    const expected = expectedFailures(8, 5).filter((key) => {
      const [k, i] = key.split(':') as [string, string];
      return done.some((r) => r.k === k && r.a <= Number(i) && Number(i) < r.b);
    });
    expect(expected.filter((key) => key.startsWith('n=5:'))).toEqual(expectedFailures(5, 5));
    expect(stored.sort()).toEqual(expected.sort());
    expect(c.counterexamples).toBe(expected.length);
    // No class beyond the smallest failing one is begun, let alone finished.
    for (const k of ['n=6', 'n=7', 'n=8']) expect(c.classes.find((x) => x.key === k)).toMatchObject({ checked: 0, state: 'incomplete' });
    expect(s.exitCode).toBe(1);
  });

  it('stops handing out chunks at --max-counterexamples and at --time-limit, keeping what finished', async () => {
    const capped = await sweep(join(dir, 'capped.sqlite'), claim, { maxCounterexamples: 3, workers: 1 });
    expect(capped.claims[0]!.stopReason).toBe('max_counterexamples');
    expect(capped.claims[0]!.counterexamples).toBeGreaterThanOrEqual(3);
    expect(capped.claims[0]!.counterexamples).toBeLessThan(expectedFailures(8, 5).length);
    const timed = await sweep(join(dir, 'timed.sqlite'), fakeClaim({ maxN: 10, failFrom: 99, spinMicros: 1000 }, 'timed-claim'), { timeLimit: 0.3 });
    expect(timed.claims[0]!.stopReason).toBe('time_limit');
    expect(timed.claims[0]!.status).toBe('completed');
    expect(timed.claims[0]!.classes.some((k) => k.state === 'incomplete')).toBe(true);
    // Stopped early with no counterexample: incomplete (exit 4), never "holds" (README, exit codes).
    expect(timed.claims[0]!.outcome).toBe('incomplete');
    expect(timed.exitCode).toBe(4);
    expect(BigInt(timed.claims[0]!.remaining!.instances)).toBeGreaterThan(0n);
  });

  it('a time limit that leaves nothing checked is incomplete, not a pass', async () => {
    const s = await sweep(join(dir, 'zero.sqlite'), fakeClaim({ maxN: 6, failFrom: 99 }, 'zero-claim'), { timeLimit: 1e-9 });
    expect(s.claims[0]!.instancesChecked).toBe(0);
    expect(s.claims[0]!.outcome).toBe('incomplete');
    expect(s.exitCode).toBe(4);
    // 2 + 4 + … + 64 words in classes n = 1..6 remain (common practice, no source).
    expect(s.claims[0]!.remaining!.instances).toBe(String(2 ** 7 - 2));
  });

  it('an empty family is reported as such and never passes', async () => {
    const s = await sweep(join(dir, 'empty.sqlite'), fakeClaim({ maxN: 0, failFrom: 99 }, 'empty-claim'));
    expect(s.claims[0]!.outcome).toBe('empty');
    expect(s.exitCode).toBe(4);
  });

  it('an aborted run is interrupted, keeps finished chunks and verifies nothing it did not finish', async () => {
    const abortDb = join(dir, 'abort.sqlite');
    const ctl = new AbortController();
    const slow = fakeClaim({ maxN: 10, failFrom: 99, spinMicros: 200 }, 'slow-claim');
    const s = await runSweep({
      claims: [slow],
      options: parseRunOptions({ db: abortDb, workers: 2, chunkSize: 16 }),
      runtimeModule: FAKE_RUNTIME,
      signal: ctl.signal,
      onProgress: (p) => {
        if (p.checked >= 64) ctl.abort();
      },
    });
    expect(s.exitCode).toBe(130);
    expect(s.claims[0]!.status).toBe('interrupted');
    const store = openStore(abortDb);
    const chunks = store.prepare(`SELECT state, COUNT(*) AS n, SUM(checked) AS c FROM chunks GROUP BY state`).all() as { state: string; n: number; c: number }[];
    store.close();
    expect(chunks.map((r) => r.state)).toEqual(['done']);
    expect(chunks[0]!.c).toBe(s.claims[0]!.instancesChecked);
    expect(s.claims[0]!.instancesChecked).toBeLessThan(2 ** 11 - 2);
  });
});
