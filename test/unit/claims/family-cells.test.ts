import { describe, expect, it } from 'vitest';
import type { ScanTally } from '../../../src/claims/claim-api.js';
import { familyCells, type SharedView } from '../../../src/claims/family-cells.js';
import { compileClaimProgram, createEvaluator, planClaim } from '../../../src/claims/index.js';
import { TABLE_PARTS, tableShape } from '../../../src/claims/shared-tables.js';
import { integerSemiring } from '../../../src/engine/index.js';
import { exchangeReverseFailures, exchangeReverseClaim, handedFailingPairs } from '../../helpers/exchange-reverse-brute-force.js';

const tally = (): ScanTally => ({ checked: 0, holds: 0, skippedZero: 0, paired: 0, vacuous: 0, nonzero: 0 });

describe('shared value tables: a worker that would wait computes parts of the cells ahead instead', () => {
  const program = compileClaimProgram(exchangeReverseClaim(3, 2));
  const plan = planClaim(program);

  it('helping fills every unclaimed part once, leaves a part another worker holds alone, and the scan reads what it wrote', () => {
    const { helpAhead } = familyCells(program, integerSemiring, true);
    const evaluator = createEvaluator(program, { exact: true });
    for (const cls of plan.classes()) {
      const layout = plan.layoutOf(cls);
      const shape = tableShape(layout)!;
      const tables = plan.sharedTables(cls)!;
      const view: SharedView = { values: new Float64Array(tables.values), state: new Int32Array(tables.state), shape };
      // Another worker is computing the first part of the last nonempty cell (state 1: claimed).
      const held = [...shape.sizes.keys()].filter((k) => shape.sizes[k]! > 0).at(-1)! * TABLE_PARTS;
      Atomics.store(view.state, held, 1);
      let helped = 0;
      while (helpAhead(cls, layout, view, { next: 0, last: shape.cells - 1 })) helped++;
      expect(helped, cls.key).toBeGreaterThan(0);
      expect(Atomics.load(view.state, held), cls.key).toBe(1);
      // Every other slot is either computed (2) or not a part of its cell (0, never claimed).
      const computed = Array.from(view.state).filter((s) => s === 2).length;
      expect(computed, cls.key).toBe(helped);
      expect(Array.from(view.state).every((s) => s === 0 || s === 1 || s === 2)).toBe(true);
      // That worker "died" before starting: free its part, so the scan claims and computes it itself.
      Atomics.store(view.state, held, 0);
      const t = tally();
      const handed: bigint[] = [];
      expect(evaluator.scan!(cls, 0n, plan.instanceCount(cls), t, (i) => handed.push(i), tables)).toBe(true);
      // The failing set by naive backtracking and the steps written out by hand (test/helpers).
      const brute = exchangeReverseFailures(cls.lengths[0], cls.lengths[1]);
      const failing = handedFailingPairs(handed, (i) => plan.instanceAt(cls, i).sides as string[]);
      expect(new Set(failing), cls.key).toEqual(new Set(brute.failing));
      expect(t.holds + t.skippedZero + failing.length, cls.key).toBe(brute.instances);
    }
  });
});
