
import type { Semiring } from '../semiring.js';
import { addPoly, constantPoly, mulPoly, ONE_POLY, polyTerms, polyText, scalePoly, subPoly, substitutePoly, variablePoly, ZERO_POLY, type Polynomial, type Term } from './polynomial.js';
import type { StripLetter } from '../weight-formula.js';
import { CodedError } from '../../errors/index.js';

/**
 * An exact quotient num / (x^low · Π atom^e): `low` is a monomial denominator (so Laurent polynomials need no
 * atoms), the atoms are the other denominators met, each stored once. Sums use the least common multiple of
 * the denominators as stated (atoms are not factored), so values stay small in a sweep; equality and zero
 * tests are exact whatever the form.
 */
export interface Fraction {
  readonly num: Polynomial;
  readonly low: readonly number[];
  readonly atoms: ReadonlyMap<string, { readonly poly: Polynomial; readonly exp: number }>;
}

const NO_ATOMS: Fraction['atoms'] = new Map();

function keyOf(e: readonly number[]): string {
  let end = e.length;
  while (end > 0 && e[end - 1] === 0) end--;
  return String.fromCharCode(...e.slice(0, end));
}

function monomial(e: readonly number[]): Polynomial {
  return new Map([[keyOf(e), 1n]]);
}

/** Least exponent of each variable over the terms of p (p nonzero). */
function lowest(p: Polynomial): number[] {
  let low: number[] | undefined;
  for (const k of p.keys()) {
    const e = Array.from({ length: Math.max(k.length, low?.length ?? 0) }, (_, i) => (i < k.length ? k.charCodeAt(i) : 0));
    low = low === undefined ? e : e.map((x, i) => Math.min(x, low![i] ?? 0));
  }
  return low ?? [];
}

function divideMonomial(p: Polynomial, e: readonly number[]): Polynomial {
  if (e.every((x) => x === 0)) return p;
  const out = new Map<string, bigint>();
  for (const [k, c] of p) {
    const ex = Array.from({ length: k.length }, (_, i) => k.charCodeAt(i) - (e[i] ?? 0));
    out.set(keyOf(ex), c);
  }
  return out;
}

export function fractionOf(p: Polynomial): Fraction {
  return { num: p, low: [], atoms: NO_ATOMS };
}

// Cancels the monomial common to the numerator and x^low, so Laurent polynomials have one form.
function tidy(num: Polynomial, low: readonly number[], atoms: Fraction['atoms']): Fraction {
  if (num.size === 0) return { num: ZERO_POLY, low: [], atoms: NO_ATOMS };
  const common = lowest(num).map((x, i) => Math.min(x, low[i] ?? 0));
  const l = Array.from({ length: low.length }, (_, i) => low[i]! - (common[i] ?? 0));
  while (l.length > 0 && l[l.length - 1] === 0) l.pop();
  return { num: divideMonomial(num, common), low: l, atoms };
}

export function mulFraction(a: Fraction, b: Fraction): Fraction {
  if (a.num.size === 0 || b.num.size === 0) return fractionOf(ZERO_POLY);
  const len = Math.max(a.low.length, b.low.length);
  const low = Array.from({ length: len }, (_, i) => (a.low[i] ?? 0) + (b.low[i] ?? 0));
  let atoms = a.atoms;
  if (b.atoms.size > 0) {
    const m = new Map(a.atoms);
    for (const [k, v] of b.atoms) m.set(k, { poly: v.poly, exp: v.exp + (m.get(k)?.exp ?? 0) });
    atoms = m;
  }
  return tidy(mulPoly(a.num, b.num), low, atoms);
}

// a's numerator over the larger denominator (low, atoms).
function over(a: Fraction, low: readonly number[], atoms: Fraction['atoms']): Polynomial {
  let num = mulPoly(a.num, monomial(low.map((x, i) => x - (a.low[i] ?? 0))));
  for (const [k, v] of atoms) for (let e = a.atoms.get(k)?.exp ?? 0; e < v.exp; e++) num = mulPoly(num, v.poly);
  return num;
}

export function addFraction(a: Fraction, b: Fraction): Fraction {
  if (a.num.size === 0) return b;
  if (b.num.size === 0) return a;
  if (a.atoms.size === 0 && b.atoms.size === 0 && a.low.length === 0 && b.low.length === 0) return fractionOf(addPoly(a.num, b.num));
  const len = Math.max(a.low.length, b.low.length);
  const low = Array.from({ length: len }, (_, i) => Math.max(a.low[i] ?? 0, b.low[i] ?? 0));
  const atoms = new Map(a.atoms);
  for (const [k, v] of b.atoms) if ((atoms.get(k)?.exp ?? 0) < v.exp) atoms.set(k, v);
  return tidy(addPoly(over(a, low, atoms), over(b, low, atoms)), low, atoms);
}

/** a / b; throws `division_by_zero` when b is 0. */
export function divideFraction(a: Fraction, b: Fraction): Fraction {
  if (b.num.size === 0) throw new CodedError('division_by_zero', { what: 'Weight quotient', expected: 'a nonzero denominator', received: '0' }, { path: 'weight.formula', hint: 'a strip difference such as y_j − y_i vanishes on pieces whose two strips coincide' });
  // Move b's denominator up, then b's numerator down: its monomial part into `low`, the rest as one atom.
  let num = mulPoly(a.num, monomial(b.low));
  for (const v of b.atoms.values()) for (let e = 0; e < v.exp; e++) num = mulPoly(num, v.poly);
  const m = lowest(b.num);
  let rest = divideMonomial(b.num, m);
  // The atom's sign is fixed by its first term in key order, so p and −p are one atom.
  const first = [...rest.keys()].sort()[0]!;
  if (rest.get(first)! < 0n) {
    rest = scalePoly(rest, -1n);
    num = scalePoly(num, -1n);
  }
  const low = Array.from({ length: Math.max(a.low.length, m.length) }, (_, i) => (a.low[i] ?? 0) + (m[i] ?? 0));
  let atoms = a.atoms;
  if (!(rest.size === 1 && rest.get('') === 1n)) {
    const key = [...rest].map(([k, c]) => `${[...k].map((ch) => ch.charCodeAt(0)).join('.')}:${c}`).sort().join('|');
    const next = new Map(a.atoms);
    next.set(key, { poly: rest, exp: (next.get(key)?.exp ?? 0) + 1 });
    atoms = next;
  }
  return tidy(num, low, atoms);
}

export function fractionIsZero(a: Fraction): boolean {
  return a.num.size === 0;
}

export function fractionEquals(a: Fraction, b: Fraction): boolean {
  return fractionIsZero(addFraction(a, { num: scalePoly(b.num, -1n), low: b.low, atoms: b.atoms }));
}

/** The denominator x^low · Π atoms as one polynomial. */
export function fractionDenominator(a: Fraction): Polynomial {
  let d = monomial(a.low);
  for (const v of a.atoms.values()) for (let e = 0; e < v.exp; e++) d = mulPoly(d, v.poly);
  return d;
}

/** Laurent terms (negative exponents allowed) when the denominator is a monomial; undefined otherwise. */
export function fractionTerms(a: Fraction, nvars: number): Term[] | undefined {
  if (a.atoms.size > 0) return undefined;
  return polyTerms(a.num, nvars).map((t) => ({ coefficient: t.coefficient, exponents: t.exponents.map((e, i) => e - (a.low[i] ?? 0)) }));
}

/** Text: Laurent polynomials with negative exponents (`t2*t3^-1`), other quotients with each denominator factor apart. */
export function fractionText(a: Fraction, names: (k: number) => string): string {
  if (a.atoms.size === 0) {
    if (a.low.length === 0) return polyText(a.num, names);
    return laurentText(a, names);
  }
  const mono = a.low.flatMap((e, k) => (e === 0 ? [] : [e === 1 ? names(k) : `${names(k)}^${e}`]));
  const atoms = [...a.atoms.values()].map((v) => `(${polyText(v.poly, names)})${v.exp > 1 ? `^${v.exp}` : ''}`);
  // A product of several factors is parenthesised whole: `a / (b*c)`, never read as `(a / b)*c`.
  const den = [...mono, ...atoms];
  return `(${polyText(a.num, names)}) / ${den.length === 1 ? den[0] : `(${den.join('*')})`}`;
}

function laurentText(a: Fraction, names: (k: number) => string): string {
  const terms = polyTerms(a.num, a.low.length).map((t) => ({ c: t.coefficient, e: t.exponents.map((x, i) => x - (a.low[i] ?? 0)) }));
  return terms
    .map((t, idx) => {
      const vars = t.e.flatMap((e, k) => (e === 0 ? [] : [e === 1 ? names(k) : `${names(k)}^${e}`]));
      const abs = t.c < 0n ? -t.c : t.c;
      const body = vars.length === 0 ? abs.toString() : abs === 1n ? vars.join('*') : `${abs}*${vars.join('*')}`;
      return (t.c < 0n ? (idx === 0 ? '-' : ' - ') : idx === 0 ? '' : ' + ') + body;
    })
    .join('');
}

export interface FractionSemiring extends Semiring<Fraction> {
  readonly size: number;
  readonly letter: StripLetter;
  readonly variableNames: readonly string[];
  variableName(k: number): string;
}

/** Exact rational functions in the strip variables (y or t, 1..N) and named parameters, which follow them. */
export function fractionSemiring(size: number, letter: StripLetter = 'y'): FractionSemiring {
  const names: string[] = [];
  const variableName = (k: number) => (k < size ? `${letter}${k + 1}` : (names[k - size] ?? `v${k}`));
  const one = fractionOf(ONE_POLY);
  return {
    name: 'fraction',
    size,
    letter,
    variableNames: names,
    variableName,
    zero: fractionOf(ZERO_POLY),
    one,
    add: addFraction,
    mul: mulFraction,
    isZero: fractionIsZero,
    equals: fractionEquals,
    fromInteger: (n) => fractionOf(constantPoly(BigInt(n))),
    variable(name) {
      let k = names.indexOf(name);
      if (k < 0) k = names.push(name) - 1;
      return fractionOf(variablePoly(size + k));
    },
    position: (i, j) => fractionOf(subPoly(variablePoly(j - 1), variablePoly(i - 1))),
    strip: (_letter, index) => fractionOf(variablePoly(index - 1)),
    divide: divideFraction,
    toText: (a) => fractionText(a, variableName),
  };
}

/**
 * Renames the variables of a quotient, k ↦ rename(k), in its numerator, its monomial denominator and its
 * atoms alike: a permutation σ of t_1..t_N acts on t_i/t_j as t_σ(i)/t_σ(j) (negative exponents move too).
 */
export function substituteFraction(a: Fraction, rename: (k: number) => number): Fraction {
  if (a.num.size === 0) return a;
  const low: number[] = [];
  a.low.forEach((e, k) => {
    if (e === 0) return;
    const to = rename(k);
    while (low.length <= to) low.push(0);
    low[to]! += e;
  });
  let atoms = a.atoms;
  if (a.atoms.size > 0) {
    const m = new Map<string, { poly: Polynomial; exp: number }>();
    for (const v of a.atoms.values()) {
      const poly = substitutePoly(v.poly, rename);
      const key = [...poly].map(([k, c]) => `${[...k].map((ch) => ch.charCodeAt(0)).join('.')}:${c}`).sort().join('|');
      m.set(key, { poly, exp: v.exp + (m.get(key)?.exp ?? 0) });
    }
    atoms = m;
  }
  return tidy(substitutePoly(a.num, rename), low, atoms);
}
