import { CodedError } from '../errors/index.js';

/** One term of a polynomial: an integer coefficient times y^exponents (variable i has index i). */
export interface PolynomialTerm {
  coefficient: bigint;
  exponents: number[];
}

interface Monomial {
  readonly exps: readonly number[]; // trailing zeros trimmed, so equal monomials have equal keys
  readonly coeff: bigint;
}

// Exponents are small, so one UTF-16 unit per variable makes a compact, fast map key. A product of
// trimmed vectors is trimmed too, so keys of equal monomials always agree.
function keyOf(exps: readonly number[]): string {
  return String.fromCharCode(...exps);
}

function trim(exps: readonly number[]): number[] {
  let end = exps.length;
  while (end > 0 && exps[end - 1] === 0) end--;
  return exps.slice(0, end);
}

function lexCompare(a: readonly number[], b: readonly number[]): number {
  const len = Math.max(a.length, b.length);
  for (let i = 0; i < len; i++) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

/** An exact sparse multivariate polynomial over ℤ; immutable, variables indexed 0, 1, 2, …. */
export class RefPolynomial {
  private readonly terms: ReadonlyMap<string, Monomial>;

  private constructor(terms: ReadonlyMap<string, Monomial>) {
    this.terms = terms;
  }

  /** The zero polynomial. */
  static zero(): RefPolynomial {
    return new RefPolynomial(new Map());
  }

  /** A constant polynomial. */
  static constant(c: bigint | number): RefPolynomial {
    return RefPolynomial.monomial(BigInt(c), []);
  }

  /** The variable with index i (y_{i+1} in the Schubert-calculus convention). */
  static variable(i: number): RefPolynomial {
    if (!Number.isInteger(i) || i < 0) {
      throw new CodedError('invalid_argument', { what: 'Variable index', expected: 'a non-negative integer', received: `${i}` });
    }
    const exps = new Array<number>(i + 1).fill(0);
    exps[i] = 1;
    return RefPolynomial.monomial(1n, exps);
  }

  /** c·y^exps. */
  static monomial(c: bigint, exps: readonly number[]): RefPolynomial {
    for (const e of exps) {
      if (!Number.isInteger(e) || e < 0 || e > 0xffff) {
        throw new CodedError('invalid_argument', { what: 'Exponent', expected: 'an integer in [0, 65535]', received: `${e}` });
      }
    }
    const m = new Map<string, Monomial>();
    if (c !== 0n) {
      const t = trim(exps);
      m.set(keyOf(t), { exps: t, coeff: c });
    }
    return new RefPolynomial(m);
  }

  /** y_b − y_a for variable indices a, b (a linear form used for roots). */
  static difference(b: number, a: number): RefPolynomial {
    return RefPolynomial.variable(b).sub(RefPolynomial.variable(a));
  }

  /** Builds a polynomial from a term list (repeated monomials are summed). */
  static fromTerms(terms: readonly PolynomialTerm[]): RefPolynomial {
    let acc = new Map<string, Monomial>();
    for (const t of terms) acc = addInto(acc, RefPolynomial.monomial(t.coefficient, t.exponents).terms, 1n);
    return new RefPolynomial(acc);
  }

  isZero(): boolean {
    return this.terms.size === 0;
  }

  /** Number of nonzero terms. */
  get size(): number {
    return this.terms.size;
  }

  add(other: RefPolynomial): RefPolynomial {
    return new RefPolynomial(addInto(new Map(this.terms), other.terms, 1n));
  }

  sub(other: RefPolynomial): RefPolynomial {
    return new RefPolynomial(addInto(new Map(this.terms), other.terms, -1n));
  }

  neg(): RefPolynomial {
    return this.scale(-1n);
  }

  scale(c: bigint): RefPolynomial {
    if (c === 0n) return RefPolynomial.zero();
    const m = new Map<string, Monomial>();
    for (const [k, t] of this.terms) m.set(k, { exps: t.exps, coeff: t.coeff * c });
    return new RefPolynomial(m);
  }

  mul(other: RefPolynomial): RefPolynomial {
    const m = new Map<string, Monomial>();
    for (const a of this.terms.values()) {
      for (const b of other.terms.values()) {
        const len = Math.max(a.exps.length, b.exps.length);
        const exps = new Array<number>(len);
        for (let i = 0; i < len; i++) exps[i] = (a.exps[i] ?? 0) + (b.exps[i] ?? 0);
        const key = keyOf(exps);
        const prev = m.get(key);
        const c = (prev?.coeff ?? 0n) + a.coeff * b.coeff;
        if (c === 0n) m.delete(key);
        else m.set(key, { exps, coeff: c });
      }
    }
    return new RefPolynomial(m);
  }

  /** Exact quotient this / divisor; throws `inexact_division` when the divisor does not divide. */
  divExact(divisor: RefPolynomial): RefPolynomial {
    if (divisor.isZero()) {
      throw new CodedError('inexact_division', { what: 'Polynomial divisor', expected: 'a nonzero polynomial', received: '0' });
    }
    const unit = unitLinearVariable(divisor);
    if (unit !== undefined) return this.divUnitLinear(divisor, unit);
    // Lex order is a monomial order, so if d | r then LT(d) | LT(r); peeling leading terms must end at 0.
    const lead = divisor.leadingTerm();
    const rest = [...divisor.terms.values()].filter((t) => t !== lead);
    const remainder = new Map(this.terms);
    const quotient = new Map<string, Monomial>();
    while (remainder.size > 0) {
      const r = leadingOf(remainder.values());
      const len = Math.max(r.exps.length, lead.exps.length);
      const exps: number[] = [];
      for (let i = 0; i < len; i++) exps.push((r.exps[i] ?? 0) - (lead.exps[i] ?? 0));
      if (exps.some((e) => e < 0) || r.coeff % lead.coeff !== 0n) {
        throw new CodedError('inexact_division', { what: 'Polynomial division', expected: 'a divisor of the dividend', received: `a remainder with leading term ${r.coeff}·y^[${r.exps.join(',')}]` });
      }
      const qc = r.coeff / lead.coeff;
      const qexps = trim(exps);
      quotient.set(keyOf(qexps), { exps: qexps, coeff: qc });
      // Subtract q·divisor in place: the leading product cancels r exactly, the rest is accumulated.
      remainder.delete(keyOf(r.exps));
      for (const t of rest) {
        const plen = Math.max(qexps.length, t.exps.length);
        const pe = new Array<number>(plen);
        for (let i = 0; i < plen; i++) pe[i] = (qexps[i] ?? 0) + (t.exps[i] ?? 0);
        const key = keyOf(pe);
        const c = (remainder.get(key)?.coeff ?? 0n) - qc * t.coeff;
        if (c === 0n) remainder.delete(key);
        else remainder.set(key, { exps: pe, coeff: c });
      }
    }
    return new RefPolynomial(quotient);
  }

  // Synthetic division by ±y_v + r (r free of y_v): with this = Σ P_k y_v^k, the quotient's coefficients
  // satisfy ±Q_{k−1} = P_k − r·Q_k from the top down, and r·Q_0 = P_0 checks exactness. Linear in the
  // size, where peeling leading terms rescans the remainder for every quotient term.
  private divUnitLinear(divisor: RefPolynomial, v: number): RefPolynomial {
    let sign = 1n;
    const rest = new Map<string, Monomial>();
    for (const [k, t] of divisor.terms) {
      if ((t.exps[v] ?? 0) === 1) sign = t.coeff;
      else rest.set(k, t);
    }
    const r = new RefPolynomial(rest);
    const slices = new Map<number, Map<string, Monomial>>();
    let top = 0;
    for (const t of this.terms.values()) {
      const e = t.exps[v] ?? 0;
      const exps = trim(t.exps.map((x, i) => (i === v ? 0 : x)));
      let slice = slices.get(e);
      if (!slice) slices.set(e, (slice = new Map()));
      slice.set(keyOf(exps), { exps, coeff: t.coeff });
      top = Math.max(top, e);
    }
    const quotient = new Map<string, Monomial>();
    let q = RefPolynomial.zero();
    for (let k = top; k >= 0; k--) {
      const p = new RefPolynomial(slices.get(k) ?? new Map());
      const next = p.sub(r.mul(q));
      if (k === 0) {
        if (!next.isZero()) {
          throw new CodedError('inexact_division', { what: 'Polynomial division', expected: 'a divisor of the dividend', received: 'a nonzero remainder' });
        }
        break;
      }
      q = next.scale(sign); // sign is ±1, its own inverse
      for (const t of q.terms.values()) {
        const exps = [...t.exps];
        while (exps.length <= v) exps.push(0);
        exps[v] = k - 1;
        const tr = trim(exps);
        quotient.set(keyOf(tr), { exps: tr, coeff: t.coeff });
      }
    }
    return new RefPolynomial(quotient);
  }

  equals(other: RefPolynomial): boolean {
    if (this.terms.size !== other.terms.size) return false;
    for (const [k, t] of this.terms) if (other.terms.get(k)?.coeff !== t.coeff) return false;
    return true;
  }

  /** Total degree (−1 for the zero polynomial). */
  degree(): number {
    let d = -1;
    for (const t of this.terms.values()) d = Math.max(d, t.exps.reduce((s, e) => s + e, 0));
    return d;
  }

  /** True when every term has the same total degree (the zero polynomial counts as homogeneous). */
  isHomogeneous(): boolean {
    const degs = new Set<number>();
    for (const t of this.terms.values()) degs.add(t.exps.reduce((s, e) => s + e, 0));
    return degs.size <= 1;
  }

  /** Coefficient of the constant term, i.e. the value at y = 0. */
  constantTerm(): bigint {
    return this.terms.get('')?.coeff ?? 0n;
  }

  /** Number of variables actually used: one more than the largest index with a nonzero exponent. */
  variableCount(): number {
    let v = 0;
    for (const t of this.terms.values()) v = Math.max(v, t.exps.length);
    return v;
  }

  /** Substitutes images[i] for variable i (variables without an image stay themselves). */
  substitute(images: readonly RefPolynomial[]): RefPolynomial {
    let acc = RefPolynomial.zero();
    for (const t of this.terms.values()) {
      let term = RefPolynomial.constant(t.coeff);
      t.exps.forEach((e, i) => {
        const img = images[i] ?? RefPolynomial.variable(i);
        for (let j = 0; j < e; j++) term = term.mul(img);
      });
      acc = acc.add(term);
    }
    return acc;
  }

  /** Renames variable i to perm[i] (used for the Weyl group action on roots and classes). */
  permuteVariables(perm: readonly number[]): RefPolynomial {
    const m = new Map<string, Monomial>();
    for (const t of this.terms.values()) {
      const exps: number[] = [];
      t.exps.forEach((e, i) => {
        const j = perm[i] ?? i;
        while (exps.length <= j) exps.push(0);
        exps[j] = (exps[j] ?? 0) + e;
      });
      const tr = trim(exps);
      m.set(keyOf(tr), { exps: tr, coeff: t.coeff });
    }
    return new RefPolynomial(m);
  }

  /** Raw terms (exponent vectors trimmed of trailing zeros), in no particular order. */
  rawTerms(): Array<{ coeff: bigint; exps: readonly number[] }> {
    return [...this.terms.values()].map((t) => ({ coeff: t.coeff, exps: t.exps }));
  }

  private leadingTerm(): Monomial {
    return leadingOf(this.terms.values());
  }

  toString(): string {
    const ts = toTerms(this, this.variableCount());
    if (ts.length === 0) return '0';
    return ts
      .map((t) => `${t.coefficient}` + t.exponents.map((e, i) => (e === 0 ? '' : `*y${i + 1}^${e}`)).join(''))
      .join(' + ');
  }
}

/** A variable v in which the divisor is ±y_v plus terms free of y_v, if any (for synthetic division). */
function unitLinearVariable(divisor: RefPolynomial): number | undefined {
  const terms = divisor.rawTerms();
  for (const t of terms) {
    if (t.coeff !== 1n && t.coeff !== -1n) continue;
    const v = t.exps.findIndex((e) => e > 0);
    if (v < 0 || t.exps[v] !== 1 || t.exps.some((e, i) => i !== v && e > 0)) continue;
    if (terms.every((u) => u === t || (u.exps[v] ?? 0) === 0)) return v;
  }
  return undefined;
}

function leadingOf(terms: Iterable<Monomial>): Monomial {
  let best: Monomial | undefined;
  for (const t of terms) if (best === undefined || lexCompare(t.exps, best.exps) > 0) best = t;
  if (best === undefined) throw new CodedError('invalid_argument', { what: 'Leading term', expected: 'a nonzero polynomial', received: '0' });
  return best;
}

function addInto(acc: Map<string, Monomial>, other: ReadonlyMap<string, Monomial>, sign: bigint): Map<string, Monomial> {
  for (const [k, t] of other) {
    const c = (acc.get(k)?.coeff ?? 0n) + sign * t.coeff;
    if (c === 0n) acc.delete(k);
    else acc.set(k, { exps: t.exps, coeff: c });
  }
  return acc;
}

/** Terms of p with exponent vectors of length nvars, zero terms removed, sorted lexicographically ascending by exponent vector. */
export function toTerms(p: RefPolynomial, nvars: number): PolynomialTerm[] {
  if (!Number.isInteger(nvars) || nvars < 0) {
    throw new CodedError('invalid_argument', { what: 'Variable count', expected: 'a non-negative integer', received: `${nvars}` });
  }
  const used = p.variableCount();
  if (used > nvars) {
    throw new CodedError('invalid_argument', { what: 'Variable count', expected: `at least ${used}`, received: `${nvars}` });
  }
  const out = p.rawTerms().map((t) => {
    const exponents = new Array<number>(nvars).fill(0);
    t.exps.forEach((e, i) => (exponents[i] = e));
    return { coefficient: t.coeff, exponents };
  });
  return out.sort((a, b) => lexCompare(a.exponents, b.exponents));
}
