import { describe, expect, it } from 'vitest';
import { autoSizing, chunkSizeFor } from '../../../src/run/chunk-sizing.js';
import { createScheduler, type SchedulerOptions, type SettleOutcome, type SweepScheduler } from '../../../src/run/sweep-scheduler.js';

// A fake driver: each class is a free interval [0, count) leased from the front; nothing real runs.
// The expected values below are interval bookkeeping worked by hand (common practice, no source).
function options(counts: number[], extra: Partial<SchedulerOptions> = {}): SchedulerOptions {
  return {
    classes: counts.map((n, i) => ({ key: `c${i}`, count: BigInt(n) })),
    capacity: 2,
    stopAtFirst: false,
    sizing: autoSizing(1, 10),
    failingClasses: new Set(),
    knownCounterexamples: 0,
    ...extra,
  };
}

interface Lease {
  ci: number;
  start: bigint;
  end: bigint;
}

/** Applies actions until the scheduler waits or finishes; returns the leases it handed out. */
function pump(s: SweepScheduler, counts: number[], settle: (ci: number) => SettleOutcome = () => 'verified', now = 0): { leases: Lease[]; last: string; settles: number[] } {
  const leases: Lease[] = [];
  const settles: number[] = [];
  for (;;) {
    const a = s.next(now);
    if (a.kind === 'lease') {
      const count = BigInt(counts[a.classIndex]!);
      if (a.from >= count) s.leased(a.classIndex, undefined);
      else {
        const end = a.from + a.size > count ? count : a.from + a.size;
        s.leased(a.classIndex, { start: a.from, end });
        leases.push({ ci: a.classIndex, start: a.from, end });
      }
    } else if (a.kind === 'settle') {
      settles.push(a.classIndex);
      s.settled(a.classIndex, settle(a.classIndex), now);
    } else return { leases, last: a.kind, settles };
  }
}

const ok = (checked: number, fails = 0) => ({ checked, holds: checked - fails, fails, added: fails, durationMs: checked });

describe('sweep scheduler (pure state machine)', () => {
  it('leases classes in order, never more than the capacity, and settles each class once its chunks are in', () => {
    const counts = [15, 7];
    const s = createScheduler(options(counts));
    let step = pump(s, counts);
    expect(step.leases.map((l) => `${l.ci}:${l.start}-${l.end}`)).toEqual(['0:0-10', '0:10-15']);
    expect(step.last).toBe('wait');
    s.completed(0, ok(10));
    step = pump(s, counts);
    // Class 0 is fully leased, so the freed slot goes to class 1 at once (no idle worker at the class boundary).
    expect(step.leases.map((l) => `${l.ci}:${l.start}-${l.end}`)).toEqual(['1:0-7']);
    s.completed(0, ok(5));
    step = pump(s, counts);
    expect(step.settles).toEqual([0]);
    s.completed(1, ok(7));
    step = pump(s, counts);
    expect(step.settles).toEqual([1]);
    expect(step.last).toBe('finished');
    expect(s.complete).toBe(true);
    expect(s.classes.map((c) => c.phase)).toEqual(['verified', 'verified']);
  });

  it('under stop-at-first begins no class before every smaller one is verified, and none after a failing one', () => {
    const counts = [20, 5, 5];
    const s = createScheduler(options(counts, { stopAtFirst: true, capacity: 4 }));
    let step = pump(s, counts);
    expect(step.leases.map((l) => l.ci)).toEqual([0, 0]);
    s.completed(0, ok(10, 1));
    s.completed(0, ok(10));
    step = pump(s, counts, () => 'counterexample');
    expect(step.settles).toEqual([0]);
    expect(step.leases).toEqual([]);
    expect(step.last).toBe('finished');
    expect(s.stopReason).toBe('stop_at_first');
    expect(s.classes.map((c) => c.phase)).toEqual(['counterexample', 'pending', 'pending']);
    expect(s.complete).toBe(false);
  });

  it('under stop-at-first a class with a stored counterexample ends the sweep there', () => {
    const counts = [5, 5, 5];
    const s = createScheduler(options(counts, { stopAtFirst: true, failingClasses: new Set(['c1']), knownCounterexamples: 1 }));
    let step = pump(s, counts);
    expect(step.leases.map((l) => l.ci)).toEqual([0]);
    s.completed(0, ok(5));
    step = pump(s, counts, (ci) => (ci === 1 ? 'counterexample' : 'verified'));
    expect(step.leases.map((l) => l.ci)).toEqual([1]);
    s.completed(1, ok(5));
    step = pump(s, counts, (ci) => (ci === 1 ? 'counterexample' : 'verified'));
    expect(step.last).toBe('finished');
    expect(s.classes[2]!.phase).toBe('pending');
  });

  it('a halt (time limit, signal) hands out nothing more but lets chunks in flight finish and settle', () => {
    const counts = [30];
    const s = createScheduler(options(counts));
    pump(s, counts);
    s.halt('time_limit');
    expect(s.next(0).kind).toBe('wait');
    s.completed(0, ok(10));
    s.completed(0, ok(10));
    const step = pump(s, counts);
    expect(step.leases).toEqual([]);
    expect(step.settles).toEqual([]);
    expect(step.last).toBe('finished');
    expect(s.stopReason).toBe('time_limit');
    expect(s.complete).toBe(false);
  });

  it('stops at --max-counterexamples, counting those stored before the run', () => {
    const counts = [100];
    const s = createScheduler(options(counts, { maxCounterexamples: 3, knownCounterexamples: 1 }));
    pump(s, counts);
    s.completed(0, ok(10, 2));
    expect(s.stopReason).toBe('max_counterexamples');
    s.completed(0, ok(10));
    expect(pump(s, counts).last).toBe('finished');
  });

  it('waits for a live peer holding part of a class, then leases what a dead one left', () => {
    const counts = [10, 10];
    const s = createScheduler(options(counts, { capacity: 1, peerPollMs: 100 }));
    pump(s, counts);
    s.completed(0, ok(10));
    // The store says a peer still holds part of class 0: the scheduler moves on to class 1 meanwhile.
    let step = pump(s, counts, () => 'peer', 1000);
    expect(step.settles).toEqual([0]);
    expect(step.leases.map((l) => l.ci)).toEqual([1]);
    s.completed(1, ok(10));
    step = pump(s, counts, () => 'verified', 1050);
    expect(step.settles).toEqual([1]);
    expect(s.next(1050)).toEqual({ kind: 'wait', until: 1100 });
    // At the poll the peer turns out dead: its leases were freed, so class 0 is leased again from its start.
    step = pump(s, counts, () => 'reopen', 1100);
    expect(step.leases.map((l) => `${l.ci}:${l.start}`)).toEqual(['0:0']);
    s.completed(0, ok(10));
    step = pump(s, counts, () => 'verified', 1200);
    expect(step.last).toBe('finished');
    expect(s.complete).toBe(true);
  });

  it('an empty family finishes at once', () => {
    const s = createScheduler(options([]));
    expect(s.next(0)).toEqual({ kind: 'finished' });
  });

  it('a failed chunk stops the run', () => {
    const counts = [50];
    const s = createScheduler(options(counts));
    pump(s, counts);
    s.abandoned(0);
    expect(s.stopReason).toBe('error');
    s.completed(0, ok(10));
    expect(pump(s, counts).last).toBe('finished');
  });
});

describe('chunk sizing (common practice, no source)', () => {
  const sizing = autoSizing(2);
  it('a fixed --chunk-size is used as given', () => {
    expect(chunkSizeFor(autoSizing(2, 37), { classRemaining: 1000n, totalRemaining: 10_000n })).toBe(37n);
  });
  it('sizes by the measured rate, aiming at the target duration', () => {
    // 150 ms at 0.01 ms per instance is 15,000 instances.
    expect(chunkSizeFor(sizing, { perInstanceMs: 0.01, classRemaining: 10n ** 9n, totalRemaining: 10n ** 9n })).toBe(15_000n);
  });
  it('hedges an unmeasured class by 4× the previous class rate', () => {
    expect(chunkSizeFor(sizing, { previousPerInstanceMs: 0.01, classRemaining: 10n ** 9n, totalRemaining: 10n ** 9n })).toBe(3_750n);
  });
  it('near the end gives each worker a short share, so workers finish together', () => {
    // 1,000 left on 2 workers with 2 chunks each in flight: at most 250 per chunk.
    expect(chunkSizeFor(sizing, { perInstanceMs: 0.001, classRemaining: 1000n, totalRemaining: 1000n })).toBe(250n);
    expect(chunkSizeFor(sizing, { perInstanceMs: 0.001, classRemaining: 5n, totalRemaining: 5n })).toBe(5n);
  });

  it('one worker (or the main thread) takes what its measured rate allows up to the class end, with no tail share', () => {
    // 150 ms at 0.001 ms per instance is 150,000, above the 1,000 left: the whole rest in one chunk (common practice, no source).
    expect(chunkSizeFor(autoSizing(1), { perInstanceMs: 0.001, classRemaining: 1000n, totalRemaining: 1000n })).toBe(1000n);
  });
});
