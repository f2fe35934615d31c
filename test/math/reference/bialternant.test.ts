import Algebrite from 'algebrite';
import { describe, expect, it } from 'vitest';
import { grassmannianStrings, stringToPartition } from '../../../src/reference/grassmannian-strings.js';
import { lrTable } from '../../../src/reference/lr-rule.js';
import { countCompletions, integerSemiring, theoryPieceSet, triangleRegion } from '../../../src/engine/index.js';

// An outside reference: the general-purpose CAS algebrite builds s_μ(x_1..x_k) = a_{μ+δ}/a_δ by the
// bialternant formula, and c_{λμ}^ν is read as the coefficient of x^{ν+δ} in a_{λ+δ}·s_μ [Macdonald,
// Symmetric Functions and Hall Polynomials, 1995, I.3 and I.5]. Only the Vandermonde division and the
// expansion are left to the CAS; each s_μ is computed once and all (λ, ν) are read from it.

const run = (cmd: string): string => Algebrite.run(cmd);

/** Monomial coefficients of an expanded integer polynomial printed by algebrite, keyed by exponent vector. */
function parsePolynomial(text: string, k: number): Map<string, bigint> {
  const out = new Map<string, bigint>();
  const src = text.replace(/\s+/g, '');
  if (src === '0') return out;
  const terms = src.match(/[+-]?[^+-]+/g) ?? [];
  expect(terms.join('')).toBe(src); // nothing skipped by the tokenizer
  for (const term of terms) {
    let coeff = term.startsWith('-') ? -1n : 1n;
    const body = term.replace(/^[+-]/, '');
    const exps = new Array<number>(k).fill(0);
    for (const factor of body.split('*')) {
      const v = /^x(\d+)(?:\^(\d+))?$/.exec(factor);
      if (v !== null) exps[Number(v[1]) - 1]! += v[2] === undefined ? 1 : Number(v[2]);
      else if (/^\d+$/.test(factor)) coeff *= BigInt(factor);
      else throw new Error(`Algebrite term: expected an integer monomial factor, received "${factor}"`);
    }
    const key = exps.join(',');
    out.set(key, (out.get(key) ?? 0n) + coeff);
  }
  return out;
}

/** s_μ(x_1..x_k) via algebrite: the alternant a_{μ+δ} divided by each Vandermonde factor x_i − x_j (monic in x_i). */
function schurByBialternant(mu: readonly number[], k: number): Map<string, bigint> {
  const rows = Array.from({ length: k }, (_, i) =>
    `[${Array.from({ length: k }, (_, j) => `x${i + 1}^${(mu[j] ?? 0) + k - 1 - j}`).join(',')}]`,
  );
  run(`a=det([${rows.join(',')}])`);
  let expr = 'a';
  for (let i = 1; i <= k; i++) for (let j = i + 1; j <= k; j++) expr = `quotient(${expr},x${i}-x${j},x${i})`;
  run(`s=expand(${expr})`);
  const parsed = parsePolynomial(run('s'), k);
  // Consistency with the CAS itself: the number of SSYT, s_μ(1,…,1), equals the sum of coefficients.
  let at1 = 's';
  for (let i = 1; i <= k; i++) at1 = `subst(1,x${i},${at1})`;
  const total = [...parsed.values()].reduce((x, y) => x + y, 0n);
  expect(BigInt(run(at1))).toBe(total);
  return parsed;
}

function permutations(k: number): Array<{ perm: number[]; sign: bigint }> {
  if (k === 0) return [{ perm: [], sign: 1n }];
  const out: Array<{ perm: number[]; sign: bigint }> = [];
  for (const { perm, sign } of permutations(k - 1)) {
    for (let pos = 0; pos <= perm.length; pos++) {
      // Inserting k−1 at pos passes over perm.length − pos larger-indexed slots: that many transpositions.
      const p = [...perm.slice(0, pos), k - 1, ...perm.slice(pos)];
      out.push({ perm: p, sign: (perm.length - pos) % 2 === 0 ? sign : -sign });
    }
  }
  return out;
}

describe('LR rule and puzzle engine against the bialternant formula computed by algebrite', () => {
  it('both agree on every triple of every Gr(k,n), n ≤ 6, k ≤ 3 (bialternant formula; Macdonald 1995)', () => {
    for (let k = 1; k <= 3; k++) {
      const perms = permutations(k);
      const schur = new Map<string, Map<string, bigint>>();
      for (const s of grassmannianStrings(k, 6)) {
        const mu = stringToPartition(s);
        schur.set(mu.join(','), schurByBialternant(mu, k));
      }
      for (let n = k + 1; n <= 6; n++) {
        const lr = lrTable(k, n);
        const all = grassmannianStrings(k, n);
        for (const ls of all) {
          const lam = stringToPartition(ls).map((v, i) => v + k - 1 - i); // λ + δ
          for (const ms of all) {
            const sMu = schur.get(stringToPartition(ms).join(','))!;
            // the engine's whole product σ_λ·σ_μ from one sweep; keys are side 5 read clockwise (ν reversed)
            const puzzles = countCompletions(triangleRegion(n), [ls, '', ms, '', null, ''], theoryPieceSet('cohomology'), { semiring: integerSemiring });
            for (const ns of all) {
              const nuDelta = stringToPartition(ns).map((v, i) => v + k - 1 - i);
              let c = 0n;
              // [x^{ν+δ}] a_{λ+δ}·s_μ with a_{λ+δ} = Σ_σ sgn σ Π_i x_i^{(λ+δ)_{σ(i)}}.
              for (const { perm, sign } of perms) {
                const e = nuDelta.map((v, i) => v - lam[perm[i]!]!);
                if (e.some((v) => v < 0)) continue;
                c += sign * (sMu.get(e.join(',')) ?? 0n);
              }
              expect(lr.get(`${ls},${ms},${ns}`) ?? 0n).toBe(c);
              expect(BigInt(puzzles.get([...ns].reverse().join('')) ?? 0), `puzzles ${ls},${ms},${ns}`).toBe(c);
            }
          }
        }
      }
    }
  });

  it('the CAS gives s_21(x1,x2,x3) = Σ_{i≠j} x_i²x_j + 2x1x2x3 (Kostka numbers K_{21,21} = 1, K_{21,111} = 2; value from memory)', () => {
    const s = schurByBialternant([2, 1], 3);
    expect(s.get('2,1,0')).toBe(1n);
    expect(s.get('0,1,2')).toBe(1n);
    expect(s.get('1,1,1')).toBe(2n);
    expect(s.get('3,0,0') ?? 0n).toBe(0n);
    expect(s.size).toBe(7);
  });
});
