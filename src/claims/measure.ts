import {
  countBoundary,
  countCompletions,
  DEFAULT_PRIMES,
  fractionSemiring,
  laurentSpan,
  substituteFraction,
  valueRing,
  fillingCountSemiring,
  formulaDegree,
  generatingSemiring,
  integerSemiring,
  makeRegion,
  modularSemiring,
  residueNormSemiring,
  polynomialSemiring,
  substitutePoly,
  statisticWeigher,
  unitTriangleCount,
  type CountOptions,
  type Fraction,
  type Generating,
  type StripLetter,
  type PieceSet,
  type Polynomial,
  type Residues,
  type ResidueNormSemiring,
  type SafeInt,
  type Semiring,
} from '../engine/index.js';
import { CodedError } from '../errors/index.js';
import type { Measure } from './claim-schema.js';
import { hasIntegerWeights } from './integer-weights.js';
import { LruCache } from './lru-cache.js';
import type { Permutation } from './substitution.js';

/** Index of the first named (non-y) variable in normalized polynomials; y_k is index k−1. */
export const NAMED_OFFSET = 256;

/** One measured value. Modular values carry a bound on the 1-norm of the exact polynomial and its degree. */
export type Value =
  | { readonly kind: 'int'; readonly v: SafeInt }
  | { readonly kind: 'gen'; readonly v: Generating }
  | { readonly kind: 'poly'; readonly v: Polynomial }
  | { readonly kind: 'frac'; readonly v: Fraction; readonly letter: StripLetter }
  | {
      readonly kind: 'mod';
      readonly v: Residues;
      readonly norm: SafeInt;
      readonly degree: number;
      /** A Laurent polynomial: `degree` bounds t^a·v for the shift a clearing its denominators (compare by the sum of two degrees). */
      readonly laurent?: boolean;
      /** A quotient with no coefficient bound: equal residues prove nothing, so a "holds" is decided exactly. */
      readonly unbounded?: boolean;
    };

/** True when a modular evaluation met a denominator that vanishes at its random point (the point is redrawn). */
export function isZeroDenominator(e: unknown): boolean {
  return e instanceof CodedError && e.code === 'division_by_zero';
}

/** σ applied to an exact value: y_m (or t_m) ↦ y_σ(m), negative exponents of Laurent values included. */
export function substituteValue(v: Value, sigma: Permutation): Value {
  const rename = (k: number) => (k < sigma.length ? sigma[k]! - 1 : k);
  if (v.kind === 'poly') return { kind: 'poly', v: substitutePoly(v.v, rename) };
  if (v.kind === 'frac') return { ...v, v: substituteFraction(v.v, rename) };
  return v;
}

// No coefficient bound at all: past the product of the primes, so `modularErrorBound` claims nothing.
const NO_BOUND = 1n << 256n;
function normOf(lane: number): SafeInt {
  return Number.isSafeInteger(lane) ? lane : NO_BOUND;
}

// The largest total degree of a piece weight, so a value's degree is at most this times the triangle count.
function weightDegree(pieces: PieceSet): number {
  let d = 1;
  for (const p of pieces.pieces) if (p.weight.type === 'formula') d = Math.max(d, formulaDegree(p.weight.formula));
  return d;
}

export type Mode = 'exact' | 'modular';

/** Seed of the modular evaluation point; fixed, so results are reproducible and both sides share the point. */
export const MODULAR_SEED = 20240601;

function sameButSide5(la: readonly number[], lb: readonly number[], sa: readonly string[], sb: readonly string[]): boolean {
  for (let i = 0; i < 6; i++) if (la[i] !== lb[i] || (i !== 4 && sa[i] !== sb[i])) return false;
  return true;
}

/** Measures boundaries in one theory, caching one sweep per boundary with side 5 left open. */
export class Meter {
  private readonly cache: LruCache<string, Map<string, unknown>>;
  private readonly modular = new Map<string, ResidueNormSemiring>();
  /** The last sweep used per tag (value, norm, …), for runs of instances that differ only in side 5. */
  private readonly last = new Map<string, { lengths: readonly number[]; sides: readonly string[]; map: Map<string, unknown> }>();
  readonly polynomial: boolean;
  /** Values are quotients (Laurent polynomials in t, or rational functions): exact values are fractions. */
  readonly fraction: boolean;
  private readonly letter: StripLetter;
  /** Degree bounds of the weights when every one is a Laurent polynomial (undefined for other quotients). */
  private readonly span: { high: number; negative: number } | undefined;

  constructor(
    readonly pieces: PieceSet,
    readonly measure: Measure,
    /** Sorted names of the formal variables of every theory in the comparison. */
    readonly names: readonly string[],
    cacheSize = 256,
  ) {
    this.cache = new LruCache(cacheSize);
    this.polynomial = measure.type === 'value' && !hasIntegerWeights(pieces);
    const ring = this.polynomial ? valueRing(pieces) : undefined;
    this.fraction = ring?.kind === 'fraction';
    this.letter = ring?.letter ?? 'y';
    this.span = this.fraction ? laurentBound(pieces) : undefined;
  }

  // One sweep for every side-5 labeling; the cache makes consecutive instances (same sides 1-4, 6) a lookup.
  private completions<T>(tag: string, lengths: readonly number[], sides: readonly string[], options: () => CountOptions<T>, post: (v: T) => unknown, useCache: boolean): Map<string, unknown> {
    // Consecutive instances usually share everything but side 5: answer those without building a key.
    const last = this.last.get(tag);
    if (useCache && last && sameButSide5(last.lengths, lengths, last.sides, sides)) return last.map;
    const key = `${tag}|${lengths.join(',')}|${sides.map((s, i) => (i === 4 ? '' : s)).join('|')}`;
    if (!useCache) {
      // One boundary from scratch (a confirmation): a closed count, which meets in the middle, costs far
      // less than a sweep for every side-5 labeling. A failing pair confirms b with T(b), then T(b) with b:
      // each boundary's own exact count serves both (never a value of another boundary, nor a modular one).
      const whole = `${key}|${sides[4]}`;
      let one = this.confirmed.get(whole);
      if (!one) {
        one = new Map<string, unknown>([[sides[4]!, post(countBoundary(makeRegion(lengths), sides, this.pieces, options()))]]);
        this.confirmed.set(whole, one);
      }
      return one;
    }
    let map = this.cache.get(key);
    if (!map) {
      const raw = countCompletions(makeRegion(lengths), sides, this.pieces, options());
      map = new Map<string, unknown>();
      for (const [k, v] of raw) map.set(k, post(v));
      if (useCache) this.cache.set(key, map);
    }
    if (useCache) this.last.set(tag, { lengths, sides, map });
    return map;
  }

  /** The measure of one boundary; `sigma` (polynomials only) renames y_m to y_σ(m) in the result. */
  value(lengths: readonly number[], sides: readonly string[], mode: Mode, sigma?: Permutation, useCache = true, attempt = 0): Value {
    const side5 = sides[4]!;
    const m = this.measure;
    if (m.type === 'puzzles' || (m.type === 'value' && !this.polynomial)) {
      const semiring = m.type === 'puzzles' ? fillingCountSemiring : integerSemiring;
      const map = this.completions(m.type, lengths, sides, () => ({ semiring }), (v) => v, useCache);
      return { kind: 'int', v: (map.get(side5) as SafeInt | undefined) ?? 0 };
    }
    if (m.type === 'statistic') {
      const map = this.completions('stat', lengths, sides, () => ({ semiring: generatingSemiring, weigher: statisticWeigher(new Set([m.kind])) }), (v) => v, useCache);
      return { kind: 'gen', v: (map.get(side5) as Generating | undefined) ?? [] };
    }
    if (mode === 'modular') {
      // A redrawn point (after a vanishing denominator) is seed + attempt; both sides of a comparison share it.
      const key = `${attempt}|${sigma ? sigma.join(',') : ''}`;
      let semiring = this.modular.get(key);
      if (!semiring) {
        const point = modularSemiring(MODULAR_SEED + attempt, DEFAULT_PRIMES, sigma ? (i) => sigma[i - 1] ?? i : undefined);
        // Draw the named variables' points in one order, so both sides of a comparison share them.
        for (const name of this.names) point.variable(name);
        // The residues and the 1-norm bound come from one sweep (the norm is a bound lane beside them).
        semiring = residueNormSemiring(point);
        this.modular.set(key, semiring);
      }
      const ring = semiring;
      const map = this.completions(`mod:${key}`, lengths, sides, () => ({ semiring: ring }), (v) => v, useCache);
      const lanes = (map.get(side5) as Residues | undefined) ?? ring.zero;
      const primes = DEFAULT_PRIMES.length;
      const v = lanes.slice(0, primes);
      const degree = this.modularDegree(lengths);
      if (!degree) return { kind: 'mod', v, norm: 0, degree: 0, unbounded: true };
      // A bound lane past the safe integers is no longer exact: then no coefficient bound is claimed (bound 1).
      return { kind: 'mod', v, norm: normOf(lanes[primes]!), ...degree };
    }
    if (this.fraction) {
      let f = (this.fractions(lengths, sides, useCache).get(side5) as Fraction | undefined) ?? fractionSemiring(0).zero;
      if (sigma) f = substituteFraction(f, (k) => (k < sigma.length ? sigma[k]! - 1 : k));
      return { kind: 'frac', v: f, letter: this.letter };
    }
    const map = this.polynomials(lengths, sides, useCache);
    let p = (map.get(side5) as Polynomial | undefined) ?? new Map<string, bigint>();
    if (sigma) p = substitutePoly(p, (k) => (k < sigma.length ? sigma[k]! - 1 : k));
    return { kind: 'poly', v: p };
  }

  /**
   * The degree bound of a modular value on a region of these side lengths (with `laurent`, of t^a·v for
   * the shift a clearing its denominators: compare two by the sum of their degrees); undefined for
   * quotients with no bound (a modular "holds" on them proves nothing).
   */
  modularDegree(lengths: readonly number[]): { degree: number; laurent?: true } | undefined {
    const triangles = unitTriangleCount(makeRegion(lengths));
    if (this.fraction && !this.span) return undefined;
    if (this.span) {
      // t^a·v is a polynomial for a_k ≤ T·negative per variable, of degree ≤ T·high + Σ a_k; the variables
      // themselves are denominators that must not vanish (+ their number), see modularErrorBound.
      const variables = makeRegion(lengths).size + this.names.length;
      return { degree: triangles * Math.max(this.span.high, 0) + variables * (triangles * this.span.negative + 1), laurent: true };
    }
    return { degree: triangles * weightDegree(this.pieces) };
  }

  private readonly rings = new Map<string, unknown>();
  /** Exact closed counts of the last boundaries confirmed (a failing pair's two confirmations share them). */
  private readonly confirmed = new LruCache<string, Map<string, unknown>>(8);
  private ringOf<R>(key: string, make: () => R): R {
    let r = this.rings.get(key) as R | undefined;
    if (r === undefined) this.rings.set(key, (r = make()));
    return r;
  }

  private polynomials(lengths: readonly number[], sides: readonly string[], useCache: boolean): Map<string, unknown> {
    const region = makeRegion(lengths);
    // One ring per size, so the engine's weight tables (cached per plan and ring) are built once, not per
    // confirmation; its named variables keep the indices they were first given, which `normalize` reads.
    const ring = this.ringOf(`poly|${region.size}`, () => polynomialSemiring(region.size));
    return this.completions(
      'poly',
      lengths,
      sides,
      () => ({ semiring: ring }),
      (v) => this.normalize(v as Polynomial, region.size, ring.variableNames),
      useCache,
    );
  }

  private fractions(lengths: readonly number[], sides: readonly string[], useCache: boolean): Map<string, unknown> {
    const region = makeRegion(lengths);
    const ring = this.ringOf(`frac|${region.size}`, () => fractionSemiring(region.size, this.letter));
    return this.completions(
      'frac',
      lengths,
      sides,
      () => ({ semiring: ring }),
      (v) => {
        const seen = ring.variableNames;
        const f = v as Fraction;
        if (seen.length === 0) return f;
        return substituteFraction(f, (k) => (k < region.size ? k : NAMED_OFFSET + this.names.indexOf(seen[k - region.size]!)));
      },
      useCache,
    );
  }

  /** Every labeling of side 5 reached by some puzzle, with its exact value or puzzle count, from one sweep (side 5 of `sides` is ignored). */
  side5Values(lengths: readonly number[], sides: readonly string[]): [string, Value][] {
    const m = this.measure;
    if (m.type === 'puzzles' || (m.type === 'value' && !this.polynomial)) {
      const semiring = m.type === 'puzzles' ? fillingCountSemiring : integerSemiring;
      const map = this.completions(m.type, lengths, sides, () => ({ semiring }), (v) => v, true);
      return [...map].map(([k, v]): [string, Value] => [k, { kind: 'int', v: v as SafeInt }]);
    }
    if (m.type === 'statistic') throw new CodedError('internal_error', { what: 'Side-5 values', expected: 'a value or puzzle-count measure', received: 'a statistic' });
    if (this.fraction) return [...this.fractions(lengths, sides, true)].map(([k, v]): [string, Value] => [k, { kind: 'frac', v: v as Fraction, letter: this.letter }]);
    return [...this.polynomials(lengths, sides, true)].map(([k, v]): [string, Value] => [k, { kind: 'poly', v: v as Polynomial }]);
  }

  // Named variables move to NAMED_OFFSET + their rank among all names, whatever order a sweep met them in.
  private normalize(p: Polynomial, size: number, seen: readonly string[]): Polynomial {
    if (seen.length === 0) return p;
    return substitutePoly(p, (k) => (k < size ? k : NAMED_OFFSET + this.names.indexOf(seen[k - size]!)));
  }
}

// Largest degree bounds over the weights, when every weight is a Laurent polynomial.
function laurentBound(pieces: PieceSet): { high: number; negative: number } | undefined {
  let high = 0;
  let negative = 0;
  for (const p of pieces.pieces) {
    const w = p.weight;
    if (w.type === 'integer') continue;
    if (w.type !== 'formula') {
      high = Math.max(high, 1);
      continue;
    }
    const s = laurentSpan(w.formula);
    if (!s) return undefined;
    high = Math.max(high, s.high);
    negative = Math.max(negative, s.negative);
  }
  return { high, negative };
}

/** Variable name of a normalized polynomial index. */
export function normalizedName(names: readonly string[]): (k: number) => string {
  return (k) => (k < NAMED_OFFSET ? `y${k + 1}` : (names[k - NAMED_OFFSET] ?? `v${k}`));
}

