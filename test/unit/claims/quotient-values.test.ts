import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compileClaimProgram, createEvaluator, parseClaim, planClaim, type InstanceResult } from '../../../src/claims/index.js';
import { isZeroDenominator, Meter, MODULAR_SEED } from '../../../src/claims/measure.js';
import { DEFAULT_PRIMES, modularSemiring } from '../../../src/engine/index.js';

const rhombi = JSON.parse(readFileSync(new URL('../../../conjectures/pieces/equivariant-k-theory-rhombi.json', import.meta.url), 'utf8')) as object;

const claimOf = (over: object) =>
  parseClaim({
    id: 'quotient-test',
    statement: 's',
    theory: rhombi,
    family: { sides: ['a', 0, 'b', 'a', 0, 'b'], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
    transform: [{ type: 'exchange', sides: [1, 4] }],
    compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    ...over,
  });

function sweep(claim: ReturnType<typeof parseClaim>, exact: boolean): InstanceResult[] {
  const program = compileClaimProgram(claim);
  const plan = planClaim(program);
  const ev = createEvaluator(program, { exact }, { pairing: false });
  const out: InstanceResult[] = [];
  for (const cls of plan.classes()) for (let i = 0n; i < plan.instanceCount(cls); i++) out.push(ev.evaluate(plan.instanceAt(cls, i)));
  return out;
}

describe('claims over Laurent-polynomial values', () => {
  // Two independent computations of one comparison: exact quotients (σ renames t_m, negative exponents
  // included) against residues at a random point (σ moves the point). They must decide alike.
  it.each([
    ['equal', { type: 'equal' }],
    ['t reversed', { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 1, to: 'a+b' }] }],
    ['t shifted', { type: 'equalAfterSubstitution', substitution: [{ type: 'shiftBlock', from: 1, to: 'a+b', by: 1 }] }],
  ])('modular and exact sweeps agree instance by instance (%s)', (_name, relation) => {
    const claim = claimOf({ compare: { measure: { type: 'value' }, relation } });
    const exact = sweep(claim, true);
    const modular = sweep(claim, false);
    expect(modular.map((r) => r.status)).toEqual(exact.map((r) => r.status));
    expect(exact.every((r) => r.method === 'exact')).toBe(true);
    const viaModular = modular.filter((r) => r.method === 'modular');
    expect(viaModular.length).toBeGreaterThan(0);
    for (const r of viaModular) expect(r.errorBound).toBeLessThan(1e-6);
    // Some values are nonzero and some comparisons fail, so the agreement is not vacuous.
    expect(exact.some((r) => r.status === 'fails')).toBe(true);
    expect(exact.some((r) => r.status === 'holds' && !r.vacuous)).toBe(true);
  });

  it('prints a counterexample as Laurent terms with negative exponents of t', () => {
    const results = sweep(claimOf({}), true);
    const bad = results.find((r) => r.status === 'fails')!;
    const json = bad.left.json as { text: string; terms: { coefficient: string; exponents: number[] }[] };
    expect(json.text).toMatch(/t\d+\^-1/);
    expect(json.terms.some((t) => t.exponents.some((e) => e < 0))).toBe(true);
  });
});

describe('claims over rational-function values', () => {
  // A weight whose denominator t_i − r vanishes at the seed's point modulo the first prime on strip 1.
  const r = modularSemiring(MODULAR_SEED, DEFAULT_PRIMES).strip!('t', 1)[0]!;
  const pieces = {
    name: 'vanishing',
    boundaryLabels: ['0', '1'],
    pieces: [
      { edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] },
      { edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] },
      { edges: { horizontal: '1', rising: '0', falling: '10' }, orientations: ['up', 'down'], rotations: true, weight: { formula: `t_j/(t_i - ${r})` } },
    ],
  };
  const claim = parseClaim({
    id: 'vanishing-denominator',
    statement: 's',
    theory: pieces,
    family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 2 }] },
    transform: [{ type: 'rotate', degrees: 120 }],
    compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
  });

  it('detects a vanishing denominator at the random point, redraws the point, and still decides as the exact sweep does', () => {
    const meter = new Meter(compileClaimProgram(claim).left, { type: 'value' }, []);
    const sides = ['01', '', '01', '', '10', ''];
    let thrown: unknown;
    try {
      meter.value([2, 0, 2, 0, 2, 0], sides, 'modular');
    } catch (e) {
      thrown = e;
    }
    expect(isZeroDenominator(thrown)).toBe(true);
    expect(meter.value([2, 0, 2, 0, 2, 0], sides, 'modular', undefined, true, 1).kind).toBe('mod');
    const exact = sweep(claim, true);
    const modular = sweep(claim, false);
    expect(modular.map((x) => x.status)).toEqual(exact.map((x) => x.status));
    expect(exact.some((x) => x.status === 'fails')).toBe(true);
  });

  it('a "holds" between general quotients is never left to residues: no coefficient bound, so it is decided exactly', () => {
    const modular = sweep(claim, false);
    for (const x of modular) if (x.status === 'holds') expect(x.method).toBe('exact');
  });
});

describe('named parameters of weight formulas in quotient values', () => {
  it('keep their names in exact values (h in −1/(1 + h(y_j − y_i)), quotient demo set)', () => {
    const pieces = JSON.parse(readFileSync(new URL('../../../conjectures/pieces/quotient-weights-demo.json', import.meta.url), 'utf8')) as object;
    const claim = parseClaim({
      id: 'named-parameter',
      statement: 's',
      theory: pieces,
      family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 2, max: 2 }] },
      transform: [{ type: 'rotate', degrees: 120 }],
      compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 1, to: 'n' }] } },
    });
    expect(compileClaimProgram(claim).names).toEqual(['h']);
    const bad = sweep(claim, true).find((r) => r.status === 'fails')!;
    expect(bad.left.text).toMatch(/\bh\b/);
    expect(bad.left.text).not.toMatch(/v\d/);
    expect((bad.left.json as { variables: string[] }).variables).toEqual(['y1', 'y2', 'h']);
  });
});
