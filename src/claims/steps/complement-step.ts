import * as z from 'zod';
import { chosenSides, IDENTITY_MAP } from '../side-map.js';
import { sideListSchema } from '../schema-parts.js';
import { defineStep } from './transform-step-def.js';

const COMPLEMENT: Readonly<Record<string, string>> = { '0': '1', '1': '0' };

/** Renaming of labels (0 ↔ 1 by default) on chosen sides. */
export const complementStep = defineStep({
  type: 'complement',
  schema: z
    .object({
      type: z.literal('complement'),
      sides: sideListSchema.default('all'),
      labelMap: z.record(z.string(), z.string()).optional().describe('For alphabets other than {0,1}: the label permutation to apply.'),
    })
    .strict()
    .describe('Exchange labels 0 ↔ 1 on the chosen sides (or all).'),
  check(step, { left, fail, path }) {
    const labels = left.boundaryLabels;
    const binary = [...labels].sort().join('') === '01';
    if (step.labelMap === undefined && !binary) {
      fail({ what: 'Complement', expected: 'the alphabet {0,1} or an explicit labelMap', received: `labels ${labels.join(' ')}` }, path, 'add "labelMap": { "a": "b", "b": "a" } naming the exchange');
    }
    if (step.labelMap) {
      const keys = Object.keys(step.labelMap).sort().join(' ');
      const values = Object.values(step.labelMap).sort().join(' ');
      const unknown = Object.keys(step.labelMap).concat(Object.values(step.labelMap)).find((l) => !labels.includes(l));
      if (unknown !== undefined) fail({ what: 'Label map', expected: `boundary labels ${labels.map((l) => `'${l}'`).join(' | ')}`, received: `'${unknown}'` }, `${path}.labelMap`);
      if (keys !== values) fail({ what: 'Label map', expected: 'a permutation of the labels it names', received: `${JSON.stringify(step.labelMap)}` }, `${path}.labelMap`);
    }
  },
  sideMap(step) {
    const chosen = chosenSides(step.sides);
    const map = step.labelMap ?? COMPLEMENT;
    return IDENTITY_MAP.map((s, i) => ({ ...s, labelMap: chosen.includes(i) ? map : {} }));
  },
  lengths: (_s, l) => [...l],
  involutive: (step) => Object.entries(step.labelMap ?? COMPLEMENT).every(([k, v]) => (step.labelMap ?? COMPLEMENT)[v] === k),
  variables: () => [],
  text: (step) => `complement${step.sides === 'all' || step.sides === undefined ? '' : ` sides ${step.sides.join(',')}`}${step.labelMap ? ` ${JSON.stringify(step.labelMap)}` : ''}`,
});
