import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { classCoverage, completeChunk, leaseChunk, openStore, reapDeadRuns, saveClaim, startRun, type LeaseRequest, type Store } from '../../../src/store/index.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-chunks-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function freshStore(name: string): { db: Store; runId: number } {
  const db = openStore(join(dir, name));
  saveClaim(db, { fingerprint: 'fp', claimId: 'c', canonicalJson: '{}', engineVersion: 'test' });
  return { db, runId: startRun(db, 'fp', {}) };
}

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

describe('chunk leases (common practice, no source: interval bookkeeping)', () => {
  it('two connections lease disjoint ranges that tile the class', () => {
    const { db, runId } = freshStore('two.sqlite');
    const other = openStore(join(dir, 'two.sqlite'));
    const ranges: string[] = [];
    for (let turn = 0; ; turn++) {
      const lease = leaseChunk(turn % 2 ? other : db, request(runId, 0n));
      if (!lease) break;
      ranges.push(`${lease.start}-${lease.end}`);
    }
    expect(ranges).toEqual(['0-30', '30-60', '60-90', '90-100']);
    other.close();
    db.close();
  });

  it('skips finished work, fills gaps left by released leases, and reports coverage', () => {
    const { db, runId } = freshStore('gaps.sqlite');
    const a = leaseChunk(db, request(runId, 0n))!;
    const b = leaseChunk(db, request(runId, 0n))!;
    done(db, runId, b.chunkId);
    db.prepare('DELETE FROM chunks WHERE chunk_id = ?').run(a.chunkId);
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
    db.close();
  });

  it('a lease of a dead process is freed, a finished chunk never written twice', () => {
    const { db, runId } = freshStore('dead.sqlite');
    const lease = leaseChunk(db, request(runId, 0n))!;
    db.prepare('UPDATE runs SET pid = ? WHERE run_id = ?').run(2 ** 22 + 12345, runId); // no such process
    expect(reapDeadRuns(db)).toBe(1);
    expect(db.prepare('SELECT status FROM runs WHERE run_id = ?').get(runId)).toEqual({ status: 'interrupted' });
    expect(done(db, runId, lease.chunkId)).toBe(-1);
    db.close();
  });
});
