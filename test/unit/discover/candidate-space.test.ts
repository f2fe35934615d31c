import { describe, expect, it } from 'vitest';
import { parseClaim, planClaim } from '../../../src/claims/index.js';
import { candidateSpace, type SearchTheory } from '../../../src/discover/candidate-space.js';
import { spaceSchema } from '../../../src/discover/discover-input.js';
import { theoryPieceSet } from '../../../src/engine/index.js';
import { applyBruteSteps, type BruteStep } from '../../helpers/claim-steps.js';

const family = {
  sides: ['a', 'b', 0, 'a', 'b', 0],
  variables: [
    { name: 'a', min: 1, max: 2 },
    { name: 'b', min: 1, max: 2 },
  ],
  conditions: [
    { type: 'sameContent', sides: [1, 4] },
    { type: 'sameContent', sides: [2, 5] },
  ],
};

const strings = (n: number) => Array.from({ length: 2 ** n }, (_, k) => k.toString(2).padStart(n, '0'));
// Every boundary of the family, by brute force.
const boundaries = [1, 2].flatMap((a) => [1, 2].flatMap((b) => strings(a).flatMap((s1) => strings(b).flatMap((s2) => strings(a).flatMap((s4) => strings(b).map((s5) => [s1, s2, '', s4, s5, '']))))));
const action = (steps: readonly BruteStep[]) => boundaries.map((b) => applyBruteSteps(steps, b).join('|')).join(' ');

describe('candidateSpace on (a,b,0,a,b,0) parallelograms', () => {
  const claim = parseClaim({ id: 'c', statement: 's', theory: 'cohomology', family, transform: [], compare: { measure: { type: 'value' }, relation: { type: 'equal' } } });
  const plan = planClaim(claim);
  const cohomology: SearchTheory = { input: 'cohomology', name: 'cohomology', pieces: theoryPieceSet('cohomology') };
  const candidates = candidateSpace(plan.compiled, plan.classes(), [cohomology], spaceSchema.parse({}));

  it('no two candidates act alike on the boundaries, and none acts as the identity (brute-force actions)', () => {
    const actions = candidates.map((c) => action(c.steps));
    expect(new Set(actions).size).toBe(actions.length);
    expect(actions).not.toContain(action([]));
  });

  it('every composition of a symmetry (identity, half turn, the two mirrors exchanging a and b), a complement (none, all) and an exchange is some candidate', () => {
    const symmetries: BruteStep[][] = [[], [{ type: 'rotate', degrees: 180 }], [{ type: 'mirror' }, { type: 'rotate', degrees: 120 }], [{ type: 'mirror' }, { type: 'rotate', degrees: 300 }]];
    const complements: BruteStep[][] = [[], [{ type: 'complement', sides: 'all' }]];
    const exchanges: BruteStep[][] = [[], ...[[1, 4], [2, 5]].flatMap((p) => [[{ type: 'exchange', sides: p }], [{ type: 'exchange', sides: p }, { type: 'reverse', sides: p }]])];
    const known = new Set(candidates.map((c) => action(c.steps)));
    const identity = action([]);
    for (const s of symmetries) for (const c of complements) for (const e of exchanges) {
      const a = action([...s, ...c, ...e]);
      if (a !== identity) expect(known.has(a), JSON.stringify([...s, ...c, ...e])).toBe(true);
    }
  });

  it('keeps the simplest description: the plain exchange of sides 2 and 5, not the half turn followed by the exchange of 1 and 4', () => {
    expect(candidates.map((c) => c.name)).toContain('exchange-2-5');
    expect(candidates.map((c) => c.name)).not.toContain('rotate180-exchange-1-4');
  });
});
