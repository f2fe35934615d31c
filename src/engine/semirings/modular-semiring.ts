
import type { Semiring } from '../semiring.js';
import { CodedError } from '../../errors/index.js';

// b^{-1} mod p by the extended Euclidean algorithm (p prime, 0 < b < p; all values stay below 2^26).
function inverseMod(b: number, p: number): number {
  let [r0, r1, s0, s1] = [p, b, 0, 1];
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1, s0, s1] = [r1, r0 - q * r1, s1, s0 - q * s1];
  }
  return ((s0 % p) + p) % p;
}

/** Residues of one value modulo each prime, at one random evaluation point of the variables. */
export type Residues = readonly number[];

// Primes below 2^26, so a product of two residues (< 2^52) stays exact in a double.
function primesBelow(limit: number, count: number): number[] {
  const found: number[] = [];
  for (let p = limit - 1; found.length < count; p -= 2) {
    let prime = p % 2 === 1;
    for (let d = 3; prime && d * d <= p; d += 2) if (p % d === 0) prime = false;
    if (prime) found.push(p);
  }
  return found;
}

export const DEFAULT_PRIMES: readonly number[] = primesBelow(2 ** 26, 3);

// A small deterministic generator (mulberry32) so that the same seed evaluates at the same point.
function generator(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// FNV-1a over the name's UTF-16 code units: a fixed 32-bit tag per variable name.
function nameHash(name: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < name.length; i++) h = Math.imul(h ^ name.charCodeAt(i), 0x01000193) >>> 0;
  return h;
}

export interface ModularSemiring extends Semiring<Residues> {
  readonly primes: readonly number[];
  readonly seed: number;
}

/**
 * Values evaluated at a pseudo-random point modulo several primes: a polynomial identity test.
 * Equal residues mean equal polynomials except with the probability `modularErrorBound` gives.
 */
export function modularSemiring(seed = 1, primes: readonly number[] = DEFAULT_PRIMES, substitution?: (m: number) => number): ModularSemiring {
  // Each variable's coordinates depend on the seed and its name only, never on the order in which a count
  // first touches variables: two semirings of one seed (say with and without a substitution) share the point.
  const points = new Map<string, Residues>();
  const point = (name: string): Residues => {
    let r = points.get(name);
    if (!r) {
      const random = generator(seed ^ nameHash(name));
      r = primes.map((p) => Math.floor(random() * p));
      points.set(name, r);
    }
    return r;
  };
  const m = primes.length;
  const of = (f: (p: number, k: number) => number): Residues => primes.map(f);
  const zero = of(() => 0);
  const one = of(() => 1);
  return {
    name: 'modular',
    primes,
    seed,
    zero,
    one,
    // Plain loops: these run once per transition of a sweep, so no closures or intermediate arrays.
    add: (a, b) => {
      const r = new Array<number>(m);
      for (let k = 0; k < m; k++) {
        const s = a[k]! + b[k]!;
        r[k] = s >= primes[k]! ? s - primes[k]! : s;
      }
      return r;
    },
    addInPlace: (acc, b) => {
      const r = acc as number[];
      for (let k = 0; k < m; k++) {
        const s = r[k]! + b[k]!;
        r[k] = s >= primes[k]! ? s - primes[k]! : s;
      }
      return r;
    },
    mul: (a, b) => {
      const r = new Array<number>(m);
      for (let k = 0; k < m; k++) r[k] = (a[k]! * b[k]!) % primes[k]!;
      return r;
    },
    isZero: (a) => {
      for (let k = 0; k < m; k++) if (a[k] !== 0) return false;
      return true;
    },
    equals: (a, b) => {
      for (let k = 0; k < m; k++) if (a[k] !== b[k]) return false;
      return true;
    },
    fromInteger: (n) => of((p) => ((n % p) + p) % p),
    variable: (name) => point(`var:${name}`),
    // With a substitution y_m ↦ y_σ(m), the value is that of the substituted polynomial at the same point.
    position: (i, j) => {
      const yi = point(`y${substitution ? substitution(i) : i}`);
      const yj = point(`y${substitution ? substitution(j) : j}`);
      return of((p, k) => (yj[k]! - yi[k]! + p) % p);
    },
    strip: (letter, index) => point(`${letter}${substitution ? substitution(index) : index}`),
    divide: (a, b) =>
      of((p, k) => {
        if (b[k] === 0) {
          throw new CodedError('division_by_zero', { what: 'Weight quotient', expected: `a denominator that is nonzero modulo ${p}`, received: '0' }, { path: 'weight.formula', hint: 'a strip difference such as y_j − y_i vanishes on pieces whose two strips coincide' });
        }
        return (a[k]! * inverseMod(b[k]!, p)) % p;
      }),
    toText: (a) => `[${a.map((r, k) => `${r} mod ${primes[k]}`).join(', ')}]`,
    numeric: { kind: 'modular', moduli: primes },
  };
}

/**
 * Probability that two different integer polynomials of total degree ≤ `degree` agree at the random
 * points modulo every prime (Schwartz–Zippel over each F_p, one independent point per prime).
 * `coefficientBound` bounds the absolute value of every coefficient of their difference: below the
 * smallest prime, the difference survives modulo each prime and the chances multiply; below the
 * product of the primes, it survives modulo at least one; beyond that no claim is made (bound 1).
 */
export function modularErrorBound(degree: number, coefficientBound: bigint, primes: readonly number[] = DEFAULT_PRIMES): number {
  const smallest = Math.min(...primes);
  const product = primes.reduce((acc, p) => acc * BigInt(p), 1n);
  if (coefficientBound < BigInt(smallest)) return primes.reduce((acc, p) => acc * Math.min(1, degree / p), 1);
  if (coefficientBound < product) return Math.min(1, degree / smallest);
  return 1;
}
