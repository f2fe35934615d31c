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
  vacuous: 2,
  nonzero: 7,
  skippedZero: 2,
  paired: 0,
  overturned: 0,
  newCounterexamples: 1,
  counterexamples: 1,
  rechecked: { checked: 0, stillFail: 0, nowHold: 0, pending: 0, partnersStored: 0 },
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
    expect(text).toContain('checked 12 instances in 1.5 s: 9 hold (7 nonzero, 2 vacuous: both values 0), 1 new counterexample, 2 skipped (value 0)');
    expect(text).toMatch(/n=2 +sides 2,0,2,0,2,0 +64 instances {2}counterexample {2}\(12 checked now, 1 fail\)/);
    expect(text).toContain('  1 counterexample stored');
    expect(text).toContain('    left  (cohomology) sides 01 | - | 01 | - | 10 | -: 1');
    expect(text).toContain('    replay: puzzlesweep replay demo.json --instance n=2:5');
    expect(text.split('\n').at(-1)).toBe('result: a counterexample is known (2.0 s)');
  });

  it('shows σ(right value) apart from the right value, and the store\'s counts of a class beside this run\'s', () => {
    const substituted = { ...claim.firstCounterexample!, right: side('y2 - y1'), substituted: side('y1 - y2'), substitution: 'rev[1..2]' };
    const stored = { ...claim.classes[0]!, stored: { checked: 64, holds: 60, fails: 4, skippedZero: 0, vacuous: 50, nonzero: 10 } };
    const text = sweepSummaryText({ ...summary, claims: [{ ...claim, firstCounterexample: substituted, classes: [stored] }] });
    expect(text).toContain('    right (cohomology) sides 01 | - | 01 | - | 10 | -: y2 - y1');
    expect(text).toContain('    σ(right), σ = rev[1..2]: y1 - y2');
    expect(text).toContain('stored: 60 hold (10 nonzero, 50 vacuous: both values 0), 4 fail');
  });

  it('writes class-wide permutations in block or cycle notation and explains an incomplete class and a truncated list', () => {
    const perms = { common: [[1, 3, 2], [2, 3, 1]], lowerBound: true };
    const text = sweepSummaryText({ ...summary, claims: [{ ...claim, classes: [{ ...claim.classes[0]!, state: 'incomplete', commonPermutations: perms }] }] });
    // [1,3,2] reverses y2..y3; [2,3,1] shifts y1..y3 by one (definitions in the claim schema).
    expect(text).toContain('permutations serving every instance: rev[2..3], shift[1..3] by 1');
    expect(text).toContain('class incomplete: instances not yet checked may rule some out');
    expect(text).toContain('only the first 720 were kept');
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
