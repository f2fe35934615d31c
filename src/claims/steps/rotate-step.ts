import * as z from 'zod';
import { permutedSides } from '../side-map.js';
import { defineStep } from './transform-step-def.js';

const turns = (degrees: number) => (((degrees / 60) % 6) + 6) % 6;

/** Rotation of the region clockwise by a multiple of 60°. */
export const rotateStep = defineStep({
  type: 'rotate',
  schema: z
    .object({ type: z.literal('rotate'), degrees: z.number().int().multipleOf(60, 'Rotation: expected a multiple of 60 degrees') })
    .strict()
    .describe('Rotate the region clockwise by `degrees` (a multiple of 60; negative turns counterclockwise). 60°: sides [σ6, σ1, …, σ5].'),
  check: () => {},
  // 60° clockwise: new sides [σ6, σ1, σ2, σ3, σ4, σ5].
  sideMap: (s) => permutedSides([0, 1, 2, 3, 4, 5].map((i) => (i - turns(s.degrees) + 6) % 6), false),
  lengths: (s, l) => [0, 1, 2, 3, 4, 5].map((i) => l[(i - turns(s.degrees) + 6) % 6]!),
  involutive: (s) => turns(s.degrees) % 3 === 0,
  variables: () => [],
  text: (s) => `rotate ${s.degrees}°`,
});
