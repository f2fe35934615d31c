import * as z from 'zod';
import { hasIntegerWeights } from '../resolve-theory.js';
import { defineMeasure } from './measure-def.js';

/** The theory's weighted sum over puzzles. */
export const valueMeasure = defineMeasure({
  type: 'value',
  schema: z.object({ type: z.literal('value') }).strict().describe("The theory's weighted sum over puzzles (an integer or a polynomial)."),
  check: () => {},
  integer: (_m, pieces) => hasIntegerWeights(pieces),
  counting: () => 'value',
  text: () => 'the value',
});
