import type { NaivePiece } from '../../../src/reference/naive-count.js';

// Piece lists written out from the theory definitions in DEVELOPERS.md, independently of the engine.

type Labels = [string, string, string];

// Turning a piece 60° clockwise keeps its clockwise label list and flips up/down; two turns rotate the list.
function allRotations(labels: Labels, weight: NaivePiece['weight']): NaivePiece[] {
  const [a, b, c] = labels;
  const cyclic: Labels[] = [[a, b, c], [c, a, b], [b, c, a]];
  const seen = new Set<string>();
  const out: NaivePiece[] = [];
  for (const l of cyclic) {
    for (const orientation of ['up', 'down'] as const) {
      const key = `${orientation}:${l.join('|')}`;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push({ orientation, labels: [...l], weight });
    }
  }
  return out;
}

const one = { type: 'integer', value: 1 } as const;

/** Cohomology pieces: all-0, all-1 and (0, 10, 1) in every rotation. */
export function cohomologyPieces(): NaivePiece[] {
  return [...allRotations(['0', '0', '0'], one), ...allRotations(['1', '1', '1'], one), ...allRotations(['0', '10', '1'], one)];
}

/** Equivariant pieces: cohomology plus the unrotated rhombus Up(x,y+1) ∪ Down(x,y) with NW=0, NE=1, SW=1, SE=0. */
export function equivariantPieces(): NaivePiece[] {
  return [
    ...cohomologyPieces(),
    { orientation: 'up', labels: ['0', '1', 'eq'], weight: one }, // upper half: left=NW, right=NE
    { orientation: 'down', labels: ['eq', '0', '1'], weight: { type: 'position' } }, // lower half: right=SE, left=SW
  ];
}

/** K-theory pieces: cohomology plus the up triangle (10, 10, 10) of weight −1. */
export function kTheoryPieces(): NaivePiece[] {
  return [...cohomologyPieces(), { orientation: 'up', labels: ['10', '10', '10'], weight: { type: 'integer', value: -1 } }];
}

/** Dual K-theory pieces: cohomology plus the down triangle (10, 10, 10) of weight −1. */
export function dualKTheoryPieces(): NaivePiece[] {
  return [...cohomologyPieces(), { orientation: 'down', labels: ['10', '10', '10'], weight: { type: 'integer', value: -1 } }];
}

/** The clockwise boundary of the structure-constant triangle c_{λμ}^ν (DEVELOPERS.md, Boundaries). */
export function triangleBoundary(lambda: string, mu: string, nu: string): { sides: number[]; boundary: string[] } {
  const n = lambda.length;
  return { sides: [n, 0, n, 0, n, 0], boundary: [lambda, '', mu, '', [...nu].reverse().join(''), ''] };
}
