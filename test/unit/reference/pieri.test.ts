import { describe, expect, it } from 'vitest';
import { conjugateString, grassmannianStrings, partitionToString } from '../../../src/reference/grassmannian-strings.js';
import { pieriColumn, pieriRow } from '../../../src/reference/pieri.js';

const s = (p: number[], k: number, n: number): string => partitionToString(p, k, n);

describe('Pieri rule', () => {
  it('σ_1·σ_1 = σ_2 + σ_11 and σ_1·σ_2 = σ_21 in Gr(2,4) (Pieri\'s rule, Fulton, Young Tableaux, 1997)', () => {
    expect(pieriRow(s([1], 2, 4), 1)).toEqual(new Map([[s([2], 2, 4), 1n], [s([1, 1], 2, 4), 1n]]));
    expect(pieriRow(s([2], 2, 4), 1)).toEqual(new Map([[s([2, 1], 2, 4), 1n]]));
    expect(pieriColumn(s([1, 1], 2, 4), 1)).toEqual(new Map([[s([2, 1], 2, 4), 1n]]));
    expect(pieriColumn(s([2, 2], 2, 4), 1)).toEqual(new Map());
  });

  it('σ_1·σ_2 = σ_3 + σ_21 in Gr(2,5) and σ_2·σ_11 = σ_31 + σ_211 in Gr(3,6) (Pieri\'s rule, Fulton 1997)', () => {
    expect(pieriRow(s([2], 2, 5), 1)).toEqual(new Map([[s([3], 2, 5), 1n], [s([2, 1], 2, 5), 1n]]));
    expect(pieriColumn(s([2], 3, 6), 2)).toEqual(new Map([[s([3, 1], 3, 6), 1n], [s([2, 1, 1], 3, 6), 1n]]));
  });

  it('row and column rules correspond under transposition Gr(k,n) ≅ Gr(n−k,n) (Fulton 1997, §9.4)', () => {
    for (const [k, n] of [[2, 5], [3, 6], [2, 6]] as const) {
      for (const lam of grassmannianStrings(k, n)) {
        for (let p = 0; p <= n - k; p++) {
          const row = pieriRow(lam, p);
          const col = pieriColumn(conjugateString(lam), p);
          expect(new Map([...row].map(([nu, c]) => [conjugateString(nu), c]))).toEqual(col);
        }
      }
    }
  });

  it('σ_∅·σ_(p) = σ_(p) (unit, common practice)', () => {
    expect(pieriRow(s([], 3, 7), 4)).toEqual(new Map([[s([4], 3, 7), 1n]]));
  });

  it('rejects a strip longer than the box with a coded error', () => {
    expect(() => pieriRow('0101', 3)).toThrowError(/Pieri row length: expected an integer in \[0, 2\], received 3/);
    expect(() => pieriColumn('0101', -1)).toThrowError(/Pieri column length/);
  });
});
