import * as z from 'zod';
import { evalAffine, valuesText } from '../affine.js';
import { permutedSides } from '../side-map.js';
import { sideSchema } from '../schema-parts.js';
import { defineStep } from './transform-step-def.js';

function froms(sides: readonly [number, number]): number[] {
  const f = [0, 1, 2, 3, 4, 5];
  const [i, j] = [sides[0] - 1, sides[1] - 1];
  f[i] = j;
  f[j] = i;
  return f;
}

/** Exchange of the strings of two sides of equal length. */
export const exchangeStep = defineStep({
  type: 'exchange',
  schema: z
    .object({ type: z.literal('exchange'), sides: z.tuple([sideSchema, sideSchema], { error: 'Exchanged sides: expected two side numbers' }) })
    .strict()
    .describe('Exchange the strings of two sides of equal length.'),
  check(step, { lengths, cornerWhere, fail, path }) {
    const [i, j] = [step.sides[0] - 1, step.sides[1] - 1];
    if (i === j) fail({ what: 'Exchanged sides', expected: 'two different sides', received: `${i + 1} twice` }, `${path}.sides`);
    const bad = cornerWhere((v) => evalAffine(lengths[i]!, v) === evalAffine(lengths[j]!, v));
    if (bad) {
      fail(
        { what: 'Exchanged sides', expected: 'equal lengths', received: `side ${i + 1} of length ${evalAffine(lengths[i]!, bad)} and side ${j + 1} of length ${evalAffine(lengths[j]!, bad)} at ${valuesText(bad)}` },
        `${path}.sides`,
        'side numbers refer to the region as left by the previous steps',
      );
    }
  },
  sideMap: (step) => permutedSides(froms(step.sides), false),
  lengths: (step, l) => froms(step.sides).map((i) => l[i]!),
  involutive: () => true,
  variables: () => [],
  text: (step) => `exchange sides ${step.sides[0]} ↔ ${step.sides[1]}`,
});
