import { RefPolynomial } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

/** One term of a Laurent polynomial: exponents may be negative. */
export interface LaurentTerm {
  coefficient: bigint;
  exponents: number[];
}

function shiftPoly(p: RefPolynomial, by: readonly number[]): RefPolynomial {
  // by ≥ 0 entrywise: multiply by the monomial t^by.
  return by.some((e) => e !== 0) ? p.mul(RefPolynomial.monomial(1n, by)) : p;
}

/**
 * An exact Laurent polynomial over ℤ, stored as t^shift · poly where poly has no monomial factor (each
 * variable's least exponent is 0). That form is unique, so equality is structural, and exact division
 * reduces to exact division of the polynomial parts (ℤ[t] is a UFD and the t_i are primes).
 */
export class RefLaurent {
  private constructor(
    readonly shift: readonly number[],
    readonly poly: RefPolynomial,
  ) {}

  static zero(): RefLaurent {
    return new RefLaurent([], RefPolynomial.zero());
  }

  static constant(c: bigint | number): RefLaurent {
    return RefLaurent.fromPolynomial(RefPolynomial.constant(c));
  }

  /** t_i^e for variable index i (0-based) and any integer e. */
  static power(i: number, e: number): RefLaurent {
    const shift = new Array<number>(i + 1).fill(0);
    shift[i] = e;
    return new RefLaurent(shift, RefPolynomial.constant(1n));
  }

  /** The Laurent polynomial of an ordinary polynomial. */
  static fromPolynomial(p: RefPolynomial): RefLaurent {
    return RefLaurent.normalise([], p);
  }

  /** Builds from terms with possibly negative exponents. */
  static fromTerms(terms: readonly LaurentTerm[]): RefLaurent {
    const len = Math.max(0, ...terms.map((t) => t.exponents.length));
    const low = new Array<number>(len).fill(0);
    for (const t of terms) t.exponents.forEach((e, i) => (low[i] = Math.min(low[i]!, e)));
    const p = RefPolynomial.fromTerms(terms.map((t) => ({ coefficient: t.coefficient, exponents: t.exponents.map((e, i) => e - low[i]!) })));
    return RefLaurent.normalise(low, p);
  }

  private static normalise(shift: readonly number[], p: RefPolynomial): RefLaurent {
    if (p.isZero()) return RefLaurent.zero();
    const raw = p.rawTerms();
    const len = Math.max(shift.length, p.variableCount());
    const low = new Array<number>(len).fill(Infinity);
    for (const t of raw) for (let i = 0; i < len; i++) low[i] = Math.min(low[i]!, t.exps[i] ?? 0);
    const poly = low.some((e) => e > 0)
      ? RefPolynomial.fromTerms(raw.map((t) => ({ coefficient: t.coeff, exponents: Array.from({ length: len }, (_, i) => (t.exps[i] ?? 0) - low[i]!) })))
      : p;
    const s = Array.from({ length: len }, (_, i) => (shift[i] ?? 0) + low[i]!);
    while (s.length > 0 && s[s.length - 1] === 0) s.pop();
    return new RefLaurent(s, poly);
  }

  isZero(): boolean {
    return this.poly.isZero();
  }

  add(other: RefLaurent): RefLaurent {
    if (this.isZero()) return other;
    if (other.isZero()) return this;
    const len = Math.max(this.shift.length, other.shift.length);
    const low = Array.from({ length: len }, (_, i) => Math.min(this.shift[i] ?? 0, other.shift[i] ?? 0));
    const a = shiftPoly(this.poly, low.map((l, i) => (this.shift[i] ?? 0) - l));
    const b = shiftPoly(other.poly, low.map((l, i) => (other.shift[i] ?? 0) - l));
    return RefLaurent.normalise(low, a.add(b));
  }

  sub(other: RefLaurent): RefLaurent {
    return this.add(other.neg());
  }

  neg(): RefLaurent {
    return new RefLaurent(this.shift, this.poly.neg());
  }

  mul(other: RefLaurent): RefLaurent {
    if (this.isZero() || other.isZero()) return RefLaurent.zero();
    const len = Math.max(this.shift.length, other.shift.length);
    const s = Array.from({ length: len }, (_, i) => (this.shift[i] ?? 0) + (other.shift[i] ?? 0));
    // A product of polynomials without monomial factors has none, so no renormalising is needed.
    return RefLaurent.normalise(s, this.poly.mul(other.poly));
  }

  /** Exact quotient; throws `inexact_division` when the divisor does not divide. */
  divExact(divisor: RefLaurent): RefLaurent {
    if (divisor.isZero()) {
      throw new CodedError('inexact_division', { what: 'Laurent divisor', expected: 'a nonzero Laurent polynomial', received: '0' });
    }
    if (this.isZero()) return this;
    const len = Math.max(this.shift.length, divisor.shift.length);
    const s = Array.from({ length: len }, (_, i) => (this.shift[i] ?? 0) - (divisor.shift[i] ?? 0));
    return RefLaurent.normalise(s, this.poly.divExact(divisor.poly));
  }

  equals(other: RefLaurent): boolean {
    if (!this.poly.equals(other.poly)) return false;
    const len = Math.max(this.shift.length, other.shift.length);
    for (let i = 0; i < len; i++) if ((this.shift[i] ?? 0) !== (other.shift[i] ?? 0)) return false;
    return true;
  }

  /** Swaps variables i and j (0-based): the Weyl group action of a transposition. */
  swapVariables(i: number, j: number): RefLaurent {
    const n = Math.max(this.shift.length, this.poly.variableCount(), i + 1, j + 1);
    const perm = Array.from({ length: n }, (_, m) => (m === i ? j : m === j ? i : m));
    const s = Array.from({ length: n }, (_, m) => this.shift[perm[m]!] ?? 0);
    return RefLaurent.normalise(s, this.poly.permuteVariables(perm));
  }

  /** The value at t = (1, …, 1): the non-equivariant K-theory value. */
  atOne(): bigint {
    return this.poly.rawTerms().reduce((acc, t) => acc + t.coeff, 0n);
  }

  /**
   * The lowest-degree homogeneous part in y after t_p = e^{y_p}. Since e^y − 1 = y + (higher terms) and a
   * monomial t^m is 1 + (higher terms), it is the lowest part of poly(1 + y) in y.
   */
  lowestPartInY(): RefPolynomial {
    if (this.isZero()) return RefPolynomial.zero();
    const n = this.poly.variableCount();
    const images = Array.from({ length: n }, (_, i) => RefPolynomial.variable(i).add(RefPolynomial.constant(1n)));
    const q = this.poly.substitute(images);
    let low = Infinity;
    for (const t of q.rawTerms()) low = Math.min(low, t.exps.reduce((a, e) => a + e, 0));
    return RefPolynomial.fromTerms(
      q.rawTerms().filter((t) => t.exps.reduce((a, e) => a + e, 0) === low).map((t) => ({ coefficient: t.coeff, exponents: [...t.exps] })),
    );
  }

  /** Terms with exponent vectors of length nvars (negative exponents allowed), sorted lexicographically. */
  toTerms(nvars: number): LaurentTerm[] {
    const used = Math.max(this.shift.length, this.poly.variableCount());
    if (used > nvars) {
      throw new CodedError('invalid_argument', { what: 'Variable count', expected: `at least ${used}`, received: `${nvars}` });
    }
    const out = this.poly.rawTerms().map((t) => ({
      coefficient: t.coeff,
      exponents: Array.from({ length: nvars }, (_, i) => (t.exps[i] ?? 0) + (this.shift[i] ?? 0)),
    }));
    return out.sort((a, b) => {
      for (let i = 0; i < nvars; i++) if (a.exponents[i] !== b.exponents[i]) return a.exponents[i]! - b.exponents[i]!;
      return 0;
    });
  }

  toString(): string {
    const ts = this.toTerms(Math.max(this.shift.length, this.poly.variableCount()));
    if (ts.length === 0) return '0';
    return ts.map((t) => `${t.coefficient}` + t.exponents.map((e, i) => (e === 0 ? '' : `*t${i + 1}^${e}`)).join('')).join(' + ');
  }
}
