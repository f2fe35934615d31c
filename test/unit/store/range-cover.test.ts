import { describe, expect, it } from 'vitest';
import { CoverMap, RangeCover } from '../../../src/store/range-cover.js';

// A tiny deterministic generator (Park–Miller minimal standard, common practice, no source).
function lcg(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 48271) % 2147483647);
}

describe('RangeCover', () => {
  it('agrees with a set of covered indices on overlapping, touching and nested ranges', () => {
    const next = lcg(7);
    for (let round = 0; round < 20; round++) {
      const cover = new RangeCover();
      const covered = new Set<number>(); // the brute-force reference
      for (let k = 0; k < 6; k++) {
        const a = next() % 60;
        const b = a + 1 + (next() % 15);
        cover.add(BigInt(a), BigInt(b));
        for (let i = a; i < b; i++) covered.add(i);
      }
      for (let i = 0; i < 80; i++) expect(cover.has(BigInt(i)), `index ${i}`).toBe(covered.has(i));
      for (const [s, e] of [[0, 80], [10, 20], [33, 34], [70, 75]] as const) {
        const expected = [...covered].filter((i) => i >= s && i < e).length;
        expect(cover.coveredWithin(BigInt(s), BigInt(e))).toBe(BigInt(expected));
      }
    }
  });

  it('keys covers by claim and class', () => {
    const map = new CoverMap();
    map.add('fp', 'n=1', 0n, 4n);
    expect(map.get('fp', 'n=1')!.has(3n)).toBe(true);
    expect(map.get('fp', 'n=2')).toBeUndefined();
    expect(map.get('other', 'n=1')).toBeUndefined();
  });
});
