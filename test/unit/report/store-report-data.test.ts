import { describe, expect, it } from 'vitest';
import { reportDataFromStore } from '../../../src/report/store-report-data.js';
import { completeChunk, findClaims, insertCounterexample, leaseChunk, markVerified, openStore, saveClaim, startRun } from '../../../src/store/index.js';

const claimJson = {
  id: 'report-data-claim',
  statement: 'A made-up claim for the report reader.',
  theory: 'cohomology',
  family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }] },
  transform: [{ type: 'rotate', degrees: 120 }],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
};

describe('reportDataFromStore', () => {
  it('reads classes (raised bounds included), tallies and counterexamples back as stored', () => {
    const db = openStore(':memory:');
    saveClaim(db, { fingerprint: 'fp', claimId: claimJson.id, canonicalJson: JSON.stringify(claimJson), engineVersion: 'test' });
    const runId = startRun(db, 'fp', {});
    const finish = (classKey: string, count: bigint, tallies: { checked: number; holds: number; paired: number; skippedZero: number; fails: number }) => {
      const l = leaseChunk(db, { fingerprint: 'fp', classKey, method: 'exact', runId, from: 0n, count, size: count })!;
      completeChunk(db, { chunkId: l.chunkId, runId, fingerprint: 'fp', classKey, ...tallies, errorBound: 0, exact: true, durationMs: 250, counterexamples: [], permutations: [] });
    };
    // n = 1: 2^3 = 8 labelings, all done and verified; n = 2: 2^6 = 64 labelings, one chunk of 40 done, one counterexample.
    finish('n=1', 8n, { checked: 8, holds: 5, paired: 2, skippedZero: 1, fails: 0 });
    markVerified(db, 'fp', runId, { classKey: 'n=1', method: 'exact', size: 3, lengths: [1, 0, 1, 0, 1, 0], variables: { n: 1 }, instances: 8n, errorBound: 0 });
    const l = leaseChunk(db, { fingerprint: 'fp', classKey: 'n=2', method: 'exact', runId, from: 0n, count: 64n, size: 40n })!;
    completeChunk(db, { chunkId: l.chunkId, runId, fingerprint: 'fp', classKey: 'n=2', checked: 40, holds: 39, paired: 0, skippedZero: 0, fails: 1, errorBound: 0, exact: true, durationMs: 1500, counterexamples: [], permutations: [] });
    const side = (text: string) => ({ theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '10', '', '01', ''], text, json: text });
    insertCounterexample(db, 'fp', runId, { classKey: 'n=2', index: 9n, size: 6, lengths: [2, 0, 2, 0, 2, 0], left: side('1'), right: side('0') });
    // n = 4 lies beyond the claim's bound (a run with --max n=4): 2^12 labelings, one chunk of 100 done.
    const l4 = leaseChunk(db, { fingerprint: 'fp', classKey: 'n=4', method: 'exact', runId, from: 0n, count: 4096n, size: 100n })!;
    completeChunk(db, { chunkId: l4.chunkId, runId, fingerprint: 'fp', classKey: 'n=4', checked: 100, holds: 100, vacuous: 90, nonzero: 10, paired: 0, skippedZero: 0, fails: 0, errorBound: 0, exact: true, durationMs: 500, counterexamples: [], permutations: [] });

    const { data } = reportDataFromStore(db, findClaims(db, 'fp')[0]!);
    expect(data.claim).toMatchObject({ id: claimJson.id, theory: 'cohomology', family: 'sides n,0,n,0,n,0 with 1 ≤ n ≤ 4', fingerprint: 'fp' });
    // n = 3 was never swept, so it is not listed; chunks that did not count nonzero holds give null there;
    // holds count boundaries (a chunk's paired instances are
    // counted by their representative's chunk), zero-skipped ones apart; fails are the stored rows.
    expect(data.classes.map((c) => [c.key, c.instances, c.checked, c.holds, c.nonzero, c.skipped, c.counterexamples, c.status, c.seconds])).toEqual([
      ['n=1', 8n, 8n, 5n, null, 1n, 0, 'verified', 0.25],
      ['n=2', 64n, 40n, 39n, null, 0n, 1, 'refuted', 1.5],
      ['n=4', 4096n, 100n, 100n, 10n, 0n, 0, 'partial', 0.5],
    ]);
    expect(data.counterexamples).toEqual([
      { classKey: 'n=2', index: 9n, size: 6, left: { theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '10', '', '01', ''], value: '1' }, right: { theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '10', '', '01', ''], value: '0' } },
    ]);
  });
});
