import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createEvaluator, parseClaim, planClaim, type Claim, type InstanceResult } from '../../../src/claims/index.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { cohomologyPieces } from '../../unit/reference/puzzle-pieces.js';

const shipped = (name: string) => JSON.parse(readFileSync(fileURLToPath(new URL(`../../../conjectures/${name}.json`, import.meta.url)), 'utf8')) as Claim;

/** Every instance up to the bounds, smallest class first; stops at the first failure when asked. */
function sweep(claim: Claim, max: Record<string, number>, stopAtFirst = false): { checked: number; fails: InstanceResult[] } {
  const plan = planClaim(claim);
  const evaluator = createEvaluator(claim, { exact: true });
  const fails: InstanceResult[] = [];
  let checked = 0;
  for (const cls of plan.classes(max)) {
    for (const instance of plan.instancesFrom(cls, 0n, plan.instanceCount(cls))) {
      const r = evaluator.evaluate(instance);
      checked++;
      if (r.status === 'fails' && evaluator.confirm(instance).status === 'fails') {
        fails.push(r);
        if (stopAtFirst) return { checked, fails };
      }
    }
  }
  return { checked, fails };
}

describe('formula claims: associativity of the structure constants', () => {
  // Associativity of the ring (common practice, no source): Σ_ν c_{λμ}^ν c_{νρ}^σ = Σ_κ c_{μρ}^κ c_{λκ}^σ.
  for (const theory of ['cohomology', 'k-theory']) {
    it(`holds on every Gr(k, n) with n ≤ 6 in ${theory}`, () => {
      const { checked, fails } = sweep(parseClaim(shipped(`${theory}-structure-constants-associative`)), { n: 6 });
      // Σ_{n ≤ 6} Σ_k C(n,k)^4 quadruples (λ, μ, ρ, σ) of one Gr(k, n) (common practice, no source).
      const binomial = (n: number, k: number): number => (k === 0 || k === n ? 1 : binomial(n - 1, k - 1) + binomial(n - 1, k));
      let quadruples = 0;
      for (let n = 1; n <= 6; n++) for (let k = 0; k <= n; k++) quadruples += binomial(n, k) ** 4;
      expect(checked).toBe(quadruples);
      expect(fails).toEqual([]);
    });
  }

  it('holds on every Gr(k, n) with n ≤ 4 for equivariant K-theory puzzles, whose values are Laurent polynomials in t', () => {
    const { checked, fails } = sweep(parseClaim(shipped('equivariant-k-structure-constants-associative')), { n: 4 });
    const binomial = (n: number, k: number): number => (k === 0 || k === n ? 1 : binomial(n - 1, k - 1) + binomial(n - 1, k));
    let quadruples = 0;
    for (let n = 1; n <= 4; n++) for (let k = 0; k <= n; k++) quadruples += binomial(n, k) ** 4;
    expect(checked).toBe(quadruples);
    expect(fails).toEqual([]);
  });

  it('a deliberately wrong formula (λ and σ exchanged on the right) yields its smallest counterexample, confirmed by naive counts', () => {
    const claim = shipped('cohomology-structure-constants-associative');
    const right = claim.compare.formula!.right;
    const wrong = parseClaim({
      ...claim,
      id: 'wrong-associativity',
      compare: { ...claim.compare, formula: { ...claim.compare.formula, right: [{ ...right[0]!, product: [{ triangle: ['s2', 's4', 'kappa'] }, { triangle: ['s5', 'kappa', 's1'] }] }] } },
    });
    const { fails } = sweep(wrong, { n: 4 }, true);
    expect(fails).toHaveLength(1);
    const first = fails[0]!;
    // Independent values: plain backtracking on each triangle; strings of one content in lexicographic order.
    const c = (l: string, m: string, n: string) => naiveCount([l.length, 0, m.length, 0, n.length, 0], [l, '', m, '', [...n].reverse().join(''), ''], cohomologyPieces()).fillings;
    const sameContent = (s: string) => {
      const out: string[] = [];
      for (let k = 0; k < 2 ** s.length; k++) {
        const t = k.toString(2).padStart(s.length, '0');
        if ([...t].sort().join('') === [...s].sort().join('')) out.push(t);
      }
      return out;
    };
    const sides = (instance: { sides: readonly string[] }) => instance.sides;
    const values = (b: readonly string[]) => {
      const [l, m, , r, s] = b as [string, string, string, string, string];
      const left = sameContent(l).reduce((acc, nu) => acc + c(l, m, nu) * c(nu, r, s), 0n);
      const wrongRight = sameContent(l).reduce((acc, k) => acc + c(m, r, k) * c(s, k, l), 0n);
      return { left, wrongRight };
    };
    const v = values(first.left.sides);
    expect(v.left).not.toBe(v.wrongRight);
    expect(first.left.text).toBe(v.left.toString());
    expect(first.right.text).toBe(v.wrongRight.toString());
    // Smallest: every instance before it (earlier classes, lower indices) satisfies the wrong formula naively.
    const plan = planClaim(wrong);
    for (const cls of plan.classes({ n: 4 })) {
      const end = cls.key === first.classKey ? first.index : plan.instanceCount(cls);
      for (let i = 0n; i < end; i++) {
        const w = values(sides(plan.instanceAt(cls, i)));
        expect(w.left).toBe(w.wrongRight);
      }
      if (cls.key === first.classKey) break;
    }
  });
});
