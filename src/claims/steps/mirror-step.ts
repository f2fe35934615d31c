import * as z from 'zod';
import { permutedSides } from '../side-map.js';
import { defineStep } from './transform-step-def.js';

const FROMS = [2, 1, 0, 5, 4, 3];

/** Left-right mirror image of the region. */
export const mirrorStep = defineStep({
  type: 'mirror',
  schema: z.object({ type: z.literal('mirror') }).strict().describe('Mirror left-right: sides [rev σ3, rev σ2, rev σ1, rev σ6, rev σ5, rev σ4].'),
  check: () => {},
  sideMap: () => permutedSides(FROMS, true),
  lengths: (_s, l) => FROMS.map((i) => l[i]!),
  involutive: () => true,
  variables: () => [],
  text: () => 'mirror',
});
