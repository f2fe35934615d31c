import { describe, expect, it } from 'vitest';
import { grassmannianStrings, inv } from '../../../src/reference/grassmannian-strings.js';
import { lrTable } from '../../../src/reference/lr-rule.js';
import { schwartzMacPhersonAtZero } from '../../../src/reference/ssm-at-zero.js';
import { schwartzMacPhersonTable } from '../../../src/reference/ssm-localization.js';

describe('SSM constants at y = 0 along a line (series in s)', () => {
  it.each([[1, 3], [2, 4], [1, 4], [1, 5]] as const)('Gr(%i,%i): equal to the multivariate solve at y = 0, for s_SM and c_SM', (k, n) => {
    // Two computations from the same restrictions: exact rational functions at y = 0, and series along y_p = p·s.
    for (const kind of ['ssm', 'csm'] as const) {
      const line = schwartzMacPhersonAtZero(kind, k, n);
      const full = schwartzMacPhersonTable(kind, k, n);
      for (const key of new Set([...line.keys(), ...full.keys()])) expect(line.get(key) ?? 0n, key).toBe(full.get(key)?.atZero() ?? 0n);
    }
  });

  it.each([[2, 6], [3, 6], [4, 6]] as const)('Gr(%i,%i): LR in degree 0, zero below, sign (−1)^{inv ν − inv λ − inv μ} beyond', (k, n) => {
    // Aluffi–Mihalcea–Schürmann–Su (positivity of SSM classes of Schubert cells); LR tableaux for degree 0.
    const table = schwartzMacPhersonAtZero('ssm', k, n);
    const lr = lrTable(k, n);
    const strings = grassmannianStrings(k, n);
    for (const a of strings) {
      for (const b of strings) {
        for (const c of strings) {
          const key = `${a},${b},${c}`;
          const v = table.get(key) ?? 0n;
          const d = inv(c) - inv(a) - inv(b);
          if (d < 0) expect(v).toBe(0n);
          if (d === 0) expect(v).toBe(lr.get(key) ?? 0n);
          if (v !== 0n) expect(v > 0n).toBe(d % 2 === 0);
        }
      }
    }
  });
});
