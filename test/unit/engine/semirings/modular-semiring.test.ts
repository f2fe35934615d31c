import { describe, expect, it } from 'vitest';
import { DEFAULT_PRIMES, modularErrorBound, modularSemiring } from '../../../../src/engine/index.js';

describe('modularSemiring', () => {
  it('works modulo the three largest primes below 2^26: 2^26 − 5, 2^26 − 27, 2^26 − 45 (value from memory, table of primes just below powers of two)', () => {
    expect(DEFAULT_PRIMES).toEqual([2 ** 26 - 5, 2 ** 26 - 27, 2 ** 26 - 45]);
  });

  it('is a ring homomorphism on integers: residues of −7·(3 + 2^40) agree with bigint arithmetic (common practice, no source)', () => {
    const r = modularSemiring();
    const got = r.mul(r.fromInteger(-7), r.add(r.fromInteger(3), r.fromInteger(2 ** 40)));
    const exact = -7n * (3n + 2n ** 40n);
    expect(got).toEqual(DEFAULT_PRIMES.map((p) => Number(((exact % BigInt(p)) + BigInt(p)) % BigInt(p))));
    expect(r.isZero(r.add(r.fromInteger(5), r.fromInteger(-5)))).toBe(true);
  });

  it('evaluates at a point fixed by the seed: equal seeds agree, other seeds differ', () => {
    const a = modularSemiring(7);
    const b = modularSemiring(7);
    const c = modularSemiring(8);
    expect(a.position(1, 3)).toEqual(b.position(1, 3));
    expect(a.variable('q')).toEqual(b.variable('q'));
    expect(a.position(1, 3)).not.toEqual(c.position(1, 3));
    // y3 − y1 = (y3 − y2) + (y2 − y1) at any point (common practice, no source)
    expect(a.position(1, 3)).toEqual(a.add(a.position(2, 3), a.position(1, 2)));
    expect(a.isZero(a.add(a.position(1, 2), a.position(2, 1)))).toBe(true);
  });

  it('gives each variable a point that does not depend on the order variables are first touched', () => {
    const a = modularSemiring(5);
    const b = modularSemiring(5);
    const aFirst = [a.variable('q'), a.strip!('t', 3), a.position(1, 2)];
    const bFirst = [b.position(1, 2), b.strip!('t', 3), b.variable('q')].reverse();
    expect(aFirst).toEqual(bFirst);
    // A substituted semiring touching t_2 first still gives t_1 ↦ t_2 the plain semiring's value of t_2.
    const swap = (m: number) => (m === 1 ? 2 : m === 2 ? 1 : m);
    const substituted = modularSemiring(5, DEFAULT_PRIMES, swap);
    expect(substituted.strip!('t', 1)).toEqual(a.strip!('t', 2));
  });

  it('applies a substitution y_m ↦ y_σ(m) at the same point', () => {
    const swap = (m: number) => (m === 1 ? 2 : m === 2 ? 1 : m);
    const plain = modularSemiring(3);
    const substituted = modularSemiring(3, DEFAULT_PRIMES, swap);
    expect(substituted.position(1, 3)).toEqual(plain.position(2, 3));
    expect(substituted.position(3, 4)).toEqual(plain.position(3, 4));
  });

  it('bounds the chance of a false "holds" by Schwartz–Zippel per prime (Schwartz, J. ACM 27, 1980; Zippel, 1979)', () => {
    const [p1, p2, p3] = DEFAULT_PRIMES as [number, number, number];
    // Small coefficients survive modulo every prime: the chances multiply.
    expect(modularErrorBound(10, 100n)).toBeCloseTo((10 / p1) * (10 / p2) * (10 / p3), 30);
    // Coefficients beyond the smallest prime but below the product: at least one prime sees the difference.
    expect(modularErrorBound(10, BigInt(p3) + 1n)).toBeCloseTo(10 / Math.min(p1, p2, p3), 20);
    // Beyond the product of the primes nothing is claimed.
    expect(modularErrorBound(10, BigInt(p1) * BigInt(p2) * BigInt(p3))).toBe(1);
  });
});
