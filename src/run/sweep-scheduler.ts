import { chunkSizeFor, type ChunkSizing } from './chunk-sizing.js';

/**
 * The sweep's decisions as a pure state machine: which class to lease from next and how much, when a
 * class is ready to be settled (verified or failed) and when the run stops. The driver performs the
 * store and worker I/O and reports back; nothing here touches threads, SQLite or the clock.
 */

export type SchedulerStop = 'stop_at_first' | 'max_counterexamples' | 'time_limit' | 'signal' | 'error';

/** What the scheduler asks the driver to do next. */
export type SchedulerAction =
  /** Lease at most `size` instances of class `classIndex`, starting at or after `from`; answer with `leased`. */
  | { readonly kind: 'lease'; readonly classIndex: number; readonly from: bigint; readonly size: bigint }
  /** The class has nothing left to lease and nothing in flight: check its coverage and answer with `settled`. */
  | { readonly kind: 'settle'; readonly classIndex: number }
  /** Nothing to do until a chunk finishes or, when `until` is set, until that time (a peer's lease is polled). */
  | { readonly kind: 'wait'; readonly until?: number | undefined }
  /** No more work will be handed out; the run ends once nothing is in flight. */
  | { readonly kind: 'finished' };

/** How a class ended up after `settle`. */
export type SettleOutcome =
  | 'verified'
  | 'counterexample'
  /** A --shard run's part of the class is done; the class as a whole awaits the other shards. */
  | 'part-done'
  /** Some of the class is leased by a live process: poll again later. */
  | 'peer'
  /** Leases of a dead process were freed (or a gap appeared): lease the class again from its start. */
  | 'reopen';

export type ClassPhase = 'pending' | 'leasing' | 'draining' | 'settling' | 'peer' | 'verified' | 'counterexample' | 'part-done';

/** One class as the scheduler sees it. */
export interface ClassProgress {
  readonly key: string;
  /** End of this run's part of the class (its instance count unless --shard narrows it). */
  readonly count: bigint;
  /** Start of this run's part of the class. */
  readonly first: bigint;
  phase: ClassPhase;
  cursor: bigint;
  outstanding: number;
  /** Instances this run finished in the class. */
  checked: number;
  holds: number;
  fails: number;
  /** Sum of worker milliseconds and instances of this run's chunks, for sizing the next chunk. */
  workMs: number;
  workInstances: number;
  pollAt: number;
}

export interface SchedulerOptions {
  /** Classes in sweep order; `count` ends and `first` (default 0) starts the part this run sweeps. */
  readonly classes: readonly { readonly key: string; readonly count: bigint; readonly first?: bigint | undefined }[];
  /** Chunks handed out at once (workers × 2 keeps every worker fed while the main thread stores a result). */
  readonly capacity: number;
  readonly stopAtFirst: boolean;
  readonly maxCounterexamples?: number | undefined;
  readonly sizing: ChunkSizing;
  /** Classes with a stored counterexample that still fails (re-check included). */
  readonly failingClasses: ReadonlySet<string>;
  readonly knownCounterexamples: number;
  /** Milliseconds between polls of a class whose remaining work is leased by a live peer. */
  readonly peerPollMs?: number | undefined;
}

/** A chunk's tallies as far as scheduling cares. */
export interface ChunkTally {
  readonly checked: number;
  readonly holds: number;
  readonly fails: number;
  /** New counterexamples stored for this chunk. */
  readonly added: number;
  readonly durationMs: number;
}

const DONE: ReadonlySet<ClassPhase> = new Set(['verified', 'counterexample', 'part-done']);

/** Creates the scheduler of one claim's sweep. */
export function createScheduler(o: SchedulerOptions) {
  const classes: ClassProgress[] = o.classes.map((c) => ({
    key: c.key,
    count: c.count,
    first: c.first ?? 0n,
    phase: 'pending',
    cursor: c.first ?? 0n,
    outstanding: 0,
    checked: 0,
    holds: 0,
    fails: 0,
    workMs: 0,
    workInstances: 0,
    pollAt: 0,
  }));
  const failing = new Set(o.failingClasses);
  let known = o.knownCounterexamples;
  let inflight = 0;
  let stop: SchedulerStop | undefined;
  const pollMs = o.peerPollMs ?? 250;

  const smallestFailing = () => classes.findIndex((c) => failing.has(c.key));
  const remainingInstances = () => classes.reduce((acc, c) => (DONE.has(c.phase) ? acc : acc + (c.count - c.cursor)), 0n);

  const checkCounterexampleStops = () => {
    if (stop) return;
    if (o.maxCounterexamples !== undefined && known >= o.maxCounterexamples) stop = 'max_counterexamples';
  };
  checkCounterexampleStops();

  function next(now: number): SchedulerAction {
    let earliestPoll: number | undefined;
    const first = o.stopAtFirst ? smallestFailing() : -1;
    // Under --stop-at-first a class starts only when every smaller one is verified, so no class beyond the
    // smallest failing one is ever finished (nor even begun).
    let smallerVerified = true;
    for (let i = 0; i < classes.length; i++) {
      const c = classes[i]!;
      const mayStart = !o.stopAtFirst || smallerVerified;
      smallerVerified &&= c.phase === 'verified' || c.phase === 'part-done';
      if (DONE.has(c.phase)) continue;
      if (first >= 0 && i > first) break;
      if (c.phase === 'leasing' && c.cursor >= c.count) c.phase = 'draining';
      if (c.phase === 'settling') continue;
      if (c.phase === 'draining') {
        if (c.outstanding === 0) {
          c.phase = 'settling';
          return { kind: 'settle', classIndex: i };
        }
        continue;
      }
      if (c.phase === 'peer') {
        if (stop) continue;
        if (now >= c.pollAt) {
          c.phase = 'settling';
          return { kind: 'settle', classIndex: i };
        }
        earliestPoll = Math.min(earliestPoll ?? Infinity, c.pollAt);
        continue;
      }
      // pending or leasing
      if (stop || inflight >= o.capacity || !mayStart) continue;
      c.phase = 'leasing';
      const size = chunkSizeFor(o.sizing, {
        perInstanceMs: c.workInstances > 0 ? c.workMs / c.workInstances : undefined,
        previousPerInstanceMs: previousRate(i),
        classRemaining: c.count - c.cursor,
        totalRemaining: remainingInstances(),
      });
      return { kind: 'lease', classIndex: i, from: c.cursor, size };
    }
    if (inflight > 0) return { kind: 'wait', until: earliestPoll };
    if (earliestPoll !== undefined && !stop) return { kind: 'wait', until: earliestPoll };
    return { kind: 'finished' };
  }

  // The last measured rate of an earlier class, scaled by nothing: the sizing rule hedges for growth.
  function previousRate(i: number): number | undefined {
    for (let j = i - 1; j >= 0; j--) {
      const c = classes[j]!;
      if (c.workInstances > 0) return c.workMs / c.workInstances;
    }
    return undefined;
  }

  /** The driver leased [start, end) of a class, or found nothing free at or after `from` (undefined). */
  function leased(i: number, range: { start: bigint; end: bigint } | undefined): void {
    const c = classes[i]!;
    if (!range) {
      c.phase = 'draining';
      return;
    }
    c.cursor = range.end;
    c.outstanding++;
    inflight++;
  }

  /** A leased chunk finished and was stored. */
  function completed(i: number, t: ChunkTally): void {
    const c = classes[i]!;
    c.outstanding--;
    inflight--;
    c.checked += t.checked;
    c.holds += t.holds;
    c.fails += t.fails;
    c.workMs += t.durationMs;
    c.workInstances += t.checked;
    known += t.added;
    if (t.fails > 0) failing.add(c.key);
    checkCounterexampleStops();
  }

  /** A leased chunk was given back unfinished (a worker error); the run stops. */
  function abandoned(i: number): void {
    classes[i]!.outstanding--;
    inflight--;
    stop ??= 'error';
  }

  /** The outcome of a `settle` request. */
  function settled(i: number, outcome: SettleOutcome, now: number): void {
    const c = classes[i]!;
    if (outcome === 'verified' || outcome === 'counterexample' || outcome === 'part-done') {
      c.phase = outcome;
      if (outcome === 'counterexample') {
        failing.add(c.key);
        if (o.stopAtFirst) stop ??= 'stop_at_first';
      }
    } else if (outcome === 'peer') {
      c.phase = 'peer';
      c.pollAt = now + pollMs;
    } else {
      c.phase = 'pending';
      c.cursor = c.first;
    }
  }

  /** Stops handing out work (signal, time limit); chunks in flight still finish and are stored. */
  function halt(reason: SchedulerStop): void {
    stop ??= reason;
  }

  return {
    next,
    leased,
    completed,
    abandoned,
    settled,
    halt,
    /** A standing counterexample is known in the class. */
    isFailing: (i: number): boolean => failing.has(classes[i]!.key),
    get stopReason(): SchedulerStop | undefined {
      return stop;
    },
    get inflight(): number {
      return inflight;
    },
    get counterexamples(): number {
      return known;
    },
    /** Every class settled as verified or counterexample. */
    get complete(): boolean {
      return classes.every((c) => DONE.has(c.phase));
    },
    classes: classes as readonly Readonly<ClassProgress>[],
  };
}

export type SweepScheduler = ReturnType<typeof createScheduler>;
