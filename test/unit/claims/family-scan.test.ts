import { describe, expect, it } from 'vitest';
import type { ScanTally } from '../../../src/claims/claim-api.js';
import { compileClaimProgram, createEvaluator, planClaim } from '../../../src/claims/index.js';
import { tableShape } from '../../../src/claims/shared-tables.js';
import { exchangeReverseClaim, exchangeReverseFailures, handedFailingPairs } from '../../helpers/exchange-reverse-brute-force.js';

const tally = (): ScanTally => ({ checked: 0, holds: 0, skippedZero: 0, paired: 0, vacuous: 0, nonzero: 0 });

describe('the bulk scan (value tables compared by index arithmetic)', () => {
  const program = compileClaimProgram(exchangeReverseClaim(3, 2));
  const plan = planClaim(program);

  it('hands exactly the failing boundaries to the per-instance path, each pair once, and counts the rest', () => {
    const evaluator = createEvaluator(program, { exact: true });
    expect(evaluator.scan).toBeDefined();
    let handedTotal = 0;
    for (const cls of plan.classes()) {
      const count = plan.instanceCount(cls);
      for (const tables of [undefined, plan.sharedTables(cls)]) {
        const t = tally();
        const handed: bigint[] = [];
        expect(evaluator.scan!(cls, 0n, count, t, (i) => handed.push(i), tables)).toBe(true);
        handedTotal += handed.length;
        // The failing set by naive backtracking and the steps written out by hand (test/helpers).
        const brute = exchangeReverseFailures(cls.lengths[0], cls.lengths[1]);
        // A handed boundary and its image T(b) = (rev s4, s2, rev s1, s5) are the failing pair.
        const failing = handedFailingPairs(handed, (i) => plan.instanceAt(cls, i).sides as string[]);
        expect(new Set(failing), cls.key).toEqual(new Set(brute.failing));
        // Every boundary is counted once: decided here (a pair's representative counts both), or handed on.
        expect(t.holds + t.skippedZero + failing.length, cls.key).toBe(brute.instances);
        expect(t.vacuous + t.nonzero).toBe(t.holds);
      }
    }
    // The claim is false on these classes (issue 7's example), so the check above compared real failures.
    expect(handedTotal).toBeGreaterThan(0);
  });

  it('the cells of a class with content groups tile it: their table sizes add up to the instances', () => {
    // (6,6,0,6,6,0), sides 1, 4 and 2, 5 of equal content: Σ_c C(6,c)² squared = 924² (common practice, no source).
    const six = compileClaimProgram({
      id: 'six',
      statement: 'x',
      theory: 'cohomology',
      family: { sides: [6, 6, 0, 6, 6, 0], variables: [], conditions: [{ type: 'sameContent', sides: [1, 4] }, { type: 'sameContent', sides: [2, 5] }] },
      transform: [{ type: 'exchange', sides: [1, 4] }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    });
    const p = planClaim(six);
    const cls = p.classes()[0]!;
    const shape = tableShape(p.layoutOf(cls))!;
    expect(shape.entries).toBe(924 * 924);
    expect(shape.cells).toBe(49);
  });
});
