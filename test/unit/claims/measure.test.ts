import { describe, expect, it } from 'vitest';
import { buildPieceSet, parseWeightFormula, theoryPieceSet, type PieceSpec } from '../../../src/engine/index.js';
import { Meter } from '../../../src/claims/measure.js';

// The built-in equivariant set with its rhombus weighed by the formula y_j − y_i instead of `position`:
// the same polynomial weight, so every measured value must agree (common practice, no source).
function formulaEquivariant() {
  const builtin = theoryPieceSet('equivariant');
  const pieces: PieceSpec[] = [
    { name: '0-triangle', edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] },
    { name: '1-triangle', edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] },
    { name: '10-triangle', edges: { horizontal: '1', rising: '0', falling: '10' }, orientations: ['up', 'down'], rotations: true },
    { name: 'upper', kind: 'upper', edges: { horizontal: 'eq', rising: '0', falling: '1' }, orientations: ['up'] },
    {
      name: 'rhombus',
      edges: { horizontal: 'eq', rising: '0', falling: '1' },
      orientations: ['down'],
      weight: { type: 'formula', text: 'y_j - y_i', formula: parseWeightFormula('y_j - y_i') },
    },
  ];
  return { builtin, custom: buildPieceSet({ name: 'formula-equivariant', boundaryLabels: ['0', '1'], pieces }) };
}

describe('Meter', () => {
  it('measures a piece set with a strip formula weight modularly, as the same weight by position', () => {
    const { builtin, custom } = formulaEquivariant();
    const a = new Meter(builtin, { type: 'value' }, []);
    const b = new Meter(custom, { type: 'value' }, []);
    // Upright triangles of side 3 in the (λ, μ, ν) convention: clockwise sides λ, '', μ, '', reverse(ν), ''.
    for (const [l, m, n] of [['010', '010', '010'], ['010', '100', '100'], ['001', '010', '010'], ['011', '101', '110']] as const) {
      const sides = [l, '', m, '', [...n].reverse().join(''), ''];
      const lengths = [3, 0, 3, 0, 3, 0];
      const x = a.value(lengths, sides, 'modular');
      const y = b.value(lengths, sides, 'modular');
      expect(y).toEqual(x);
      expect(b.value(lengths, sides, 'exact')).toEqual(a.value(lengths, sides, 'exact'));
    }
  });

  it('bounds the degree of a modular value by the weight degree times the triangle count', () => {
    const spec: PieceSpec[] = [
      { name: '0-triangle', edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] },
      { name: '1-triangle', edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] },
      { name: '10-triangle', edges: { horizontal: '1', rising: '0', falling: '10' }, orientations: ['up', 'down'], rotations: true, weight: { type: 'formula', text: 'y_i^2 * y_j', formula: parseWeightFormula('y_i^2 * y_j') } },
    ];
    const meter = new Meter(buildPieceSet({ name: 'cubic', boundaryLabels: ['0', '1'], pieces: spec }), { type: 'value' }, []);
    const v = meter.value([2, 0, 2, 0, 2, 0], ['01', '', '01', '', '01', ''], 'modular');
    // Side 2 has 4 unit triangles; each weight has total degree 3 (common practice, no source).
    expect(v.kind === 'mod' && v.degree).toBe(12);
  });
});
