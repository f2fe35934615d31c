import { describe, expect, it } from 'vitest';
import { substitutionStepDef, SUBSTITUTION_STEPS, substitutionStepSchema } from '../../../../src/claims/substitutions/substitution-registry.js';

describe('substitution step registry', () => {
  it('lists every step type in the schema error', () => {
    const r = substitutionStepSchema.safeParse({ type: 'swap' });
    for (const d of SUBSTITUTION_STEPS) expect(r.error!.issues[0]!.message).toContain(`'${d.type}'`);
  });

  it('gives the images of each step on y1..y6 (hand computed from the definitions in the schema)', () => {
    const rev = { type: 'reverseBlock' as const, from: 2, to: 'n' };
    expect(substitutionStepDef(rev).images(rev, { n: 5 }, 6)).toEqual([1, 5, 4, 3, 2, 6]);
    const shift = { type: 'shiftBlock' as const, from: 1, to: 4, by: -1 };
    expect(substitutionStepDef(shift).images(shift, {}, 6)).toEqual([4, 1, 2, 3, 5, 6]);
    const explicit = { type: 'explicit' as const, images: [2, 1] };
    expect(substitutionStepDef(explicit).images(explicit, {}, 4)).toEqual([2, 1, 3, 4]);
    expect(substitutionStepDef(shift).variables(shift)).toEqual([]);
    expect(substitutionStepDef(rev).variables(rev)).toEqual(['n']);
  });
});
