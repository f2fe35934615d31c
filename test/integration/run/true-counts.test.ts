import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { loadSweepClaim } from '../../../src/run/load-sweep-claim.js';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';
import { listCounterexamples, openStore } from '../../../src/store/index.js';
import { exchangeReverseClaim, exchangeReverseFailures } from '../../helpers/exchange-reverse-brute-force.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-counts-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function claimFile(name: string, data: object): string {
  const path = join(dir, name);
  writeFileSync(path, JSON.stringify(data));
  return path;
}

describe('counts that a brute force re-derives (issue 7)', () => {
  it('an involutive failing claim stores every failing boundary, class by class; holds = instances − fails', async () => {
    const db = join(dir, 'involutive.sqlite');
    const claim = loadSweepClaim(claimFile('exchange-reverse.json', exchangeReverseClaim(4, 3)));
    const s = await runSweep({ claims: [claim], options: parseRunOptions({ db, workers: 2, chunkSize: 64 }) });
    const c = s.claims[0]!;
    const store = openStore(db);
    const stored = listCounterexamples(store, claim.fingerprint);
    store.close();
    let instances = 0;
    let fails = 0;
    for (let a = 1; a <= 4; a++) {
      for (let b = 1; b <= 3; b++) {
        // Independent brute force: naive backtracking counts and the steps written out by hand.
        const brute = exchangeReverseFailures(a, b);
        const key = `a=${a},b=${b}`;
        const here = stored.filter((x) => x.classKey === key).map((x) => [x.left.sides[0], x.left.sides[1], x.left.sides[3], x.left.sides[4]].join('|'));
        expect(here.sort(), key).toEqual([...brute.failing].sort());
        const k = c.classes.find((x) => x.key === key)!;
        expect(k.instances).toBe(String(brute.instances));
        expect(k.fails, key).toBe(brute.failing.length);
        expect(k.holds, key).toBe(brute.instances - brute.failing.length);
        instances += brute.instances;
        fails += brute.failing.length;
      }
    }
    // Issue 7 reported 135 counterexamples for this claim; the brute force finds twice as many boundaries.
    expect(fails).toBe(270);
    expect(c.counterexamples).toBe(fails);
    expect(c.holds).toBe(instances - fails);
    expect((c.vacuous ?? 0) + (c.nonzero ?? 0)).toBe(c.holds);
  });

  it('rewording the statement sweeps nothing new; raising a bound sweeps only the new classes', async () => {
    const db = join(dir, 'fingerprint.sqlite');
    const data = exchangeReverseClaim(2, 2);
    const first = await runSweep({ claims: [loadSweepClaim(claimFile('a.json', data))], options: parseRunOptions({ db, workers: 1 }) });
    const reworded = await runSweep({ claims: [loadSweepClaim(claimFile('b.json', { ...data, statement: 'Said differently.' }))], options: parseRunOptions({ db, workers: 1 }) });
    expect(reworded.claims[0]!.fingerprint).toBe(first.claims[0]!.fingerprint);
    expect(reworded.claims[0]!.instancesChecked).toBe(0);
    const raised = await runSweep({ claims: [loadSweepClaim(claimFile('c.json', exchangeReverseClaim(3, 2)))], options: parseRunOptions({ db, workers: 1 }) });
    // New classes a=3,b=1 and a=3,b=2: boundaries counted by the brute force above.
    expect(raised.claims[0]!.instancesChecked).toBe(exchangeReverseFailures(3, 1).instances + exchangeReverseFailures(3, 2).instances);
  });
});
