import { checkGrassmannian, grassmannianStrings, inv } from './grassmannian-strings.js';
import { solveByExactDivision } from './fixed-point-solve.js';
import { RefLaurent } from './ref-laurent.js';

// Equivariant K-theory of Gr(k, n): K_T(pt) = ℤ[t_1^{±1}, …, t_n^{±1}], t_p = e^{y_p} (t_p has variable
// index p−1). Classes are tuples of restrictions to the fixed points V_w.

/** Swaps characters a, a+1 of a string (a is 1-based). */
export function swapPositions(s: string, a: number): string {
  return s.slice(0, a - 1) + s[a] + s[a - 1] + s.slice(a + 1);
}

/** The point class string 1^k 0^{n−k} (largest codimension). */
export function pointString(k: number, n: number): string {
  return '1'.repeat(k) + '0'.repeat(n - k);
}

/** Π over pairs i < j with s_i = 1, s_j = 0 of factor(i, j) (1-based positions). */
export function productOverInversions<T>(s: string, one: T, factor: (i: number, j: number) => T, mul: (a: T, b: T) => T): T {
  let acc = one;
  for (let i = 1; i <= s.length; i++) {
    for (let j = i + 1; j <= s.length; j++) if (s[i - 1] === '1' && s[j - 1] === '0') acc = mul(acc, factor(i, j));
  }
  return acc;
}

/** 1 − t_i/t_j: the K-theoretic Euler factor of the weight y_j − y_i. */
export function kEulerFactor(i: number, j: number): RefLaurent {
  return RefLaurent.constant(1n).sub(RefLaurent.power(i - 1, 1).mul(RefLaurent.power(j - 1, -1)));
}

/** [O_{X_s}]|_s = Π_{i<j, s_i=1, s_j=0} (1 − t_i/t_j): the normalisation fixed by the conventions. */
export function kDiagonal(s: string): RefLaurent {
  return productOverInversions(s, RefLaurent.constant(1n), kEulerFactor, (a, b) => a.mul(b));
}

/**
 * All restrictions [O_{X_λ}]|_w of Gr(k, n) (result.get(λ).get(w), zero entries omitted).
 *
 * Method: start from the point class, supported at one fixed point with the K-theoretic Euler class of
 * its tangent space there, and climb by isobaric divided differences. For λ with "01" at positions a, a+1
 * and μ = s_a·λ (codimension one more), X_λ = P_a·X_μ and the action map P_a ×_B X_μ → X_λ is birational
 * with rational singularities, so [O_{X_λ}] is its pushforward. Localizing on P_a/B ≅ ℙ¹ (tangent weight
 * α = y_{a+1} − y_a at B, −α at s_aB) gives
 *   [O_{X_λ}]|_w = ( f(w) − (t_a/t_{a+1})·s_a f(s_a w) ) / (1 − t_a/t_{a+1}),   f = [O_{X_μ}],
 * where s_a swaps positions a, a+1 of w and the variables t_a, t_{a+1} (Demazure's isobaric operator in its
 * left form; see e.g. Kostant–Kumar, J. Diff. Geom. 32, 1990, for the K-theoretic nil-Hecke action).
 */
export function kRestrictionTable(k: number, n: number): Map<string, Map<string, RefLaurent>> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const table = new Map<string, Map<string, RefLaurent>>();
  const pt = pointString(k, n);
  table.set(pt, new Map([[pt, kDiagonal(pt)]]));
  const byCodimDown = [...strings].sort((a, b) => inv(b) - inv(a));
  for (const lam of byCodimDown) {
    if (lam === pt) continue;
    const a = lam.indexOf('01') + 1;
    const f = table.get(swapPositions(lam, a))!;
    const ta = RefLaurent.power(a - 1, 1);
    const ta1 = RefLaurent.power(a, 1);
    const denominator = ta1.sub(ta); // (1 − t_a/t_{a+1})·t_{a+1}
    const row = new Map<string, RefLaurent>();
    for (const w of strings) {
      const here = f.get(w) ?? RefLaurent.zero();
      const there = (f.get(swapPositions(w, a)) ?? RefLaurent.zero()).swapVariables(a - 1, a);
      const num = ta1.mul(here).sub(ta.mul(there));
      if (!num.isZero()) row.set(w, num.divExact(denominator));
    }
    table.set(lam, row);
  }
  return table;
}

/**
 * Structure constants c_{λμ}^ν(t) of [O_λ]·[O_μ] = Σ_ν c_{λμ}^ν [O_ν] in K_T(Gr(k, n)), keyed `${λ},${μ},${ν}`
 * (zero values omitted), by the triangular solve at the fixed points in increasing codimension.
 */
/** With `only`, just the products of that one pair (λ, μ). */
export function kLocalizationTable(k: number, n: number, only?: readonly [string, string]): Map<string, RefLaurent> {
  const res = kRestrictionTable(k, n);
  return solveByExactDivision(grassmannianStrings(k, n), (lam, w) => res.get(lam)!.get(w), only);
}
