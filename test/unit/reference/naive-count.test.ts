import { describe, expect, it } from 'vitest';
import { referenceTable, type ReferenceTheory } from '../../../src/reference/crosscheck-tables.js';
import { grassmannianStrings } from '../../../src/reference/grassmannian-strings.js';
import { naiveCount, type NaivePiece } from '../../../src/reference/naive-count.js';
import { naiveCountAtPoints } from '../../../src/reference/naive-count-at-point.js';
import { RefPolynomial } from '../../../src/reference/ref-polynomial.js';
import {
  cohomologyPieces,
  dualKTheoryPieces,
  equivariantPieces,
  kTheoryPieces,
  triangleBoundary,
} from './puzzle-pieces.js';

const y = (i: number): RefPolynomial => RefPolynomial.variable(i - 1);

describe('naive puzzle counter', () => {
  it('a unit hexagon with an all-0 boundary has one filling by all-0 triangles (counted by hand)', () => {
    const zeros = ['0', '0', '0', '0', '0', '0'];
    const r = naiveCount([1, 1, 1, 1, 1, 1], zeros, cohomologyPieces());
    expect(r.fillings).toBe(1n);
    expect(r.value.equals(RefPolynomial.constant(1))).toBe(true);
  });

  it('named weights become variables after y_1..y_N: six all-0 triangles of weight a give a^6 (counted by hand)', () => {
    const pieces: NaivePiece[] = [
      { orientation: 'up', labels: ['0', '0', '0'], weight: { type: 'variable', name: 'a' } },
      { orientation: 'down', labels: ['0', '0', '0'], weight: { type: 'variable', name: 'a' } },
      { orientation: 'down', labels: ['1', '1', '1'], weight: { type: 'variable', name: 'b' } },
    ];
    const r = naiveCount([1, 1, 1, 1, 1, 1], ['0', '0', '0', '0', '0', '0'], pieces);
    expect(r.variableNames).toEqual(['a', 'b']);
    // N = s6 + s1 + s2 = 3, so a is polynomial variable 3 and b is 4.
    expect(r.value.equals(RefPolynomial.monomial(1n, [0, 0, 0, 6]))).toBe(true);
  });

  it('the equivariant Gr(1,2) puzzle for c_{10,10}^{10} is one rhombus of weight y_2 − y_1 (worked by hand)', () => {
    const { sides, boundary } = triangleBoundary('10', '10', '10');
    const r = naiveCount(sides, boundary, equivariantPieces());
    expect(r.fillings).toBe(1n);
    expect(r.value.equals(y(2).sub(y(1)))).toBe(true);
  });

  const theories: Array<[ReferenceTheory, NaivePiece[], string]> = [
    ['cohomology', cohomologyPieces(), 'Knutson–Tao, Duke Math. J. 119, 2003 (with Tao, Woodward, JAMS 2004)'],
    ['equivariant', equivariantPieces(), 'Knutson–Tao, Duke Math. J. 119, 2003'],
    ['k-theory', kTheoryPieces(), 'Vakil, Annals of Math. 164, 2006'],
    ['dual-k-theory', dualKTheoryPieces(), 'Wheeler–Zinn-Justin, J. reine angew. Math. 757, 2019'],
  ];
  for (const [theory, pieces, source] of theories) {
    it(`counts ${theory} puzzles equal to the independent tables for every triple with n ≤ 4 (${source})`, () => {
      for (let n = 1; n <= 4; n++) {
        for (let k = 0; k <= n; k++) {
          const table = referenceTable(theory, k, n);
          const all = grassmannianStrings(k, n);
          for (const a of all) for (const b of all) for (const c of all) {
            const { sides, boundary } = triangleBoundary(a, b, c);
            const ref = table.get(`${a},${b},${c}`);
            const expected = ref === undefined ? RefPolynomial.zero() : RefPolynomial.fromTerms(ref.terms);
            expect(naiveCount(sides, boundary, pieces).value.equals(expected)).toBe(true);
          }
        }
      }
    });
  }

  it('at points: three up triangles of weight a/2 give (a/2)^3, reduced: 27/8 at a = 3, 8 at a = 4 (worked by hand)', () => {
    const pieces: NaivePiece[] = [
      { orientation: 'up', labels: ['0', '0', '0'], weight: { type: 'formula', text: 'a/2' } },
      { orientation: 'down', labels: ['0', '0', '0'], weight: { type: 'integer', value: 1 } },
    ];
    const zeros = ['0', '0', '0', '0', '0', '0'];
    const at = (a: bigint) => ({ y: () => 0n, parameter: () => a });
    expect(naiveCountAtPoints([1, 1, 1, 1, 1, 1], zeros, pieces, [at(3n), at(4n)]).values).toEqual([{ num: 27n, den: 8n }, { num: 8n, den: 1n }]);
    // A weight whose denominator vanishes at the point is refused, not read as infinity.
    const pole: NaivePiece[] = [{ ...pieces[0]!, weight: { type: 'formula', text: '1/(a - 3)' } }, pieces[1]!];
    expect(() => naiveCountAtPoints([1, 1, 1, 1, 1, 1], zeros, pole, [at(3n)])).toThrow(expect.objectContaining({ code: 'division_by_zero' }));
  });

  it('rejects a hexagon that does not close and a boundary of the wrong length, with coded errors', () => {
    expect(() => naiveCount([1, 1, 1, 1, 2, 1], ['0', '0', '0', '0', '00', '0'], [])).toThrowError(
      /Hexagon closure: expected s1\+s2 = s4\+s5 and s2\+s3 = s5\+s6, received \[1, 1, 1, 1, 2, 1\]/,
    );
    expect(() => naiveCount([2, 0, 2, 0, 2, 0], ['0', '', '01', '', '01', ''], [])).toThrowError(
      /Boundary side 1 length: expected 2, received 1/,
    );
    try {
      naiveCount([1, 1, 1, 1, 1, 1], ['0', '0', '0', '0', '0', '0'], [{ orientation: 'up', labels: ['0', '0'] as never, weight: { type: 'position' } }]);
      expect.unreachable();
    } catch (e) {
      expect((e as { code: string }).code).toBe('invalid_piece');
    }
  });
});
