import { describe, expect, it } from 'vitest';
import { checkBoundary, makeRegion, reverseString, structureConstantSides, theoryPieceSet } from '../../../src/engine/index.js';
import { codedFailure } from '../../helpers/coded-failure.js';

const cohomology = theoryPieceSet('cohomology');

describe('boundaries', () => {
  it('puts λ, μ and reversed ν on sides 1, 3, 5 of the triangle (DEVELOPERS.md, "Boundaries")', () => {
    expect(structureConstantSides('0101', '0011', '1100')).toEqual(['0101', '', '0011', '', '0011', '']);
    expect(reverseString('0111')).toBe('1110');
  });

  it('accepts a well-formed boundary, with side 5 left open', () => {
    const region = makeRegion([2, 1, 1, 2, 1, 1]);
    expect(checkBoundary(region, ['01', '1', '0', '10', '1', '0'], cohomology)).toEqual(['01', '1', '0', '10', '1', '0']);
    expect(checkBoundary(region, ['01', '1', '0', '10', null, '0'], cohomology)[4]).toBeNull();
  });

  it('names the side, the expected length and the fix when a side is too long or short', () => {
    const e = codedFailure(() => checkBoundary(makeRegion([2, 0, 2, 0, 2, 0]), ['01', '', '011', '', '10', ''], cohomology));
    expect(e.code).toBe('invalid_boundary');
    expect(e.path).toBe('sides[2]');
    expect(e.message).toBe("Side 3 (down-right): expected 2 labels, received 3 ('011')");
    const empty = codedFailure(() => checkBoundary(makeRegion([2, 0, 2, 0, 2, 0]), ['01', '1', '01', '', '10', ''], cohomology));
    expect(empty.hint).toMatch(/empty side/);
  });

  it('rejects labels outside the alphabet, six sides only, and an open side other than side 5', () => {
    const region = makeRegion([1, 0, 1, 0, 1, 0]);
    const bad = codedFailure(() => checkBoundary(region, ['2', '', '0', '', '1', ''], cohomology));
    expect(bad.message).toMatch(/^Side 1 \(up-right\): expected labels from '0' \| '1', received '2'/);
    expect(codedFailure(() => checkBoundary(region, ['0', '', '0', '', '1'], cohomology)).message).toBe('Boundary: expected 6 side strings, received 5');
    expect(codedFailure(() => checkBoundary(region, [null, '', '0', '', '1', ''], cohomology)).code).toBe('internal_error');
  });
});
