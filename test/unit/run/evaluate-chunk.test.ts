import { describe, expect, it } from 'vitest';
import { compileClaimProgram, createEvaluator, planClaim } from '../../../src/claims/index.js';
import { evaluateChunk } from '../../../src/run/evaluate-chunk.js';
import { exchangeReverseClaim, exchangeReverseFailures } from '../../helpers/exchange-reverse-brute-force.js';

const key = (sides: readonly string[]) => [sides[0], sides[1], sides[3], sides[4]].join('|');

describe('evaluateChunk', () => {
  const program = compileClaimProgram(exchangeReverseClaim(3, 2));
  const plan = planClaim(program);

  for (const [a, b] of [[2, 1], [3, 2]] as const) {
    it(`stores every failing boundary of class a=${a},b=${b}, partners included, and counts boundaries`, () => {
      const cls = plan.classes().find((c) => c.key === `a=${a},b=${b}`)!;
      const n = plan.instanceCount(cls);
      const brute = exchangeReverseFailures(a, b);
      expect(BigInt(brute.instances)).toBe(n);
      // Chunks of 5 split pairs across chunks; the union must still be every failing boundary once.
      const evaluator = createEvaluator(program, { exact: false });
      const tally = { holds: 0, fails: 0, checked: 0, vacuous: 0, nonzero: 0, partners: 0 };
      const stored = new Map<string, number>();
      for (let s = 0n; s < n; s += 5n) {
        const r = evaluateChunk(plan, evaluator, cls, s, s + 5n > n ? n : s + 5n);
        for (const k of ['holds', 'fails', 'checked'] as const) tally[k] += r[k];
        tally.vacuous += r.vacuous ?? 0;
        tally.nonzero += r.nonzero ?? 0;
        for (const c of r.counterexamples) {
          stored.set(key(c.left.sides), (stored.get(key(c.left.sides)) ?? 0) + 1);
          if (c.partnerOf !== undefined) tally.partners++;
          expect(plan.indexOf(cls, c.left.sides)).toBe(c.index);
        }
      }
      // The brute force (naive backtracking, independent of the engine) lists the failing boundaries.
      expect([...stored.keys()].sort()).toEqual([...brute.failing].sort());
      expect([...stored.values()].every((v) => v === 1)).toBe(true);
      expect(tally.fails).toBe(brute.failing.length);
      expect(tally.holds).toBe(brute.instances - brute.failing.length);
      expect(tally.vacuous + tally.nonzero).toBe(tally.holds);
      expect(tally.checked).toBe(brute.instances);
      // A failing pair {b, T(b)} with T(b) ≠ b gives one row found through its partner.
      expect(tally.partners).toBeGreaterThan(0);
    });
  }
});
