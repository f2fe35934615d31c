import {
  DEFAULT_PRIMES,
  constantPoly,
  fractionDenominator,
  fractionEquals,
  fractionOf,
  fractionTerms,
  fractionText,
  generatingSemiring,
  modularErrorBound,
  polyEquals,
  polyTerms,
  polyText,
  substituteFraction,
  substitutePoly,
  toBigInt,
  type Fraction,
  type Polynomial,
  type StripLetter,
} from '../engine/index.js';
import type { Measured } from './claim-api.js';
import type { Relation } from './claim-schema.js';
import { NAMED_OFFSET, normalizedName, type Value } from './measure.js';
import { allPermutations, blockReversals, type Permutation } from './substitution.js';

/** Above this chance of a false "holds", a modular comparison is redone exactly. */
export const MAX_MODULAR_ERROR = 1e-6;

/** At most this many working permutations are listed per instance. */
export const MAX_LISTED_PERMUTATIONS = 720;

export function isZeroValue(v: Value): boolean {
  if (v.kind === 'int') return toBigInt(v.v) === 0n;
  if (v.kind === 'gen') return v.v.length === 0;
  if (v.kind === 'poly') return v.v.size === 0;
  if (v.kind === 'frac') return v.v.num.size === 0;
  return v.v.every((r) => r === 0);
}

export function equalValues(a: Value, b: Value): boolean {
  if (a.kind === 'int' && b.kind === 'int') return toBigInt(a.v) === toBigInt(b.v);
  if (a.kind === 'gen' && b.kind === 'gen') return generatingSemiring.equals(a.v, b.v);
  if (a.kind === 'poly' && b.kind === 'poly') return polyEquals(a.v, b.v);
  if (a.kind === 'frac' || b.kind === 'frac') {
    // A formula side with no nonzero term is the integer or polynomial 0 beside quotient values.
    const asFraction = (x: Value): Fraction | undefined => (x.kind === 'frac' ? x.v : x.kind === 'poly' ? fractionOf(x.v) : x.kind === 'int' ? fractionOf(constantPoly(toBigInt(x.v))) : undefined);
    const [fa, fb] = [asFraction(a), asFraction(b)];
    return fa !== undefined && fb !== undefined && fractionEquals(fa, fb);
  }
  if (a.kind === 'mod' && b.kind === 'mod') return a.v.every((r, k) => r === b.v[k]);
  return false;
}

/** Chance that two modular values agree although the exact polynomials differ. */
export function errorBoundOf(a: Value, b: Value): number {
  if (a.kind !== 'mod' || b.kind !== 'mod') return 0;
  if (a.unbounded || b.unbounded) return 1;
  // Laurent values: t^a·(L − R) is a polynomial of degree at most the sum of the two sides' bounds.
  const degree = a.laurent || b.laurent ? a.degree + b.degree : Math.max(a.degree, b.degree, 1);
  return modularErrorBound(degree, toBigInt(a.norm) + toBigInt(b.norm) + 1n, DEFAULT_PRIMES);
}

/** Whether `left relation right` holds (equality relations only see the already-substituted right value). */
export function relationHolds(relation: Relation, left: Value, right: Value): boolean {
  if (relation.type === 'lessOrEqual' || relation.type === 'greaterOrEqual') {
    const [l, r] = [toBigInt((left as { v: number | bigint }).v), toBigInt((right as { v: number | bigint }).v)];
    return relation.type === 'lessOrEqual' ? l <= r : l >= r;
  }
  return equalValues(left, right);
}

// Evaluation of a normalized polynomial at a point modulo a prime below 2^26 (products stay exact).
const PRIME = DEFAULT_PRIMES[0]!;
function evalMod(p: Polynomial, point: (k: number) => number): number {
  let sum = 0;
  for (const [key, c] of p) {
    let t = Number(((c % BigInt(PRIME)) + BigInt(PRIME)) % BigInt(PRIME));
    for (let k = 0; k < key.length; k++) for (let e = key.charCodeAt(k); e > 0; e--) t = (t * point(k)) % PRIME;
    sum = (sum + t) % PRIME;
  }
  return sum;
}

/** Every permutation of the search space with left = σ(right), filtered at a random point, then confirmed exactly. */
export function findPermutations(space: 'blockReversals' | 'allPermutations', m: number, left: Polynomial, right: Polynomial): { found: Permutation[]; truncated: boolean } {
  const xs = Array.from({ length: NAMED_OFFSET + 64 }, (_, k) => (Math.imul(k + 1, 2654435761) >>> 0) % PRIME);
  const target = evalMod(left, (k) => xs[k]!);
  const found: Permutation[] = [];
  let truncated = false;
  for (const sigma of space === 'blockReversals' ? blockReversals(m) : allPermutations(m)) {
    // σ(right) at x is right at the point whose k-th coordinate is x_σ(k).
    if (evalMod(right, (k) => (k < m ? xs[sigma[k]! - 1]! : xs[k]!)) !== target) continue;
    if (!polyEquals(left, substitutePoly(right, (k) => (k < m ? sigma[k]! - 1 : k)))) continue;
    if (found.length >= MAX_LISTED_PERMUTATIONS) {
      truncated = true;
      break;
    }
    found.push(sigma);
  }
  return { found, truncated };
}

// A quotient at a point modulo PRIME; undefined when its denominator vanishes there (then only exact tests decide).
function evalFractionMod(f: Fraction, point: (k: number) => number): number | undefined {
  const d = evalMod(fractionDenominator(f), point);
  if (d === 0) return undefined;
  let inv = 1;
  for (let e = PRIME - 2, b = d; e > 0; e >>= 1, b = Number((BigInt(b) * BigInt(b)) % BigInt(PRIME))) if (e & 1) inv = Number((BigInt(inv) * BigInt(b)) % BigInt(PRIME));
  return Number((BigInt(evalMod(f.num, point)) * BigInt(inv)) % BigInt(PRIME));
}

/** `findPermutations` for quotients: σ acts on numerator and denominator alike; every hit is confirmed exactly. */
export function findFractionPermutations(space: 'blockReversals' | 'allPermutations', m: number, left: Fraction, right: Fraction): { found: Permutation[]; truncated: boolean } {
  const xs = Array.from({ length: NAMED_OFFSET + 64 }, (_, k) => (Math.imul(k + 1, 2654435761) >>> 0) % PRIME);
  const target = evalFractionMod(left, (k) => xs[k]!);
  const found: Permutation[] = [];
  let truncated = false;
  for (const sigma of space === 'blockReversals' ? blockReversals(m) : allPermutations(m)) {
    const at = target === undefined ? undefined : evalFractionMod(right, (k) => (k < m ? xs[sigma[k]! - 1]! : xs[k]!));
    if (at !== undefined && at !== target) continue;
    if (!fractionEquals(left, substituteFraction(right, (k) => (k < m ? sigma[k]! - 1 : k)))) continue;
    if (found.length >= MAX_LISTED_PERMUTATIONS) {
      truncated = true;
      break;
    }
    found.push(sigma);
  }
  return { found, truncated };
}

/**
 * Printable and stable-JSON form of a value. With `eager` false, `text` and `json` are prototype
 * getters computed on first read: a sweep reads them only for counterexamples, and building them for
 * every instance dominated its cost. Such an object must not cross a thread or go through
 * JSON.stringify; confirmations, which do, are eager plain objects.
 */
export function measured(theory: string, lengths: readonly number[], sides: readonly string[], v: Value, names: readonly string[], eager = true): Measured {
  if (!eager) return new LazyMeasured(theory, lengths, sides, v, names);
  return { theory, lengths: [...lengths], sides: [...sides], ...render(lengths, v, names) };
}

class LazyMeasured implements Measured {
  private shown: { text: string; json: unknown } | undefined;

  constructor(
    readonly theory: string,
    readonly lengths: readonly number[],
    readonly sides: readonly string[],
    private readonly value: Value,
    private readonly names: readonly string[],
  ) {}

  get text(): string {
    return (this.shown ??= render(this.lengths, this.value, this.names)).text;
  }

  get json(): unknown {
    return (this.shown ??= render(this.lengths, this.value, this.names)).json;
  }
}

function render(lengths: readonly number[], v: Value, names: readonly string[]): { text: string; json: unknown } {
  if (v.kind === 'int') return { text: v.v.toString(), json: v.v.toString() };
  if (v.kind === 'gen') return { text: generatingSemiring.toText(v.v), json: { distribution: v.v.map((c) => c.toString()) } };
  if (v.kind === 'mod') return { text: `[${v.v.map((r, k) => `${r} mod ${DEFAULT_PRIMES[k]}`).join(', ')}]`, json: { residues: [...v.v], primes: [...DEFAULT_PRIMES] } };
  if (v.kind === 'frac') return renderFraction(lengths, v.v, v.letter, names);
  // The same layout as the CLI's value JSON: y_1..y_n, then named variables, exponents as arrays.
  let n = lengths[5]! + lengths[0]! + lengths[1]!;
  for (const key of v.v.keys()) for (let k = 0; k < Math.min(key.length, NAMED_OFFSET); k++) if (key.charCodeAt(k) > 0) n = Math.max(n, k + 1);
  const dense = substitutePoly(v.v, (k) => (k < NAMED_OFFSET ? k : n + k - NAMED_OFFSET));
  const text = polyText(v.v, normalizedName(names));
  const terms = polyTerms(dense, n + names.length).map((t) => ({ coefficient: t.coefficient.toString(), exponents: t.exponents }));
  const variables = names.length ? { variables: [...Array.from({ length: n }, (_, k) => `y${k + 1}`), ...names] } : {};
  return { text, json: { text, terms, ...variables } };
}

// Quotients as `count --json` writes them: Laurent terms (negative exponents) of t_1..t_N or y_1..y_N then the
// named variables; other quotients as numerator and denominator term lists.
function renderFraction(lengths: readonly number[], f: Fraction, letter: StripLetter, names: readonly string[]): { text: string; json: unknown } {
  let n = lengths[5]! + lengths[0]! + lengths[1]!;
  const seen = (k: number) => {
    if (k < NAMED_OFFSET) n = Math.max(n, k + 1);
  };
  for (const key of f.num.keys()) for (let k = 0; k < key.length; k++) if (key.charCodeAt(k) > 0) seen(k);
  f.low.forEach((e, k) => e !== 0 && seen(k));
  const dense = substituteFraction(f, (k) => (k < NAMED_OFFSET ? k : n + k - NAMED_OFFSET));
  const nameOf = (k: number) => (k < n ? `${letter}${k + 1}` : (names[k - n] ?? `v${k}`));
  const text = fractionText(dense, nameOf);
  const nvars = n + names.length;
  const variables = names.length ? { variables: [...Array.from({ length: n }, (_, k) => `${letter}${k + 1}`), ...names] } : {};
  const termJson = (t: { coefficient: bigint; exponents: readonly number[] }) => ({ coefficient: t.coefficient.toString(), exponents: [...t.exponents] });
  const laurent = fractionTerms(dense, nvars);
  if (laurent) return { text, json: { text, terms: laurent.map(termJson), ...variables } };
  return { text, json: { text, numerator: polyTerms(dense.num, nvars).map(termJson), denominator: polyTerms(fractionDenominator(dense), nvars).map(termJson), ...variables } };
}
