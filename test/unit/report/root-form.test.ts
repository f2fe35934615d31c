import { describe, expect, it } from 'vitest';
import { addPoly, constantPoly, mulPoly, polyTerms, subPoly, variablePoly, type Polynomial } from '../../../src/engine/index.js';
import { formText, isRootPositive, rootFactors, toRootBasis } from '../../../src/report/root-form.js';

const y = (m: number) => variablePoly(m - 1);
const root = (i: number, j: number) => subPoly(y(j), y(i));

function evaluate(p: Polynomial, at: readonly bigint[]): bigint {
  let sum = 0n;
  for (const t of polyTerms(p, 0)) {
    let v = t.coefficient;
    t.exponents.forEach((e, k) => {
      v *= at[k]! ** BigInt(e);
    });
    sum += v;
  }
  return sum;
}

// Seeded points, so a failure reproduces [common practice, no source].
function points(size: number, count: number): bigint[][] {
  let s = 12345;
  const next = () => BigInt(((s = (s * 1103515245 + 12345) % 2 ** 31) % 41) - 20);
  return Array.from({ length: count }, () => Array.from({ length: size }, next));
}

describe('values in the roots z_m = y_{m+1} − y_m', () => {
  const size = 5;
  // (y4 − y1)(y3 − y2) + 2(y5 − y3): positive in the roots, since y_j − y_i = z_i + … + z_{j−1}.
  const p = addPoly(mulPoly(root(1, 4), root(2, 3)), mulPoly(constantPoly(2n), root(3, 5)));

  it('rewrites a polynomial to one with the same values at every point (z from y)', () => {
    const r = toRootBasis(p, size);
    for (const at of points(size, 50)) {
      const z = [at[0]!, ...Array.from({ length: size - 1 }, (_, m) => at[m + 1]! - at[m]!)];
      expect(evaluate(r, z)).toBe(evaluate(p, at));
    }
    expect(isRootPositive(p, size)).toBe(true);
    expect(isRootPositive(subPoly(y(1), y(2)), size)).toBe(false); // y1 − y2 = −z1
  });

  it('rewrites high powers and leaves named variables (index ≥ N) alone', () => {
    // q·(y5 − y1)^4·y3^3 + y2^5 with q = variable 5: the same values at every point (z from y) [evaluation].
    const q = variablePoly(size);
    let h = mulPoly(q, mulPoly(mulPoly(root(1, 5), root(1, 5)), mulPoly(root(1, 5), root(1, 5))));
    h = addPoly(mulPoly(h, mulPoly(y(3), mulPoly(y(3), y(3)))), mulPoly(y(2), mulPoly(mulPoly(y(2), y(2)), mulPoly(y(2), y(2)))));
    const r5 = toRootBasis(h, size);
    for (const at of points(size + 1, 40)) {
      const z = [at[0]!, ...Array.from({ length: size - 1 }, (_, m) => at[m + 1]! - at[m]!), at[size]!];
      expect(evaluate(r5, z)).toBe(evaluate(h, at));
    }
  });

  it('pulls out root factors whose product with the cofactor is the polynomial', () => {
    const q = mulPoly(mulPoly(root(1, 3), root(1, 3)), addPoly(root(2, 5), y(4)));
    const { factors, cofactor } = rootFactors(q, size);
    expect(factors).toEqual([
      [1, 3],
      [1, 3],
    ]);
    let back = cofactor;
    for (const [i, j] of factors) back = mulPoly(back, root(i, j));
    for (const at of points(size, 30)) expect(evaluate(back, at)).toBe(evaluate(q, at));
  });

  it('writes the forms as text', () => {
    expect(formText(root(2, 4), size, [], 'roots').text).toBe('z2 + z3');
    expect(formText(root(2, 4), size, [], 'expanded').text).toBe('y4 - y2');
    expect(formText(mulPoly(root(1, 2), root(3, 5)), size, [], 'factored').text).toBe('(y2 - y1)*(y5 - y3)');
    // Not positive in the roots: stays expanded and says so.
    expect(formText(subPoly(y(1), y(2)), size, [], 'roots')).toEqual({ form: 'expanded', text: 'y1 - y2' });
  });
});
