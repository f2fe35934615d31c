import type { Store } from './open-store.js';

/** One class range a shard is responsible for, with what is needed to mark the class verified after a merge. */
export interface ShardClass {
  readonly key: string;
  /** Instances of the whole class (decimal). */
  readonly instances: string;
  readonly size: number;
  readonly lengths: readonly number[];
  readonly variables: Readonly<Record<string, number>>;
  /** The shard's half-open index range [start, end) of the class (decimal). */
  readonly start: string;
  readonly end: string;
}

/** What `run --shard i/N` records in its run row (`options_json.shard`): enough to check and merge shards. */
export interface ShardRecord {
  readonly index: number;
  readonly count: number;
  /** Digest of the partitioned plan (classes, sizes, weights): shards of one sweep share it. */
  readonly plan: string;
  readonly classes: readonly ShardClass[];
}

/** Every shard recorded in a store's runs (a merged store holds many), one per claim and shard index, newest kept. */
export function allShardRecords(db: Store): { fingerprint: string; record: ShardRecord }[] {
  const rows = db.prepare('SELECT fingerprint, options_json FROM runs ORDER BY run_id').all() as { fingerprint: string; options_json: string }[];
  const out = new Map<string, { fingerprint: string; record: ShardRecord }>();
  for (const r of rows) {
    const shard = (JSON.parse(r.options_json) as { shard?: ShardRecord }).shard;
    if (shard && Array.isArray(shard.classes)) out.set(`${r.fingerprint}|${shard.index}`, { fingerprint: r.fingerprint, record: shard });
  }
  return [...out.values()];
}
