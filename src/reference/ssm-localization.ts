import { checkGrassmannian, grassmannianStrings, inv } from './grassmannian-strings.js';
import { solveAtFixedPoints } from './fixed-point-solve.js';
import { pointString, productOverInversions, swapPositions } from './k-localization.js';
import { RefFraction, type ChernFactorKey } from './ref-fraction.js';
import { RefPolynomial } from './ref-polynomial.js';

// Chern–Schwartz–MacPherson classes of the Schubert cells X_s° = B·V_s of Gr(k, n) in H_T, and the
// Segre–Schwartz–MacPherson classes s_SM = c_SM / c^T(T Gr). Variable y_p has index p−1.

const ONE = RefPolynomial.constant(1n);

function root(i: number, j: number): RefPolynomial {
  return RefPolynomial.difference(j - 1, i - 1); // y_j − y_i
}

/** The factor keys 1 + y_j − y_i over the tangent weights y_j − y_i of Gr at V_w (w_i = 1, w_j = 0, any order). */
export function tangentFactors(w: string): Map<ChernFactorKey, number> {
  const out = new Map<ChernFactorKey, number>();
  for (let i = 1; i <= w.length; i++) for (let j = 1; j <= w.length; j++) if (w[i - 1] === '1' && w[j - 1] === '0') out.set(`${j},${i}`, 1);
  return out;
}

/** The factor keys over the tangent weights of the cell X_w° at V_w: y_j − y_i with i > j, w_i = 1, w_j = 0. */
export function cellFactors(w: string): Map<ChernFactorKey, number> {
  const out = new Map<ChernFactorKey, number>();
  for (const [key, e] of tangentFactors(w)) {
    const [j, i] = key.split(',').map(Number) as [number, number];
    if (i > j) out.set(key, e);
  }
  return out;
}

/** Π over the normal weights y_j − y_i (i < j, w_i = 1, w_j = 0): the cohomology class [X_w]|_w. */
export function normalProduct(w: string): RefPolynomial {
  return productOverInversions(w, ONE, root, (a, b) => a.mul(b));
}

/** The normal weights y_j − y_i (i < j, w_i = 1, w_j = 0) one by one. */
function normalRoots(w: string): RefPolynomial[] {
  return productOverInversions<RefPolynomial[]>(w, [], (i, j) => [root(i, j)], (a, b) => [...a, ...b]);
}

/** Π_{key} (1 + y_j − y_i)^e as a polynomial. */
export function factorProduct(factors: ReadonlyMap<ChernFactorKey, number>): RefPolynomial {
  let acc = ONE;
  for (const [key, e] of factors) {
    const [j, i] = key.split(',').map(Number) as [number, number];
    for (let m = 0; m < e; m++) acc = acc.mul(ONE.add(root(i, j)));
  }
  return acc;
}

/**
 * All restrictions c_SM(X_λ°)|_w (result.get(λ).get(w), zero entries omitted).
 *
 * Method: the point cell's class is the point class. For λ with "01" at positions a, a+1 and μ = s_a·λ, the
 * action map P_a ×_B X_μ° → X_λ° ⊔ X_μ° is a bijection, and c_SM commutes with proper pushforward; the
 * source is a bundle over P_a/B ≅ ℙ¹ (tangent weight α = y_{a+1} − y_a at B, −α at s_aB), so localizing,
 *   c_SM(X_λ°)|_w = ( f(w) − (1 − α)·s_a f(s_a w) ) / α,   f = c_SM(X_μ°),
 * the Demazure–Lusztig-type operator of Aluffi–Mihalcea (Compositio Math. 152, 2016) in left form.
 */
export function csmRestrictionTable(k: number, n: number): Map<string, Map<string, RefPolynomial>> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const table = new Map<string, Map<string, RefPolynomial>>();
  const pt = pointString(k, n);
  table.set(pt, new Map([[pt, normalProduct(pt)]]));
  for (const lam of [...strings].sort((a, b) => inv(b) - inv(a))) {
    if (lam === pt) continue;
    const a = lam.indexOf('01') + 1;
    const f = table.get(swapPositions(lam, a))!;
    const alpha = root(a, a + 1);
    const perm = Array.from({ length: n }, (_, m) => (m === a - 1 ? a : m === a ? a - 1 : m));
    const row = new Map<string, RefPolynomial>();
    for (const w of strings) {
      const here = f.get(w) ?? RefPolynomial.zero();
      const there = (f.get(swapPositions(w, a)) ?? RefPolynomial.zero()).permuteVariables(perm);
      const num = here.sub(ONE.sub(alpha).mul(there));
      if (!num.isZero()) row.set(w, num.divExact(alpha));
    }
    table.set(lam, row);
  }
  return table;
}

/** Which normalisation the structure constants are taken in. */
export type SchwartzMacPherson = 'ssm' | 'csm';

/**
 * Structure constants keyed `${λ},${μ},${ν}` (zero values omitted): for 'ssm', e_{λμ}^ν in
 * s_SM(X_λ°)·s_SM(X_μ°) = Σ_ν e_{λμ}^ν s_SM(X_ν°); for 'csm', the same with c_SM. Solved point by point in
 * increasing codimension; at w, s_SM(X_ν°)|_w = c_SM(X_ν°)|_w / Π_{tangent χ}(1 + χ), and c_SM(X_w°)|_w is the
 * normal product times the cell factors, so each step divides by a polynomial and adds known factors.
 */
/** With `only`, just the products of that one pair (λ, μ). */
export function schwartzMacPhersonTable(kind: SchwartzMacPherson, k: number, n: number, only?: readonly [string, string]): Map<string, RefFraction> {
  const res = csmRestrictionTable(k, n);
  return solveAtFixedPoints<RefPolynomial, RefFraction>(
    {
      strings: grassmannianStrings(k, n),
      at: (lam, w) => res.get(lam)!.get(w),
      // ssm: c_λ c_μ / c(TGr) = Σ e^ν c_ν at w; csm: c_λ c_μ = Σ d^ν c_ν.
      product: (lw, mw, w) => {
        const p = RefFraction.fromPolynomial(lw.mul(mw));
        return kind === 'ssm' ? p.divFactors(tangentFactors(w)) : p;
      },
      subtract: (rem, c, nw) => rem.sub(c.mul(RefFraction.fromPolynomial(nw))),
      isZero: (v) => v.isZero(),
      solve: (rem, w) => {
        // One normal root at a time: division by a linear form is synthetic, by their product it is not.
        let r = rem;
        for (const root of normalRoots(w)) r = r.divPolynomial(root);
        return r.divFactors(cellFactors(w)).reduced();
      },
    },
    only,
  );
}
