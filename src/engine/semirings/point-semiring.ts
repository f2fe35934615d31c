import type { Semiring } from '../semiring.js';
import { CodedError } from '../../errors/index.js';

/** An exact rational number num/den, den > 0, gcd(num, den) = 1. */
export interface PointValue {
  readonly num: bigint;
  readonly den: bigint;
}

const abs = (a: bigint) => (a < 0n ? -a : a);
function gcd(a: bigint, b: bigint): bigint {
  let [x, y] = [abs(a), abs(b)];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function reduced(num: bigint, den: bigint): PointValue {
  if (num === 0n) return { num: 0n, den: 1n };
  const g = gcd(num, den) * (den < 0n ? -1n : 1n);
  return g === 1n ? { num, den } : { num: num / g, den: den / g };
}

/**
 * Values at one rational point: the strip variables y_m (or t_m) take the integers `coordinates[m − 1]` and
 * every value is an exact rational number. Comparing two rational functions here is an identity test
 * (Schwartz–Zippel) for values too large to expand, such as equivariant SSM values at n = 6.
 */
export function pointSemiring(coordinates: readonly bigint[]): Semiring<PointValue> {
  const coordinate = (m: number): bigint => {
    const c = coordinates[m - 1];
    if (c === undefined) throw new CodedError('invalid_argument', { what: 'Point coordinate', expected: `a value for strip ${m}`, received: `${coordinates.length} coordinates` });
    return c;
  };
  const of = (v: bigint): PointValue => ({ num: v, den: 1n });
  return {
    name: 'point',
    zero: of(0n),
    one: of(1n),
    add: (a, b) => (a.den === b.den ? reduced(a.num + b.num, a.den) : reduced(a.num * b.den + b.num * a.den, a.den * b.den)),
    mul: (a, b) => reduced(a.num * b.num, a.den * b.den),
    isZero: (a) => a.num === 0n,
    equals: (a, b) => a.num === b.num && a.den === b.den,
    fromInteger: (n) => of(BigInt(n)),
    variable(name) {
      throw new CodedError('invalid_argument', { what: 'Point value', expected: 'a piece set without named parameters', received: `parameter '${name}'` }, { path: 'theory' });
    },
    position: (i, j) => of(coordinate(j) - coordinate(i)),
    strip: (_letter, index) => of(coordinate(index)),
    divide: (a, b) => {
      if (b.num === 0n) {
        throw new CodedError('division_by_zero', { what: 'Weight quotient', expected: 'a denominator that is nonzero at the point', received: '0' }, { path: 'weight.formula', hint: 'choose another point' });
      }
      return reduced(a.num * b.den, a.den * b.num);
    },
    toText: (a) => (a.den === 1n ? `${a.num}` : `${a.num}/${a.den}`),
  };
}
