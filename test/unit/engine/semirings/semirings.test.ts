import { describe, expect, it } from 'vitest';
import {
  addInt,
  DEFAULT_PRIMES,
  generatingSemiring,
  modularErrorBound,
  modularSemiring,
  mulInt,
  mulPoly,
  polyDegree,
  polynomialSemiring,
  polyText,
  substitutePoly,
} from '../../../../src/engine/index.js';

describe('safe integers', () => {
  it('promote to bigint instead of losing precision past 2^53', () => {
    // 2^53 + 1 is the first integer a double cannot hold [IEEE 754, common practice].
    const big = addInt(Number.MAX_SAFE_INTEGER, 2);
    expect(typeof big).toBe('bigint');
    expect(big).toBe(2n ** 53n + 1n);
    expect(mulInt(2 ** 30, 2 ** 30)).toBe(2n ** 60n);
    expect(addInt(2, 3)).toBe(5);
  });
});

describe('polynomials', () => {
  const ring = polynomialSemiring(3);
  it('multiply and print', () => {
    const p = mulPoly(ring.position(1, 2), ring.position(2, 3)); // (y2 − y1)(y3 − y2)
    // (y2 − y1)(y3 − y2) = y2·y3 − y2² − y1·y3 + y1·y2 [expanded by hand]
    expect(polyText(p, ring.variableName)).toBe('y1*y2 + y2*y3 - y1*y3 - y2^2');
    expect(polyDegree(p)).toBe(2);
  });
  it('substitute variables', () => {
    const p = ring.position(1, 3); // y3 − y1
    const reversed = substitutePoly(p, (k) => 2 - k); // y_m ↦ y_{4−m}
    expect(ring.equals(reversed, ring.position(3, 1))).toBe(true);
  });
});

describe('modular identity tests', () => {
  it('agree with exact arithmetic on a product of linear forms', () => {
    const mod = modularSemiring(42);
    const a = mod.mul(mod.position(1, 2), mod.position(1, 3));
    const b = mod.mul(mod.position(1, 3), mod.position(1, 2));
    expect(mod.equals(a, b)).toBe(true);
    expect(mod.equals(a, mod.position(1, 2))).toBe(false);
  });
  it('state an error bound from Schwartz–Zippel', () => {
    // Schwartz–Zippel: a nonzero polynomial of degree d vanishes at a random point of F_p^n with
    // probability ≤ d/p [Schwartz, J. ACM 1980; Zippel 1979].
    const [p1, p2, p3] = DEFAULT_PRIMES as [number, number, number];
    expect(modularErrorBound(10, 5n)).toBeCloseTo((10 / p1) * (10 / p2) * (10 / p3), 30);
    expect(modularErrorBound(10, BigInt(p3) * 2n)).toBeCloseTo(10 / Math.min(p1, p2, p3), 20);
    expect(modularErrorBound(10, 2n ** 90n)).toBe(1);
  });
});

describe('generating polynomials', () => {
  it('multiply as polynomials in t', () => {
    // (1 + t)^2 = 1 + 2t + t^2 [binomial theorem]
    const s = generatingSemiring.add(generatingSemiring.one, generatingSemiring.t);
    expect(generatingSemiring.mul(s, s)).toEqual([1, 2, 1]);
  });
});
