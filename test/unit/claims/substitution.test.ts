import { describe, expect, it } from 'vitest';
import { createEvaluator, parseClaim, planClaim } from '../../../src/claims/index.js';
import { countBoundary, makeRegion, polyEquals, polynomialSemiring, substitutePoly, theoryPieceSet } from '../../../src/engine/index.js';
import { allPermutations, blockReversals, isInvolution, permutationKey, substitutionFor } from '../../../src/claims/substitution.js';
import type { SubstitutionStep } from '../../../src/claims/claim-schema.js';
import { expectDeterministicEnumeration } from '../../helpers/contracts.js';
import { codedFailure } from '../../helpers/coded-failure.js';

// Every expected permutation below is worked out by hand from the step definitions in the claim schema
// (y_m ↦ y_σ(m), listed as the images σ(1..M)); "by hand" means no source beyond those definitions.
const sigma = (steps: SubstitutionStep[], m: number, values: Record<string, number> = {}) => substitutionFor(steps, values, m);

describe('substitution steps', () => {
  it('reverseBlock 2..4 on y1..y5 is [1,4,3,2,5] (by hand: y_m ↦ y_(2+4−m) inside the block)', () => {
    expect(sigma([{ type: 'reverseBlock', from: 2, to: 4 }], 5)).toEqual([1, 4, 3, 2, 5]);
  });

  it('shiftBlock 1..3 by 1 on y1..y4 is the 3-cycle [2,3,1,4] (by hand: 1 + (m−1+1) mod 3)', () => {
    expect(sigma([{ type: 'shiftBlock', from: 1, to: 3, by: 1 }], 4)).toEqual([2, 3, 1, 4]);
  });

  it('shiftBlock by −1 is the inverse cycle, and by the block length is the identity (by hand)', () => {
    // from 2 to 4, by −1: m=2 ↦ 2 + (−1 mod 3) = 4, m=3 ↦ 2, m=4 ↦ 3
    expect(sigma([{ type: 'shiftBlock', from: 2, to: 4, by: -1 }], 4)).toEqual([1, 4, 2, 3]);
    expect(sigma([{ type: 'shiftBlock', from: 2, to: 4, by: 3 }], 4)).toEqual([1, 2, 3, 4]);
    expect(sigma([{ type: 'shiftBlock', from: 2, to: 4, by: 4 }], 4)).toEqual(sigma([{ type: 'shiftBlock', from: 2, to: 4, by: 1 }], 4));
  });

  it('shiftBlock reads its bounds from the class variables: 1..n by n−1 at n = 3 is [3,1,2] (by hand)', () => {
    expect(sigma([{ type: 'shiftBlock', from: 1, to: 'n', by: 'n-1' }], 3, { n: 3 })).toEqual([3, 1, 2]);
  });

  it('explicit [2,1] on y1..y4 swaps y1, y2 and keeps the later variables (by hand)', () => {
    expect(sigma([{ type: 'explicit', images: [2, 1] }], 4)).toEqual([2, 1, 3, 4]);
    expect(sigma([{ type: 'explicit', images: [3, 1, 2] }], 3)).toEqual([3, 1, 2]);
  });

  it('composes steps in order, σ = s_2 ∘ s_1 (by hand: [2,1,3] then [2,3,1] gives [3,2,1]; the other order [1,3,2])', () => {
    const swap: SubstitutionStep = { type: 'explicit', images: [2, 1, 3] };
    const cycle: SubstitutionStep = { type: 'shiftBlock', from: 1, to: 3, by: 1 };
    expect(sigma([swap, cycle], 3)).toEqual([3, 2, 1]);
    expect(sigma([cycle, swap], 3)).toEqual([1, 3, 2]);
  });

  it('rejects a block outside y1..yM and too many images with a coded error naming the step', () => {
    const block = codedFailure(() => sigma([{ type: 'reverseBlock', from: 1, to: 2 }, { type: 'shiftBlock', from: 2, to: 5, by: 1 }], 4));
    expect(block.code).toBe('invalid_claim');
    expect(block.message).toMatch(/expected 1 ≤ from ≤ to ≤ 4, received from = 2, to = 5/);
    expect(block.path).toBe('compare.relation.substitution[1]');
    const images = codedFailure(() => sigma([{ type: 'explicit', images: [2, 1, 3] }], 2));
    expect(images.message).toMatch(/expected at most 2 entries, received 3/);
    expect(images.path).toBe('compare.relation.substitution[0].images');
  });

  it('tells involutions apart (by hand: a swap is one, a 3-cycle is not) and keys a permutation by its images', () => {
    expect(isInvolution([2, 1, 3])).toBe(true);
    expect(isInvolution(sigma([{ type: 'reverseBlock', from: 1, to: 4 }], 5))).toBe(true);
    expect(isInvolution([2, 3, 1])).toBe(false);
    expect(permutationKey([3, 1, 2])).toBe('3,1,2');
  });
});

describe('permutation search spaces', () => {
  it('blockReversals(3): the identity, then each block y_p..y_q reversed (1 + C(3,2) = 4, by hand)', () => {
    expect([...blockReversals(3)]).toEqual([
      [1, 2, 3],
      [2, 1, 3],
      [3, 2, 1],
      [1, 3, 2],
    ]);
  });

  it('allPermutations(3) lists the 3! = 6 permutations in lexicographic order (by hand)', () => {
    expect([...allPermutations(3)]).toEqual([
      [1, 2, 3],
      [1, 3, 2],
      [2, 1, 3],
      [2, 3, 1],
      [3, 1, 2],
      [3, 2, 1],
    ]);
  });

  it('enumerates deterministically without repeats: 5! = 120 permutations, 1 + C(5,2) = 11 block reversals (common practice, no source)', () => {
    expect(expectDeterministicEnumeration(() => allPermutations(5), permutationKey)).toHaveLength(120);
    expect(expectDeterministicEnumeration(() => blockReversals(5), permutationKey)).toHaveLength(11);
  });
});

describe('substitutions in a sweep', () => {
  // With no transform, b and T(b) are the same boundary, so the claim holds exactly where σ fixes the value.
  // Each value is recounted on its own and renamed by a hand-written σ (0-based variable indices).
  it.each([
    ['explicit [2,1]: y1 ↔ y2', { type: 'explicit', images: [2, 1] }, (k: number) => [1, 0, 2][k]!],
    ['shiftBlock 1..3 by 1: y1 → y2 → y3 → y1', { type: 'shiftBlock', from: 1, to: 3, by: 1 }, (k: number) => (k + 1) % 3],
  ] as const)('%s', (_name, step, rename) => {
    const claim = parseClaim({
      id: 'substitution-sweep',
      statement: 's',
      theory: 'equivariant',
      family: { sides: ['n', 'n', 'n', 'n', 'n', 'n'], variables: [{ name: 'n', min: 1, max: 1 }] },
      transform: [],
      compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [step] } },
    });
    const plan = planClaim(claim);
    const ev = createEvaluator(claim, { exact: true });
    const pieces = theoryPieceSet('equivariant');
    const ring = polynomialSemiring(3);
    const seen = { holds: 0, fails: 0 };
    for (const cls of plan.classes()) {
      for (let i = 0n; i < plan.instanceCount(cls); i++) {
        const b = plan.instanceAt(cls, i);
        const r = ev.evaluate(b);
        const v = countBoundary(makeRegion(b.sides.map((x) => [...x].length)), b.sides, pieces, { semiring: ring });
        const fixed = polyEquals(v, substitutePoly(v, rename));
        expect(r.status, b.sides.join('|')).toBe(fixed ? 'holds' : 'fails');
        seen[fixed ? 'holds' : 'fails']++;
      }
    }
    // 2^6 labelings of the unit hexagon (completed triangle of side N = 3, so y1..y3); both outcomes occur,
    // so the check can fail either way.
    expect(seen.holds + seen.fails).toBe(2 ** 6);
    expect(seen.fails).toBeGreaterThan(0);
  });
});
