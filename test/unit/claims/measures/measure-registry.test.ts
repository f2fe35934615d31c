import { describe, expect, it } from 'vitest';
import { theoryPieceSet } from '../../../../src/engine/index.js';
import { measureDef, MEASURES, measureSchema } from '../../../../src/claims/measures/measure-registry.js';

describe('measure registry', () => {
  it('lists every measure type in the schema error', () => {
    const r = measureSchema.safeParse({ type: 'area' });
    for (const d of MEASURES) expect(r.error!.issues[0]!.message).toContain(`'${d.type}'`);
  });

  it('knows which measures are integers: values of integer-weight theories and puzzle counts (README, theories table)', () => {
    expect(measureDef({ type: 'value' }).integer({ type: 'value' }, theoryPieceSet('k-theory'))).toBe(true);
    expect(measureDef({ type: 'value' }).integer({ type: 'value' }, theoryPieceSet('equivariant'))).toBe(false);
    expect(measureDef({ type: 'puzzles' }).integer({ type: 'puzzles' }, theoryPieceSet('equivariant'))).toBe(true);
    expect(measureDef({ type: 'statistic', kind: 'k' }).counting({ type: 'statistic', kind: 'k' })).toEqual({ statistic: 'k' });
  });
});
