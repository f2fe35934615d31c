import { RefPolynomial } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

/** A denominator factor 1 + y_j − y_i, keyed `${j},${i}` with 1-based positions. */
export type ChernFactorKey = string;

function factorPoly(key: ChernFactorKey): RefPolynomial {
  const [j, i] = key.split(',').map(Number) as [number, number];
  return RefPolynomial.constant(1n).add(RefPolynomial.difference(j - 1, i - 1));
}

const PRIME = 2305843009213693951n; // 2^61 − 1
const POINT = [3n, 1000003n, 77777n, 123456789n, 987654321n, 55555n, 31337n, 4242424242n, 16180339n, 27182818n, 14142135n, 17320508n];

function mayVanishOn(p: RefPolynomial, j: number, i: number): boolean {
  const free = (m: number): bigint => POINT[m % POINT.length]! + BigInt(m);
  const at = (m: number): bigint => (m === j ? free(i) - 1n : free(m));
  let total = 0n;
  for (const t of p.rawTerms()) {
    let v = t.coeff % PRIME;
    t.exps.forEach((e, m) => {
      if (e > 0) v = (v * modPow(((at(m) % PRIME) + PRIME) % PRIME, e)) % PRIME;
    });
    total = (total + v) % PRIME;
  }
  return total === 0n;
}

function modPow(b: bigint, e: number): bigint {
  let r = 1n;
  for (let k = 0; k < e; k++) r = (r * b) % PRIME;
  return r;
}

function degreeOf(exps: readonly number[]): number {
  return exps.reduce((a, e) => a + e, 0);
}

/** Terms of p of total degree ≤ d. */
export function truncate(p: RefPolynomial, d: number): RefPolynomial {
  return RefPolynomial.fromTerms(p.rawTerms().filter((t) => degreeOf(t.exps) <= d).map((t) => ({ coefficient: t.coeff, exponents: [...t.exps] })));
}

/** The homogeneous part of p of degree d. */
export function homogeneousPart(p: RefPolynomial, d: number): RefPolynomial {
  return RefPolynomial.fromTerms(p.rawTerms().filter((t) => degreeOf(t.exps) === d).map((t) => ({ coefficient: t.coeff, exponents: [...t.exps] })));
}

/**
 * An exact element of ℤ[y] localized at the factors 1 + y_j − y_i: numerator / Π (1 + y_j − y_i)^e. The
 * factors are distinct irreducibles, so cancelling every factor that divides the numerator gives a unique
 * form, and equality is structural. These are the values of SSM and CSM structure constants.
 */
export class RefFraction {
  private constructor(
    readonly numerator: RefPolynomial,
    readonly denominator: ReadonlyMap<ChernFactorKey, number>,
  ) {}

  static fromPolynomial(p: RefPolynomial): RefFraction {
    return new RefFraction(p, new Map());
  }

  static zero(): RefFraction {
    return RefFraction.fromPolynomial(RefPolynomial.zero());
  }

  /** numerator / Π factors^exponent, reduced. */
  static of(numerator: RefPolynomial, denominator: ReadonlyMap<ChernFactorKey, number>): RefFraction {
    return new RefFraction(numerator, new Map([...denominator].filter(([, e]) => e > 0))).reduce();
  }

  isZero(): boolean {
    return this.numerator.isZero();
  }

  isPolynomial(): boolean {
    return this.denominator.size === 0;
  }

  private reduce(): RefFraction {
    if (this.numerator.isZero()) return RefFraction.zero();
    let num = this.numerator;
    const den = new Map(this.denominator);
    for (const [key, e] of den) {
      let left = e;
      const [j, i] = key.split(',').map(Number) as [number, number];
      // 1 + y_j − y_i divides num iff num vanishes on y_j = y_i − 1. A nonzero value at a random point of
      // that hyperplane (mod a prime) rules it out cheaply; otherwise exact division decides.
      while (left > 0 && mayVanishOn(num, j - 1, i - 1)) {
        try {
          num = num.divExact(factorPoly(key));
        } catch {
          break;
        }
        left--;
      }
      if (left === 0) den.delete(key);
      else den.set(key, left);
    }
    return new RefFraction(num, den);
  }

  private over(den: ReadonlyMap<ChernFactorKey, number>): RefPolynomial {
    // The numerator over a larger denominator `den` (which must contain this one).
    let num = this.numerator;
    for (const [key, e] of den) for (let m = this.denominator.get(key) ?? 0; m < e; m++) num = num.mul(factorPoly(key));
    return num;
  }

  /** Sum over the least common denominator, not reduced (call `reduced()` when a canonical form is needed). */
  add(other: RefFraction): RefFraction {
    const den = new Map(this.denominator);
    for (const [key, e] of other.denominator) den.set(key, Math.max(e, den.get(key) ?? 0));
    const num = this.over(den).add(other.over(den));
    return num.isZero() ? RefFraction.zero() : new RefFraction(num, den);
  }

  /** The canonical form: every denominator factor that divides the numerator cancelled. */
  reduced(): RefFraction {
    return this.reduce();
  }

  sub(other: RefFraction): RefFraction {
    return this.add(other.neg());
  }

  neg(): RefFraction {
    return new RefFraction(this.numerator.neg(), this.denominator);
  }

  /** Product, not reduced. */
  mul(other: RefFraction): RefFraction {
    const den = new Map(this.denominator);
    for (const [key, e] of other.denominator) den.set(key, e + (den.get(key) ?? 0));
    const num = this.numerator.mul(other.numerator);
    return num.isZero() ? RefFraction.zero() : new RefFraction(num, den);
  }

  /** Divides by a polynomial, which must divide the numerator exactly. */
  divPolynomial(p: RefPolynomial): RefFraction {
    return new RefFraction(this.numerator.divExact(p), this.denominator);
  }

  /** Divides by Π factors^exponent (not reduced). */
  divFactors(factors: ReadonlyMap<ChernFactorKey, number>): RefFraction {
    const den = new Map(this.denominator);
    for (const [key, e] of factors) if (e > 0) den.set(key, e + (den.get(key) ?? 0));
    return new RefFraction(this.numerator, den);
  }

  equals(other: RefFraction): boolean {
    if (!this.numerator.equals(other.numerator) || this.denominator.size !== other.denominator.size) return false;
    for (const [key, e] of this.denominator) if (other.denominator.get(key) !== e) return false;
    return true;
  }

  /** The value at y = 0 (every denominator factor is 1 there). */
  atZero(): bigint {
    return this.numerator.constantTerm();
  }

  /** The homogeneous part of degree d of the power series in y (1/(1+χ) = Σ (−χ)^m). */
  seriesPart(d: number): RefPolynomial {
    if (d < 0) {
      throw new CodedError('invalid_argument', { what: 'Series degree', expected: 'a non-negative integer', received: `${d}` });
    }
    let acc = truncate(this.numerator, d);
    for (const [key, e] of this.denominator) {
      const chi = factorPoly(key).sub(RefPolynomial.constant(1n));
      let inverse = RefPolynomial.constant(1n);
      let power = RefPolynomial.constant(1n);
      for (let m = 1; m <= d; m++) {
        power = truncate(power.mul(chi.neg()), d);
        inverse = inverse.add(power);
      }
      for (let m = 0; m < e; m++) acc = truncate(acc.mul(inverse), d);
    }
    return homogeneousPart(acc, d);
  }

  toString(): string {
    if (this.denominator.size === 0) return this.numerator.toString();
    const den = [...this.denominator].map(([key, e]) => {
      const [j, i] = key.split(',');
      return `(1+y${j}-y${i})${e > 1 ? `^${e}` : ''}`;
    });
    return `(${this.numerator.toString()}) / ${den.join('·')}`;
  }
}
