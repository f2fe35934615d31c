import type { Semiring } from '../semiring.js';
import { CodedError } from '../../errors/index.js';

/**
 * An exact rational number num / Π atom^e: the denominator is kept as the integers divided by (positive,
 * with multiplicities), so adding two values brings them to common multiplicities without any gcd.
 */
export interface PointValue {
  readonly num: bigint;
  readonly den: ReadonlyMap<bigint, number>;
}

const NONE: ReadonlyMap<bigint, number> = new Map();
const abs = (a: bigint) => (a < 0n ? -a : a);
function gcd(a: bigint, b: bigint): bigint {
  let [x, y] = [abs(a), abs(b)];
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function denominator(v: PointValue): bigint {
  let d = 1n;
  for (const [atom, e] of v.den) for (let q = 0; q < e; q++) d *= atom;
  return d;
}

/** The value as a reduced fraction num/den, den > 0. */
export function pointFraction(v: PointValue): { num: bigint; den: bigint } {
  const den = denominator(v);
  const g = gcd(v.num, den);
  return v.num === 0n ? { num: 0n, den: 1n } : { num: v.num / g, den: den / g };
}

// a.num scaled to the denominator `to` (which contains a's).
function scaled(a: PointValue, to: ReadonlyMap<bigint, number>): bigint {
  let num = a.num;
  for (const [atom, e] of to) for (let q = a.den.get(atom) ?? 0; q < e; q++) num *= atom;
  return num;
}

function add(a: PointValue, b: PointValue): PointValue {
  if (b.num === 0n) return a;
  if (a.num === 0n) return b;
  if (a.den.size === 0 && b.den.size === 0) return { num: a.num + b.num, den: NONE };
  const den = new Map(a.den);
  for (const [atom, e] of b.den) den.set(atom, Math.max(e, den.get(atom) ?? 0));
  const num = scaled(a, den) + scaled(b, den);
  return num === 0n ? { num: 0n, den: NONE } : { num, den };
}

function mul(a: PointValue, b: PointValue): PointValue {
  const num = a.num * b.num;
  if (num === 0n) return { num: 0n, den: NONE };
  if (b.den.size === 0) return { num, den: a.den };
  if (a.den.size === 0) return { num, den: b.den };
  const den = new Map(a.den);
  for (const [atom, e] of b.den) den.set(atom, e + (den.get(atom) ?? 0));
  return { num, den };
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
  const of = (v: bigint): PointValue => ({ num: v, den: NONE });
  return {
    name: 'point',
    zero: of(0n),
    one: of(1n),
    add,
    mul,
    isZero: (a) => a.num === 0n,
    equals: (a, b) => scaled(a, NONE) * denominator(b) === b.num * denominator(a),
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
      // a / (b.num / D_b) = a·D_b / b.num; b.num joins the denominator's atoms, its sign goes up.
      const atom = abs(b.num);
      const top = mul(a, { num: denominator(b) * (b.num < 0n ? -1n : 1n), den: NONE });
      return atom === 1n ? top : mul(top, { num: 1n, den: new Map([[atom, 1]]) });
    },
    toText: (a) => {
      const f = pointFraction(a);
      return f.den === 1n ? `${f.num}` : `${f.num}/${f.den}`;
    },
  };
}
