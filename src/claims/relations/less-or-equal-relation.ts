import * as z from 'zod';
import { integers } from './integer-order.js';
import { needIntegerMeasure } from './relation-checks.js';
import { defineRelation } from './relation-def.js';

/** left ≤ right. */
export const lessOrEqualRelation = defineRelation({
  type: 'lessOrEqual',
  schema: z.object({ type: z.literal('lessOrEqual') }).strict().describe('left ≤ right (integer measures only).'),
  check: (_r, ctx) => needIntegerMeasure('lessOrEqual', ctx),
  symmetric: false,
  holds: (left, right) => {
    const [l, r] = integers(left, right);
    return l <= r;
  },
  variables: () => [],
  text: () => 'L ≤ R',
  failure: 'L > R',
});
