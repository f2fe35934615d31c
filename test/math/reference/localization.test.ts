import { describe, expect, it } from 'vitest';
import { bruhatLeq, grassmannianStrings, inv } from '../../../src/reference/grassmannian-strings.js';
import { localizationTable, restriction, restrictionTable } from '../../../src/reference/localization.js';
import { lrTable } from '../../../src/reference/lr-rule.js';
import { RefPolynomial } from '../../../src/reference/ref-polynomial.js';

const y = (i: number): RefPolynomial => RefPolynomial.variable(i - 1); // y_i, 1-based as in the papers

// Computed once for every Gr(k, n), n ≤ 6, and shared by the checks below.
const tables = new Map<string, { res: Map<string, Map<string, RefPolynomial>>; c: Map<string, RefPolynomial> }>();
for (let n = 1; n <= 6; n++) {
  for (let k = 0; k <= n; k++) tables.set(`${k},${n}`, { res: restrictionTable(k, n), c: localizationTable(k, n) });
}
const cases = [...tables.keys()].map((key) => key.split(',').map(Number) as [number, number]);

// The quick loop (convention pins) is test/unit/reference/localization.test.ts.
describe('localization: properties on every Gr(k, n), n ≤ 6', () => {
  it('has support exactly on λ ≤ w and [X_λ]|_λ = Π over inversions i<j of (y_j − y_i) (common practice, no source)', () => {
    for (const [k, n] of cases) {
      const { res } = tables.get(`${k},${n}`)!;
      const all = grassmannianStrings(k, n);
      for (const lam of all) {
        for (const w of all) expect(res.get(lam)!.has(w)).toBe(bruhatLeq(lam, w));
        let expected = RefPolynomial.constant(1);
        for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) if (lam[i] === '1' && lam[j] === '0') expected = expected.mul(y(j + 1).sub(y(i + 1)));
        expect(res.get(lam)!.get(lam)!.equals(expected)).toBe(true);
      }
    }
  });

  it('restrictions are homogeneous of degree inv(λ) and satisfy the GKM conditions (Goresky–Kottwitz–MacPherson, Invent. Math. 131, 1998)', () => {
    for (const [k, n] of cases) {
      const { res } = tables.get(`${k},${n}`)!;
      for (const [lam, row] of res) {
        const at = (w: string): RefPolynomial => row.get(w) ?? RefPolynomial.zero();
        for (const [, p] of row) {
          expect(p.isHomogeneous()).toBe(true);
          expect(p.degree()).toBe(inv(lam));
        }
        for (const w of grassmannianStrings(k, n)) {
          for (let a = 0; a < n; a++) {
            for (let b = a + 1; b < n; b++) {
              if (w[a] === w[b]) continue;
              const chars = [...w];
              [chars[a], chars[b]] = [chars[b]!, chars[a]!];
              const diff = at(w).sub(at(chars.join('')));
              expect(() => diff.divExact(y(b + 1).sub(y(a + 1)))).not.toThrow();
            }
          }
        }
      }
    }
  });

  it('structure constants are homogeneous of degree inv λ + inv μ − inv ν, vanish unless λ, μ ≤ ν, and give LR at y = 0 (Knutson–Tao 2003)', () => {
    for (const [k, n] of cases) {
      const { c } = tables.get(`${k},${n}`)!;
      const lr = lrTable(k, n);
      for (const [key, p] of c) {
        const [l, m, v] = key.split(',') as [string, string, string];
        expect(bruhatLeq(l, v) && bruhatLeq(m, v)).toBe(true);
        expect(p.isHomogeneous()).toBe(true);
        expect(p.degree()).toBe(inv(l) + inv(m) - inv(v));
      }
      const all = grassmannianStrings(k, n);
      for (const l of all) for (const m of all) for (const v of all) {
        const p = c.get(`${l},${m},${v}`);
        expect(p?.constantTerm() ?? 0n).toBe(lr.get(`${l},${m},${v}`) ?? 0n);
      }
    }
  });

  it('is Graham-positive: a nonnegative polynomial in the simple roots α_i = y_{i+1} − y_i (Graham, Duke Math. J. 109, 2001)', () => {
    for (const [k, n] of cases) {
      // y_1 = 0 and y_{i+1} = y_i + α_i express each y in the α's (the structure constants depend on differences).
      const images: RefPolynomial[] = [RefPolynomial.zero()];
      for (let i = 1; i < n; i++) images.push(images[i - 1]!.add(RefPolynomial.variable(i - 1)));
      for (const p of tables.get(`${k},${n}`)!.c.values()) {
        for (const t of p.substitute(images).rawTerms()) expect(t.coeff > 0n).toBe(true);
      }
    }
  });

  it('c_{λλ}^λ = [X_λ]|_λ and c_{∅λ}^ν = δ_{λν} (localization at λ, common practice, no source)', () => {
    for (const [k, n] of cases) {
      const { res, c } = tables.get(`${k},${n}`)!;
      const all = grassmannianStrings(k, n);
      for (const lam of all) {
        expect(c.get(`${lam},${lam},${lam}`)!.equals(res.get(lam)!.get(lam)!)).toBe(true);
        for (const nu of all) expect(c.has(`${all[0]},${lam},${nu}`)).toBe(lam === nu);
      }
    }
  });
});
