import { describe, expect, it } from 'vitest';
import { ProfileTable } from '../../../src/engine/profile-table.js';

describe('ProfileTable', () => {
  // Against a Map on keys spread over the whole safe range, with repeats, growth and clearing
  // [common practice, no source: a hash table must agree with any other map].
  it('agrees with a Map on inserts, repeats, growth and clear', () => {
    const table = new ProfileTable(2, false);
    const reference = new Map<number, number>();
    let s = 12345;
    const next = () => (s = (s * 48271) % 2147483647);
    for (let round = 0; round < 2; round++) {
      for (let i = 0; i < 20000; i++) {
        const key = i % 3 === 0 ? (next() % 500) : next() * 4194304 + next() % 4194304; // small repeats and keys beyond 2^32
        const e = table.slot(key);
        table.vals[e * 2]! += 1;
        table.vals[e * 2 + 1] = key % 7;
        reference.set(key, (reference.get(key) ?? 0) + 1);
      }
      expect(table.count).toBe(reference.size);
      const wrong = [...reference].filter(([key, n]) => {
        const e = table.find(key);
        return e < 0 || table.keys[e] !== key || table.vals[e * 2] !== n;
      });
      expect(wrong).toEqual([]);
      expect(table.find(-5)).toBe(-1);
      table.clear();
      reference.clear();
      expect(table.count).toBe(0);
      expect(table.find(0)).toBe(-1);
    }
  });

  it('inserts new entries with every lane 0, also after clear', () => {
    const table = new ProfileTable(3, true);
    const e = table.slot(2 ** 52 + 1);
    table.vals.set([1, 2, 3], e * 3);
    table.clear();
    const f = table.slot(7);
    expect([...table.vals.subarray(f * 3, f * 3 + 3)]).toEqual([0, 0, 0]);
    expect(table.vals).toBeInstanceOf(Uint32Array);
  });
});
