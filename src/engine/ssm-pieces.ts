import type { PieceSpec } from './piece-set.js';
import { parseWeightFormula } from './weight-formula.js';

// The equivariant SSM rule (Knutson–Zinn-Justin 2021, Segre–Schwartz–MacPherson puzzles) read as a lattice
// model: a vertical rhombus (up triangle over the down triangle below it) sits where the strips i < j
// cross, χ = y_j − y_i. Its weight is ( R₀ + χ·1 ) / (1 + χ), where R₀ is the y = 0 rule (the cohomology
// triangles and both K-triangles, −1 each) and 1 lets both strips' labels pass straight through. So the
// pieces are those of `ssm-nonequivariant`, whose rhombi already weigh R₀, plus one composite rhombus
// per entry of χ·(1 − R₀)/(1 + χ): weight ±χ/(1 + χ), zero at y = 0.

const PLUS = '(y_j - y_i)/(1 + y_j - y_i)';
const MINUS = '-(y_j - y_i)/(1 + y_j - y_i)';

/** One crossing rhombus: labels NW, NE (its upper half) and SW, SE (its lower half), with its sign. */
interface Crossing {
  readonly nw: string;
  readonly ne: string;
  readonly sw: string;
  readonly se: string;
  readonly sign: 1 | -1;
}

// Straight-through rhombi R₀ lacks (weight +), and R₀'s label-exchanging rhombi corrected to
// R₀/(1 + χ) (weight −χ/(1 + χ) against R₀ = 1; +χ/(1 + χ) against the K-triangle ones, R₀ = −1).
// The equivariant rhombus (NW 0, NE 1, SW 1, SE 0) is the first; the other two straight ones carry 10.
const CROSSINGS: readonly Crossing[] = [
  { nw: '0', ne: '1', sw: '1', se: '0', sign: 1 },
  { nw: '1', ne: '10', sw: '10', se: '1', sign: 1 },
  { nw: '10', ne: '0', sw: '0', se: '10', sign: 1 },
  { nw: '0', ne: '0', sw: '1', se: '10', sign: -1 },
  { nw: '10', ne: '1', sw: '0', se: '0', sign: -1 },
  { nw: '1', ne: '1', sw: '10', se: '0', sign: -1 },
  { nw: '0', ne: '10', sw: '1', se: '1', sign: -1 },
  { nw: '10', ne: '10', sw: '0', se: '1', sign: 1 },
  { nw: '1', ne: '0', sw: '10', se: '10', sign: 1 },
];

/**
 * The crossing rhombi of the equivariant SSM rule as unit triangles joined by labels of their own
 * (`eq` for the equivariant rhombus, `x1`…`x8` for the others); the weight sits on the lower half.
 */
export function ssmCrossingPieces(equivariantLabel: string): PieceSpec[] {
  return CROSSINGS.flatMap((c, m) => {
    const label = m === 0 ? equivariantLabel : `x${m}`;
    const name = m === 0 ? 'equivariant' : `ssm-rhombus-${c.nw}.${c.ne}.${c.sw}.${c.se}`;
    const kind = m === 0 ? 'equivariant' : 'ssm-rhombus';
    const text = c.sign === 1 ? PLUS : MINUS;
    return [
      { name: `${name}-upper`, kind: `${kind}-upper`, edges: { horizontal: label, rising: c.nw, falling: c.ne }, orientations: ['up'] },
      { name, kind, edges: { horizontal: label, rising: c.se, falling: c.sw }, orientations: ['down'], weight: { type: 'formula', text, formula: parseWeightFormula(text) } },
    ] satisfies PieceSpec[];
  });
}
