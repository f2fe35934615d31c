import { describe, expect, it } from 'vitest';
import { classCoverage, completeChunk, doneInstances, leaseChunk, reapDeadRuns, releaseChunk, type LeaseRequest, type Store } from '../../../src/store/index.js';
import { memoryStore } from '../../helpers/memory-store.js';

const request = (runId: number, from: bigint, extra: Partial<LeaseRequest> = {}): LeaseRequest => ({
  fingerprint: 'fp',
  classKey: 'n=1',
  method: 'modular',
  runId,
  from,
  count: 100n,
  size: 30n,
  ...extra,
});

const done = (db: Store, runId: number, chunkId: number, exact = false) =>
  completeChunk(db, { chunkId, runId, fingerprint: 'fp', classKey: 'n=1', checked: 1, holds: 1, fails: 0, skippedZero: 0, paired: 0, errorBound: exact ? 0 : 0.001, exact, durationMs: 1, counterexamples: [], permutations: [] });

// Interval bookkeeping on one connection (common practice, no source); two connections on one file are
// in test/integration/store/chunk-records.test.ts.
describe('chunk leases', () => {
  it('leases consecutive ranges of at most `size` that tile [0, count), then nothing', () => {
    const { db, runId } = memoryStore();
    const ranges: string[] = [];
    for (let l = leaseChunk(db, request(runId, 0n)); l; l = leaseChunk(db, request(runId, 0n))) ranges.push(`${l.start}-${l.end}`);
    expect(ranges).toEqual(['0-30', '30-60', '60-90', '90-100']);
  });

  it('starts at `from` and stops short of the next leased range', () => {
    const { db, runId } = memoryStore();
    const later = leaseChunk(db, request(runId, 50n))!;
    expect([later.start, later.end]).toEqual([50n, 80n]);
    const early = leaseChunk(db, request(runId, 40n))!;
    // 40..50 is free and 50..80 leased, so the lease is cut at 50; the next one skips to 80 (by hand)
    expect([early.start, early.end]).toEqual([40n, 50n]);
    const next = leaseChunk(db, request(runId, 40n))!;
    expect([next.start, next.end]).toEqual([80n, 100n]);
  });

  it('skips finished work, fills gaps left by released leases, and reports coverage', () => {
    const { db, runId } = memoryStore();
    const a = leaseChunk(db, request(runId, 0n))!;
    const b = leaseChunk(db, request(runId, 0n))!;
    done(db, runId, b.chunkId);
    releaseChunk(db, a.chunkId);
    expect(classCoverage(db, 'fp', 'n=1', 'modular', 100n).complete).toBe(false);
    const again = leaseChunk(db, request(runId, 0n))!;
    expect([again.start, again.end]).toEqual([0n, 30n]);
    done(db, runId, again.chunkId, true);
    for (let l = leaseChunk(db, request(runId, 0n)); l; l = leaseChunk(db, request(runId, 0n))) done(db, runId, l.chunkId);
    const cov = classCoverage(db, 'fp', 'n=1', 'modular', 100n);
    expect(cov.complete).toBe(true);
    expect(cov.method).toBe('modular');
    expect(cov.errorBound).toBeCloseTo(0.003, 10); // union bound over the three modular chunks
    // An exact run may not rely on modular chunks.
    expect(classCoverage(db, 'fp', 'n=1', 'exact', 100n).complete).toBe(false);
    // 100 instances are done for a modular run; only the exact chunk 0..30 counts for an exact one.
    expect(doneInstances(db, 'fp', 'n=1', 'modular')).toBe(100n);
    expect(doneInstances(db, 'fp', 'n=1', 'exact')).toBe(30n);
  });

  it('an exact run leases again what only modular chunks cover; a modular run does not', () => {
    const { db, runId } = memoryStore();
    for (let l = leaseChunk(db, request(runId, 0n)); l; l = leaseChunk(db, request(runId, 0n))) done(db, runId, l.chunkId);
    expect(leaseChunk(db, request(runId, 0n))).toBeUndefined();
    expect(leaseChunk(db, request(runId, 0n, { method: 'exact' }))).toMatchObject({ start: 0n, end: 30n });
  });

  it('a lease of a dead run is freed, a finished chunk never written twice', () => {
    const { db, runId } = memoryStore();
    const lease = leaseChunk(db, request(runId, 0n))!;
    db.prepare('UPDATE runs SET pid = ? WHERE run_id = ?').run(2 ** 22 + 12345, runId); // above Linux's pid_max: no such process
    expect(reapDeadRuns(db)).toBe(1);
    expect(db.prepare('SELECT status FROM runs WHERE run_id = ?').get(runId)).toEqual({ status: 'interrupted' });
    expect(done(db, runId, lease.chunkId)).toBe(-1);
    expect(db.prepare('SELECT COUNT(*) AS n FROM chunks').get()).toEqual({ n: 0 });
  });

  it('keeps indices beyond 2^53 exact', () => {
    const { db, runId } = memoryStore();
    const big = 2n ** 60n;
    const l = leaseChunk(db, request(runId, big, { count: big + 10n, size: 4n }))!;
    expect([l.start, l.end]).toEqual([big, big + 4n]);
  });
});
