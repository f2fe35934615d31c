import { describe, expect, it } from 'vitest';
import { createEvaluator, parseClaim, planClaim, type ClaimInput } from '../../../src/claims/index.js';
import { evaluateTerms } from '../../../src/claims/formula/evaluate-formula.js';
import { CodedError } from '../../../src/errors/index.js';
import { naiveCount } from '../../../src/reference/naive-count.js';
import { cohomologyPieces, equivariantPieces } from '../reference/puzzle-pieces.js';

const rhombus = (right: object, over: Partial<ClaimInput> = {}): unknown => ({
  id: 'formula-test',
  statement: 's',
  theory: 'cohomology',
  family: { sides: ['n', 'n', 0, 'n', 'n', 0], variables: [{ name: 'n', min: 1, max: 2 }] },
  transform: [],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' }, formula: { right } },
  ...over,
});

const split = [{ sum: [{ name: 'eta', length: 'n' }], product: [{ sides: ['s1', '-', 'eta', '-', 's5', '-'] }, { sides: ['-', 's2', '-', 's4', '-', { reverse: 'eta' }] }] }];

function claimError(data: unknown): CodedError {
  try {
    parseClaim(data);
  } catch (e) {
    return e as CodedError;
  }
  throw new Error('expected an invalid claim');
}

describe('formula claims: validation', () => {
  it('accepts a sum over η of products of two triangle values', () => {
    expect(() => parseClaim(rhombus(split))).not.toThrow();
  });

  it('names the field of an unknown string name, a boundary that does not close, a transform or a right theory next to a formula', () => {
    const unknown = claimError(rhombus([{ product: [{ sides: ['s1', '-', 'eta', '-', 's5', '-'] }] }]));
    expect(unknown.path).toBe('compare.formula.right[0].product[0].sides[2]');
    const open = claimError(rhombus([{ product: [{ sides: ['s1', '-', 's1', '-', 's2', 's2'] }] }]));
    expect(open.path).toBe('compare.formula.right[0].product[0]');
    expect(open.message).toContain('n=1');
    const steps = claimError(rhombus(split, { transform: [{ type: 'rotate', degrees: 180 }] }));
    expect(steps.path).toBe('transform');
    const right = claimError(rhombus(split, { compare: { measure: { type: 'value' }, relation: { type: 'equal' }, rightTheory: 'k-theory', formula: { right: split } } as never }));
    expect(right.path).toBe('compare.rightTheory');
  });
});

describe('formula claims: evaluation', () => {
  it('sums over exactly the strings asked for (C(4,2) = 6 strings of length 4 with two 1s; 2^3 of length 3; common practice, no source)', () => {
    const one = () => ({ kind: 'int' as const, v: 1 });
    const empty = { length: () => 0, build: () => '' };
    const term = (binder: object) => [{ coefficient: 1, binders: [binder], product: [{ theory: 't', sides: [empty, empty, empty, empty, empty, empty] }] }];
    const lengthBinder = (length: number, ones?: number) => ({ name: 'eta', kind: 'length', length: { constant: length, coefficients: {} }, ones: ones === undefined ? undefined : { constant: ones, coefficients: {} } });
    expect(evaluateTerms(term(lengthBinder(4, 2)) as never, ['', '', '', '', '', ''], {}, one, ['0', '1'])).toEqual({ kind: 'int', v: 6 });
    expect(evaluateTerms(term(lengthBinder(3)) as never, ['', '', '', '', '', ''], {}, one, ['0', '1'])).toEqual({ kind: 'int', v: 8 });
  });

  it('the right side of every rhombus boundary equals the same sum computed with the naive backtracking counter', () => {
    const claim = parseClaim(rhombus(split));
    const plan = planClaim(claim);
    const evaluator = createEvaluator(claim, { exact: true });
    const count = (sides: string[]) => naiveCount(sides.map((s) => s.length), sides, cohomologyPieces()).fillings;
    for (const cls of plan.classes()) {
      const n = cls.variables.n!;
      for (let i = 0n; i < plan.instanceCount(cls); i++) {
        const b = plan.instanceAt(cls, i);
        const r = evaluator.evaluate(b);
        let sum = 0n;
        for (let k = 0; k < 2 ** n; k++) {
          const eta = k.toString(2).padStart(n, '0');
          sum += count([b.sides[0]!, '', eta, '', b.sides[4]!, '']) * count(['', b.sides[1]!, '', b.sides[3]!, '', [...eta].reverse().join('')]);
        }
        expect(r.right.text).toBe(sum.toString());
        expect(r.left.text).toBe(count([...b.sides]).toString());
      }
    }
  });
});

describe('formula claims: sums read off one open-side-5 sweep', () => {
  it('both sides of associativity (n ≤ 3) equal the sums of products of naive triangle counts', () => {
    const claim = parseClaim({
      id: 'assoc-test',
      statement: 's',
      theory: 'cohomology',
      family: { sides: ['n', 'n', 0, 'n', 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }], conditions: [{ type: 'sameContent', sides: [1, 2, 4] }, { type: 'sameContent', sides: [4, 5] }] },
      transform: [],
      compare: {
        measure: { type: 'value' },
        relation: { type: 'equal' },
        formula: {
          left: [{ sum: [{ name: 'nu', sameContentAs: 's1' }], product: [{ triangle: ['s1', 's2', 'nu'] }, { triangle: ['nu', 's4', 's5'] }] }],
          right: [{ sum: [{ name: 'kappa', length: 'n' }], product: [{ triangle: ['s2', 's4', 'kappa'] }, { triangle: ['s1', 'kappa', 's5'] }] }],
        },
      },
    });
    const c = (l: string, m: string, n: string) => naiveCount([l.length, 0, m.length, 0, n.length, 0], [l, '', m, '', [...n].reverse().join(''), ''], cohomologyPieces()).fillings;
    const plan = planClaim(claim);
    const evaluator = createEvaluator(claim, { exact: true });
    let nonzero = 0;
    for (const cls of plan.classes()) {
      const n = cls.variables.n!;
      const all = Array.from({ length: 2 ** n }, (_, k) => k.toString(2).padStart(n, '0'));
      for (let i = 0n; i < plan.instanceCount(cls); i++) {
        const b = plan.instanceAt(cls, i);
        const [l, m, , r, s] = b.sides as [string, string, string, string, string];
        const left = all.reduce((acc, nu) => acc + c(l, m, nu) * c(nu, r, s), 0n);
        const right = all.reduce((acc, k) => acc + c(m, r, k) * c(l, k, s), 0n);
        const result = evaluator.evaluate(b);
        expect(result.left.text).toBe(left.toString());
        expect(result.right.text).toBe(right.toString());
        if (left !== 0n) nonzero++;
      }
    }
    expect(nonzero).toBeGreaterThan(10);
  });
});

describe('formula claims: polynomial theories', () => {
  it('an empty sum is the zero polynomial: a boundary with no puzzle on either side holds (equivariant, n = 1)', () => {
    const claim = parseClaim(rhombus(split, { theory: 'equivariant', family: { sides: ['n', 'n', 0, 'n', 'n', 0], variables: [{ name: 'n', min: 1, max: 1 }] } }));
    const plan = planClaim(claim);
    const evaluator = createEvaluator(claim, { exact: true });
    const cls = plan.classes()[0]!;
    const sides = ['1', '1', '', '1', '0', ''];
    // Independent values by plain backtracking: no puzzle fills the rhombus, nor any pair of its triangles.
    const count = (s: string[]) => naiveCount(s.map((x) => x.length), s, equivariantPieces()).fillings;
    expect(count(sides)).toBe(0n);
    for (const eta of ['0', '1']) expect(count(['1', '', eta, '', '0', '']) * count(['', '1', '', '1', '', eta])).toBe(0n);
    const r = evaluator.evaluate({ classKey: cls.key, index: plan.indexOf(cls, sides)!, sides });
    expect(r.status).toBe('holds');
  });
});

describe('formula claims compared after a permutation of y', () => {
  // The exchange of sides 1 and 4 of (a,0,b,a,0,b) keeps the equivariant value up to reversing
  // y_(b+1)..y_(a+b) (the rule of issue 12's checks, value from memory there); written as a formula.
  const exchange = (relation: object) =>
    parseClaim({
      id: 'formula-substitution',
      statement: 's',
      theory: 'equivariant',
      family: { sides: ['a', 0, 'b', 'a', 0, 'b'], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
      transform: [],
      compare: { measure: { type: 'value' }, relation, formula: { left: [{ product: [{ sides: ['s1', 's2', 's3', 's4', 's5', 's6'] }] }], right: [{ product: [{ sides: ['s4', 's2', 's3', 's1', 's5', 's6'] }] }] } },
    });
  const statuses = (relation: object) => {
    const claim = exchange(relation);
    const plan = planClaim(claim);
    const ev = createEvaluator(claim, { exact: true });
    const out: string[] = [];
    for (const cls of plan.classes()) for (let i = 0n; i < plan.instanceCount(cls); i++) out.push(ev.evaluate(plan.instanceAt(cls, i)).status);
    return out;
  };

  it('holds with the block reversal applied to the right side, fails as a plain equality', () => {
    expect(statuses({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] }).every((s) => s === 'holds')).toBe(true);
    expect(statuses({ type: 'equal' }).some((s) => s === 'fails')).toBe(true);
    expect(statuses({ type: 'equalUpToPermutation', searchSpace: 'allPermutations' }).every((s) => s === 'holds')).toBe(true);
  });
});
