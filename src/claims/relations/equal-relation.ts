import * as z from 'zod';
import { equalValues } from '../compare-values.js';
import { defineRelation } from './relation-def.js';

/** left = right. */
export const equalRelation = defineRelation({
  type: 'equal',
  schema: z.object({ type: z.literal('equal') }).strict().describe('left = right.'),
  check: () => {},
  symmetric: true,
  holds: equalValues,
  variables: () => [],
  text: () => 'L = R',
  failure: 'L ≠ R',
});
