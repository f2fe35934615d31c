import { describe, expect, it } from 'vitest';
import { bruhatLeq, grassmannianStrings } from '../../../src/reference/grassmannian-strings.js';
import { localizationTable, restriction, restrictionTable } from '../../../src/reference/localization.js';
import { RefPolynomial } from '../../../src/reference/ref-polynomial.js';

const y = (i: number): RefPolynomial => RefPolynomial.variable(i - 1); // y_i, 1-based as in the papers

// The quick loop; test/math/reference/localization.test.ts checks GKM, degrees, LR at y = 0 and
// Graham positivity on every Gr(k, n) with n ≤ 6.
describe('localization', () => {
  it('pins the convention: [X_10]|_10 = y_2 − y_1 and c_{10,10}^{10} = y_2 − y_1 in Gr(1,2) (task convention)', () => {
    expect(restriction('10', '10').equals(y(2).sub(y(1)))).toBe(true);
    expect(localizationTable(1, 2).get('10,10,10')!.equals(y(2).sub(y(1)))).toBe(true);
  });


  it('σ_1·σ_1 in Gr(1,3): c^{010} = y_3 − y_2, c^{100} = 1 (value from memory, Knutson–Tao, Duke Math. J. 119, 2003)', () => {
    const t = localizationTable(1, 3);
    expect(t.get('010,010,010')!.equals(y(3).sub(y(2)))).toBe(true);
    expect(t.get('010,010,100')!.equals(RefPolynomial.constant(1))).toBe(true);
    expect(t.has('010,010,001')).toBe(false);
  });


  it('Gr(2,4): support exactly on λ ≤ w, and [X_λ]|_λ = Π over inversions i<j of (y_j − y_i) (common practice, no source)', () => {
    const res = restrictionTable(2, 4);
    const all = grassmannianStrings(2, 4);
    for (const lam of all) {
      for (const w of all) expect(res.get(lam)!.has(w)).toBe(bruhatLeq(lam, w));
      let expected = RefPolynomial.constant(1);
      for (let i = 0; i < 4; i++) for (let j = i + 1; j < 4; j++) if (lam[i] === '1' && lam[j] === '0') expected = expected.mul(y(j + 1).sub(y(i + 1)));
      expect(res.get(lam)!.get(lam)!.equals(expected)).toBe(true);
    }
  });

  it('rejects mismatched strings with a coded error', () => {
    expect(() => restriction('011', '10')).toThrowError(/Schubert string length: expected 2, received 3/);
  });
});
