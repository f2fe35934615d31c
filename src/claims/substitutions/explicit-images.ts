import * as z from 'zod';
import { valuesText } from '../affine.js';
import { defineSubstitutionStep } from './substitution-step-def.js';

/** y_m ↦ y_(images[m−1]) for the first images.length variables. */
export const explicitImages = defineSubstitutionStep({
  type: 'explicit',
  schema: z
    .object({ type: z.literal('explicit'), images: z.array(z.number().int().min(1, 'Image: expected an index ≥ 1')).min(1) })
    .strict()
    .describe('y_m ↦ y_(images[m−1]) for m ≤ images.length (a permutation of 1..length); later variables stay.'),
  check(s, ctx, n) {
    const sorted = [...s.images].sort((a, b) => a - b);
    if (sorted.some((x, i) => x !== i + 1)) ctx.fail({ what: 'Images', expected: `a permutation of 1..${s.images.length}`, received: `[${s.images.join(',')}]` }, `${ctx.path}.images`);
    const bad = ctx.pointWhere((v) => s.images.length <= n(v));
    if (bad) ctx.fail({ what: 'Images', expected: `at most N = ${n(bad)} entries`, received: `${s.images.length} at ${valuesText(bad)}` }, `${ctx.path}.images`, 'N = s6+s1+s2 of the larger completed triangle');
  },
  images: (s, _values, m) => Array.from({ length: m }, (_, k) => s.images[k] ?? k + 1),
  rangeError: (s, _values, m) => (s.images.length <= m ? undefined : { parts: { what: 'Images', expected: `at most ${m} entries`, received: `${s.images.length}` }, field: 'images' }),
  variables: () => [],
  text: (s) => `[${s.images.join(',')}]`,
});
