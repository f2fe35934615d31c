import { describe, expect, it } from 'vitest';
import { inferPermutationRule } from '../../../src/discover/infer-substitution.js';

// Permutations as 1-based images; reversal of y_p..y_q built directly from its definition (common practice, no source).
const reversal = (n: number, p: number, q: number) => Array.from({ length: n }, (_, k) => (k + 1 >= p && k + 1 <= q ? p + q - (k + 1) : k + 1));
const identity = (n: number) => reversal(n, 1, 1);

describe('inferPermutationRule', () => {
  it('finds reverse y_(b+1)..y_(a+b) from classes that each allow that block', () => {
    const classes = [];
    for (let a = 1; a <= 3; a++) for (let b = 1; b <= 3; b++) classes.push({ variables: { a, b }, n: a + b, common: [reversal(a + b, b + 1, a + b)] });
    expect(inferPermutationRule(['a', 'b'], classes)).toEqual({ type: 'reverseBlock', from: 'b+1', to: 'a+b' });
  });

  it('prefers the identity when it serves every class, and gives up when a class has no common permutation', () => {
    const classes = [1, 2, 3].map((n) => ({ variables: { n }, n, common: [identity(n), reversal(n, 1, n)] }));
    expect(inferPermutationRule(['n'], classes)).toEqual({ type: 'identity' });
    expect(inferPermutationRule(['n'], [...classes, { variables: { n: 4 }, n: 4, common: [] }])).toBeUndefined();
  });

  it('gives up when the blocks follow no affine pattern', () => {
    // Blocks [1,2], [1,2], [1,4], [1,2] for n = 2..5: no affine `to` fits.
    const blocks = [2, 2, 4, 2];
    const classes = [2, 3, 4, 5].map((n, k) => ({ variables: { n }, n, common: [reversal(n, 1, blocks[k]!)] }));
    expect(inferPermutationRule(['n'], classes)).toBeUndefined();
  });
});
