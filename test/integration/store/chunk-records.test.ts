import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { leaseChunk, openStore, saveClaim, startRun, type LeaseRequest, type Store } from '../../../src/store/index.js';

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

// Two connections on one file; the single-connection lease rules are unit tests (test/unit/store/chunk-records.test.ts).
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
});
