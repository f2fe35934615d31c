import { addFraction, addInt, addPoly, constantPoly, fractionOf, isZeroInt, mulFraction, mulInt, mulPoly, toBigInt, type Fraction, type Polynomial, type SafeInt, type StripLetter } from '../../engine/index.js';
import { CodedError } from '../../errors/index.js';
import type { Value } from '../measure.js';
import { nextString } from '../multiset-rank.js';
import type { CompiledBinder, CompiledTerm } from './compile-formula.js';
import type { StringEnv } from './string-expr.js';

/** The value of one boundary in one theory (exact: integers, polynomials or quotients). */
export type ValueOf = (theory: string, lengths: readonly number[], sides: readonly string[]) => Value;

/** Every labeling of side 5 with its value, the other sides as given (one open-side-5 sweep). */
export type Side5Of = (theory: string, lengths: readonly number[], sides: readonly string[]) => readonly (readonly [string, Value])[];

type Exact = { kind: 'int'; v: SafeInt } | { kind: 'poly'; v: Polynomial } | { kind: 'frac'; v: Fraction; letter: StripLetter };

const asPoly = (x: Exact): Polynomial => (x.kind === 'poly' ? x.v : x.kind === 'int' ? constantPoly(toBigInt(x.v)) : x.v.num);
const asFraction = (x: Exact): Fraction => (x.kind === 'frac' ? x.v : fractionOf(asPoly(x)));
const isZero = (x: Exact) => (x.kind === 'int' ? isZeroInt(x.v) : x.kind === 'poly' ? x.v.size === 0 : x.v.num.size === 0);

function exact(v: Value): Exact {
  if (v.kind === 'int' || v.kind === 'poly' || v.kind === 'frac') return v;
  throw new CodedError('internal_error', { what: 'Formula value', expected: 'an exact integer, polynomial or quotient', received: `a ${v.kind} value` });
}

// Quotients (Laurent values of equivariant K-theory, rational functions) absorb integers and polynomials.
const letterOf = (a: Exact, b: Exact): StripLetter | undefined => (a.kind === 'frac' ? a.letter : b.kind === 'frac' ? b.letter : undefined);

function add(a: Exact, b: Exact): Exact {
  if (a.kind === 'int' && b.kind === 'int') return { kind: 'int', v: addInt(a.v, b.v) };
  const letter = letterOf(a, b);
  if (letter) return { kind: 'frac', v: addFraction(asFraction(a), asFraction(b)), letter };
  return { kind: 'poly', v: addPoly(asPoly(a), asPoly(b)) };
}

function mul(a: Exact, b: Exact): Exact {
  if (a.kind === 'int' && b.kind === 'int') return { kind: 'int', v: mulInt(a.v, b.v) };
  const letter = letterOf(a, b);
  if (letter) return { kind: 'frac', v: mulFraction(asFraction(a), asFraction(b)), letter };
  return { kind: 'poly', v: mulPoly(asPoly(a), asPoly(b)) };
}

/** Every string with the given label counts, in lexicographic order. */
function* arrangements(labels: number[], alphabet: readonly string[]): Generator<string> {
  const a = [...labels].sort((x, y) => x - y);
  do yield a.map((k) => alphabet[k]!).join('');
  while (nextString(a));
}

function* binderStrings(b: CompiledBinder, env: StringEnv, variables: Readonly<Record<string, number>>, alphabet: readonly string[]): Generator<string> {
  if (b.kind === 'content') {
    yield* arrangements([...b.of.build(env, variables)].map((c) => alphabet.indexOf(c)), alphabet);
    return;
  }
  const n = evalLength(b, variables);
  if (b.ones !== undefined) {
    const ones = b.ones.constant + Object.entries(b.ones.coefficients).reduce((s, [k, c]) => s + c * (variables[k] ?? 0), 0);
    const one = alphabet.indexOf('1');
    const zero = alphabet.indexOf('0');
    yield* arrangements([...new Array<number>(n - ones).fill(zero), ...new Array<number>(ones).fill(one)], alphabet);
    return;
  }
  // Every string of length n: each content in turn.
  const counts = (rest: number, parts: number): number[][] => (parts === 1 ? [[rest]] : Array.from({ length: rest + 1 }, (_, k) => counts(rest - k, parts - 1).map((c) => [k, ...c])).flat());
  for (const c of counts(n, alphabet.length)) yield* arrangements(c.flatMap((m, k) => new Array<number>(m).fill(k)), alphabet);
}

function evalLength(b: Extract<CompiledBinder, { kind: 'length' }>, variables: Readonly<Record<string, number>>): number {
  return b.length.constant + Object.entries(b.length.coefficients).reduce((s, [k, c]) => s + c * (variables[k] ?? 0), 0);
}

/** Σ over the terms of coefficient · Σ_η Π value(boundary), for the boundary b with `sides`. */
export function evaluateTerms(terms: readonly CompiledTerm[], sides: readonly string[], variables: Readonly<Record<string, number>>, valueOf: ValueOf, alphabet: readonly string[], side5Of?: Side5Of): Value {
  let total: Exact = { kind: 'int', v: 0 };
  for (const term of terms) {
    const bound = new Map<string, string>();
    const env: StringEnv = { sides, bound };
    // Factors already known from a driver's sweep, by product index.
    const known = new Map<number, Exact>();
    let sum: Exact = { kind: 'int', v: 0 };
    const go = (k: number): void => {
      if (k === term.binders.length) {
        let product: Exact = { kind: 'int', v: 1 };
        for (let q = 0; q < term.product.length; q++) {
          let v = known.get(q);
          if (v === undefined) {
            const s = term.product[q]!.sides.map((x) => x.build(env, variables));
            // Boundary labels are single characters, so a side's length is its string length.
            v = exact(valueOf(term.product[q]!.theory, s.map((x) => x.length), s));
          }
          if (isZero(v)) return;
          product = mul(product, v);
        }
        sum = add(sum, product);
        return;
      }
      const b = term.binders[k]!;
      const driver = side5Of ? term.drivers[k] : undefined;
      if (driver) {
        // Only the strings where the driver's factor is nonzero can contribute: read them off one sweep.
        const p = term.product[driver.product]!;
        const length = b.kind === 'length' ? evalLength(b, variables) : b.of.build(env, variables).length;
        const built = p.sides.map((x, i) => (i === 4 ? '0'.repeat(length) : x.build(env, variables)));
        const wanted = b.kind === 'content' ? [...b.of.build(env, variables)].sort().join('') : undefined;
        const ones = b.kind === 'length' && b.ones !== undefined ? b.ones.constant + Object.entries(b.ones.coefficients).reduce((acc, [name, c]) => acc + c * (variables[name] ?? 0), 0) : undefined;
        for (const [s5, value] of side5Of!(p.theory, built.map((x) => x.length), built)) {
          const v = exact(value);
          if (isZero(v) || s5.length !== length) continue;
          const s = driver.reversed ? [...s5].reverse().join('') : s5;
          if (wanted !== undefined && [...s].sort().join('') !== wanted) continue;
          if (ones !== undefined && [...s].filter((c) => c === '1').length !== ones) continue;
          bound.set(b.name, s);
          known.set(driver.product, v);
          go(k + 1);
        }
        known.delete(driver.product);
        bound.delete(b.name);
        return;
      }
      for (const s of binderStrings(b, env, variables, alphabet)) {
        bound.set(b.name, s);
        go(k + 1);
      }
      bound.delete(b.name);
    };
    go(0);
    total = add(total, mul({ kind: 'int', v: term.coefficient }, sum));
  }
  return total;
}
