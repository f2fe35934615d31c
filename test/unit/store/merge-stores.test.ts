import { describe, expect, it } from 'vitest';
import type { Measured } from '../../../src/claims/claim-api.js';
import { shardRanges, type ClassWork } from '../../../src/run/shard-partition.js';
import {
  completeChunk,
  leaseChunk,
  markVerified,
  mergeStores,
  openStore,
  saveClaim,
  startRun,
  type CounterexampleRecord,
  type ShardRecord,
  type Store,
} from '../../../src/store/index.js';

// A synthetic claim swept by hand through the store's own writers: class n has 4^n instances, and an
// instance fails when its index is a multiple of 7 in class n=3 (a rule of this test, so the truth is known).
const FP = 'f'.repeat(64);
const CLASSES: ClassWork[] = [1, 2, 3].map((n) => ({ key: `n=${n}`, instances: 4n ** BigInt(n), weight: BigInt(n * n) }));
const fails = (cls: string, i: bigint) => cls === 'n=3' && i % 7n === 0n;
const measured = (text: string): Measured => ({ theory: 'cohomology', lengths: [1, 0, 1, 0, 1, 0], sides: ['0', '', '1', '', '0', ''], text, json: text });
const cx = (cls: string, i: bigint, right = '1'): CounterexampleRecord => ({ classKey: cls, index: i, size: 3, lengths: [1, 0, 1, 0, 1, 0], left: measured('0'), right: measured(right) });

let clock = 0;
function shardStore(index: number, count: number, opts: { skip?: (cls: string, start: bigint) => boolean; claimId?: string; fingerprint?: string; chunk?: bigint; plan?: string } = {}): Store {
  const fp = opts.fingerprint ?? FP;
  const db = openStore(':memory:');
  saveClaim(db, { fingerprint: fp, claimId: opts.claimId ?? 'merge-test', canonicalJson: '{}', engineVersion: 'test' });
  const ranges = shardRanges(CLASSES, { index, count });
  const record: ShardRecord = {
    index,
    count,
    plan: opts.plan ?? 'plan-a',
    classes: ranges.map((r) => {
      const n = Number(r.classKey.slice(2));
      return { key: r.classKey, instances: (4n ** BigInt(n)).toString(), size: 3 * n, lengths: [n, 0, n, 0, n, 0], variables: { n }, start: r.start.toString(), end: r.end.toString() };
    }),
  };
  const runId = startRun(db, fp, { shard: record, test: index });
  // Distinct start times, as distinct processes would have.
  db.prepare('UPDATE runs SET started_at = ?, heartbeat_at = ? WHERE run_id = ?').run(new Date(Date.UTC(2026, 0, 1, 0, 0, clock)).toISOString(), new Date(Date.UTC(2026, 0, 1, 0, 0, clock)).toISOString(), runId);
  clock++;
  for (const r of ranges) {
    for (let from = r.start; ; ) {
      const lease = leaseChunk(db, { fingerprint: fp, classKey: r.classKey, method: 'exact', runId, from, count: r.end, size: opts.chunk ?? 5n });
      if (!lease) break;
      from = lease.end;
      if (opts.skip?.(r.classKey, lease.start)) continue; // left leased: this part of the shard is unfinished
      const found: CounterexampleRecord[] = [];
      for (let i = lease.start; i < lease.end; i++) if (fails(r.classKey, i)) found.push(cx(r.classKey, i));
      const n = Number(lease.end - lease.start);
      completeChunk(db, { chunkId: lease.chunkId, runId, fingerprint: fp, classKey: r.classKey, checked: n, holds: n - found.length, fails: found.length, skippedZero: 0, paired: 0, errorBound: 0, exact: true, durationMs: 1, counterexamples: found, permutations: [] });
    }
    const cls = CLASSES.find((c) => c.key === r.classKey)!;
    if (r.start === 0n && r.end === cls.instances && ![...Array(Number(cls.instances)).keys()].some((i) => fails(cls.key, BigInt(i)))) {
      const n = Number(cls.key.slice(2));
      markVerified(db, fp, runId, { classKey: cls.key, method: 'exact', size: 3 * n, lengths: [n, 0, n, 0, n, 0], variables: { n }, instances: cls.instances, errorBound: 0 });
    }
  }
  return db;
}

// The store's content that must not depend on merge order: everything but row ids, run ids and times.
function logical(db: Store) {
  const rows = (sql: string) => (db.prepare(sql).all() as Record<string, unknown>[]).map((r) => JSON.stringify(r));
  return {
    claims: rows('SELECT fingerprint, claim_id, canonical_json FROM claims ORDER BY fingerprint'),
    runs: rows('SELECT fingerprint, host, pid, started_at, options_json, status, instances_checked FROM runs ORDER BY started_at'),
    chunks: rows(`SELECT fingerprint, class_key, method, start_index, end_index, checked, holds, fails FROM chunks WHERE state = 'done' ORDER BY class_key, start_index`),
    counterexamples: rows('SELECT fingerprint, class_key, instance_index, left_value, right_value FROM counterexamples ORDER BY class_key, instance_index'),
    verified: rows('SELECT fingerprint, class_key, method, instances, size, lengths, variables FROM verified_classes ORDER BY class_key'),
  };
}

const sources = (dbs: Store[], names?: string[]) => dbs.map((db, i) => ({ name: names?.[i] ?? `shard-${i}`, db }));
const shuffle = <T,>(xs: T[], seed: number) => {
  const out = [...xs];
  let s = seed;
  for (let i = out.length - 1; i > 0; i--) {
    s = (s * 1103515245 + 12345) % 2 ** 31; // a linear congruential generator (common practice, no source)
    const j = s % (i + 1);
    [out[i], out[j]] = [out[j]!, out[i]!];
  }
  return out;
};

describe('merging shard stores (definitions of merge; common practice, no source)', () => {
  const N = 5;
  const shards = Array.from({ length: N }, (_, i) => shardStore(i, N));
  const names = shards.map((_, i) => `shard-${i}`);

  it('gives the same store for every order and every split into successive merges, and merging again changes nothing', () => {
    const reference = openStore(':memory:');
    const report = mergeStores(reference, 'all', sources(shards, names));
    expect(report.complete).toBe(true);
    const want = logical(reference);
    for (let seed = 1; seed <= 6; seed++) {
      const order = shuffle([...shards.keys()], seed);
      const cut = seed % N;
      const target = openStore(':memory:');
      mergeStores(target, 't', order.slice(0, cut).map((i) => ({ name: names[i]!, db: shards[i]! })));
      mergeStores(target, 't', order.slice(cut).map((i) => ({ name: names[i]!, db: shards[i]! })));
      expect(logical(target)).toEqual(want);
      const again = mergeStores(target, 't', shuffle(sources(shards, names), seed + 10));
      expect(again.claims[0]!.added).toEqual({ chunks: 0, counterexamples: 0, permutations: 0 });
      expect(again.claims[0]!.duplicates.counterexamples).toBe(Number(report.claims[0]!.added.counterexamples));
      expect(logical(target)).toEqual(want);
    }
  });

  it('holds the union: every instance once, every failing instance, verified exactly the classes without one', () => {
    const target = openStore(':memory:');
    mergeStores(target, 't', sources(shards, names));
    const chunks = target.prepare(`SELECT class_key, start_index AS s, end_index AS e FROM chunks WHERE state = 'done' ORDER BY class_key, start_index`).all() as { class_key: string; s: number; e: number }[];
    for (const c of CLASSES) {
      let cursor = 0;
      for (const r of chunks.filter((x) => x.class_key === c.key)) {
        expect(r.s).toBe(cursor);
        cursor = r.e;
      }
      expect(BigInt(cursor)).toBe(c.instances);
    }
    const stored = (target.prepare('SELECT class_key, instance_index AS i FROM counterexamples ORDER BY i').all() as { class_key: string; i: number }[]).map((r) => `${r.class_key}:${r.i}`);
    const expected = CLASSES.flatMap((c) => [...Array(Number(c.instances)).keys()].filter((i) => fails(c.key, BigInt(i))).map((i) => `${c.key}:${i}`));
    expect(stored).toEqual(expected);
    const verified = (target.prepare('SELECT class_key FROM verified_classes ORDER BY class_key').all() as { class_key: string }[]).map((r) => r.class_key);
    expect(verified).toEqual(['n=1', 'n=2']);
  });

  it('reports a missing shard, and verifies a class only once every part of it is done in some shard', () => {
    const missing = 3;
    // The class that shard 3 shares with its neighbours cannot be verified without it.
    const shared = shardRanges(CLASSES, { index: missing, count: N }).map((r) => r.classKey);
    const target = openStore(':memory:');
    const partial = mergeStores(target, 't', sources(shards, names).filter((_, i) => i !== missing));
    expect(partial.complete).toBe(false);
    expect(partial.claims[0]!.shards!.missing).toEqual([missing]);
    const before = (target.prepare('SELECT class_key FROM verified_classes').all() as { class_key: string }[]).map((r) => r.class_key);
    for (const k of shared) expect(before).not.toContain(k);
    const full = mergeStores(target, 't', [{ name: names[missing]!, db: shards[missing]! }]);
    expect(full.complete).toBe(true);
    const after = (target.prepare('SELECT class_key FROM verified_classes ORDER BY class_key').all() as { class_key: string }[]).map((r) => r.class_key);
    expect(after).toEqual(['n=1', 'n=2']);
  });

  it('reports an unfinished shard with the instances it has left', () => {
    // The first chunk of each class range is left leased, as a run stopped by its time limit leaves it.
    const seen = new Set<string>();
    const unfinished = shardStore(1, N, { skip: (cls) => !seen.has(cls) && Boolean(seen.add(cls)) });
    const target = openStore(':memory:');
    const r = mergeStores(target, 't', [...sources(shards, names).filter((_, i) => i !== 1), { name: 'slow', db: unfinished }]);
    expect(r.complete).toBe(false);
    const u = r.claims[0]!.shards!.unfinished;
    expect(u.map((x) => [x.index, x.store])).toEqual([[1, 'slow']]);
    const leased = unfinished.prepare(`SELECT SUM(end_index - start_index) AS n FROM chunks WHERE state = 'leased'`).get() as { n: number };
    expect(u[0]!.remaining).toBe(String(leased.n));
  });

  it('refuses two fingerprints of one claim with a coded error, and writes nothing', () => {
    const other = shardStore(0, N, { fingerprint: 'e'.repeat(64) });
    const target = openStore(':memory:');
    const before = logical(target);
    expect(() => mergeStores(target, 't', [...sources(shards, names), { name: 'edited', db: other }])).toThrow(
      expect.objectContaining({ code: 'fingerprint_mismatch', message: expect.stringMatching(/^Claim 'merge-test': expected one fingerprint across the merged stores, received 2/) }),
    );
    expect(logical(target)).toEqual(before);
  });

  it('refuses shards of different partitions', () => {
    const target = openStore(':memory:');
    expect(() => mergeStores(target, 't', [{ name: 'a', db: shards[0]! }, { name: 'b', db: shardStore(1, N + 1) }])).toThrow(expect.objectContaining({ code: 'shard_mismatch' }));
    expect(() => mergeStores(target, 't', [{ name: 'a', db: shards[0]! }, { name: 'b', db: shardStore(1, N, { plan: 'plan-b' }) }])).toThrow(expect.objectContaining({ code: 'shard_mismatch' }));
  });

  it('refuses the same instance with different values, never choosing one', () => {
    const i = shards.findIndex((db) => (db.prepare('SELECT COUNT(*) AS n FROM counterexamples').get() as { n: number }).n > 0);
    const changed = shardStore(i, N);
    changed.prepare(`UPDATE counterexamples SET right_value = '2' WHERE instance_index = (SELECT MIN(instance_index) FROM counterexamples)`).run();
    const target = openStore(':memory:');
    mergeStores(target, 't', [{ name: 'first', db: shards[i]! }]);
    const before = logical(target);
    expect(() => mergeStores(target, 't', [{ name: 'second', db: changed }])).toThrow(expect.objectContaining({ code: 'merge_conflict', message: expect.stringContaining('right_value') }));
    expect(logical(target)).toEqual(before);
  });

  it('refuses an instance one store found failing while another finished it as holding', () => {
    const i = shards.findIndex((db) => (db.prepare('SELECT COUNT(*) AS n FROM counterexamples').get() as { n: number }).n > 0);
    const holding = shardStore(i, N);
    holding.prepare('DELETE FROM counterexamples WHERE instance_index = (SELECT MIN(instance_index) FROM counterexamples)').run();
    const target = openStore(':memory:');
    expect(() => mergeStores(target, 't', [{ name: 'fails', db: shards[i]! }, { name: 'holds', db: holding }])).toThrow(
      expect.objectContaining({ code: 'merge_conflict', message: expect.stringContaining('found it holds') }),
    );
  });

  it('accepts a partner row found through its pair in another shard, and checks it where the pair was evaluated', () => {
    // Pair {p, x} with p < x: the shard holding p evaluates both and stores x marked partner_of p; the shard
    // holding x only counts it as paired (the claims layer's rule for involutions).
    const [first, second] = shardRanges(CLASSES, { index: 0, count: 2 }).filter((r) => r.classKey === 'n=3').concat(shardRanges(CLASSES, { index: 1, count: 2 }).filter((r) => r.classKey === 'n=3'));
    expect(first && second).toBeTruthy(); // class n=3 is split between the two shards
    const p = first!.start;
    const x = fails('n=3', second!.start) ? second!.start + 1n : second!.start;
    const a = shardStore(0, 2);
    const b = shardStore(1, 2);
    a.prepare(`INSERT INTO counterexamples (fingerprint, class_key, instance_index, size, lengths, left_theory, left_sides, left_value, left_json, right_theory, right_sides, right_value, right_json, confirmed_exact, found_run, partner_of)
      SELECT fingerprint, 'n=3', ?, size, lengths, left_theory, left_sides, left_value, left_json, right_theory, right_sides, right_value, right_json, 1, found_run, ? FROM counterexamples LIMIT 1`).run(x, p);
    expect(() => mergeStores(openStore(':memory:'), 't', [{ name: 'a', db: a }, { name: 'b', db: b }])).not.toThrow();
    // A store that evaluated the representative p itself but lacks the partner row disagrees.
    const c = shardStore(0, 2);
    expect(() => mergeStores(openStore(':memory:'), 't', [{ name: 'a', db: a }, { name: 'c', db: c }])).toThrow(expect.objectContaining({ code: 'merge_conflict' }));
  });

  it('keeps one copy of duplicated chunks and reports them', () => {
    const copy = shardStore(2, N);
    const target = openStore(':memory:');
    const r = mergeStores(target, 't', [{ name: 'a', db: shards[2]! }, { name: 'b', db: copy }]);
    const chunks = (shards[2]!.prepare(`SELECT COUNT(*) AS n FROM chunks WHERE state = 'done'`).get() as { n: number }).n;
    expect(r.claims[0]!.added.chunks).toBe(chunks);
    expect(r.claims[0]!.duplicates.chunks).toBe(chunks);
    expect(r.claims[0]!.shards!.repeated.map((x) => x.index)).toEqual([2]);
  });

  it('merges a table it does not know by name, row by row', () => {
    const a = shardStore(0, N);
    const b = shardStore(1, N);
    for (const db of [a, b]) db.exec('CREATE TABLE IF NOT EXISTS extra_notes (fingerprint TEXT, class_key TEXT, note TEXT, PRIMARY KEY (fingerprint, class_key))');
    a.prepare('INSERT INTO extra_notes VALUES (?, ?, ?)').run(FP, 'n=1', 'x');
    b.prepare('INSERT INTO extra_notes VALUES (?, ?, ?)').run(FP, 'n=1', 'x');
    b.prepare('INSERT INTO extra_notes VALUES (?, ?, ?)').run(FP, 'n=2', 'y');
    const target = openStore(':memory:');
    target.exec('CREATE TABLE extra_notes (fingerprint TEXT, class_key TEXT, note TEXT, PRIMARY KEY (fingerprint, class_key))');
    const r = mergeStores(target, 't', [{ name: 'a', db: a }, { name: 'b', db: b }]);
    expect(r.otherTables.filter((t) => t.table === 'extra_notes')).toEqual([{ table: 'extra_notes', added: 2, duplicates: 1 }]);
    b.prepare(`UPDATE extra_notes SET note = 'z' WHERE class_key = 'n=1'`).run();
    expect(() => mergeStores(openStore(':memory:'), 't', [{ name: 'a', db: a }, { name: 'b', db: b }])).not.toThrow(); // target lacks the table: nothing to compare
    const t2 = openStore(':memory:');
    t2.exec('CREATE TABLE extra_notes (fingerprint TEXT, class_key TEXT, note TEXT, PRIMARY KEY (fingerprint, class_key))');
    expect(() => mergeStores(t2, 't', [{ name: 'a', db: a }, { name: 'b', db: b }])).toThrow(expect.objectContaining({ code: 'merge_conflict' }));
  });
});
