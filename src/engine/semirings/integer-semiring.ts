
import type { Semiring } from '../semiring.js';
import { addInt, intEquals, isZeroInt, mulInt, type SafeInt } from './safe-integer.js';
import { CodedError } from '../../errors/index.js';

/** Exact integers with automatic promotion to bigint; position weights and variables are rejected. */
export const integerSemiring: Semiring<SafeInt> = {
  name: 'integer',
  zero: 0,
  one: 1,
  add: addInt,
  mul: mulInt,
  isZero: isZeroInt,
  equals: intEquals,
  fromInteger: (n) => n,
  variable(name) {
    throw new CodedError('internal_error', { what: 'Integer value', expected: 'a piece set without formal variables', received: `variable '${name}'` }, { path: 'theory', hint: 'count it with the polynomial semiring' });
  },
  position() {
    throw new CodedError('internal_error', { what: 'Integer value', expected: 'a piece set without position weights', received: 'an equivariant piece' }, { path: 'theory', hint: 'count it with the polynomial or modular semiring' });
  },
  toText: (a) => a.toString(),
  numeric: { kind: 'integer' },
};

/** Counts fillings: every piece weighs 1, whatever its declared weight. */
export const fillingCountSemiring: Semiring<SafeInt> = {
  ...integerSemiring,
  name: 'fillings',
  weightless: true,
  fromInteger: () => 1,
  variable: () => 1,
  position: () => 1,
};
