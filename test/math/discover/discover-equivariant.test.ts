import { describe, expect, it } from 'vitest';
import { createEvaluator, parseClaim, planClaim } from '../../../src/claims/index.js';
import { parseDiscoverInput } from '../../../src/discover/discover-input.js';
import { runDiscover } from '../../../src/discover/run-discover.js';
import { hexagonFamily } from '../../helpers/hexagon-family.js';

// The second check: (a,0,b,a,0,b) in equivariant cohomology, opposite sides of equal content.
const family = hexagonFamily(3);

describe('discover on (a,0,b,a,0,b) in equivariant cohomology', () => {
  const result = runDiscover(parseDiscoverInput({ id: 'eq', family }, ['equivariant']), { max: {}, db: ':memory:' });
  const exchange = result.survivors.find((s) => s.evidence.testedAs === 'eq-equivariant-exchange-1-4');

  it('finds the exchange of sides 1 and 4 up to the reversal of y_(b+1)..y_(a+b), written as equalAfterSubstitution', () => {
    // Expected rule stated by issue 12's checks (value from memory there).
    expect(exchange?.evidence.permutationRule?.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] });
    expect(exchange?.claim.transform).toEqual([{ type: 'exchange', sides: [1, 4] }]);
    expect(exchange?.claim.compare.relation).toEqual({ type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'b+1', to: 'a+b' }] });
  });

  it('the written claim sweeps clean with exact polynomials, and its statement as a plain equality fails', () => {
    const claim = parseClaim(exchange!.claim);
    const sweep = (c: typeof claim) => {
      const plan = planClaim(c);
      const evaluator = createEvaluator(c, { exact: true });
      let fails = 0;
      let checked = 0;
      for (const cls of plan.classes()) {
        for (let i = 0n; i < plan.instanceCount(cls); i++) {
          const r = evaluator.evaluate(plan.instanceAt(cls, i));
          if (r.status === 'fails') fails++;
          if (r.status !== 'paired') checked++;
        }
      }
      return { fails, checked };
    };
    const clean = sweep(claim);
    expect(clean.fails).toBe(0);
    expect(clean.checked).toBeGreaterThan(0);
    // Without the substitution the claim is false somewhere, so the substitution is doing work.
    expect(sweep(parseClaim({ ...exchange!.claim, compare: { measure: { type: 'value' }, relation: { type: 'equal' } } })).fails).toBeGreaterThan(0);
  });
});
