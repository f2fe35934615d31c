import { describe, expect, it } from 'vitest';
import { inferPermutationRule } from '../../../src/claims/permutation-rule.js';

const id = (m: number) => Array.from({ length: m }, (_, k) => k + 1);
// Reversal of y_p..y_q and cyclic shift of y_p..y_q by s, written out from their definitions (claim schema).
const rev = (m: number, p: number, q: number) => id(m).map((k) => (k >= p && k <= q ? p + q - k : k));
const shift = (m: number, p: number, q: number, s: number) => id(m).map((k) => (k >= p && k <= q ? p + ((k - p + s) % (q - p + 1)) : k));

describe('inferPermutationRule', () => {
  it('fits one block reversal with affine endpoints, the identity where the block is one variable', () => {
    const classes = [];
    for (let a = 1; a <= 3; a++) for (let b = 1; b <= 3; b++) classes.push({ variables: { a, b }, common: [a === 1 ? id(a + b) : rev(a + b, b + 1, a + b)] });
    const rule = inferPermutationRule(['a', 'b'], classes)!;
    expect(rule.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] });
    expect(rule.text).toBe('rev[b+1..a+b] in every class');
  });

  it('fits a cyclic shift when no reversal serves, and says equal when the identity serves all', () => {
    const classes = [2, 3, 4, 5].map((n) => ({ variables: { n }, common: [shift(n + 1, 2, n + 1, 1)] }));
    expect(inferPermutationRule(['n'], classes)!.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'shiftBlock', from: 2, to: 'n+1', by: 1 }] });
    expect(inferPermutationRule(['n'], [{ variables: { n: 2 }, common: [id(3)] }])!.relation).toEqual({ type: 'equal' });
  });

  it('finds nothing when a class has no common permutation or the blocks follow no affine pattern', () => {
    expect(inferPermutationRule(['n'], [{ variables: { n: 2 }, common: [] }])).toBeUndefined();
    const erratic = [1, 2, 3, 4].map((n) => ({ variables: { n }, common: [rev(6, 1, [2, 5, 3, 6][n - 1]!)] }));
    expect(inferPermutationRule(['n'], erratic)).toBeUndefined();
  });
});
