import { describe, expect, it } from 'vitest';
import { sweepSummaryText } from '../../../src/cli/sweep-summary-text.js';
import type { ClaimSummary } from '../../../src/run/sweep-summary.js';

const side = (sides: string[], text: string) => ({ theory: 'cohomology', lengths: sides.map((s) => s.length), sides, text, json: text });

// A hand-made summary of an involutive claim that fails: every count in it is written here, not computed.
const claim: ClaimSummary = {
  claimId: 'golden',
  fingerprint: 'fedcba9876543210',
  runId: 2,
  status: 'completed',
  stopReason: 'finished',
  instancesChecked: 32,
  holds: 28,
  vacuous: 20,
  nonzero: 8,
  skippedZero: 0,
  paired: 12,
  overturned: 0,
  newCounterexamples: 4,
  counterexamples: 4,
  rechecked: { checked: 0, stillFail: 0, nowHold: 0, pending: 0, partnersStored: 0 },
  method: 'exact',
  errorBound: 0,
  outcome: 'counterexample',
  classes: [
    { key: 'a=1,b=1', size: 4, lengths: [1, 1, 0, 1, 1, 0], instances: '8', done: '8', checked: 8, holds: 8, fails: 0, state: 'verified', method: 'exact', errorBound: 0, stored: { checked: 8, holds: 8, fails: 0, skippedZero: 0, vacuous: 5, nonzero: 3 } },
    { key: 'a=2,b=1', size: 6, lengths: [2, 1, 0, 2, 1, 0], instances: '24', done: '24', checked: 24, holds: 20, fails: 4, state: 'counterexample', stored: { checked: 24, holds: 20, fails: 4, skippedZero: 0, vacuous: 15, nonzero: 5 } },
  ],
  firstCounterexample: { classKey: 'a=2,b=1', index: '7', size: 6, left: side(['01', '0', '', '01', '0', ''], '1'), right: side(['10', '0', '', '10', '0', ''], '0'), replay: 'puzzlesweep replay golden.json --instance a=2,b=1:7' },
  elapsedMs: 1200,
};

describe('sweep summary text', () => {
  it('keeps its layout (golden file: a regression pin of the text, the counts above are hand-written)', async () => {
    const text = sweepSummaryText({ db: 'results/golden.sqlite', claims: [claim], interrupted: false, elapsedMs: 1500, workerCrashes: 0, exitCode: 1 });
    await expect(`${text}\n`).toMatchFileSnapshot('golden/sweep-summary.txt');
  });
});
