import type { ValueForm } from '../report/root-form.js';

/** An exact integer: a JSON number while |x| < 2^53, a decimal string beyond. */
export type JsonInteger = number | string;

/** One term c·∏ x_k^{e_k} of a polynomial value. */
export interface TermJson {
  readonly coefficient: JsonInteger;
  readonly exponents: readonly number[];
}

/** A value: an integer, or a polynomial (or fraction) with its text and exact terms. */
export type ValueJson =
  | JsonInteger
  | {
      readonly text: string;
      /** How `text` is written: in the roots z_m = y_{m+1} − y_m, expanded in y, or factored. */
      readonly form?: ValueForm;
      /** Exponents of y_1..y_N, then of named variables. */
      readonly terms?: readonly TermJson[];
      /** Exponents of z_1..z_{N−1}, when the value is positive in the roots. */
      readonly rootTerms?: readonly TermJson[];
      readonly variables?: readonly string[];
      readonly numerator?: readonly TermJson[];
      readonly denominator?: readonly TermJson[];
    };

/** Partitions as typed back (`21`, `12.3.1`, `0`). */
export interface PartitionsJson {
  readonly lambda: string;
  readonly mu: string;
  readonly nu?: string;
}

/** The `count --json` object. */
export interface CountJson {
  readonly formatVersion: number;
  readonly theory: string;
  readonly lambda?: string;
  readonly mu?: string;
  readonly nu?: string;
  readonly partitions?: PartitionsJson;
  readonly grassmannian?: readonly [number, number];
  readonly lengths: readonly number[];
  readonly sides: readonly string[];
  readonly region: 'own' | 'completed';
  readonly completion?: { readonly lengths: readonly number[]; readonly sides: readonly string[] };
  readonly puzzles: JsonInteger;
  readonly value: ValueJson;
  readonly distribution?: { readonly kind: string; readonly counts: readonly JsonInteger[] };
}

/** The `expand --json` object: σ_λ·σ_μ = Σ value·σ_ν over the listed ν. */
export interface ProductJson {
  readonly formatVersion: number;
  readonly theory: string;
  readonly lambda: string;
  readonly mu: string;
  readonly grassmannian?: readonly [number, number];
  readonly partitions?: PartitionsJson;
  readonly products: readonly { readonly nu: string; readonly partition?: string; readonly value: ValueJson }[];
}

/** The `table --format json` object: every nonzero c_{λμ}^ν of Gr(k, n). */
export interface TableJson {
  readonly formatVersion: number;
  readonly theory: string;
  readonly grassmannian: readonly [number, number];
  readonly entries: readonly {
    readonly lambda: string;
    readonly mu: string;
    readonly nu: string;
    readonly partitions: Required<PartitionsJson>;
    readonly value: ValueJson;
  }[];
}
