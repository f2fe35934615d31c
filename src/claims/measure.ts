import {
  countCompletions,
  DEFAULT_PRIMES,
  fillingCountSemiring,
  formulaDegree,
  generatingSemiring,
  integerSemiring,
  makeRegion,
  modularSemiring,
  polynomialSemiring,
  substitutePoly,
  statisticWeigher,
  unitTriangleCount,
  type CountOptions,
  type Generating,
  type PieceSet,
  type Polynomial,
  type Residues,
  type SafeInt,
  type Semiring,
} from '../engine/index.js';
import type { Measure } from './claim-schema.js';
import { hasIntegerWeights } from './resolve-theory.js';
import { LruCache } from './lru-cache.js';
import type { Permutation } from './substitution.js';

/** Index of the first named (non-y) variable in normalized polynomials; y_k is index k−1. */
export const NAMED_OFFSET = 256;

/** One measured value. Modular values carry a bound on the 1-norm of the exact polynomial and its degree. */
export type Value =
  | { readonly kind: 'int'; readonly v: SafeInt }
  | { readonly kind: 'gen'; readonly v: Generating }
  | { readonly kind: 'poly'; readonly v: Polynomial }
  | { readonly kind: 'mod'; readonly v: Residues; readonly norm: SafeInt; readonly degree: number };

const abs = (n: number) => (n < 0 ? -n : n);

// Every weight replaced by the 1-norm of its polynomial: the count bounds the 1-norm of the value.
const normSemiring: Semiring<SafeInt> = {
  ...integerSemiring,
  name: 'norm',
  fromInteger: (n) => abs(n),
  variable: () => 1,
  position: () => 2,
  strip: () => 1,
};

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
  private readonly modular = new Map<string, Semiring<Residues>>();
  /** The last sweep used per tag (value, norm, …), for runs of instances that differ only in side 5. */
  private readonly last = new Map<string, { lengths: readonly number[]; sides: readonly string[]; map: Map<string, unknown> }>();
  readonly polynomial: boolean;

  constructor(
    readonly pieces: PieceSet,
    readonly measure: Measure,
    /** Sorted names of the formal variables of every theory in the comparison. */
    readonly names: readonly string[],
    cacheSize = 256,
  ) {
    this.cache = new LruCache(cacheSize);
    this.polynomial = measure.type === 'value' && !hasIntegerWeights(pieces);
  }

  // One sweep for every side-5 labeling; the cache makes consecutive instances (same sides 1-4, 6) a lookup.
  private completions<T>(tag: string, lengths: readonly number[], sides: readonly string[], options: () => CountOptions<T>, post: (v: T) => unknown, useCache: boolean): Map<string, unknown> {
    // Consecutive instances usually share everything but side 5: answer those without building a key.
    const last = this.last.get(tag);
    if (useCache && last && sameButSide5(last.lengths, lengths, last.sides, sides)) return last.map;
    const key = `${tag}|${lengths.join(',')}|${sides.map((s, i) => (i === 4 ? '' : s)).join('|')}`;
    let map = useCache ? this.cache.get(key) : undefined;
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
  value(lengths: readonly number[], sides: readonly string[], mode: Mode, sigma?: Permutation, useCache = true): Value {
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
      const key = sigma ? sigma.join(',') : '';
      let semiring = this.modular.get(key);
      if (!semiring) {
        semiring = modularSemiring(MODULAR_SEED, DEFAULT_PRIMES, sigma ? (i) => sigma[i - 1] ?? i : undefined);
        // Draw the named variables' points in one order, so both sides of a comparison share them.
        for (const name of this.names) semiring.variable(name);
        this.modular.set(key, semiring);
      }
      const ring = semiring;
      const map = this.completions(`mod:${key}`, lengths, sides, () => ({ semiring: ring }), (v) => v, useCache);
      const norms = this.completions('norm', lengths, sides, () => ({ semiring: normSemiring }), (v) => v, useCache);
      return {
        kind: 'mod',
        v: (map.get(side5) as Residues | undefined) ?? ring.zero,
        norm: (norms.get(side5) as SafeInt | undefined) ?? 0,
        degree: unitTriangleCount(makeRegion(lengths)) * weightDegree(this.pieces),
      };
    }
    const map = this.polynomials(lengths, sides, useCache);
    let p = (map.get(side5) as Polynomial | undefined) ?? new Map<string, bigint>();
    if (sigma) p = substitutePoly(p, (k) => (k < sigma.length ? sigma[k]! - 1 : k));
    return { kind: 'poly', v: p };
  }

  private polynomials(lengths: readonly number[], sides: readonly string[], useCache: boolean): Map<string, unknown> {
    const region = makeRegion(lengths);
    let ring = polynomialSemiring(region.size);
    return this.completions(
      'poly',
      lengths,
      sides,
      () => {
        ring = polynomialSemiring(region.size);
        return { semiring: ring };
      },
      (v) => this.normalize(v as Polynomial, region.size, ring.variableNames),
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
    if (m.type === 'statistic') throw new Error('side-5 values of a statistic are not needed');
    return [...this.polynomials(lengths, sides, true)].map(([k, v]): [string, Value] => [k, { kind: 'poly', v: v as Polynomial }]);
  }

  // Named variables move to NAMED_OFFSET + their rank among all names, whatever order a sweep met them in.
  private normalize(p: Polynomial, size: number, seen: readonly string[]): Polynomial {
    if (seen.length === 0) return p;
    return substitutePoly(p, (k) => (k < size ? k : NAMED_OFFSET + this.names.indexOf(seen[k - size]!)));
  }
}

/** Variable name of a normalized polynomial index. */
export function normalizedName(names: readonly string[]): (k: number) => string {
  return (k) => (k < NAMED_OFFSET ? `y${k + 1}` : (names[k - NAMED_OFFSET] ?? `v${k}`));
}

