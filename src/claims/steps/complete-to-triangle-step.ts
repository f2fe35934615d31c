import * as z from 'zod';
import { completeToTriangle, makeRegion } from '../../engine/index.js';
import { addAffine, constantAffine } from '../affine.js';
import { defineStep } from './transform-step-def.js';

/** Completion of a hexagon to its triangle by gluing back the cut-off corners. */
export const completeToTriangleStep = defineStep({
  type: 'completeToTriangle',
  schema: z.object({ type: z.literal('completeToTriangle') }).strict().describe('Glue the cut-off corners back: the completed triangle of side s6+s1+s2.'),
  check: () => {},
  sideMap: () => undefined,
  lengths(_s, l) {
    const n = addAffine(addAffine(l[5]!, l[0]!), l[1]!);
    return [n, constantAffine(0), n, constantAffine(0), n, constantAffine(0)];
  },
  apply(_s, b, pieces) {
    const done = completeToTriangle(makeRegion(b.lengths), b.sides, pieces);
    return { lengths: [...done.region.lengths], sides: done.sides };
  },
  involutive: () => false,
  variables: () => [],
  text: () => 'complete to a triangle',
});
