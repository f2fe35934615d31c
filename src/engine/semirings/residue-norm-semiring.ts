import type { Semiring } from '../semiring.js';
import type { ModularSemiring, Residues } from './modular-semiring.js';

/**
 * Residues at a random point and a bound on the 1-norm, from one sweep: a value is
 * `[r_1, …, r_m, norm]`, the residues of a modular semiring followed by one bound lane (numeric-kernel.ts).
 * The norm lane weighs every piece by the 1-norm of its weight (an integer n by |n|, y_j − y_i by 2, a
 * strip or named variable by 1), so it sums Π‖w‖₁ over the puzzles, which bounds the 1-norm of the exact
 * value: what `modularErrorBound` needs besides the residues. Quotient weights keep their numerator's
 * norm: right for Laurent weights (their divisors are ± monomials, of 1-norm 1); any other quotient's
 * value has no coefficient bound at all, and callers treat it so.
 */
export interface ResidueNormSemiring extends Semiring<Residues> {
  readonly modular: ModularSemiring;
}

export function residueNormSemiring(modular: ModularSemiring): ResidueNormSemiring {
  const m = modular.primes.length;
  const join = (r: Residues, norm: number): Residues => [...r, norm];
  const residues = (a: Residues) => a.slice(0, m);
  const norm = (a: Residues) => a[m]!;
  const lift = (f: (a: Residues, b: Residues) => Residues, g: (x: number, y: number) => number) => (a: Residues, b: Residues) => join(f(residues(a), residues(b)), g(norm(a), norm(b)));
  return {
    name: 'residues and norm',
    modular,
    zero: join(modular.zero, 0),
    one: join(modular.one, 1),
    add: lift(modular.add, (x, y) => x + y),
    mul: lift(modular.mul, (x, y) => x * y),
    // Zero only with a zero norm: a sweep dropping zero states must not drop a contribution to the bound.
    isZero: (a) => modular.isZero(residues(a)) && norm(a) === 0,
    equals: (a, b) => modular.equals(residues(a), residues(b)) && norm(a) === norm(b),
    fromInteger: (n) => join(modular.fromInteger(n), Math.abs(n)),
    variable: (name) => join(modular.variable(name), 1),
    position: (i, j) => join(modular.position(i, j), 2),
    strip: (letter, index) => join(modular.strip!(letter, index), 1),
    divide: lift(modular.divide!, (x) => x),
    toText: (a) => `${modular.toText(residues(a))}, 1-norm ≤ ${norm(a)}`,
    numeric: { kind: 'modular', moduli: [...modular.primes, 0] },
  };
}
