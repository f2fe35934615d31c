import { describe, expect, it } from 'vitest';
import { countRegion, regionOfSides } from '../../../src/claims/count-region.js';
import { resolveTheory } from '../../../src/claims/resolve-theory.js';
import { theoryPieceSet } from '../../../src/engine/index.js';
import { codedFailure } from '../../helpers/coded-failure.js';

// Issue 7, item 1: CLI flag names leave claims/; an error names the field, the CLI edge names the flag.
describe('claims errors name fields, never flags', () => {
  it('a region, a boundary, a statistic and a theory point at sides, sides[i], statistic and theory', () => {
    const region = codedFailure(() => regionOfSides(['01', '1', '01', '1', '01', '']));
    expect(region).toMatchObject({ code: 'invalid_region', path: 'sides' });
    const boundary = codedFailure(() => countRegion(theoryPieceSet('cohomology'), ['01', '', '01', '', '02', '']));
    expect(boundary).toMatchObject({ code: 'invalid_boundary', path: 'sides[4]' });
    const statistic = codedFailure(() => countRegion(theoryPieceSet('cohomology'), ['01', '', '01', '', '01', ''], { statistic: 'zz' }));
    expect(statistic).toMatchObject({ code: 'invalid_argument', path: 'statistic' });
    const theory = codedFailure(() => resolveTheory('kohomology'));
    expect(theory).toMatchObject({ code: 'unknown_theory', path: 'theory' });
    for (const e of [region, boundary, statistic, theory]) {
      expect(e.message).not.toContain('--');
      expect(e.path).not.toMatch(/^--/);
    }
  });
});
