import { describe, expect, it } from 'vitest';
import { canonicalClaimJson, claimFingerprint, ENGINE_VERSION, parseClaim } from '../../../src/claims/index.js';

const data = {
  id: 'fp-test',
  statement: 'Fingerprint test.',
  theory: 'cohomology',
  family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }] },
  transform: [{ type: 'mirror' }, { type: 'complement' }],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
};

describe('claimFingerprint', () => {
  it('is a sha256 hex digest that ignores key order and $schema', () => {
    const a = parseClaim(data);
    const reordered = parseClaim({ compare: { relation: { type: 'equal' }, measure: { type: 'value' } }, transform: data.transform, family: data.family, theory: 'cohomology', statement: data.statement, id: data.id, $schema: 'x.json' });
    expect(claimFingerprint(a, ENGINE_VERSION)).toMatch(/^[0-9a-f]{64}$/);
    expect(claimFingerprint(reordered)).toBe(claimFingerprint(a));
    expect(canonicalClaimJson(reordered)).toBe(canonicalClaimJson(a));
    expect(JSON.parse(canonicalClaimJson(a))).toEqual({ ...a });
  });

  it('changes with the mathematics and with the engine version', () => {
    const a = parseClaim(data);
    const lower = parseClaim({ ...data, family: { ...data.family, variables: [{ name: 'n', min: 2, max: 3 }] } });
    const other = parseClaim({ ...data, transform: [{ type: 'mirror' }] });
    expect(claimFingerprint(lower)).not.toBe(claimFingerprint(a));
    expect(claimFingerprint(other)).not.toBe(claimFingerprint(a));
    expect(claimFingerprint(a, '2')).not.toBe(claimFingerprint(a, '1'));
  });

  it('ignores the statement and the variables\' upper bounds (a raised bound only adds classes; issue 7)', () => {
    const a = parseClaim(data);
    const reworded = parseClaim({ ...data, statement: 'Mirror and complement: said differently.' });
    const raised = parseClaim({ ...data, family: { ...data.family, variables: [{ name: 'n', min: 1, max: 6 }] } });
    expect(claimFingerprint(reworded)).toBe(claimFingerprint(a));
    expect(claimFingerprint(raised)).toBe(claimFingerprint(a));
    // The canonical JSON still keeps both: it is the claim the store can show and recompile.
    expect(canonicalClaimJson(reworded)).not.toBe(canonicalClaimJson(a));
  });

  it('is the same after a round trip through canonical JSON (what the store keeps)', () => {
    const a = parseClaim(data);
    expect(claimFingerprint(parseClaim(JSON.parse(canonicalClaimJson(a))))).toBe(claimFingerprint(a));
  });
});
