import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { applyTransform, compileClaimProgram, createEvaluator, loadClaim, parseClaim, planClaim, type Claim, type InstanceResult } from '../../../src/claims/index.js';
import { countBoundary, fillingCountSemiring, integerSemiring, makeRegion, polynomialSemiring, polyEquals, substitutePoly, theoryPieceSet } from '../../../src/engine/index.js';

const fixtures = fileURLToPath(new URL('../../fixtures/claims/valid/', import.meta.url));
const lengthsOf = (sides: readonly string[]) => sides.map((s) => [...s].length);

function sweep(claim: Claim, exact = false, tuning = {}): InstanceResult[] {
  const plan = planClaim(compileClaimProgram(claim));
  const ev = createEvaluator(compileClaimProgram(claim), { exact }, tuning);
  const out: InstanceResult[] = [];
  for (const cls of plan.classes()) for (let i = 0n; i < plan.instanceCount(cls); i++) out.push(ev.evaluate(plan.instanceAt(cls, i)));
  return out;
}

const base = (over: object) =>
  parseClaim({
    id: 'ev-test',
    statement: 's',
    theory: 'cohomology',
    family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }] },
    transform: [],
    compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    ...over,
  });

describe('createEvaluator', () => {
  it('confirms a theorem: mirror and complement keep cohomology values (Fulton, Young Tableaux, 1997), each pair once', () => {
    const claim = loadClaim(join(fixtures, 'mirror-complement-cohomology.json'));
    const results = sweep(claim);
    expect(results.filter((r) => r.status === 'fails')).toEqual([]);
    const plan = planClaim(compileClaimProgram(claim));
    // Each unordered pair {b, T(b)} is evaluated exactly once: the paired member names its lower partner.
    for (const r of results.filter((x) => x.status === 'paired')) {
      const cls = plan.classForKey(r.classKey);
      const b = plan.instanceAt(cls, r.index);
      const t = applyTransform(claim.transform, lengthsOf(b.sides), b.sides, theoryPieceSet('cohomology'));
      expect(r.partnerIndex).toBe(plan.indexOf(cls, t.sides));
      expect(r.partnerIndex! < r.index).toBe(true);
      const partner = results.find((x) => x.classKey === r.classKey && x.index === r.partnerIndex)!;
      expect(partner.status).toBe('holds');
    }
    const evaluated = results.filter((r) => r.status === 'holds').length;
    const paired = results.filter((r) => r.status === 'paired').length;
    // 8 + 64 + 512 boundaries (2^(3n)); pairs plus fixed points cover them all.
    expect(evaluated + paired).toBe(584);
    expect(paired).toBeGreaterThan(250);
    expect(sweep(claim, false, { pairing: false }).every((r) => r.status === 'holds')).toBe(true);
  });

  it('finds the counterexamples of a false claim, checked by independent single counts', () => {
    // False: reversing side 1 of a triangle keeps the cohomology value (it changes the Schubert class).
    const claim = base({ transform: [{ type: 'reverse', sides: [1] }] });
    const results = sweep(claim, false, { cacheSize: 1 });
    const fails = results.filter((r) => r.status === 'fails');
    expect(fails.length).toBeGreaterThan(0);
    const pieces = theoryPieceSet('cohomology');
    for (const r of fails.slice(0, 20)) {
      const rev = [[...r.left.sides[0]!].reverse().join(''), ...r.left.sides.slice(1)];
      expect(r.right.sides).toEqual(rev);
      const l = countBoundary(makeRegion(lengthsOf(r.left.sides)), r.left.sides, pieces, { semiring: integerSemiring });
      const rt = countBoundary(makeRegion(lengthsOf(rev)), rev, pieces, { semiring: integerSemiring });
      expect(String(l)).toBe(r.left.text);
      expect(String(rt)).toBe(r.right.text);
      expect(l).not.toEqual(rt);
    }
    // Every instance where the single counts differ is reported, and none other.
    for (const r of results) {
      const rev = [[...r.left.sides[0]!].reverse().join(''), ...r.left.sides.slice(1)];
      const differ = countBoundary(makeRegion(lengthsOf(rev)), r.left.sides, pieces, { semiring: integerSemiring }) !== countBoundary(makeRegion(lengthsOf(rev)), rev, pieces, { semiring: integerSemiring });
      // A differing pair is reported once, on its lower index; the other member is 'paired'.
      expect(r.status === 'fails' || (r.status === 'paired' && differ)).toBe(differ);
    }
  });

  it('compares against another theory and with ≥ on puzzle counts', () => {
    expect(sweep(loadClaim(join(fixtures, 'rotate-k-theory-dual.json'))).every((r) => r.status === 'holds')).toBe(true);
    // Cohomology pieces are K-theory pieces, so K-theory has at least as many puzzles (common practice, no source).
    const ge = base({ theory: 'k-theory', compare: { measure: { type: 'puzzles' }, relation: { type: 'greaterOrEqual' }, rightTheory: 'cohomology' } });
    expect(sweep(ge).every((r) => r.status === 'holds')).toBe(true);
    // In Gr(2,4), G_1·G_1 = G_2 + G_11 − G_21 (Buch, Acta Math. 189, 2002): one K-theory puzzle more than in cohomology.
    const le = base({
      theory: 'k-theory',
      family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 4, max: 4 }], conditions: [1, 3, 5].map((side) => ({ type: 'labelCount', side, count: 2 })) },
      compare: { measure: { type: 'puzzles' }, relation: { type: 'lessOrEqual' }, rightTheory: 'cohomology' },
    });
    const fails = sweep(le).filter((r) => r.status === 'fails');
    expect(fails.length).toBeGreaterThan(0);
    for (const r of fails) expect(Number(r.left.text)).toBeGreaterThan(Number(r.right.text));
  });

  it('tests equivariant values modularly with a stated error bound, agreeing with exact polynomials', () => {
    const claim = base({ theory: 'equivariant', transform: [{ type: 'rotate', degrees: 120 }], family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 2 }] } });
    const modular = sweep(claim);
    const exact = sweep(claim, true);
    expect(modular.map((r) => r.status)).toEqual(exact.map((r) => r.status));
    for (const r of modular.filter((x) => x.status === 'holds')) {
      expect(r.method).toBe('modular');
      expect(r.errorBound).toBeGreaterThanOrEqual(0);
      expect(r.errorBound!).toBeLessThan(1e-6);
    }
    expect(exact.every((r) => r.method === 'exact')).toBe(true);
    const ev = createEvaluator(compileClaimProgram(claim), { exact: false });
    const plan = planClaim(compileClaimProgram(claim));
    const cls = plan.classes()[1]!;
    for (let i = 0n; i < 8n; i++) {
      const inst = plan.instanceAt(cls, i);
      const c = ev.confirm(inst);
      expect(c.method).toBe('exact');
      expect(c.status).toBe(exact.find((r) => r.classKey === cls.key && r.index === i)!.status);
    }
  });

  it('applies a substitution to the right value, checked against substitutePoly on single exact counts', () => {
    const claim = base({
      theory: 'equivariant',
      family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 2, max: 2 }] },
      compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 1, to: 'n' }] } },
    });
    const pieces = theoryPieceSet('equivariant');
    for (const r of sweep(claim, true)) {
      const ring = polynomialSemiring(2);
      const v = countBoundary(makeRegion(lengthsOf(r.left.sides)), r.left.sides, pieces, { semiring: ring });
      const swapped = substitutePoly(v, (k) => 1 - k); // y1 ↔ y2 (hand-written σ for n = 2)
      expect(r.status === 'holds').toBe(polyEquals(v, swapped));
    }
  });

  it('finds a permutation that works and lists every one that does', () => {
    const claim = base({
      theory: 'equivariant',
      family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 2, max: 2 }] },
      compare: { measure: { type: 'value' }, relation: { type: 'equalUpToPermutation', searchSpace: 'allPermutations' } },
    });
    const results = sweep(claim);
    for (const r of results) {
      expect(r.status).toBe('holds');
      expect(r.permutations).toContainEqual([1, 2]);
    }
    // A nonzero value y2 − y1 is not symmetric, so exactly the identity serves (checked by hand).
    expect(results.some((r) => /^(y2 - y1|-y1 \+ y2)$/.test(r.left.text) && r.permutations!.length === 1)).toBe(true);
  });

  it('skips zero values with nonzeroOnly and counts statistics', () => {
    const claim = base({ family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 2 }], nonzeroOnly: true }, transform: [{ type: 'reverse', sides: [1] }] });
    const plain = sweep(claim, false, { pairing: false });
    const pieces = theoryPieceSet('cohomology');
    for (const r of plain) {
      const zero = Number(countBoundary(makeRegion(lengthsOf(r.left.sides)), r.left.sides, pieces, { semiring: fillingCountSemiring })) === 0;
      expect(r.status === 'skipped_zero').toBe(zero);
    }
    // With pairing, a zero left value still stands for its nonzero partner: no failure is lost. A failing
    // boundary is decided by its own result or, when paired, by its representative's `partnerStatus`.
    const paired = sweep(claim);
    const plan = planClaim(compileClaimProgram(claim));
    for (const r of plain.filter((x) => x.status === 'fails')) {
      const p = paired.find((x) => x.classKey === r.classKey && x.index === r.index)!;
      const rep = p.status === 'paired' ? paired.find((x) => x.classKey === r.classKey && x.index === p.partnerIndex)! : p;
      expect(p.status === 'paired' ? rep.partnerStatus : p.status).toBe('fails');
      if (p.status === 'paired') expect(rep.partnerIndex).toBe(r.index);
      // the exact confirmation of that failure agrees with it (a sweep stores only confirmed failures)
      const cls = plan.classes().find((c) => c.key === r.classKey)!;
      expect(createEvaluator(compileClaimProgram(claim), { exact: false }).confirm(plan.instanceAt(cls, r.index)).status).toBe('fails');
    }
    // A zero left value is never a counterexample itself under nonzeroOnly (README, "Writing a claim").
    expect(paired.every((x) => x.status !== 'fails' || x.left.text !== '0')).toBe(true);
    const stat = sweep(loadClaim(join(fixtures, 'custom-statistic.json')));
    expect(stat.some((r) => r.status === 'holds' && r.left.text.includes('t'))).toBe(true);
    expect(stat.every((r) => r.status !== 'fails')).toBe(true);
  });
});
