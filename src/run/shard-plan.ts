import type { ClaimPlan, SizeClass } from '../claims/claim-api.js';
import type { ShardRecord } from '../store/index.js';
import type { RunOptions } from './run-options.js';
import { planDigest, planWork, shardRanges } from './shard-partition.js';

/** The classes one shard sweeps (each with its index range) and the record its run row keeps. */
export interface ShardPlan {
  readonly record: ShardRecord;
  readonly classes: readonly { readonly cls: SizeClass; readonly first: bigint; readonly limit: bigint }[];
}

/** The shard's part of the plan under `options.max`, or undefined when the run is not sharded. */
export function shardPlan(plan: ClaimPlan, options: Pick<RunOptions, 'max' | 'shard'>): ShardPlan | undefined {
  if (!options.shard) return undefined;
  const all = plan.classes(options.max);
  const work = planWork(plan, all);
  const byKey = new Map(all.map((c) => [c.key, c]));
  const classes = shardRanges(work, options.shard).map((r) => ({ cls: byKey.get(r.classKey)!, first: r.start, limit: r.end }));
  return {
    classes,
    record: {
      index: options.shard.index,
      count: options.shard.count,
      plan: planDigest(work),
      classes: classes.map(({ cls, first, limit }) => ({
        key: cls.key,
        instances: plan.instanceCount(cls).toString(),
        size: cls.size,
        lengths: cls.lengths,
        variables: cls.variables,
        start: first.toString(),
        end: limit.toString(),
      })),
    },
  };
}
