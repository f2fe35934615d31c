import { checkGrassmannian, checkString, grassmannianStrings, inv } from './grassmannian-strings.js';
import { solveByExactDivision } from './fixed-point-solve.js';
import { RefPolynomial } from './ref-polynomial.js';

// Conventions: the simple reflection s_i (1 ≤ i < n) swaps positions i, i+1 of a string and variables
// y_i, y_{i+1}; the simple root is α_i = y_{i+1} − y_i; variable y_i has polynomial index i−1. The
// identity string is 0^{n−k}1^k, and w = s_{a_1}⋯s_{a_ℓ}·id means s_{a_ℓ} acts first.

function swapAt(s: string, i: number): string {
  // 1-based i: swap characters i and i+1.
  return s.slice(0, i - 1) + s[i] + s[i - 1] + s.slice(i + 1);
}

function identityString(s: string): string {
  const ones = [...s].filter((c) => c === '1').length;
  return '0'.repeat(s.length - ones) + '1'.repeat(ones);
}

/** A reduced word a of the minimal permutation of w, so that w = s_{a_1}⋯s_{a_ℓ}·id with ℓ = inv(w). */
export function minimalReducedWord(w: string): number[] {
  checkString(w);
  const word: number[] = [];
  let cur = w;
  // Any adjacent "10" is a left descent: swapping it lowers inv by exactly one.
  for (;;) {
    const i = cur.indexOf('10');
    if (i < 0) break;
    word.push(i + 1);
    cur = swapAt(cur, i + 1);
  }
  return word;
}

/** The roots β_j = s_{a_1}⋯s_{a_{j−1}}(α_{a_j}) of a word, as pairs [b, a] meaning y_b − y_a (1-based). */
export function wordRoots(word: readonly number[]): Array<[number, number]> {
  const n = Math.max(1, ...word.map((a) => a + 1));
  // perm[i] is the image of index i under the prefix s_{a_1}∘⋯∘s_{a_{j−1}}.
  const perm = Array.from({ length: n + 1 }, (_, i) => i);
  const roots: Array<[number, number]> = [];
  for (const a of word) {
    roots.push([perm[a + 1]!, perm[a]!]);
    // Compose on the right with s_a: the new prefix maps a ↦ old(a+1) and a+1 ↦ old(a).
    const t = perm[a]!;
    perm[a] = perm[a + 1]!;
    perm[a + 1] = t;
  }
  return roots;
}

/**
 * The restriction [X_λ]|_w of an equivariant Schubert class to the fixed point w, by the AJS–Billey formula
 * [Billey, Duke Math. J. 96, 1999]: a sum over reduced subwords for λ's minimal permutation inside a fixed
 * reduced word of w's minimal permutation of the products of the roots β_j.
 */
export function restriction(lambda: string, w: string): RefPolynomial {
  checkString(w);
  checkString(lambda, [...w].filter((c) => c === '1').length, w.length);
  const word = minimalReducedWord(w);
  const roots = wordRoots(word).map(([b, a]) => RefPolynomial.difference(b - 1, a - 1));
  const m = inv(lambda);
  const id = identityString(w);
  let total = RefPolynomial.zero();
  // A subword of length inv(λ) carrying id to λ is exactly a reduced word of λ's minimal permutation
  // (its product lies in the coset of that permutation and is no longer than it).
  const chosen: number[] = [];
  const walk = (start: number): void => {
    if (chosen.length === m) {
      let s = id;
      for (let t = chosen.length - 1; t >= 0; t--) s = swapAt(s, word[chosen[t]!]!);
      if (s !== lambda) return;
      let prod = RefPolynomial.constant(1n);
      for (const j of chosen) prod = prod.mul(roots[j]!);
      total = total.add(prod);
      return;
    }
    for (let j = start; j <= word.length - (m - chosen.length); j++) {
      chosen.push(j);
      walk(j + 1);
      chosen.pop();
    }
  };
  walk(0);
  return total;
}

/** All restrictions of Gr(k, n): result.get(λ).get(w) = [X_λ]|_w (zero entries omitted). */
export function restrictionTable(k: number, n: number): Map<string, Map<string, RefPolynomial>> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const table = new Map<string, Map<string, RefPolynomial>>();
  for (const lam of strings) {
    const row = new Map<string, RefPolynomial>();
    for (const w of strings) {
      const r = restriction(lam, w);
      if (!r.isZero()) row.set(w, r);
    }
    table.set(lam, row);
  }
  return table;
}

/**
 * Torus-equivariant structure constants of Gr(k, n), keyed `${λ},${μ},${ν}` (zero values omitted), from
 * [X_λ]|_w·[X_μ]|_w = Σ_ν c_{λμ}^ν(y)·[X_ν]|_w solved point by point in increasing inv(w).
 */
export function localizationTable(k: number, n: number): Map<string, RefPolynomial> {
  const res = restrictionTable(k, n);
  return solveByExactDivision(grassmannianStrings(k, n), (lam, w) => res.get(lam)!.get(w));
}

