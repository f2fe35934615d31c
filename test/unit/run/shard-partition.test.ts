import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadClaim, planClaim } from '../../../src/claims/index.js';
import { instanceWeight, parseShard, planWork, shardRanges, type ClassWork } from '../../../src/run/shard-partition.js';

// Every instance index of every class must be in exactly one shard: a partition (definition; common practice, no source).
function checkPartition(classes: readonly ClassWork[], n: number) {
  const covered = new Map<string, [bigint, bigint][]>();
  const work: bigint[] = [];
  for (let i = 0; i < n; i++) {
    let w = 0n;
    for (const r of shardRanges(classes, { index: i, count: n })) {
      expect(r.end).toBeGreaterThan(r.start);
      const list = covered.get(r.classKey) ?? [];
      list.push([r.start, r.end]);
      covered.set(r.classKey, list);
      w += (r.end - r.start) * classes.find((c) => c.key === r.classKey)!.weight;
    }
    work.push(w);
  }
  for (const c of classes) {
    const list = (covered.get(c.key) ?? []).sort((a, b) => (a[0] < b[0] ? -1 : 1));
    let cursor = 0n;
    for (const [s, e] of list) {
      expect(s).toBe(cursor); // no gap and no overlap
      cursor = e;
    }
    expect(cursor).toBe(c.instances);
  }
  // Balance: the line of total work W is cut at ⌊W·k/N⌋, so a shard's work is W/N give or take the largest
  // single instance weight (consequence of the construction; common practice, no source).
  const total = classes.reduce((a, c) => a + c.instances * c.weight, 0n);
  const heaviest = classes.reduce((a, c) => (c.weight > a ? c.weight : a), 1n);
  for (const w of work) {
    expect(w * BigInt(n)).toBeGreaterThanOrEqual(total - BigInt(n) * (heaviest + 1n));
    expect(w * BigInt(n)).toBeLessThanOrEqual(total + BigInt(n) * (heaviest + 1n));
  }
  expect(work.reduce((a, b) => a + b, 0n)).toBe(total);
}

const shardCounts = [1, 2, 3, 4, 7, 16, 64, 256, 1000];

describe('shard partition', () => {
  const dir = 'conjectures';
  const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
  it.each(files)('covers every instance of %s exactly once, balanced by work, for many N', (file) => {
    const plan = planClaim(loadClaim(join(dir, file)));
    const classes = planWork(plan, plan.classes());
    for (const n of shardCounts) checkPartition(classes, n);
  });

  it('covers synthetic plans with huge classes, tiny classes and more shards than instances', () => {
    const plans: ClassWork[][] = [
      [{ key: 'a', instances: 1n, weight: 1n }],
      [{ key: 'a', instances: 3n, weight: 5n }, { key: 'b', instances: 2n, weight: 1n }],
      [{ key: 'a', instances: 10n ** 30n, weight: 17n }, { key: 'b', instances: 7n, weight: 1000n }, { key: 'c', instances: 123456789n, weight: 3n }],
    ];
    for (const p of plans) for (const n of [1, 2, 5, 13, 100]) checkPartition(p, n);
  });

  it('balances by estimated work, not by instance count', () => {
    // 100 cheap instances then 100 ten-times-dearer ones: half the work is ~ the first 100 + 45 dear ones
    // (arithmetic on the construction; common practice, no source).
    const classes: ClassWork[] = [{ key: 'cheap', instances: 100n, weight: 1n }, { key: 'dear', instances: 100n, weight: 10n }];
    const first = shardRanges(classes, { index: 0, count: 2 });
    expect(first).toEqual([{ classKey: 'cheap', start: 0n, end: 100n }, { classKey: 'dear', start: 0n, end: 45n }]);
  });

  it('is deterministic', () => {
    const plan = planClaim(loadClaim('conjectures/k-theory-equals-cohomology.json'));
    const a = shardRanges(planWork(plan, plan.classes({ n: 5 })), { index: 3, count: 7 });
    const b = shardRanges(planWork(plan, plan.classes({ n: 5 })), { index: 3, count: 7 });
    expect(a).toEqual(b);
  });

  it('weighs an instance by the unit triangles of its region', () => {
    // A triangle of side n has n² unit triangles (common practice, no source).
    expect(instanceWeight([4, 0, 4, 0, 4, 0])).toBe(16n);
    // Hexagon 1,1,1,1,1,1: completed triangle of side 3 (9) minus three corners of side 1 (value from memory: 6).
    expect(instanceWeight([1, 1, 1, 1, 1, 1])).toBe(6n);
  });

  it('parses i/N and rejects the rest with a coded error naming --shard', () => {
    expect(parseShard('2/4')).toEqual({ index: 2, count: 4 });
    for (const bad of ['4/4', '1', '-1/4', '0/0', 'a/b', '1/2/3']) {
      expect(() => parseShard(bad)).toThrowError(/Shard: expected 'i\/N'/);
    }
  });
});
