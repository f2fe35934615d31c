/**
 * The weight ring a count is taken in. `position(i, j)` is the equivariant weight y_j − y_i;
 * `variable(name)` a named formal variable of a custom piece set.
 */
export interface Semiring<T> {
  readonly name: string;
  /** True for rings where every piece weighs one whatever it declares (counting fillings). */
  readonly weightless?: boolean;
  readonly zero: T;
  readonly one: T;
  add(a: T, b: T): T;
  /**
   * Optional: adds `b` into `acc` and returns it, mutating `acc`. Sweeps call it only on values they
   * created themselves, so big values (polynomials) are not copied once per contribution.
   */
  addInPlace?(acc: T, b: T): T;
  /** Optional: acc += a·b in place, on the same terms as `addInPlace` (no temporary product). */
  addProductInPlace?(acc: T, a: T, b: T): T;
  /** Optional: called on each value a sweep step built once nothing more is added into it (drops build-time indexes). */
  settle?(a: T): void;
  mul(a: T, b: T): T;
  isZero(a: T): boolean;
  equals(a: T, b: T): boolean;
  fromInteger(n: number): T;
  variable(name: string): T;
  position(i: number, j: number): T;
  /** Optional: the strip variable y_m or t_m (1-based m) of a weight formula. */
  strip?(letter: 'y' | 't', index: number): T;
  /** Optional: the exact quotient a / b of a weight formula; rings without it reject quotients. */
  divide?(a: T, b: T): T;
  toText(a: T): string;
  /**
   * Optional: how the numeric kernel may hold these values in typed arrays: exact integers (safe
   * integers, redone in bigint on overflow), or residues modulo each prime (values are residue arrays).
   */
  readonly numeric?: NumericForm;
  /** Optional: the number of terms a value holds, for the memory estimate of long sweeps. */
  terms?(a: T): number;
  /** Optional: bytes one term takes in a sweep's table (default: a Map entry's, `BYTES_PER_TERM`). */
  readonly termBytes?: number;
  /**
   * Optional: a cheaper form of these values that sweeps compute in (polynomials as typed arrays);
   * the same object on every call, so weight tables cached per ring stay valid.
   */
  work?(): WorkForm<T>;
}

/** Values of a ring in another form: sweeps run in `semiring` and convert each final value `out`. */
export interface WorkForm<T> {
  readonly semiring: Semiring<unknown>;
  into(value: T): unknown;
  out(value: unknown): T;
}

/**
 * Numeric representation of a semiring's values (see `Semiring.numeric`). A modulus 0 among the
 * moduli is a bound lane: a nonnegative float64 (an upper bound such as a 1-norm; numeric-kernel.ts).
 */
export type NumericForm = { readonly kind: 'integer' } | { readonly kind: 'modular'; readonly moduli: readonly number[] };
