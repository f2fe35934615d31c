import * as z from 'zod';
import { chosenSides, IDENTITY_MAP } from '../side-map.js';
import { sideListSchema } from '../schema-parts.js';
import { defineStep } from './transform-step-def.js';

/** Reversal of the strings of chosen sides. */
export const reverseStep = defineStep({
  type: 'reverse',
  schema: z.object({ type: z.literal('reverse'), sides: sideListSchema }).strict().describe('Reverse the strings of the chosen sides.'),
  check: () => {},
  sideMap(step) {
    const chosen = chosenSides(step.sides);
    return IDENTITY_MAP.map((s, i) => ({ ...s, reversed: chosen.includes(i) }));
  },
  lengths: (_s, l) => [...l],
  involutive: () => true,
  variables: () => [],
  text: (step) => `reverse ${step.sides === 'all' ? 'all sides' : `sides ${step.sides.join(',')}`}`,
});
