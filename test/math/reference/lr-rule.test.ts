import { describe, expect, it } from 'vitest';
import { dualString, grassmannianStrings } from '../../../src/reference/grassmannian-strings.js';
import { lrTable } from '../../../src/reference/lr-rule.js';
import { columnClass, pieriColumn, pieriRow, rowClass } from '../../../src/reference/pieri.js';

// Whole-table checks; the value pins are in test/unit/reference/lr-rule.test.ts.
describe('Littlewood–Richardson rule on whole tables', () => {
  it('agrees with Pieri on every one-row and one-column μ, n ≤ 7 (Pieri\'s rule, Fulton, Young Tableaux, 1997)', () => {
    for (let n = 1; n <= 7; n++) {
      for (let k = 1; k < n; k++) {
        const t = lrTable(k, n);
        for (const lam of grassmannianStrings(k, n)) {
          const checks: Array<[string, Map<string, bigint>]> = [];
          for (let p = 0; p <= n - k; p++) checks.push([rowClass(p, k, n), pieriRow(lam, p)]);
          for (let p = 0; p <= k; p++) checks.push([columnClass(p, k, n), pieriColumn(lam, p)]);
          for (const [mu, pieri] of checks) {
            for (const nu of grassmannianStrings(k, n)) {
              expect(t.get(`${lam},${mu},${nu}`) ?? 0n).toBe(pieri.get(nu) ?? 0n);
            }
          }
        }
      }
    }
  });


  it('is commutative, has σ_∅ as unit and pairs dual classes to the point (Fulton, Young Tableaux, 1997, §9.4)', () => {
    for (const [k, n] of [[2, 5], [3, 6], [3, 7]] as const) {
      const t = lrTable(k, n);
      const all = grassmannianStrings(k, n);
      const id = all[0]!;
      const pt = all[all.length - 1]!;
      for (const a of all) {
        for (const b of all) {
          // Duality theorem: σ_λ·σ_μ has coefficient δ_{μ, λ∨} on the point class.
          expect(t.get(`${a},${b},${pt}`) ?? 0n).toBe(b === dualString(a) ? 1n : 0n);
          expect(t.get(`${id},${a},${b}`) ?? 0n).toBe(a === b ? 1n : 0n);
          for (const c of all) expect(t.get(`${a},${b},${c}`) ?? 0n).toBe(t.get(`${b},${a},${c}`) ?? 0n);
        }
      }
    }
  });

});
