import { describe, expect, it } from 'vitest';
import { referenceTable } from '../../../src/reference/crosscheck-tables.js';

describe('referenceTable', () => {
  it('cohomology of Gr(2,4): σ_1² = σ_2 + σ_11 as single constant terms (Fulton, Young Tableaux, 1997)', () => {
    const t = referenceTable('cohomology', 2, 4);
    expect(t.get('0101,0101,1001')).toEqual({ terms: [{ coefficient: 1n, exponents: [0, 0, 0, 0] }] });
    expect(t.get('0101,0101,0110')).toEqual({ terms: [{ coefficient: 1n, exponents: [0, 0, 0, 0] }] });
    expect(t.has('0101,0101,1010')).toBe(false); // zero values are omitted
  });

  it('equivariant Gr(1,2): c_{10,10}^{10} = y_2 − y_1 in canonical term order (task convention)', () => {
    expect(referenceTable('equivariant', 1, 2).get('10,10,10')).toEqual({
      terms: [
        { coefficient: 1n, exponents: [0, 1] },
        { coefficient: -1n, exponents: [1, 0] },
      ],
    });
  });

  it('K-theory and dual K-theory of Gr(1,2) = P¹ (computed by hand: O_pt² = 0, I_∅ = 1 − O_pt)', () => {
    const k = referenceTable('k-theory', 1, 2);
    expect([...k.keys()].sort()).toEqual(['01,01,01', '01,10,10', '10,01,10']);
    const d = referenceTable('dual-k-theory', 1, 2);
    // I_∅² = 1 − 2 O_pt = I_∅ − I_pt
    expect(d.get('01,01,10')).toEqual({ terms: [{ coefficient: -1n, exponents: [0, 0] }] });
  });

  it('rejects an unknown theory with a coded error', () => {
    expect(() => referenceTable('quantum' as never, 1, 2)).toThrowError(/Theory: expected one of cohomology, equivariant, k-theory, dual-k-theory, ssm-nonequivariant, received quantum/);
  });
});
