import * as z from 'zod';
import { evalAffine, valuesText, addAffine } from '../affine.js';
import { equalValues } from '../compare-values.js';
import { needPolynomialMeasure } from './relation-checks.js';
import { defineRelation } from './relation-def.js';

/** At most this many y variables for the search over all permutations. */
export const MAX_PERMUTED_VARIABLES = 8;

/** left = π(right) for SOME y-permutation π of a search space. */
export const equalUpToPermutationRelation = defineRelation({
  type: 'equalUpToPermutation',
  schema: z
    .object({ type: z.literal('equalUpToPermutation'), searchSpace: z.enum(['blockReversals', 'allPermutations'], { error: "Search space: expected one of 'blockReversals' | 'allPermutations'" }) })
    .strict()
    .describe('left = right with SOME y-permutation applied to the right value: blockReversals = reverse one block y_p..y_q (or none); allPermutations = all of y_1..y_N, N ≤ 8.'),
  check(r, ctx) {
    needPolynomialMeasure('equalUpToPermutation', ctx);
    if (r.searchSpace !== 'allPermutations') return;
    const size = (l: typeof ctx.lengths) => addAffine(addAffine(l[5]!, l[0]!), l[1]!);
    const n = (v: Record<string, number>) => Math.max(evalAffine(size(ctx.lengths), v), evalAffine(size(ctx.transformedLengths), v));
    const bad = ctx.cornerWhere((v) => n(v) <= MAX_PERMUTED_VARIABLES);
    if (bad) ctx.fail({ what: 'Permutation search', expected: `at most ${MAX_PERMUTED_VARIABLES} variables`, received: `${n(bad)} at ${valuesText(bad)}` }, `${ctx.path}.searchSpace`, "lower the variable bounds or search 'blockReversals'");
  },
  // Not paired: each boundary's own permutation is recorded.
  symmetric: false,
  searchSpace: (r) => r.searchSpace,
  holds: equalValues,
  variables: () => [],
  text: (r) => `L = π(R) for some π in ${r.searchSpace === 'blockReversals' ? 'the block reversals' : 'all permutations'}`,
  failure: 'L ≠ π(R) for every π searched',
});
