import { describe, expect, it } from 'vitest';
import { createEvaluator, parseClaim, planClaim } from '../../../src/claims/index.js';
import { parseDiscoverInput, theoryInput } from '../../../src/discover/discover-input.js';
import { runDiscover } from '../../../src/discover/run-discover.js';
import { hexagonFamily } from '../../helpers/hexagon-family.js';

const family = hexagonFamily(2);

describe('discover on (a,0,b,a,0,b) with Laurent values (equivariant K-theory rhombus file)', () => {
  const result = runDiscover(parseDiscoverInput({ id: 'eqk', family }, [theoryInput('conjectures/pieces/equivariant-k-theory-rhombi.json')]), { max: {}, db: ':memory:' });

  it('keeps a survivor only if the claim runner, comparing exact quotients instance by instance, finds a permutation of t for every boundary', () => {
    expect(result.survivors.length).toBeGreaterThan(0);
    for (const s of result.survivors) {
      expect(s.claim.statement).toMatch(/permutation of t_1\.\.t_N/);
      const claim = parseClaim(s.claim);
      const plan = planClaim(claim);
      const evaluator = createEvaluator(claim, { exact: true });
      for (const cls of plan.classes()) for (let i = 0n; i < plan.instanceCount(cls); i++) expect(evaluator.evaluate(plan.instanceAt(cls, i)).status).not.toBe('fails');
    }
  });

  it('the exchange of sides 1 and 4 survives only up to a permutation: as a plain equality it fails (sweeps of conjectures/equivariant-k-parallelogram-exchange*.json)', () => {
    const exchange = result.survivors.find((s) => s.evidence.testedAs === 'eqk-equivariant-k-theory-rhombi-exchange-1-4');
    expect(exchange).toBeDefined();
    const plain = parseClaim({ ...exchange!.claim, compare: { ...exchange!.claim.compare, relation: { type: 'equal' } } });
    const plan = planClaim(plain);
    const evaluator = createEvaluator(plain, { exact: true });
    let fails = 0;
    for (const cls of plan.classes()) for (let i = 0n; i < plan.instanceCount(cls); i++) if (evaluator.evaluate(plan.instanceAt(cls, i)).status === 'fails') fails++;
    expect(fails).toBeGreaterThan(0);
  });
});
