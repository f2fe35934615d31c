import { hostname } from 'node:os';
import { describe, expect, it } from 'vitest';
import { ChunkLeaser, listLeaseHolders, openStore, reapDeadRuns, saveClaim, startTokenOf, type Store } from '../../../src/store/index.js';

// Runs held by other processes, written as such a process would have written them (in-memory store).
function storeWithPeer(pid: number, processStart: string | null, heartbeatAgoMs = 0): { db: Store; runId: number } {
  const db = openStore(':memory:');
  saveClaim(db, { fingerprint: 'fp', claimId: 'c', canonicalJson: '{}', engineVersion: 'test' });
  const beat = new Date(Date.now() - heartbeatAgoMs).toISOString();
  const info = db
    .prepare(`INSERT INTO runs (fingerprint, started_at, heartbeat_at, host, pid, process_start, options_json, status) VALUES ('fp', ?, ?, ?, ?, ?, '{}', 'running')`)
    .run(beat, beat, hostname(), pid, processStart);
  const runId = Number(info.lastInsertRowid);
  new ChunkLeaser(db, { fingerprint: 'fp', classKey: 'n=1', method: 'modular', runId, count: 100n }).lease(0n, 40n);
  return { db, runId };
}

const leased = (db: Store) => (db.prepare(`SELECT COUNT(*) AS n FROM chunks WHERE state = 'leased'`).get() as { n: number }).n;

// The parent process (the test runner) is alive for the whole test; its start token is read from /proc.
const parent = process.ppid;
const parentToken = startTokenOf(parent);

describe('lease holders: a dead process is recognised even when its pid was reused (common practice, no source)', () => {
  it.runIf(parentToken !== undefined)('a live pid whose start time differs from the stored one is a reused pid: its leases are freed', () => {
    const { db, runId } = storeWithPeer(parent, `${parentToken}-earlier`);
    expect(listLeaseHolders(db)[0]).toMatchObject({ runId, gone: 'pid reused', chunks: 1, instances: 40n });
    expect(reapDeadRuns(db)).toBe(1);
    expect(leased(db)).toBe(0);
    expect(db.prepare('SELECT status FROM runs WHERE run_id = ?').get(runId)).toEqual({ status: 'interrupted' });
    db.close();
  });

  it.runIf(parentToken !== undefined)('the same pid with the same start time is the live holder: nothing is freed', () => {
    const { db } = storeWithPeer(parent, parentToken!);
    expect(listLeaseHolders(db)[0]!.gone).toBeUndefined();
    expect(reapDeadRuns(db)).toBe(0);
    expect(leased(db)).toBe(1);
    db.close();
  });

  it('without a start time, a heartbeat older than the expiry frees a live pid too', () => {
    const { db } = storeWithPeer(parent, null, 10 * 60_000);
    expect(listLeaseHolders(db)[0]!.gone).toBe('heartbeat expired');
    expect(reapDeadRuns(db)).toBe(1);
    expect(leased(db)).toBe(0);
    db.close();
  });

  it('a pid with no process is gone', () => {
    const { db } = storeWithPeer(2 ** 22 + 4321, null);
    expect(listLeaseHolders(db)[0]!.gone).toBe('no process');
    db.close();
  });
});
