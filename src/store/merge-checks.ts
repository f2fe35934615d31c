import { CodedError } from '../errors/index.js';
import type { Store } from './open-store.js';
import type { CoverMap } from './range-cover.js';
import { allShardRecords, type ShardRecord } from './shard-records.js';
import { STORE_MIGRATIONS } from './store-migrations.js';

/** A store offered to a merge, named for messages (its path). */
export interface MergeSource {
  readonly name: string;
  readonly db: Store;
}

/** Shards of one claim seen in the merged stores: which are missing and which stopped before their work was done. */
export interface ShardReport {
  readonly count: number;
  readonly present: readonly number[];
  readonly missing: readonly number[];
  readonly unfinished: readonly { readonly index: number; readonly store: string; readonly remaining: string }[];
  /** A shard index found in more than one store (their results are merged; duplicates are reported). */
  readonly repeated: readonly { readonly index: number; readonly stores: readonly string[] }[];
}

/** The store's schema version (0: not a puzzlesweep store). */
export function schemaVersion(db: Store): number {
  const has = db.prepare(`SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'schema_version'`).get();
  if (!has) return 0;
  return (db.prepare('SELECT MAX(version) AS v FROM schema_version').get() as { v: number | null }).v ?? 0;
}

/** Whether a store was written by an older schema (a merge migrates a copy of it first). */
export const isOlderSchema = (db: Store) => schemaVersion(db) >= 1 && schemaVersion(db) < STORE_MIGRATIONS.length;

/** Refuses sources this version cannot merge without loss: no store schema, or a newer one. */
export function checkSchemas(sources: readonly MergeSource[]): void {
  for (const s of sources) {
    const v = schemaVersion(s.db);
    if (v < 1 || v > STORE_MIGRATIONS.length) {
      throw new CodedError('store_error', { what: `Store schema of '${s.name}'`, expected: `version 1 to ${STORE_MIGRATIONS.length}`, received: `${v}` }, {
        path: s.name,
        hint: v < 1 ? 'this file is not a puzzlesweep store' : 'it was written by a newer puzzlesweep; merge with that version',
      });
    }
  }
}

/** Refuses to merge two versions (fingerprints) of one claim id: their results are about different claims. */
export function checkFingerprints(sources: readonly MergeSource[]): void {
  const byId = new Map<string, Map<string, string[]>>();
  for (const s of sources) {
    for (const r of s.db.prepare('SELECT claim_id, fingerprint FROM claims').all() as { claim_id: string; fingerprint: string }[]) {
      const fps = byId.get(r.claim_id) ?? new Map<string, string[]>();
      fps.set(r.fingerprint, [...(fps.get(r.fingerprint) ?? []), s.name]);
      byId.set(r.claim_id, fps);
    }
  }
  for (const [id, fps] of byId) {
    if (fps.size < 2) continue;
    const list = [...fps].map(([fp, stores]) => `${fp.slice(0, 12)} (${stores.join(', ')})`).join('; ');
    throw new CodedError('fingerprint_mismatch', { what: `Claim '${id}'`, expected: 'one fingerprint across the merged stores', received: `${fps.size}: ${list}` }, {
      path: 'stores',
      hint: 'shards of one sweep must run the same claim file with the same puzzlesweep version; merge each version into its own store',
    });
  }
}

/** Shard records per fingerprint (from the target too); shards of one claim must agree on the shard count and the partitioned plan. */
export function collectShards(stores: readonly MergeSource[]): Map<string, { store: string; record: ShardRecord }[]> {
  const out = new Map<string, { store: string; record: ShardRecord }[]>();
  for (const s of stores) {
    for (const { fingerprint, record } of allShardRecords(s.db)) out.set(fingerprint, [...(out.get(fingerprint) ?? []), { store: s.name, record }]);
  }
  for (const [fp, list] of out) {
    const first = list[0]!;
    const other = list.find((x) => x.record.count !== first.record.count || x.record.plan !== first.record.plan);
    if (other) {
      throw new CodedError('shard_mismatch', { what: `Shards of claim ${fp.slice(0, 12)}`, expected: 'one partition', received: `${first.record.count} shards of plan ${first.record.plan} (${first.store}) and ${other.record.count} shards of plan ${other.record.plan} (${other.store})` }, { path: 'stores', hint: 'every shard of a sweep must use the same --shard N and the same --max bounds' });
    }
  }
  return out;
}

/**
 * Which shards are present, missing, or unfinished: work of their ranges that no finished chunk of the merged
 * store covers (so a shard finished in another store counts as finished). `repeated`: indices in more than
 * one of the merged stores.
 */
export function shardReport(list: readonly { store: string; record: ShardRecord }[], merged: CoverMap, fingerprint: string, sourceNames: ReadonlySet<string>): ShardReport {
  const count = list[0]!.record.count;
  const seen = new Map<number, string[]>();
  const unfinished = new Map<number, { index: number; store: string; remaining: string }>();
  for (const { store, record } of list) {
    const stores = seen.get(record.index) ?? [];
    if (!stores.includes(store)) stores.push(store);
    seen.set(record.index, stores);
    let remaining = 0n;
    for (const c of record.classes) {
      const start = BigInt(c.start);
      const end = BigInt(c.end);
      remaining += end - start - (merged.get(fingerprint, c.key)?.coveredWithin(start, end) ?? 0n);
    }
    if (remaining > 0n) unfinished.set(record.index, { index: record.index, store, remaining: remaining.toString() });
  }
  const present = [...seen.keys()].sort((a, b) => a - b);
  const missing = Array.from({ length: count }, (_, i) => i).filter((i) => !seen.has(i));
  const repeated = [...seen]
    .map(([index, stores]) => ({ index, stores: stores.filter((s) => sourceNames.has(s)) }))
    .filter((r) => r.stores.length > 1);
  return { count, present, missing, unfinished: [...unfinished.values()].sort((a, b) => a.index - b.index), repeated };
}
