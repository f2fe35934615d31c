import { describe, expect, it } from 'vitest';
import { parseGrassmannian, parsePartition, partitionOfString, partitionText, stringOfPartition } from '../../../src/products/partition-strings.js';

// A small seeded generator, so the random cases are the same on every run [common practice, no source].
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

const inv = (s: string) => {
  let c = 0;
  for (let i = 0; i < s.length; i++) for (let j = i + 1; j < s.length; j++) if (s[i] === '1' && s[j] === '0') c++;
  return c;
};

describe('partitions ↔ 0/1 strings', () => {
  it('round-trips every 0/1 string with n ≤ 10 through its partition and back', () => {
    for (let n = 1; n <= 10; n++) {
      for (let bits = 0; bits < 2 ** n; bits++) {
        const s = bits.toString(2).padStart(n, '0');
        const k = [...s].filter((c) => c === '1').length;
        const p = partitionOfString(s);
        expect(stringOfPartition(p, { k, n })).toBe(s);
        // |λ| = inv(λ): the codimension of the Schubert class [definition of the bijection, Fulton, Young Tableaux, 1997, §9.4].
        expect(p.reduce((a, b) => a + b, 0)).toBe(inv(s));
        // The text a user types parses back to the same partition.
        expect(parsePartition(partitionText(p))).toEqual(p);
      }
    }
  });

  it('round-trips random partitions in random boxes, parts up to 40 (the dot separator)', () => {
    const rand = lcg(20261202);
    for (let trial = 0; trial < 2000; trial++) {
      const k = 1 + Math.floor(rand() * 8);
      const width = Math.floor(rand() * 40);
      const parts = Array.from({ length: Math.floor(rand() * (k + 1)) }, () => Math.floor(rand() * (width + 1))).sort((a, b) => b - a).filter((x) => x > 0);
      const s = stringOfPartition(parts, { k, n: k + width });
      expect(s).toHaveLength(k + width);
      expect(partitionOfString(s)).toEqual(parts);
      expect(parsePartition(partitionText(parts))).toEqual(parts);
    }
  });

  it('reads the shorthand the README uses', () => {
    // 1100 ↦ (2,2) and 0101 ↦ (1) [the convention of DEVELOPERS.md, "Boundaries"].
    expect(stringOfPartition([2, 2], { k: 2, n: 4 })).toBe('1100');
    expect(stringOfPartition([1], { k: 2, n: 4 })).toBe('0101');
    expect(parsePartition('321')).toEqual([3, 2, 1]);
    expect(parsePartition('12.3.1')).toEqual([12, 3, 1]);
    expect(parsePartition(' 0 ')).toEqual([]);
    expect(parsePartition('-')).toEqual([]);
    expect(partitionText([12, 3, 1])).toBe('12.3.1');
    expect(partitionText([])).toBe('0');
    expect(partitionText([15])).toBe('15.');
    expect(parsePartition('15.')).toEqual([15]);
    expect(() => parsePartition('15')).toThrow(/weakly decreasing/);
  });

  it('rejects what is not a partition or does not fit, naming the option', () => {
    expect(() => parsePartition('123')).toThrow(/weakly decreasing/);
    expect(() => parsePartition('2,1')).toThrow(/expected digits/);
    expect(() => stringOfPartition([4], { k: 2, n: 5 })).toThrow(/at most 2 parts, each at most 3/);
    expect(() => stringOfPartition([1, 1, 1], { k: 2, n: 5 })).toThrow(/Gr\(2,5\)/);
    expect(() => parseGrassmannian('7,3')).toThrow(/0 ≤ k ≤ n/);
    expect(parseGrassmannian(' 3, 7')).toEqual({ k: 3, n: 7 });
  });
});
