import { checkGrassmannian, conjugateString, grassmannianStrings, partitionToString, stringToPartition } from './grassmannian-strings.js';
import { CodedError } from '../errors/index.js';

// A truncated polynomial in L variables: monomial x^e is encoded as Σ e_i·B^(L−1−i) with a base B larger than
// every exponent that survives truncation, so numeric order of keys is lexicographic order of exponents.
interface Encoding {
  readonly vars: number;
  readonly base: number;
  readonly maxDegree: number;
}

type TruncatedPoly = Map<number, bigint>;

function decode(key: number, enc: Encoding): number[] {
  const e = new Array<number>(enc.vars).fill(0);
  for (let i = enc.vars - 1; i >= 0; i--) {
    e[i] = key % enc.base;
    key = Math.floor(key / enc.base);
  }
  return e;
}

function degreeOf(key: number, enc: Encoding): number {
  return decode(key, enc).reduce((s, v) => s + v, 0);
}

/**
 * The stable Grothendieck polynomial G_λ(x_1..x_L) = Σ_T (−1)^{|T|−|λ|} x^T over set-valued tableaux T of
 * shape λ [Buch, Acta Math. 189, 2002, Thm 3.1], with terms of degree above maxDegree dropped. Boxes hold
 * nonempty sets; max of a box ≤ min of the box to its right, max < min of the box below.
 */
function grothendieckTruncated(lambda: readonly number[], enc: Encoding): TruncatedPoly {
  const out: TruncatedPoly = new Map();
  const rows = lambda.filter((v) => v > 0);
  const size = rows.reduce((s, v) => s + v, 0);
  if (rows.length > enc.vars || size > enc.maxDegree) return out;
  const maxOf: number[][] = rows.map((len) => new Array<number>(len).fill(0));
  const exps = new Array<number>(enc.vars).fill(0);
  let degree = 0;
  const fill = (r: number, c: number): void => {
    if (r === rows.length) {
      let key = 0;
      for (const e of exps) key = key * enc.base + e;
      const sign = (degree - size) % 2 === 0 ? 1n : -1n;
      out.set(key, (out.get(key) ?? 0n) + sign);
      return;
    }
    if (c === rows[r]) {
      fill(r + 1, 0);
      return;
    }
    const left = c > 0 ? maxOf[r]![c - 1]! : 1;
    const above = r > 0 ? maxOf[r - 1]![c]! + 1 : 1;
    const lo = Math.max(left, above);
    // Boxes still to fill each need at least one entry, which bounds the extra entries here.
    const remainingBoxes = size - (rows.slice(0, r).reduce((s, v) => s + v, 0) + c) - 1;
    const room = enc.maxDegree - degree - remainingBoxes;
    // Choose the box's set as (min m, extra entries from (m, L]) by bitmask over the larger letters.
    for (let m = lo; m <= enc.vars; m++) {
      const higher = enc.vars - m;
      for (let mask = 0; mask < 1 << higher; mask++) {
        let bits = 0;
        let top = m;
        for (let b = 0; b < higher; b++) if (mask & (1 << b)) { bits++; top = m + 1 + b; }
        if (bits + 1 > room) continue;
        exps[m - 1]!++;
        for (let b = 0; b < higher; b++) if (mask & (1 << b)) exps[m + b]!++;
        degree += bits + 1;
        maxOf[r]![c] = top;
        fill(r, c + 1);
        degree -= bits + 1;
        exps[m - 1]!--;
        for (let b = 0; b < higher; b++) if (mask & (1 << b)) exps[m + b]!--;
      }
    }
  };
  fill(0, 0);
  for (const [k, v] of out) if (v === 0n) out.delete(k);
  return out;
}

function multiplyTruncated(a: TruncatedPoly, b: TruncatedPoly, enc: Encoding): TruncatedPoly {
  const withDeg = (p: TruncatedPoly): Array<[number, number, bigint]> =>
    [...p].map(([k, v]) => [k, degreeOf(k, enc), v] as [number, number, bigint]).sort((x, y) => x[1] - y[1]);
  const as = withDeg(a);
  const bs = withDeg(b);
  const out: TruncatedPoly = new Map();
  for (const [ka, da, ca] of as) {
    for (const [kb, db, cb] of bs) {
      if (da + db > enc.maxDegree) break;
      const k = ka + kb; // no carries: every exponent of a surviving product is ≤ maxDegree < base
      const v = (out.get(k) ?? 0n) + ca * cb;
      if (v === 0n) out.delete(k);
      else out.set(k, v);
    }
  }
  return out;
}

/**
 * Expands G_λ·G_μ = Σ_ν c_{λμ}^ν G_ν in L variables for |ν| ≤ maxDegree (keys: ν's nonzero parts joined by
 * ','): the lowest-degree part of the remainder is Σ c^ν s_ν, since G_ν = s_ν + higher terms, and its
 * lex-leading monomial x^ν carries c^ν; subtracting c^ν G_ν and repeating peels off every term.
 */
export function grothendieckProduct(
  lambda: readonly number[],
  mu: readonly number[],
  vars: number,
  maxDegree: number,
): Map<string, bigint> {
  if (!Number.isInteger(vars) || vars < 1) {
    throw new CodedError('invalid_argument', { what: 'Variable count', expected: 'a positive integer', received: `${vars}` });
  }
  if (!Number.isInteger(maxDegree) || maxDegree < 0) {
    throw new CodedError('invalid_argument', { what: 'Maximum degree', expected: 'a non-negative integer', received: `${maxDegree}` });
  }
  const enc: Encoding = { vars, base: maxDegree + 1, maxDegree };
  const cache = new Map<string, TruncatedPoly>();
  return expand(lambda, mu, enc, cache);
}

function expand(
  lambda: readonly number[],
  mu: readonly number[],
  enc: Encoding,
  cache: Map<string, TruncatedPoly>,
): Map<string, bigint> {
  const g = (p: readonly number[]): TruncatedPoly => {
    const key = p.filter((v) => v > 0).join(',');
    let hit = cache.get(key);
    if (hit === undefined) {
      hit = grothendieckTruncated(p, enc);
      cache.set(key, hit);
    }
    return hit;
  };
  const rem = multiplyTruncated(g(lambda), g(mu), enc);
  const result = new Map<string, bigint>();
  while (rem.size > 0) {
    let bestKey = -1;
    let bestDeg = Infinity;
    for (const k of rem.keys()) {
      const d = degreeOf(k, enc);
      if (d < bestDeg || (d === bestDeg && k > bestKey)) {
        bestDeg = d;
        bestKey = k;
      }
    }
    const nu = decode(bestKey, enc);
    if (nu.some((v, i) => i > 0 && v > nu[i - 1]!)) {
      throw new CodedError('invalid_argument', { what: 'Leading exponent', expected: 'a partition', received: `(${nu.join(',')})` });
    }
    const c = rem.get(bestKey)!;
    const name = nu.filter((v) => v > 0).join(',');
    result.set(name, c);
    for (const [k, v] of g(nu)) {
      const w = (rem.get(k) ?? 0n) - c * v;
      if (w === 0n) rem.delete(k);
      else rem.set(k, w);
    }
  }
  return result;
}

/** Options for `grothendieckTable`: `transpose: false` forces k variables even when k > n−k. */
export interface GrothendieckTableOptions {
  transpose?: boolean;
}

/**
 * K-theory structure constants of Gr(k, n) in the structure-sheaf basis, O_λ·O_μ = Σ c_{λμ}^ν O_ν, keyed
 * `${λ},${μ},${ν}` (zero values omitted). G_ν with ν outside the k×(n−k) box span an ideal and are dropped
 * [Buch 2002, §8]; when k > n−k the table is read off Gr(n−k, n) through conjugate partitions, since
 * G_λ ↦ G_λ' is a ring automorphism [Buch 2002], keeping at most ⌊n/2⌋ variables.
 */
export function grothendieckTable(k: number, n: number, options: GrothendieckTableOptions = {}): Map<string, bigint> {
  checkGrassmannian(k, n);
  if (k > n - k && options.transpose !== false) {
    const dual = grothendieckTable(n - k, n, options);
    const out = new Map<string, bigint>();
    for (const [key, c] of dual) {
      const [a, b, d] = key.split(',') as [string, string, string];
      out.set(`${conjugateString(a)},${conjugateString(b)},${conjugateString(d)}`, c);
    }
    return out;
  }
  const strings = grassmannianStrings(k, n);
  const table = new Map<string, bigint>();
  if (k === 0 || k === n) {
    const only = strings[0]!;
    table.set(`${only},${only},${only}`, 1n);
    return table;
  }
  const enc: Encoding = { vars: k, base: k * (n - k) + 1, maxDegree: k * (n - k) };
  const cache = new Map<string, TruncatedPoly>();
  strings.forEach((lam, i) => {
    for (let j = i; j < strings.length; j++) {
      const mu = strings[j]!;
      for (const [name, c] of expand(stringToPartition(lam), stringToPartition(mu), enc, cache)) {
        const nu = name === '' ? [] : name.split(',').map(Number);
        if ((nu[0] ?? 0) > n - k) continue; // outside the box: the ideal that vanishes on Gr(k, n)
        const s = partitionToString(nu, k, n);
        table.set(`${lam},${mu},${s}`, c);
        table.set(`${mu},${lam},${s}`, c);
      }
    }
  });
  return table;
}
