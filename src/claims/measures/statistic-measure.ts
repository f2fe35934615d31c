import * as z from 'zod';
import { defineMeasure } from './measure-def.js';

/** The distribution of the number of pieces of one kind over the puzzles. */
export const statisticMeasure = defineMeasure({
  type: 'statistic',
  schema: z
    .object({ type: z.literal('statistic'), kind: z.string().min(1) })
    .strict()
    .describe('The distribution Σ_k (number of puzzles with k pieces of this kind)·t^k.'),
  check(m, { left, right, fail }) {
    for (const [set, path] of [[left, 'theory'], [right, 'compare.rightTheory']] as const) {
      const kinds = [...new Set(set.pieces.map((p) => p.kind))];
      if (!kinds.includes(m.kind)) {
        fail({ what: 'Statistic kind', expected: `a piece kind of ${set.name} (${kinds.map((k) => `'${k}'`).join(' | ')})`, received: `'${m.kind}'` }, 'compare.measure.kind', path === 'theory' ? undefined : 'the right-hand theory lacks this kind');
      }
    }
  },
  integer: () => false,
  counting: (m) => ({ statistic: m.kind }),
  text: (m) => `the distribution of '${m.kind}' pieces`,
});
