import { describe, expect, it } from 'vitest';
import { countBoundary, countCompletions, polynomialSemiring, polyTerms, theoryPieceSet, triangleRegion, type Polynomial } from '../../../src/engine/index.js';
import { grassmannianStrings } from '../../../src/reference/grassmannian-strings.js';
import { localizationTable } from '../../../src/reference/localization.js';
import { toTerms, type RefPolynomial } from '../../../src/reference/ref-polynomial.js';

// Exact polynomial sweeps start as Maps and move into the packed form (typed arrays) once their tables
// hold `workFormTerms` terms: from the first step (0), part way (a few dozen) or not at all (default, on
// these small products). Each must give the equivariant structure constants of Gr(3,6) that localization
// gives [src/reference/localization.ts; Knutson–Tao, Duke 2003], which shares no code with the sweep.
const canonical = (terms: readonly { coefficient: bigint; exponents: readonly number[] }[]) =>
  terms.map((t) => `${t.coefficient}*${t.exponents.join(',')}`).sort().join(' + ');
const engineText = (p: Polynomial, n: number) => canonical(polyTerms(p, n));
const refText = (p: RefPolynomial, n: number) => canonical(toTerms(p, n));

describe('polynomial sweeps in their work form', () => {
  const n = 6;
  const pieces = theoryPieceSet('equivariant');
  const table = localizationTable(3, n);
  const strings = grassmannianStrings(3, n);

  it('whole products σ_λ·σ_μ equal localization whether packed from the start, part way or never', () => {
    for (const lambda of ['010101', '001011', '010110']) {
      for (const workFormTerms of [0, 24, undefined]) {
        const got = countCompletions(triangleRegion(n), [lambda, '', lambda, '', null, ''], pieces, { semiring: polynomialSemiring(n), ...(workFormTerms === undefined ? {} : { workFormTerms }) });
        for (const nu of strings) {
          const want = table.get(`${lambda},${lambda},${nu}`);
          const v = got.get([...nu].reverse().join(''));
          expect(v ? engineText(v, n) : '', `${lambda} ${nu} ${workFormTerms}`).toBe(want ? refText(want, n) : '');
        }
      }
    }
  });

  it('single coefficients (the meet of two sweeps) equal localization in every form', () => {
    for (const [lambda, mu] of [['010101', '001101'], ['001011', '010101']] as const) {
      for (const nu of strings) {
        const want = table.get(`${lambda},${mu},${nu}`);
        for (const workFormTerms of [0, 8, undefined]) {
          const v = countBoundary(triangleRegion(n), [lambda, '', mu, '', [...nu].reverse().join(''), ''], pieces, { semiring: polynomialSemiring(n), ...(workFormTerms === undefined ? {} : { workFormTerms }) });
          expect(engineText(v, n), `${lambda} ${mu} ${nu} ${workFormTerms}`).toBe(want ? refText(want, n) : '');
        }
      }
    }
  });
});
