import { describe, expect, it } from 'vitest';
import { schwartzMacPhersonAtPoint } from '../../../src/reference/ssm-at-point.js';
import type { RefFraction } from '../../../src/reference/ref-fraction.js';
import { schwartzMacPhersonTable } from '../../../src/reference/ssm-localization.js';

// Exact values of the rational functions at an integer point [evaluation by hand of closed forms below].
function at(f: RefFraction, y: readonly bigint[]): [bigint, bigint] {
  let num = 0n;
  for (const t of f.numerator.rawTerms()) {
    let v = t.coeff;
    t.exps.forEach((e, m) => {
      for (let q = 0; q < e; q++) v *= y[m]!;
    });
    num += v;
  }
  let den = 1n;
  for (const [key, e] of f.denominator) {
    const [j, i] = key.split(',').map(Number) as [number, number];
    for (let q = 0; q < e; q++) den *= 1n + y[j - 1]! - y[i - 1]!;
  }
  return [num, den];
}

describe('SSM structure constants at a point', () => {
  it('P¹ at y = (5, 9): e_{01,01}^{10} = −1/(1 + y2 − y1) = −1/5 and e_{10,10}^{10} = χ/(1 + χ) = 4/5', () => {
    // s_SM(C)|_10 = 1/(1+χ), s_SM(pt)|_10 = χ/(1+χ), χ = y2 − y1 (solved by hand; README, SSM conventions).
    const v = schwartzMacPhersonAtPoint('ssm', 1, 2, [5n, 9n]);
    expect(v.get('01,01,10')).toEqual({ num: -1n, den: 5n });
    expect(v.get('10,10,10')).toEqual({ num: 4n, den: 5n });
    expect(v.get('01,10,01')).toEqual({ num: 0n, den: 1n });
  });

  it('equals the symbolic solve evaluated at the point on every triple of Gr(k, 4) (common practice: two solves, one answer)', () => {
    const y = [101n, -37n, 2024n, 7n];
    for (const kind of ['ssm', 'csm'] as const) {
      for (const k of [1, 2, 3]) {
        const symbolic = schwartzMacPhersonTable(kind, k, 4);
        for (const [key, v] of schwartzMacPhersonAtPoint(kind, k, 4, y)) {
          const f = symbolic.get(key);
          const [num, den] = f ? at(f, y) : [0n, 1n];
          expect(num * v.den, `${kind} ${key}`).toBe(v.num * den);
        }
      }
    }
  });

  it('refuses a point where a tangent factor 1 + y_j − y_i vanishes', () => {
    expect(() => schwartzMacPhersonAtPoint('ssm', 1, 2, [5n, 4n])).toThrow(/expected a point where no denominator vanishes/);
  });
});
