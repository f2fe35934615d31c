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
  it('reads classes, tallies and counterexamples back as stored; paired and zero-skipped instances count as holds', () => {
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

    const { data } = reportDataFromStore(db, findClaims(db, 'fp')[0]!);
    expect(data.claim).toMatchObject({ id: claimJson.id, theory: 'cohomology', family: 'sides n,0,n,0,n,0 with 1 ≤ n ≤ 3', fingerprint: 'fp' });
    // n = 3 was never swept, so it is not listed.
    expect(data.classes.map((c) => [c.key, c.instances, c.checked, c.holds, c.counterexamples, c.status, c.seconds])).toEqual([
      ['n=1', 8n, 8n, 8n, 0, 'verified', 0.25],
      ['n=2', 64n, 40n, 39n, 1, 'refuted', 1.5],
    ]);
    expect(data.counterexamples).toEqual([
      { classKey: 'n=2', index: 9n, size: 6, left: { theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '10', '', '01', ''], value: '1' }, right: { theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '10', '', '01', ''], value: '0' } },
    ]);
  });
});
