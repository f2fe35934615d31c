import { describe, expect, it } from 'vitest';
import { parseClaim, planClaim } from '../../../src/claims/index.js';
import { transformSideMap } from '../../../src/claims/boundary-transform.js';
import { mapsFamilyToItself } from '../../../src/discover/family-image.js';
import { HEXAGON_SYMMETRIES } from '../../../src/discover/hexagon-symmetries.js';

function symmetriesOf(family: object): string[] {
  const claim = parseClaim({ id: 'f', statement: 's', theory: 'cohomology', family, transform: [], compare: { measure: { type: 'value' }, relation: { type: 'equal' } } });
  const plan = planClaim(claim);
  return HEXAGON_SYMMETRIES.filter((s) => mapsFamilyToItself(transformSideMap(s.steps)!, plan.compiled, plan.classes())).map((s) => s.name);
}

describe('hexagon symmetries that map a family to itself', () => {
  it('a triangle family keeps its 6 symmetries (the dihedral group of the triangle; common practice, no source)', () => {
    expect(symmetriesOf({ sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }] })).toHaveLength(6);
  });

  it('a parallelogram family keeps the identity and the half turn, and the two mirrors only when a ↔ b maps the box to itself', () => {
    const para = (bMax: number) => ({ sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 3 }, { name: 'b', min: 1, max: bMax }] });
    // Symmetries of a parallelogram with unequal sides: identity and 180° rotation (common practice, no source).
    expect(symmetriesOf(para(2))).toEqual(['identity', 'rotate180']);
    expect(symmetriesOf(para(3))).toHaveLength(4);
  });

  it('a content condition on one side only breaks the symmetries that move that side', () => {
    const family = { sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'labelCount', side: 1, count: 1 }] };
    expect(symmetriesOf(family)).toEqual(['identity']);
  });
});
