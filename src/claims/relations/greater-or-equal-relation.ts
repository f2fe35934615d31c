import * as z from 'zod';
import { integers } from './integer-order.js';
import { needIntegerMeasure } from './relation-checks.js';
import { defineRelation } from './relation-def.js';

/** left ≥ right. */
export const greaterOrEqualRelation = defineRelation({
  type: 'greaterOrEqual',
  schema: z.object({ type: z.literal('greaterOrEqual') }).strict().describe('left ≥ right (integer measures only).'),
  check: (_r, ctx) => needIntegerMeasure('greaterOrEqual', ctx),
  symmetric: false,
  holds: (left, right) => {
    const [l, r] = integers(left, right);
    return l >= r;
  },
  variables: () => [],
  text: () => 'L ≥ R',
  failure: 'L < R',
});
