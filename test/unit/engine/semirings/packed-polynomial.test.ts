import { describe, expect, it } from 'vitest';
import { polynomialSemiring, type Polynomial, type Semiring } from '../../../../src/engine/index.js';
import { MonomialTable } from '../../../../src/engine/semirings/monomial-table.js';
import { packedForm, packPolynomial, unpackPolynomial } from '../../../../src/engine/semirings/packed-polynomial-semiring.js';
import type { PackedPoly } from '../../../../src/engine/semirings/packed-polynomial.js';
import { RefPolynomial } from '../../../../src/reference/ref-polynomial.js';

// The packed arithmetic (typed arrays of interned monomials, safe-integer coefficients promoted to
// bigint) against the reference polynomials of src/reference, which share no code with it. Check values
// come from RefPolynomial [straightforward map-of-monomials arithmetic, common practice, no source].

function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

const LIMIT = 2n ** 53n;
type Spec = { coefficient: bigint; exponents: number[] }[];

// Random terms: up to 5 variables, exponents 0..3, coefficients small, near ±2^53 or far beyond it.
function randomSpec(r: () => number): Spec {
  const terms = Math.floor(r() * 7);
  const out: Spec = [];
  for (let t = 0; t < terms; t++) {
    const exponents = Array.from({ length: 1 + Math.floor(r() * 5) }, () => (r() < 0.5 ? 0 : Math.floor(r() * 4)));
    const kind = r();
    const small = BigInt(Math.floor(r() * 7) - 3);
    const coefficient = kind < 0.7 ? small : kind < 0.9 ? (r() < 0.5 ? LIMIT - 1n - small : -(LIMIT - 1n) + small) : LIMIT * LIMIT + small;
    out.push({ coefficient, exponents });
  }
  return out;
}

const ref = (s: Spec) => RefPolynomial.fromTerms(s);
// Map form built term by term, so repeated monomials add up as in the reference.
function mapOf(s: Spec): Polynomial {
  const m = new Map<string, bigint>();
  for (const t of s) {
    let end = t.exponents.length;
    while (end > 0 && t.exponents[end - 1] === 0) end--;
    const key = String.fromCharCode(...t.exponents.slice(0, end));
    const c = (m.get(key) ?? 0n) + t.coefficient;
    if (c === 0n) m.delete(key);
    else m.set(key, c);
  }
  return m;
}
function asRef(p: Polynomial): RefPolynomial {
  return RefPolynomial.fromTerms([...p].map(([k, c]) => ({ coefficient: c, exponents: [...k].map((ch) => ch.charCodeAt(0)) })));
}

describe('packed polynomials', () => {
  const ring = polynomialSemiring(5);
  const form = packedForm(ring);
  const packed = form.semiring as Semiring<PackedPoly>;

  it('add, multiply, add in place and compare like the reference on random polynomials', () => {
    const r = rng(20261202);
    for (let trial = 0; trial < 400; trial++) {
      const [sa, sb, sc] = [randomSpec(r), randomSpec(r), randomSpec(r)];
      const [a, b, c] = [form.into(mapOf(sa)), form.into(mapOf(sb)), form.into(mapOf(sc))];
      expect(asRef(form.out(packed.add(a, b))).equals(ref(sa).add(ref(sb)))).toBe(true);
      expect(asRef(form.out(packed.mul(a, b))).equals(ref(sa).mul(ref(sb)))).toBe(true);
      // (a·b + c) − c·1 built in place, then compared: exercises cancellation to zero coefficients.
      const acc = packed.add(packed.mul(a, b), packed.zero);
      const owned = packed.addInPlace!(packed.mul(acc, packed.one), c);
      const want = ref(sa).mul(ref(sb)).add(ref(sc));
      expect(asRef(form.out(owned)).equals(want)).toBe(true);
      expect(packed.isZero(owned)).toBe(want.isZero());
      expect(packed.terms!(owned)).toBe(want.size);
      // Inputs are never mutated by add or mul.
      expect(asRef(form.out(a)).equals(ref(sa))).toBe(true);
      expect(packed.equals(a, form.into(mapOf(sa)))).toBe(true);
      expect(packed.equals(owned, form.into(mapOf(sa)))).toBe(want.equals(ref(sa)));
      const minus = packed.addInPlace!(packed.mul(c, packed.fromInteger(1)), packed.mul(c, packed.fromInteger(-1)));
      expect(packed.isZero(minus)).toBe(true);
    }
  });

  it('promotes coefficients to bigint instead of overflowing past 2^53', () => {
    // (2^52·y1 + 1)² = 2^104·y1² + 2^53·y1 + 1 [binomial square, by hand]
    const p = form.into(new Map([['\u0001', 2n ** 52n], ['', 1n]]));
    const square = form.out(packed.mul(p, p));
    expect(square).toEqual(new Map([['\u0002', 2n ** 104n], ['\u0001', 2n ** 53n], ['', 1n]]));
    // (2^53 − 1) + 1 = 2^53 as a sum in place [IEEE 754: 2^53 − 1 is the largest safe integer]
    const acc = packed.mul(form.into(new Map([['', 2n ** 53n - 1n]])), packed.one);
    expect(form.out(packed.addInPlace!(acc, packed.one))).toEqual(new Map([['', 2n ** 53n]]));
  });

  it('grows past its first capacity and keeps every term', () => {
    // Π_{k<4} (1 + y_k)^3 has 4^4 = 256 terms with binomial coefficients [binomial theorem]
    let p = packed.one;
    for (let k = 0; k < 4; k++) for (let e = 0; e < 3; e++) p = packed.mul(p, packed.add(packed.one, packed.strip!('y', k + 1)));
    let want = RefPolynomial.constant(1);
    for (let k = 0; k < 4; k++) for (let e = 0; e < 3; e++) want = want.mul(RefPolynomial.constant(1).add(RefPolynomial.variable(k)));
    expect(packed.terms!(p)).toBe(256);
    expect(asRef(form.out(p)).equals(want)).toBe(true);
  });
});

describe('monomial table', () => {
  it('interns each monomial once and multiplies exponent vectors', () => {
    const t = new MonomialTable();
    const y1 = t.intern('\u0000\u0001');
    expect(t.intern('\u0000\u0001')).toBe(y1);
    expect(t.variableOf(y1)).toBe(1);
    const sq = t.timesVariable(y1, 1);
    expect(t.keyOf(sq)).toBe('\u0000\u0002'); // y1·y1 = y1² [by hand]
    expect(t.keyOf(t.times(sq, t.intern('\u0003')))).toBe('\u0003\u0002'); // y0³·y1² [by hand]
    expect(t.times(0, sq)).toBe(sq);
    expect(t.variableOf(sq)).toBe(-1);
  });
  it('refuses an exponent beyond one UTF-16 unit instead of wrapping', () => {
    const t = new MonomialTable();
    const top = t.intern('\uffff');
    // 0xFFFF + 1 would wrap to 0 in String.fromCharCode [ECMAScript ToUint16]
    expect(() => t.timesVariable(top, 0)).toThrow(RangeError);
    expect(() => t.times(top, top)).toThrow(RangeError);
  });
  it('packs and unpacks a Map polynomial unchanged', () => {
    const t = new MonomialTable();
    const p: Polynomial = new Map([['', -3n], ['\u0000\u0002', 2n ** 70n], ['\u0001', 5n]]);
    expect(unpackPolynomial(t, packPolynomial(t, p))).toEqual(p);
  });
});
