import * as z from 'zod';
import { addAffine, evalAffine } from '../affine.js';
import { equalValues } from '../compare-values.js';
import { substitutionStepDef, substitutionStepSchema } from '../substitutions/substitution-registry.js';
import { substitutionFor } from '../substitution.js';
import { needPolynomialMeasure } from './relation-checks.js';
import { defineRelation } from './relation-def.js';

/** left = σ(right) for a fixed y-substitution σ per class. */
export const equalAfterSubstitutionRelation = defineRelation({
  type: 'equalAfterSubstitution',
  schema: z
    .object({ type: z.literal('equalAfterSubstitution'), substitution: z.array(substitutionStepSchema).min(1, 'Substitution: expected at least one step') })
    .strict()
    .describe('left = right with y_m ↦ y_σ(m) applied to the right value; σ is the steps composed in order.'),
  check(r, ctx) {
    needPolynomialMeasure('equalAfterSubstitution', ctx);
    const size = (l: typeof ctx.lengths) => addAffine(addAffine(l[5]!, l[0]!), l[1]!);
    const [nLeft, nRight] = [size(ctx.lengths), size(ctx.transformedLengths)];
    const n = (v: Record<string, number>) => Math.max(evalAffine(nLeft, v), evalAffine(nRight, v));
    r.substitution.forEach((s, k) => substitutionStepDef(s).check(s, { ...ctx, path: `${ctx.path}.substitution[${k}]` }, n));
  },
  symmetric: true,
  substitution: (r, values, m) => substitutionFor(r.substitution, values, m),
  holds: equalValues,
  variables: (r) => [...new Set(r.substitution.flatMap((s) => substitutionStepDef(s).variables(s)))],
  text: (r) => `L = σ(R), σ = ${r.substitution.map((s) => substitutionStepDef(s).text(s)).join(' then ')}`,
  failure: 'L ≠ σ(R)',
});
