import * as z from 'zod';
import { evalAffine, parseAffine, type Affine } from '../affine.js';
import { expressionSchema, expressionVariables } from '../schema-parts.js';
import { checkBlock } from './block-check.js';
import { defineSubstitutionStep } from './substitution-step-def.js';

const at = (e: number | string, v: Readonly<Record<string, number>>) => evalAffine(parseAffine(e) as Affine, v);

/** y_m ↦ y_(from+to−m) on the block from..to. */
export const reverseBlock = defineSubstitutionStep({
  type: 'reverseBlock',
  schema: z.object({ type: z.literal('reverseBlock'), from: expressionSchema, to: expressionSchema }).strict().describe('y_m ↦ y_(from+to−m) for from ≤ m ≤ to.'),
  check: (s, ctx, n) => checkBlock(s.from, s.to, ctx, n),
  images(s, values, m) {
    const [from, to] = [at(s.from, values), at(s.to, values)];
    return Array.from({ length: m }, (_, k) => (k + 1 >= from && k + 1 <= to ? from + to - k - 1 : k + 1));
  },
  rangeError(s, values, m) {
    const [from, to] = [at(s.from, values), at(s.to, values)];
    return 1 <= from && from <= to && to <= m ? undefined : { parts: { what: 'Substitution block', expected: `1 ≤ from ≤ to ≤ ${m}`, received: `from = ${from}, to = ${to}` } };
  },
  variables: (s) => [...new Set([...expressionVariables(s.from), ...expressionVariables(s.to)])],
  text: (s) => `rev[${s.from}..${s.to}]`,
});
