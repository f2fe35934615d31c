import { describe, expect, it } from 'vitest';
import { summaryJson, sweepSummaryText } from '../../../src/cli/sweep-summary-text.js';
import type { ClaimSummary, SweepSummary } from '../../../src/run/sweep-summary.js';

const side = (text: string) => ({ theory: 'cohomology', lengths: [2, 0, 2, 0, 2, 0], sides: ['01', '', '01', '', '10', ''], text, json: text });

// A hand-made summary: 12 instances checked, 9 hold, 2 skipped as zero, 1 counterexample.
const claim: ClaimSummary = {
  claimId: 'demo',
  fingerprint: 'abcdef0123456789',
  runId: 3,
  status: 'completed',
  stopReason: 'finished',
  instancesChecked: 12,
  holds: 9,
  skippedZero: 2,
  paired: 0,
  overturned: 0,
  newCounterexamples: 1,
  counterexamples: 1,
  rechecked: { checked: 0, stillFail: 0, nowHold: 0, pending: 0 },
  method: 'exact',
  errorBound: 0,
  classes: [{ key: 'n=2', size: 6, lengths: [2, 0, 2, 0, 2, 0], instances: '64', done: '64', checked: 12, holds: 9, fails: 1, state: 'counterexample' }],
  firstCounterexample: { classKey: 'n=2', index: '5', size: 6, left: side('1'), right: side('2'), replay: 'puzzlesweep replay demo.json --instance n=2:5' },
  outcome: 'counterexample',
  elapsedMs: 1500,
};
const summary: SweepSummary = { db: 'results/x.sqlite', claims: [claim], interrupted: false, elapsedMs: 2000, workerCrashes: 0, exitCode: 1 };

describe('sweepSummaryText', () => {
  it('prints each count of the summary in its phrase, the first counterexample and its replay command', () => {
    const text = sweepSummaryText(summary);
    expect(text).toContain('claim demo (abcdef012345), run 3: completed');
    expect(text).toContain('checked 12 instances in 1.5 s: 9 hold, 1 new counterexample, 2 skipped (value 0)');
    expect(text).toMatch(/n=2 +sides 2,0,2,0,2,0 +64 instances {2}counterexample {2}\(12 checked now, 1 fail\)/);
    expect(text).toContain('  1 counterexample stored');
    expect(text).toContain('    left  (cohomology) sides 01 | - | 01 | - | 10 | -: 1');
    expect(text).toContain('    replay: puzzlesweep replay demo.json --instance n=2:5');
    expect(text.split('\n').at(-1)).toBe('result: a counterexample is known (2.0 s)');
  });

  it('says how to resume an interrupted run and states the modular error bound', () => {
    const text = sweepSummaryText({ ...summary, interrupted: true, exitCode: 130, claims: [{ ...claim, method: 'modular', errorBound: 3e-12 }] });
    expect(text).toContain('chance of a false "holds" ≤ 3.00e-12');
    expect(text).toMatch(/^result: interrupted: .*run the same command again to resume/m);
  });

  it('an incomplete run says what remains and how to finish, and never that the claim holds', () => {
    const incomplete: ClaimSummary = {
      ...claim,
      stopReason: 'time_limit',
      counterexamples: 0,
      newCounterexamples: 0,
      firstCounterexample: undefined,
      outcome: 'incomplete',
      remaining: { classes: ['n=3'], instances: '400', rechecks: 0 },
      classes: [{ ...claim.classes[0]!, state: 'incomplete', done: '112', instances: '512', key: 'n=3' }],
    };
    const text = sweepSummaryText({ ...summary, exitCode: 4, claims: [incomplete] });
    expect(text).toContain('(112 of 512 done)');
    expect(text).toContain('unfinished: 400 instances in 1 class (n=3); run the same command again to finish (with a larger --time-limit, or none)');
    expect(text.split('\n').at(-1)).toMatch(/^result: incomplete: /);
    expect(text).not.toMatch(/holds on/);
  });

  it('writes bigints as decimal strings in JSON', () => {
    expect(summaryJson({ index: 2n ** 70n })).toBe(`{"index":"${(2n ** 70n).toString()}"}`);
  });
});
