import { describe, expect, it } from 'vitest';
import { buildPieceSet, countBoundary, DEFAULT_PRIMES, modularSemiring, residueNormSemiring, triangleRegion } from '../../../../src/engine/index.js';

// One label, every triangle weighs w: the triangle of side n has n² unit triangles and one filling, so its
// value is w^(n²) and the 1-norm bound |w|^(n²) [common practice, no source].
const single = (w: number) => buildPieceSet({ name: `weight-${w}`, boundaryLabels: ['0'], pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'], weight: { type: 'integer', value: w } }] });
const sides = (n: number) => ['0'.repeat(n), '', '0'.repeat(n), '', '0'.repeat(n), ''];
const residue = (x: bigint, p: number) => Number(((x % BigInt(p)) + BigInt(p)) % BigInt(p));

describe('residueNormSemiring: residues at a point and a 1-norm bound, one sweep', () => {
  const ring = residueNormSemiring(modularSemiring(11));
  const m = DEFAULT_PRIMES.length;

  it('weighs integers by |n|, y_j − y_i by 2, strips and named variables by 1 (the 1-norms of those polynomials)', () => {
    expect(ring.fromInteger(-7)[m]).toBe(7);
    expect(ring.position(1, 3)[m]).toBe(2);
    expect(ring.strip!('t', 2)[m]).toBe(1);
    expect(ring.variable('q')[m]).toBe(1);
    // ‖a·b‖₁ ≤ ‖a‖₁‖b‖₁ and ‖a + b‖₁ ≤ ‖a‖₁ + ‖b‖₁ [triangle inequality]: the lane multiplies and adds norms
    expect(ring.mul(ring.fromInteger(-3), ring.position(1, 2))[m]).toBe(6);
    expect(ring.add(ring.fromInteger(5), ring.fromInteger(-5))[m]).toBe(10);
  });

  it('keeps the residues of the modular semiring of the same seed', () => {
    const plain = modularSemiring(11);
    const x = ring.mul(ring.fromInteger(-3), ring.position(1, 2));
    expect(x.slice(0, m)).toEqual(plain.mul(plain.fromInteger(-3), plain.position(1, 2)));
  });

  it('is zero only when the norm is zero too, so a sweep never drops a contribution to the bound', () => {
    const cancelled = ring.add(ring.fromInteger(5), ring.fromInteger(-5));
    expect(cancelled.slice(0, m)).toEqual([0, 0, 0]);
    expect(ring.isZero(cancelled)).toBe(false);
    expect(ring.isZero(ring.zero)).toBe(true);
  });

  it('sweeps as numeric lanes: residues of w^(n²) and the bound |w|^(n²)', () => {
    const v = countBoundary(triangleRegion(4), sides(4), single(-3), { semiring: ring });
    expect(v.slice(0, m)).toEqual(DEFAULT_PRIMES.map((p) => residue((-3n) ** 16n, p)));
    expect(v[m]).toBe(3 ** 16);
  });

  it('a bound lane past 2^53 does not raise: it stays at least 2^53 (rounding of nonnegative products is monotone)', () => {
    // 2^64 puzzles' worth of norm: an integer lane would throw NumericOverflow here (numeric-overflow.test.ts).
    for (const strategy of ['forward', 'backward', 'meet'] as const) {
      const v = countBoundary(triangleRegion(8), sides(8), single(2), { semiring: ring, strategy });
      expect(v.slice(0, m)).toEqual(DEFAULT_PRIMES.map((p) => residue(2n ** 64n, p)));
      expect(v[m]).toBe(2 ** 64);
      expect(Number.isSafeInteger(v[m])).toBe(false);
    }
  });
});
