import { describe, expect, it } from 'vitest';
import {
  addPoly,
  countCompletions,
  integerSemiring,
  mulPoly,
  ONE_POLY,
  polyDegree,
  polynomialSemiring,
  polyTerms,
  scalePoly,
  theoryPieceSet,
  triangleRegion,
  variablePoly,
  ZERO_POLY,
  type Polynomial,
} from '../../../src/engine/index.js';
import { lrTable } from '../../../src/reference/lr-rule.js';
import { contains, grassmannianStrings, inversions, partitionOfString, stringOfPartition } from '../../helpers/boundaries.js';

const reverse = (s: string) => [...s].reverse().join('');

/** All products σ_λ·σ_μ of Gr(k, n) in a theory: key `λ,μ` → (ν → value). */
function products<T>(theory: string, k: number, n: number, semiring: Parameters<typeof countCompletions<T>>[3]['semiring']): Map<string, Map<string, T>> {
  const out = new Map<string, Map<string, T>>();
  const strings = grassmannianStrings(k, n);
  for (const l of strings)
    for (const m of strings) {
      const all = countCompletions(triangleRegion(n), [l, '', m, '', null, ''], theoryPieceSet(theory), { semiring });
      out.set(`${l},${m}`, new Map([...all].map(([side5, v]) => [reverse(side5), v])));
    }
  return out;
}

const grassmannians = (maxN: number) => Array.from({ length: maxN }, (_, i) => i + 1).flatMap((n) => Array.from({ length: n + 1 }, (_, k) => [k, n] as const));

describe('Pieri’s rule for every σ_λ times a row and a column class, n ≤ 8 [Pieri’s rule; Fulton, Young Tableaux, 1997]', () => {
  it.each(grassmannians(8).filter(([k, n]) => k > 0 && k < n))('Gr(%i,%i)', (k, n) => {
    const strings = grassmannianStrings(k, n);
    for (let p = 1; p <= Math.max(k, n - k); p++) {
      for (const [special, strip] of [
        [p <= n - k ? stringOfPartition([p, ...new Array<number>(k - 1).fill(0)], n) : null, 'horizontal'],
        [p <= k ? stringOfPartition([...new Array<number>(p).fill(1), ...new Array<number>(k - p).fill(0)], n) : null, 'vertical'],
      ] as const) {
        if (special === null || k === 0) continue;
        for (const lambda of strings) {
          const all = countCompletions(triangleRegion(n), [lambda, '', special, '', null, ''], theoryPieceSet('cohomology'), { semiring: integerSemiring });
          const lam = partitionOfString(lambda);
          for (const nu of strings) {
            const v = partitionOfString(nu);
            // ν/λ must be a strip of p boxes with at most one box per column (horizontal) or row (vertical)
            const size = v.reduce((a, b) => a + b, 0) - lam.reduce((a, b) => a + b, 0);
            const ok =
              contains(v, lam) &&
              size === p &&
              (strip === 'horizontal' ? v.every((x, i) => i === 0 || x <= lam[i - 1]!) : v.every((x, i) => x - lam[i]! <= 1));
            expect(all.get(reverse(nu)) ?? 0, `${lambda}·${special} → ${nu}`).toBe(ok ? 1 : 0);
          }
        }
      }
    }
  });
});

// y_m = d_1 + … + d_{m−1} writes a polynomial in the differences d_i = y_{i+1} − y_i (y_1 = 0 is
// harmless: equivariant structure constants depend on differences only).
function inDifferences(p: Polynomial, n: number): Polynomial {
  const y = (m: number): Polynomial => Array.from({ length: m - 1 }, (_, i) => variablePoly(i)).reduce(addPoly, ZERO_POLY);
  let out = ZERO_POLY;
  for (const t of polyTerms(p, n)) {
    let term: Polynomial = scalePoly(ONE_POLY, t.coefficient);
    t.exponents.forEach((e, m) => {
      for (let r = 0; r < e; r++) term = mulPoly(term, y(m + 1));
    });
    out = addPoly(out, term);
  }
  return out;
}

describe('equivariant structure constants, n ≤ 6', () => {
  it.each(grassmannians(6).filter(([k, n]) => k > 0 && k < n))('Gr(%i,%i): homogeneous, y = 0 gives LR, Graham-positive', (k, n) => {
    const lr = lrTable(k, n);
    for (const [pair, row] of products('equivariant', k, n, polynomialSemiring(n))) {
      const [l, m] = pair.split(',') as [string, string];
      for (const nu of grassmannianStrings(k, n)) {
        const c = row.get(nu) ?? ZERO_POLY;
        const degree = inversions(l) + inversions(m) - inversions(nu);
        // homogeneous of degree inv λ + inv μ − inv ν [Knutson–Tao, Duke 2003]
        for (const t of polyTerms(c, n)) expect(t.exponents.reduce((a, b) => a + b, 0)).toBe(degree);
        // y = 0 recovers the Littlewood–Richardson coefficient [Knutson–Tao 2003; LR rule, Fulton 1997]
        const constant = polyTerms(c, n).find((t) => t.exponents.every((e) => e === 0))?.coefficient ?? 0n;
        expect(constant).toBe(lr.get(`${l},${m},${nu}`) ?? 0n);
        // nonnegative in the differences y_{m+1} − y_m [Graham, Duke 2001]
        for (const t of polyTerms(inDifferences(c, n), n)) expect(t.coefficient > 0n, `${l},${m},${nu}`).toBe(true);
        if (c.size > 0) expect(polyDegree(c)).toBe(degree);
      }
    }
  });
});

describe('K-theory structure constants, n ≤ 7', () => {
  it.each(grassmannians(7))('Gr(%i,%i): Brion’s sum rule, alternating signs, lowest degree = LR, Lenart’s K-Pieri', (k, n) => {
    const lr = lrTable(k, n);
    const strings = grassmannianStrings(k, n);
    for (const [pair, row] of products('k-theory', k, n, integerSemiring)) {
      const [l, m] = pair.split(',') as [string, string];
      const nonzeroInCohomology = strings.some((nu) => (lr.get(`${l},${m},${nu}`) ?? 0n) !== 0n);
      // Σ_ν c_{λμ}^ν = χ(O_λ·O_μ) = 1 if σ_λσ_μ ≠ 0, else 0 [Brion, J. Algebra 2002]
      expect([...row.values()].reduce((a: bigint, b) => a + BigInt(b), 0n)).toBe(nonzeroInCohomology ? 1n : 0n);
      for (const nu of strings) {
        const c = BigInt(row.get(nu) ?? 0);
        const excess = inversions(nu) - inversions(l) - inversions(m);
        // (−1)^{|ν|−|λ|−|μ|} c ≥ 0 and c = 0 below the cohomological degree [Brion 2002; Buch, Acta Math. 2002]
        expect(excess % 2 === 0 ? c >= 0n : c <= 0n).toBe(true);
        if (excess < 0) expect(c).toBe(0n);
        if (excess === 0) expect(c).toBe(lr.get(`${l},${m},${nu}`) ?? 0n);
      }
    }
    if (k === 0 || k === n) return;
    // G_1·G_λ = Σ (−1)^{|μ/λ|−1} G_μ over μ ⊋ λ with μ/λ a rook strip (no two boxes in a row or a
    // column) [Lenart, Ann. Comb. 2000]
    const divisor = stringOfPartition([1, ...new Array<number>(k - 1).fill(0)], n);
    for (const l of strings) {
      const all = countCompletions(triangleRegion(n), [l, '', divisor, '', null, ''], theoryPieceSet('k-theory'), { semiring: integerSemiring });
      const lam = partitionOfString(l);
      for (const nu of strings) {
        const mu = partitionOfString(nu);
        const added = mu.map((x, i) => x - lam[i]!);
        const boxes = added.reduce((a, b) => a + b, 0);
        const rook = contains(mu, lam) && boxes > 0 && added.every((a) => a <= 1) && mu.every((x, i) => added[i] === 0 || i === mu.length - 1 || mu[i + 1]! < x || added[i + 1] === 0);
        const columnsDistinct = rook && new Set(mu.flatMap((x, i) => (added[i] === 1 ? [x] : []))).size === boxes;
        expect(BigInt(all.get(reverse(nu)) ?? 0), `${l}·σ1 → ${nu}`).toBe(columnsDistinct ? (boxes % 2 === 1 ? 1n : -1n) : 0n);
      }
    }
  });
});

function mobius(small: string, big: string): bigint {
  const s = partitionOfString(small);
  const b = partitionOfString(big);
  const grown = b.map((x, i) => x - s[i]!);
  if (grown.some((g) => g < 0 || g > 1)) return 0n;
  const columns = b.filter((_, i) => grown[i] === 1);
  if (new Set(columns).size !== columns.length) return 0n;
  return columns.length % 2 === 0 ? 1n : -1n;
}

describe('dual K-theory is dual to K-theory under χ, n ≤ 6', () => {
  // χ(I_λ·O_{μ∨}) = δ_{λμ} and χ(O_λ·I_{μ∨}) = δ_{λμ}, with O_λ = Σ_{ν ⊇ λ} I_ν, χ(I_ν) = δ_{ν,pt},
  // χ(O_ν) = 1, and μ∨ = reverse(μ) the opposite class [Brion, J. Algebra 2002; Buch, Acta Math. 2002].
  // Inverting O = Σ I uses the Möbius function of Young's lattice: (−1)^{|α/s|} when α/s has no two
  // boxes in one row or column, else 0 [Stanley, Enumerative Combinatorics I, 1986, §3.9].
  it.each(grassmannians(6).filter(([k, n]) => k > 0 && k < n))('Gr(%i,%i)', (k, n) => {
    const strings = grassmannianStrings(k, n);
    const point = '1'.repeat(k) + '0'.repeat(n - k);
    const dualK = products('dual-k-theory', k, n, integerSemiring);
    const kTheory = products('k-theory', k, n, integerSemiring);
    const above = (s: string) => strings.filter((a) => contains(partitionOfString(a), partitionOfString(s)));
    for (const l of strings)
      for (const m of strings) {
        const dual = reverse(m);
        const viaDual = above(dual).reduce((acc, a) => acc + BigInt(dualK.get(`${l},${a}`)!.get(point) ?? 0), 0n);
        const viaK = above(dual).reduce((acc, a) => {
          const chi = [...kTheory.get(`${l},${a}`)!.values()].reduce((s: bigint, v) => s + BigInt(v), 0n);
          return acc + mobius(dual, a) * chi;
        }, 0n);
        expect(viaDual, `χ(I_${l}·O_${dual})`).toBe(l === m ? 1n : 0n);
        expect(viaK, `χ(O_${l}·I_${dual})`).toBe(l === m ? 1n : 0n);
      }
  });
});
