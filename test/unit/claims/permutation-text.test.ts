import { describe, expect, it } from 'vitest';
import { cycleText, permutationText } from '../../../src/claims/permutation-text.js';

describe('permutationText', () => {
  it('writes block reversals, shifts and cycles (definitions in the claim schema; hand computed)', () => {
    expect(permutationText([1, 2, 3])).toBe('id');
    expect(permutationText([1, 4, 3, 2, 5])).toBe('rev[2..4]');
    expect(permutationText([2, 1])).toBe('rev[1..2]');
    // y_k ↦ y_(1 + (k−1+1) mod 3) on 1..3: 1→2, 2→3, 3→1.
    expect(permutationText([2, 3, 1, 4])).toBe('shift[1..3] by 1');
    expect(permutationText([3, 4, 1, 2])).toBe('shift[1..4] by 2');
    expect(permutationText([2, 1, 4, 3])).toBe('(1 2)(3 4)');
    expect(cycleText([3, 1, 2, 5, 4])).toBe('(1 3 2)(4 5)');
  });
});
