import { describe, expect, it } from 'vitest';
import {
  conjugateString,
  dualString,
  grassmannianStrings,
  partitionToString,
  stringToPartition,
} from '../../../src/reference/grassmannian-strings.js';
import { lrCoefficient, lrTable } from '../../../src/reference/lr-rule.js';
import { columnClass, pieriColumn, pieriRow, rowClass } from '../../../src/reference/pieri.js';

describe('Littlewood–Richardson rule', () => {
  it('σ_1² = σ_2 + σ_11 in Gr(2,4) (Fulton, Young Tableaux, 1997)', () => {
    const t = lrTable(2, 4);
    const s1 = partitionToString([1], 2, 4);
    const entries = [...t].filter(([key]) => key.startsWith(`${s1},${s1},`));
    expect(new Map(entries)).toEqual(
      new Map([
        [`${s1},${s1},${partitionToString([2], 2, 4)}`, 1n],
        [`${s1},${s1},${partitionToString([1, 1], 2, 4)}`, 1n],
      ]),
    );
  });

  it('s_21·s_21 = s_42 + s_411 + s_33 + 2 s_321 + s_3111 + s_222 + s_2211 (value from memory)', () => {
    const expected: Array<[number[], bigint]> = [
      [[4, 2], 1n], [[4, 1, 1], 1n], [[3, 3], 1n], [[3, 2, 1], 2n], [[3, 1, 1, 1], 1n], [[2, 2, 2], 1n], [[2, 2, 1, 1], 1n],
      [[6], 0n], [[5, 1], 0n], [[4, 1, 1], 1n], [[2, 1, 1, 1, 1], 0n], [[3, 3, 0], 1n],
    ];
    for (const [nu, c] of expected) expect(lrCoefficient([2, 1], [2, 1], nu)).toBe(c);
  });

  it('c_{λμ}^ν = 0 unless |ν| = |λ| + |μ| (grading, common practice)', () => {
    expect(lrCoefficient([1], [1], [3])).toBe(0n);
    expect(lrCoefficient([2, 1], [1], [2, 1])).toBe(0n);
  });

  it('is invariant under transposition c_{λμ}^ν = c_{λ\'μ\'}^{ν\'} (Macdonald, Symmetric Functions, 1995, I.9)', () => {
    const t = lrTable(2, 6);
    const u = lrTable(4, 6);
    for (const [key, c] of t) {
      const [a, b, d] = key.split(',') as [string, string, string];
      expect(u.get(`${conjugateString(a)},${conjugateString(b)},${conjugateString(d)}`)).toBe(c);
    }
    expect(u.size).toBe(t.size);
  });

  it('matches the standard-tableau count Σ_ν c^ν f^ν = C(6,3) f^21 f^21 for s_21² (Fulton 1997, §7.3)', () => {
    // Σ_ν c_{λμ}^ν f^ν = C(|λ|+|μ|, |λ|) f^λ f^μ counting standard tableaux (Fulton 1997, §7.3), summed over all ν
    // without truncation; check it for λ = μ = (2,1) using the full list from memory above: f^42=9, f^411=10,
    // f^33=5, f^321=16, f^3111=10, f^222=5, f^2211=9 (hook length formula).
    const f: Array<[number[], number]> = [[[4, 2], 9], [[4, 1, 1], 10], [[3, 3], 5], [[3, 2, 1], 16], [[3, 1, 1, 1], 10], [[2, 2, 2], 5], [[2, 2, 1, 1], 9]];
    let total = 0n;
    for (const [nu, fnu] of f) total += lrCoefficient([2, 1], [2, 1], nu) * BigInt(fnu);
    expect(total).toBe(20n * 2n * 2n); // C(6,3) · f^21 · f^21
  });

  it('rejects a non-partition with a coded error', () => {
    expect(() => lrCoefficient([1, 2], [1], [2, 2])).toThrowError(/Partition λ part 2: expected an integer in \[0, 1\], received 2/);
    expect(stringToPartition(partitionToString([], 0, 3))).toEqual([]);
  });
});
