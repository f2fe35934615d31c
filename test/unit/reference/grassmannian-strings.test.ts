import { describe, expect, it } from 'vitest';
import {
  bruhatLeq,
  conjugateString,
  dualString,
  grassmannianStrings,
  inv,
  partitionToString,
  stringToPartition,
} from '../../../src/reference/grassmannian-strings.js';

const binomial = (n: number, k: number): number => (k === 0 ? 1 : (binomial(n - 1, k - 1) * n) / k);

describe('grassmannian strings', () => {
  it('lists C(n, k) distinct strings with k ones (Schubert cells of Gr(k,n), common practice, no source)', () => {
    for (let n = 0; n <= 7; n++) {
      for (let k = 0; k <= n; k++) {
        const all = grassmannianStrings(k, n);
        expect(new Set(all).size).toBe(binomial(n, k));
        expect(all.every((s) => s.length === n && [...s].filter((c) => c === '1').length === k)).toBe(true);
      }
    }
  });

  it('fixes the DEVELOPERS.md examples: 1100 ↦ (2,2), 0101 ↦ (1,0), 0011 ↦ (0,0)', () => {
    expect(stringToPartition('1100')).toEqual([2, 2]);
    expect(stringToPartition('0101')).toEqual([1, 0]);
    expect(stringToPartition('0011')).toEqual([0, 0]);
    expect(inv('1100')).toBe(4); // point class of Gr(2,4) has codimension 4 (dim Gr(2,4) = 4, common practice)
    expect(inv('0011')).toBe(0);
  });

  it('inv equals the partition size and the inverse map round-trips (common practice, no source)', () => {
    for (let n = 1; n <= 6; n++) {
      for (let k = 0; k <= n; k++) {
        for (const s of grassmannianStrings(k, n)) {
          const p = stringToPartition(s);
          expect(inv(s)).toBe(p.reduce((a, b) => a + b, 0));
          expect(partitionToString(p, k, n)).toBe(s);
        }
      }
    }
  });

  it('orders by containment of partitions (Bruhat order on Gr(2,4), value from memory)', () => {
    expect(bruhatLeq('0101', '1001')).toBe(true); // (1) ⊆ (2)
    expect(bruhatLeq('1001', '0110')).toBe(false); // (2) ⊄ (1,1)
    expect(bruhatLeq('0110', '1001')).toBe(false); // (1,1) ⊄ (2)
    expect(bruhatLeq('0011', '1100')).toBe(true);
  });

  it('dual reverses the string and complements the partition in the box (Fulton, Young Tableaux, 1997, §9.4)', () => {
    expect(dualString('1001')).toBe('1001'); // (2) in the 2×2 box is its own complement (2−0, 2−2)
    expect(stringToPartition(dualString(partitionToString([2], 2, 5)))).toEqual([3, 1]); // (3−0, 3−2)
    for (const s of grassmannianStrings(3, 6)) {
      const p = stringToPartition(s);
      const d = stringToPartition(dualString(s));
      expect(d).toEqual(p.map((_, i) => 3 - p[2 - i]!));
    }
  });

  it('conjugation transposes the partition: (3) in Gr(1,4) ↔ (1,1,1) in Gr(3,4) (common practice, no source)', () => {
    expect(conjugateString('1000')).toBe('1110');
    expect(stringToPartition(conjugateString('1000'))).toEqual([1, 1, 1]);
  });

  it('rejects bad strings with a coded error', () => {
    expect(() => inv('012')).toThrowError(/Schubert string: expected only 0s and 1s, received "012"/);
    try {
      partitionToString([1, 2], 2, 4);
    } catch (e) {
      expect((e as { code: string }).code).toBe('invalid_argument');
    }
    expect(() => partitionToString([1, 2], 2, 4)).toThrow();
  });
});
