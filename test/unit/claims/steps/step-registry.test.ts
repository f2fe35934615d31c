import { describe, expect, it } from 'vitest';
import { constantAffine, evalAffine, parseAffine, type Affine } from '../../../../src/claims/affine.js';
import { applySideMap, composeSideMaps, isIdentityMap } from '../../../../src/claims/side-map.js';
import { stepDef, TRANSFORM_STEPS, transformStepSchema, type TransformStep } from '../../../../src/claims/steps/step-registry.js';
import { compileClaimProgram } from '../../../../src/claims/index.js';

// One example of every registered step (the test fails when a new step has no example here).
const EXAMPLES: Record<string, TransformStep[]> = {
  rotate: [{ type: 'rotate', degrees: 60 }, { type: 'rotate', degrees: 180 }, { type: 'rotate', degrees: -120 }],
  mirror: [{ type: 'mirror' }],
  complement: [{ type: 'complement', sides: 'all' }, { type: 'complement', sides: [2, 5] }],
  exchange: [{ type: 'exchange', sides: [1, 4] }],
  reverse: [{ type: 'reverse', sides: [1, 3] }],
  completeToTriangle: [{ type: 'completeToTriangle' }],
};

const symbolic = ['a', 'b', 'c', 'd', 'e', 'f'].map((v) => parseAffine(v) as Affine);

describe('transform step registry', () => {
  it('builds the schema union and its "expected one of" message from the registry', () => {
    const r = transformStepSchema.safeParse({ type: 'twist' });
    expect(r.success).toBe(false);
    const message = r.error!.issues[0]!.message;
    for (const d of TRANSFORM_STEPS) expect(message).toContain(`'${d.type}'`);
    expect(Object.keys(EXAMPLES).sort()).toEqual(TRANSFORM_STEPS.map((d) => d.type).sort());
  });

  it('gives every step an action: a side map that moves lengths as `lengths` says, or its own `apply`', () => {
    for (const steps of Object.values(EXAMPLES)) {
      for (const step of steps) {
        const def = stepDef(step);
        const m = def.sideMap(step);
        if (!m) {
          expect(def.apply).toBeTypeOf('function');
          continue;
        }
        // Side i of T(b) has the length of the side it comes from (common practice, no source).
        const values = { a: 1, b: 2, c: 3, d: 4, e: 5, f: 6 };
        const moved = def.lengths(step, symbolic).map((l) => evalAffine(l, values));
        expect(moved).toEqual(m.map((s) => s.from + 1));
      }
    }
  });

  it('says a step is involutive exactly when applying it twice is the identity', () => {
    for (const steps of Object.values(EXAMPLES)) {
      for (const step of steps) {
        const m = stepDef(step).sideMap(step);
        if (!m) expect(stepDef(step).involutive(step)).toBe(false);
        else expect(stepDef(step).involutive(step)).toBe(isIdentityMap(composeSideMaps(m, m)));
      }
    }
    // A 120° rotation moves side 1 to side 3 (DEVELOPERS.md, lattice conventions): not an involution.
    expect(stepDef(EXAMPLES.rotate![2]!).involutive(EXAMPLES.rotate![2]!)).toBe(false);
  });

  it('exchange then reverse of sides 1 and 4 acts on strings as written (hand computed)', () => {
    const steps: TransformStep[] = [{ type: 'exchange', sides: [1, 4] }, { type: 'reverse', sides: [1, 4] }];
    const m = steps.map((s) => stepDef(s).sideMap(s)!).reduce((a, b) => composeSideMaps(a, b));
    expect(applySideMap(m, [2, 1, 0, 2, 1, 0], ['01', '1', '', '11', '0', '']).sides).toEqual(['11', '1', '', '10', '0', '']);
    expect(stepDef(steps[0]!).text(steps[0]!)).toBe('exchange sides 1 ↔ 4');
  });

  it('reports a failing static check at the step\'s JSON path', () => {
    const claim = {
      id: 'x',
      statement: 's',
      theory: 'cohomology',
      family: { sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }] },
      transform: [{ type: 'mirror' }, { type: 'exchange', sides: [1, 2] }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    };
    expect(() => compileClaimProgram(claim)).toThrow(/Exchanged sides: expected equal lengths/);
    try {
      compileClaimProgram(claim);
    } catch (e) {
      expect((e as { path: string }).path).toBe('transform[1].sides');
    }
    expect(constantAffine(0).constant).toBe(0);
  });
});
