import { describe, expect, it } from 'vitest';
import { countBoundary, enumeratePuzzles, integerSemiring, makeRegion, structureConstantSides, theoryPieceSet, type Puzzle } from '../../../src/engine/index.js';
import { puzzleWeightText } from '../../../src/report/puzzle-weight.js';

// A puzzle reduced to what the weight text reads: its pieces' weights.
const withWeights = (...weights: string[]): Puzzle => ({ pieces: weights.map((weight) => ({ weight })) }) as unknown as Puzzle;

describe('puzzleWeightText', () => {
  // Expected texts written by hand from the rule in the doc comment: signs collected in front, factors
  // other than 1 multiplied, compound factors in parentheses.
  it.each([
    [[], '1'],
    [['1', '1'], '1'],
    [['-1'], '-1'],
    [['-1', '1', '-1'], '1'],
    [['y3 - y1'], 'y3 - y1'],
    [['-1', 'y3 - y1'], '-(y3 - y1)'],
    [['y2 - y1', 'y4 - y3'], '(y2 - y1)(y4 - y3)'],
    [['q', '-1', '-1'], 'q'],
  ] as const)('%j reads %s', (weights, text) => {
    expect(puzzleWeightText(withWeights(...weights))).toBe(text);
  });

  it('sums to the K-theory value over the puzzles of a boundary: G1·G1 ∋ −G21 [Buch, Acta Math. 2002]', () => {
    const pieces = theoryPieceSet('k-theory');
    const sides = structureConstantSides('0101', '0101', '1010');
    const region = makeRegion([4, 0, 4, 0, 4, 0]);
    const total = [...enumeratePuzzles(region, sides, pieces)].reduce((s, p) => s + BigInt(puzzleWeightText(p)), 0n);
    expect(total).toBe(BigInt(countBoundary(region, sides, pieces, { semiring: integerSemiring })));
  });
});
