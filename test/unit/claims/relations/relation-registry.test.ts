import { describe, expect, it } from 'vitest';
import { compileClaimProgram } from '../../../../src/claims/index.js';
import { relationDef, RELATIONS, relationSchema } from '../../../../src/claims/relations/relation-registry.js';

const int = (v: number) => ({ kind: 'int' as const, v });

const claim = (relation: object, measure: object = { type: 'value' }, theory = 'cohomology') => ({
  id: 'x',
  statement: 's',
  theory,
  family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 2 }] },
  transform: [{ type: 'mirror' }, { type: 'complement' }],
  compare: { measure, relation },
});

describe('relation registry', () => {
  it('lists every registered relation in the schema error', () => {
    const r = relationSchema.safeParse({ type: 'approximately' });
    for (const d of RELATIONS) expect(r.error!.issues[0]!.message).toContain(`'${d.type}'`);
  });

  it('decides integer relations as their symbols say (common practice, no source)', () => {
    expect(relationDef({ type: 'lessOrEqual' }).holds(int(2), int(3))).toBe(true);
    expect(relationDef({ type: 'lessOrEqual' }).holds(int(4), int(3))).toBe(false);
    expect(relationDef({ type: 'greaterOrEqual' }).holds(int(4), int(3))).toBe(true);
    expect(relationDef({ type: 'equal' }).holds(int(4), int(4))).toBe(true);
    expect(relationDef({ type: 'equal' }).symmetric).toBe(true);
    expect(relationDef({ type: 'lessOrEqual' }).symmetric).toBe(false);
  });

  it('names the variables a substitution mentions, and writes σ for one class', () => {
    const r = { type: 'equalAfterSubstitution' as const, substitution: [{ type: 'reverseBlock' as const, from: 1, to: 'a+1' }, { type: 'shiftBlock' as const, from: 'b', to: 5, by: 1 }] };
    expect(relationDef(r).variables(r).sort()).toEqual(['a', 'b']);
    // rev[1..2] then shift[1..5] by 1 at a=1, b=1, on y1..y5: y1 ↦ y2 ↦ y3, y2 ↦ y1 ↦ y2 (hand computed).
    expect(relationDef(r).substitution!(r, { a: 1, b: 1 }, 5)).toEqual([3, 2, 4, 5, 1]);
    expect(relationDef(r).text(r)).toBe('L = σ(R), σ = rev[1..a+1] then shift[b..5] by 1');
  });

  it('checks the measure a relation needs at compile time', () => {
    expect(() => compileClaimProgram(claim({ type: 'lessOrEqual' }, { type: 'value' }, 'equivariant'))).toThrow(/expected an integer measure/);
    expect(() => compileClaimProgram(claim({ type: 'equalUpToPermutation', searchSpace: 'blockReversals' }))).toThrow(/expected a polynomial measure/);
    expect(compileClaimProgram(claim({ type: 'lessOrEqual' }, { type: 'puzzles' })).relation.type).toBe('lessOrEqual');
  });
});
