import * as z from 'zod';
import { evalAffine, parseAffine, type Affine } from '../affine.js';
import { expressionSchema, expressionVariables } from '../schema-parts.js';
import { checkBlock } from './block-check.js';
import { defineSubstitutionStep } from './substitution-step-def.js';

const at = (e: number | string, v: Readonly<Record<string, number>>) => evalAffine(parseAffine(e) as Affine, v);

/** y_m ↦ y_(from + (m−from+by) mod len) on the block from..to: a cyclic shift. */
export const shiftBlock = defineSubstitutionStep({
  type: 'shiftBlock',
  schema: z
    .object({ type: z.literal('shiftBlock'), from: expressionSchema, to: expressionSchema, by: expressionSchema })
    .strict()
    .describe('y_m ↦ y_(from + (m−from+by) mod (to−from+1)) for from ≤ m ≤ to.'),
  check(s, ctx, n) {
    checkBlock(s.from, s.to, ctx, n);
    ctx.expr(s.by, `${ctx.path}.by`);
  },
  images(s, values, m) {
    const [from, to, by] = [at(s.from, values), at(s.to, values), at(s.by, values)];
    const len = to - from + 1;
    return Array.from({ length: m }, (_, k) => (k + 1 >= from && k + 1 <= to ? from + ((((k + 1 - from + by) % len) + len) % len) : k + 1));
  },
  rangeError(s, values, m) {
    const [from, to] = [at(s.from, values), at(s.to, values)];
    return 1 <= from && from <= to && to <= m ? undefined : { parts: { what: 'Substitution block', expected: `1 ≤ from ≤ to ≤ ${m}`, received: `from = ${from}, to = ${to}` } };
  },
  variables: (s) => [...new Set([s.from, s.to, s.by].flatMap(expressionVariables))],
  text: (s) => `shift[${s.from}..${s.to}] by ${s.by}`,
});
