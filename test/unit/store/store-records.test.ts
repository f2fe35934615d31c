import { describe, expect, it } from 'vitest';
import {
  classCommonPermutations,
  completeChunk,
  findClaims,
  finishRun,
  insertCounterexample,
  intersectPermutations,
  leaseChunk,
  listCounterexamples,
  listRuns,
  listVerified,
  markVerified,
  openStore,
  permutationSummary,
  reapDeadRuns,
  recordRecheck,
  saveClaim,
  startRun,
  type CounterexampleRecord,
} from '../../../src/store/index.js';
import { STORE_MIGRATIONS } from '../../../src/store/store-migrations.js';
import { memoryStore } from '../../helpers/memory-store.js';

const measured = (sides: string[], text: string) => ({ theory: 'cohomology', lengths: sides.map((s) => s.length), sides, text, json: text });
const counterexample = (classKey: string, index: bigint, size: number, lengths: number[]): CounterexampleRecord => ({
  classKey,
  index,
  size,
  lengths,
  left: measured(['01', '', '01', '', '10', ''], '1'),
  right: measured(['01', '', '01', '', '10', ''], '2'),
});

describe('openStore', () => {
  it('applies every migration once to a new store and creates the tables the README documents', () => {
    const db = openStore(':memory:');
    const versions = (db.prepare('SELECT version FROM schema_version ORDER BY version').all() as { version: number }[]).map((r) => r.version);
    expect(versions).toEqual(STORE_MIGRATIONS.map((_, i) => i + 1));
    const tables = (db.prepare("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'").all() as { name: string }[]).map((r) => r.name);
    // README, "The store": the documented tables
    expect(tables).toEqual(expect.arrayContaining(['schema_version', 'claims', 'runs', 'chunks', 'counterexamples', 'verified_classes', 'permutations']));
    const chunkColumns = (db.prepare('PRAGMA table_info(chunks)').all() as { name: string }[]).map((c) => c.name);
    // README, "The store", row `chunks`
    expect(chunkColumns).toEqual(expect.arrayContaining(['chunk_id', 'fingerprint', 'class_key', 'method', 'start_index', 'end_index', 'state', 'run_id', 'checked', 'holds', 'fails', 'skipped_zero', 'paired', 'error_bound', 'duration_ms', 'finished_at', 'common_permutations', 'permutations_truncated']));
  });
});

describe('claim records', () => {
  it('keeps one row per fingerprint, finds by id or fingerprint, newest first', () => {
    const db = openStore(':memory:');
    saveClaim(db, { fingerprint: 'a1', claimId: 'same', canonicalJson: '{"v":1}', engineVersion: 'e' });
    saveClaim(db, { fingerprint: 'a2', claimId: 'same', canonicalJson: '{"v":2}', engineVersion: 'e', sourceFile: 'x.json' });
    saveClaim(db, { fingerprint: 'a1', claimId: 'same', canonicalJson: '{"v":1}', engineVersion: 'e', sourceFile: 'y.json' });
    expect(findClaims(db, 'same').map((c) => c.fingerprint)).toEqual(['a2', 'a1']);
    expect(findClaims(db, 'a1')).toEqual([{ fingerprint: 'a1', claimId: 'same', canonicalJson: '{"v":1}', engineVersion: 'e', sourceFile: 'y.json' }]);
    expect(findClaims(db, 'none')).toEqual([]);
    expect(findClaims(db)).toHaveLength(2);
  });
});

describe('counterexample records', () => {
  it('stores each counterexample once and reads it back unchanged, indices beyond 2^53 included', () => {
    const { db, runId } = memoryStore();
    const c = { ...counterexample('n=2', 2n ** 60n + 1n, 6, [2, 0, 2, 0, 2, 0]), permutation: [2, 1] };
    expect(insertCounterexample(db, 'fp', runId, c)).toBe(true);
    expect(insertCounterexample(db, 'fp', runId, c)).toBe(false);
    const [back] = listCounterexamples(db, 'fp');
    expect(back).toEqual({ ...c, fingerprint: 'fp', foundRun: runId, recheckedRun: null, recheck: null });
  });

  it('lists in sweep order: size, then side lengths, then class and index (by hand)', () => {
    const { db, runId } = memoryStore();
    for (const c of [
      counterexample('n=3', 5n, 9, [3, 0, 3, 0, 3, 0]),
      counterexample('a=1', 7n, 6, [2, 1, 1, 1, 1, 0]),
      counterexample('n=2', 3n, 6, [2, 0, 2, 0, 2, 0]),
      counterexample('n=2', 1n, 6, [2, 0, 2, 0, 2, 0]),
    ]) insertCounterexample(db, 'fp', runId, c);
    expect(listCounterexamples(db, 'fp').map((c) => `${c.classKey}:${c.index}`)).toEqual(['n=2:1', 'n=2:3', 'a=1:7', 'n=3:5']); // [2,0,…] < [2,1,…]
  });

  it('records the outcome of a re-check', () => {
    const { db, runId } = memoryStore();
    insertCounterexample(db, 'fp', runId, counterexample('n=2', 1n, 6, [2, 0, 2, 0, 2, 0]));
    const later = startRun(db, 'fp', {});
    recordRecheck(db, 'fp', 'n=2', 1n, later, 'holds');
    expect(listCounterexamples(db, 'fp')[0]).toMatchObject({ recheckedRun: later, recheck: 'holds' });
  });
});

describe('run records', () => {
  it('opens a run as running, closes it with its reason, and lists newest first', () => {
    const { db, runId } = memoryStore();
    const second = startRun(db, 'fp', { workers: 2 });
    finishRun(db, runId, 'completed', 'finished');
    const runs = listRuns(db, 'fp', 5);
    expect(runs.map((r) => [r.runId, r.status, r.stopReason])).toEqual([
      [second, 'running', null],
      [runId, 'completed', 'finished'],
    ]);
    expect(runs[0]!.abandoned).toBe(false); // this very process is alive
  });

  it('reaps a running run of this process unless it is one of our own', () => {
    const { db, runId } = memoryStore();
    expect(reapDeadRuns(db, new Set([runId]))).toBe(0);
    expect(reapDeadRuns(db)).toBe(1);
    expect(listRuns(db, 'fp')[0]).toMatchObject({ status: 'interrupted', stopReason: 'signal' });
  });

  it('sums the finished chunks into the run row', () => {
    const { db, runId } = memoryStore();
    const req = { fingerprint: 'fp', classKey: 'n=1', method: 'exact' as const, runId, from: 0n, count: 10n, size: 5n };
    for (const [checked, holds] of [[5, 4], [5, 5]] as const) {
      const l = leaseChunk(db, req)!;
      completeChunk(db, { chunkId: l.chunkId, runId, fingerprint: 'fp', classKey: 'n=1', checked, holds, fails: checked - holds, skippedZero: 0, paired: 0, errorBound: 0, exact: true, durationMs: 1, counterexamples: checked > holds ? [counterexample('n=1', 2n, 3, [1, 0, 1, 0, 1, 0])] : [], permutations: [] });
    }
    expect(listRuns(db, 'fp')[0]).toMatchObject({ instancesChecked: 10, holds: 9, counterexamples: 1 });
  });
});

describe('verified classes', () => {
  it('are recorded once per class and method and listed in sweep order', () => {
    const { db, runId } = memoryStore();
    const v = (classKey: string, size: number, method: 'exact' | 'modular') => ({ classKey, method, size, lengths: [size / 3, 0, size / 3, 0, size / 3, 0], variables: { n: size / 3 }, instances: 2n ** BigInt(size), errorBound: method === 'exact' ? 0 : 1e-9 });
    markVerified(db, 'fp', runId, v('n=2', 6, 'modular'));
    markVerified(db, 'fp', runId, v('n=1', 3, 'modular'));
    markVerified(db, 'fp', runId, v('n=1', 3, 'modular'));
    markVerified(db, 'fp', runId, v('n=1', 3, 'exact'));
    expect(listVerified(db, 'fp').map((x) => `${x.classKey}/${x.method}`)).toEqual(['n=1/exact', 'n=1/modular', 'n=2/modular']);
    expect(listVerified(db, 'fp')[2]).toEqual(v('n=2', 6, 'modular'));
  });
});

describe('permutation records', () => {
  it('intersects permutation lists (by hand: {12, 21} ∩ {21} = {21})', () => {
    const first = intersectPermutations(undefined, [[1, 2], [2, 1]]);
    expect([...first.keys()]).toEqual(['1,2', '2,1']);
    expect([...intersectPermutations(first, [[2, 1]]).values()]).toEqual([[2, 1]]);
  });

  it('summarises stored permutations and intersects the common ones over finished chunks', () => {
    const { db, runId } = memoryStore();
    const req = { fingerprint: 'fp', classKey: 'n=2', method: 'exact' as const, runId, from: 0n, count: 4n, size: 2n };
    const lists = [[[1, 2], [2, 1]], [[2, 1]]];
    lists.forEach((common, k) => {
      const l = leaseChunk(db, req)!;
      completeChunk(db, { chunkId: l.chunkId, runId, fingerprint: 'fp', classKey: 'n=2', checked: 2, holds: 2, fails: 0, skippedZero: 0, paired: 0, errorBound: 0, exact: true, durationMs: 1, counterexamples: [], permutations: [{ index: BigInt(2 * k), permutation: [2, 1] }, { index: BigInt(2 * k + 1), permutation: [2, 1] }], commonPermutations: common, permutationsTruncated: k === 1 });
    });
    expect(permutationSummary(db, 'fp')).toEqual({ instances: 4, distinct: 1, common: [2, 1] });
    expect(classCommonPermutations(db, 'fp', 'n=2')).toEqual({ common: [[2, 1]], lowerBound: true });
    expect(classCommonPermutations(db, 'fp', 'n=3')).toBeUndefined();
  });
});
