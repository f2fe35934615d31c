import { describe, expect, it } from 'vitest';
import { enumeratePuzzles, makeRegion, reverseString, structureConstantSides, theoryPieceSet } from '../../../src/engine/index.js';
import { drawPuzzleText } from '../../../src/report/text-drawing.js';

describe('drawPuzzleText', () => {
  it('writes the bottom side left to right on the last line, between vertex dots', () => {
    // c_{10,01}^{10} = 1 in Gr(1,2): the identity class 01 is the unit (common practice, no source): one puzzle.
    const [puzzle, more] = [...enumeratePuzzles(makeRegion([2, 0, 2, 0, 2, 0]), structureConstantSides('10', '01', '10'), theoryPieceSet('cohomology'))];
    expect(more).toBeUndefined();
    const lines = drawPuzzleText(puzzle!).split('\n');
    // Side 5 is read clockwise (right to left), so left to right it is ν = reverse(side 5).
    expect(lines[lines.length - 1]!.replace(/[·\s]/g, '')).toBe('10');
    expect(reverseString(puzzle!.sides[4]!)).toBe('10');
    expect(lines.at(-1)!.match(/·/g)).toHaveLength(3); // three vertices on a bottom side of length 2
    expect(lines.join('\n')).not.toContain('weights:');
  });

  it('lists the pieces whose weight is not 1: one K-piece of weight −1 in the K-theory puzzle of c_{1,1}^{21} [Buch 2002]', () => {
    const pieces = theoryPieceSet('k-theory');
    const weighted = [...enumeratePuzzles(makeRegion([4, 0, 4, 0, 4, 0]), structureConstantSides('0101', '0101', '1010'), pieces)]
      .map(drawPuzzleText)
      .filter((t) => t.includes('weights:'));
    expect(weighted).toHaveLength(1);
    expect(weighted[0]!.split('weights:')[1]!.trim()).toMatch(/^Up\(\d+,\d+\) k-piece: -1$/);
  });
});
