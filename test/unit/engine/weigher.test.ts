import { describe, expect, it } from 'vitest';
import { declaredWeigher, generatingSemiring, integerSemiring, polynomialSemiring, positionIndices, statisticWeigher, theoryPieceSet } from '../../../src/engine/index.js';

describe('weighers', () => {
  it('gives both halves of the rhombus Up(x,y+1) ∪ Down(x,y) the strips i = x+1, j = x+y+2 (DEVELOPERS.md, "Theories")', () => {
    for (const [x, y] of [[0, 0], [2, 1], [1, 3]] as const) {
      const expected = { i: x + 1, j: x + y + 2 };
      expect(positionIndices({ orientation: 'down', x, y })).toEqual(expected);
      expect(positionIndices({ orientation: 'up', x, y: y + 1 })).toEqual(expected);
    }
  });

  it('weighs pieces as declared: 1 for plain pieces, −1 for the K-piece, y_j − y_i for the rhombus', () => {
    const k = theoryPieceSet('k-theory');
    const weigh = declaredWeigher(integerSemiring);
    const at = { orientation: 'up' as const, x: 0, y: 0 };
    const weights = new Set(k.pieces.map((p) => String(weigh(p, at))));
    expect(weights).toEqual(new Set(['1', '-1'])); // the theory table in README
    const eq = theoryPieceSet('equivariant');
    const rhombus = eq.pieces.find((p) => p.weight.type === 'position')!;
    const ring = polynomialSemiring(4);
    // Down(1,1): i = 2, j = 4 by the formula above, so the weight is y4 − y2
    expect(ring.toText(declaredWeigher(ring)(rhombus, { orientation: 'down', x: 1, y: 1 }))).toBe('y4 - y2');
  });

  it('weighs t for pieces of a counted kind and 1 for the others', () => {
    const k = theoryPieceSet('k-theory');
    const weigh = statisticWeigher(new Set(['k-piece']));
    const at = { orientation: 'up' as const, x: 0, y: 0 };
    for (const p of k.pieces) expect(weigh(p, at)).toEqual(p.kind === 'k-piece' ? generatingSemiring.t : generatingSemiring.one);
  });
});
