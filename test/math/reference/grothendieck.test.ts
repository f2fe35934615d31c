import { describe, expect, it } from 'vitest';
import { conjugateString, grassmannianStrings, inv, partitionToString, stringToPartition } from '../../../src/reference/grassmannian-strings.js';
import { grothendieckProduct, grothendieckTable } from '../../../src/reference/grothendieck.js';
import { lrTable } from '../../../src/reference/lr-rule.js';

const tables = new Map<string, Map<string, bigint>>();
for (let n = 1; n <= 7; n++) for (let k = 0; k <= n; k++) tables.set(`${k},${n}`, grothendieckTable(k, n));
const cases = [...tables.keys()].map((key) => key.split(',').map(Number) as [number, number]);

// The quick loop (value pins) is test/unit/reference/grothendieck.test.ts.
describe('Grothendieck structure constants on every Gr(k, n), n ≤ 7', () => {
  it('Σ_ν c_{λμ}^ν = 1 when σ_λσ_μ ≠ 0 and 0 otherwise (χ(O_ν) = 1; Brion, J. Algebra 258, 2002)', () => {
    for (const [k, n] of cases) {
      const t = tables.get(`${k},${n}`)!;
      const all = grassmannianStrings(k, n);
      for (const a of all) {
        for (const b of all) {
          let sum = 0n;
          for (const c of all) sum += t.get(`${a},${b},${c}`) ?? 0n;
          // X_λ meets a general translate of X_μ iff λ_i + μ_{k+1−i} ≤ n−k for all i (Fulton 1997, §9.4).
          const pa = stringToPartition(a);
          const pb = stringToPartition(b);
          const meets = pa.every((v, i) => v + pb[k - 1 - i]! <= n - k);
          expect(sum).toBe(meets ? 1n : 0n);
        }
      }
    }
  });

  it('alternates in sign and its lowest-degree part is the LR table (Brion 2002; Buch 2002)', () => {
    for (const [k, n] of cases) {
      const t = tables.get(`${k},${n}`)!;
      const lr = lrTable(k, n);
      for (const [key, c] of t) {
        const [a, b, d] = key.split(',') as [string, string, string];
        const excess = inv(d) - inv(a) - inv(b);
        expect(excess).toBeGreaterThanOrEqual(0);
        expect(excess % 2 === 0 ? c > 0n : c < 0n).toBe(true);
        if (excess === 0) expect(c).toBe(lr.get(key));
      }
      for (const [key, c] of lr) expect(t.get(key)).toBe(c);
    }
  });

  it('transposition c_{λμ}^ν = c_{λ\'μ\'}^{ν\'} holds when both sides are computed directly (Buch 2002)', () => {
    // Both Gr(k,n) with k > n−k (k variables) and Gr(n−k,n) (n−k variables) computed without the shortcut.
    for (const [k, n] of [[2, 3], [3, 4], [3, 5], [4, 5], [4, 6], [5, 7]] as const) {
      const direct = grothendieckTable(k, n, { transpose: false });
      const other = grothendieckTable(n - k, n, { transpose: false });
      expect(direct.size).toBe(other.size);
      for (const [key, c] of direct) {
        const [a, b, d] = key.split(',') as [string, string, string];
        expect(other.get(`${conjugateString(a)},${conjugateString(b)},${conjugateString(d)}`)).toBe(c);
      }
      expect(tables.get(`${k},${n}`)).toEqual(direct);
    }
  });

  it('is commutative with unit O_∅ (common practice, no source)', () => {
    for (const [k, n] of [[2, 5], [3, 6], [3, 7]] as const) {
      const t = tables.get(`${k},${n}`)!;
      const all = grassmannianStrings(k, n);
      for (const a of all) {
        for (const b of all) {
          expect(t.get(`${all[0]},${a},${b}`) ?? 0n).toBe(a === b ? 1n : 0n);
          for (const c of all) expect(t.get(`${a},${b},${c}`) ?? 0n).toBe(t.get(`${b},${a},${c}`) ?? 0n);
        }
      }
    }
  });
});
