import * as z from 'zod';
import { defineMeasure } from './measure-def.js';

/** The number of puzzles. */
export const puzzlesMeasure = defineMeasure({
  type: 'puzzles',
  schema: z.object({ type: z.literal('puzzles') }).strict().describe('The number of puzzles.'),
  check: () => {},
  integer: () => true,
  counting: () => 'puzzles',
  text: () => 'the number of puzzles',
});
