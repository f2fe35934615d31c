import { describe, expect, it } from 'vitest';
import { partitionToString } from '../../../src/reference/grassmannian-strings.js';
import { grothendieckProduct, grothendieckTable } from '../../../src/reference/grothendieck.js';

// The quick loop; test/math/reference/grothendieck.test.ts checks Brion's sum rule, sign alternation,
// transposition and commutativity on every Gr(k, n) with n ≤ 7.
describe('Grothendieck structure constants', () => {
  it('G_1·G_1 = G_2 + G_11 − G_21 (Buch, Acta Math. 189, 2002; value from memory)', () => {
    expect(grothendieckProduct([1], [1], 2, 8)).toEqual(new Map([['2', 1n], ['1,1', 1n], ['2,1', -1n]]));
    expect(grothendieckProduct([1], [1], 3, 8)).toEqual(new Map([['2', 1n], ['1,1', 1n], ['2,1', -1n]]));
    const t = grothendieckTable(2, 4);
    const s = (p: number[]): string => partitionToString(p, 2, 4);
    expect(t.get(`${s([1])},${s([1])},${s([2])}`)).toBe(1n);
    expect(t.get(`${s([1])},${s([1])},${s([1, 1])}`)).toBe(1n);
    expect(t.get(`${s([1])},${s([1])},${s([2, 1])}`)).toBe(-1n);
  });


  it('G_1·G_2 = G_3 + G_21 − G_31 in three variables (Pieri-type rule, Lenart, Comm. Algebra 28, 2000; value from memory)', () => {
    expect(grothendieckProduct([2], [1], 3, 8)).toEqual(new Map([['3', 1n], ['2,1', 1n], ['3,1', -1n]]));
  });


  it('rejects a bad variable count with a coded error', () => {
    expect(() => grothendieckProduct([1], [1], 0, 4)).toThrowError(/Variable count: expected a positive integer, received 0/);
  });
});
