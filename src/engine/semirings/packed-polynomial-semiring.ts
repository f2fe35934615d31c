import type { Semiring, WorkForm } from '../semiring.js';
import { MonomialTable } from './monomial-table.js';
import { addBigTerm, addPacked, addPackedInPlace, addProductPacked, addTerm, bigAt, mulPacked, packedEquals, PackedPoly, settlePacked } from './packed-polynomial.js';
import type { Polynomial } from './polynomial.js';

/** Bytes per term of a packed table (id, coefficient, index slots and growth slack; measured order of magnitude). */
export const PACKED_BYTES_PER_TERM = 40;

/** The monomial table of a packed polynomial form: to read values of `packedForm(...).semiring`. */
export interface PackedForm extends WorkForm<Polynomial> {
  readonly table: MonomialTable;
  into(value: Polynomial): PackedPoly;
  out(value: unknown): Polynomial;
}

/** Map → packed, monomials interned in `table`. */
export function packPolynomial(table: MonomialTable, p: Polynomial): PackedPoly {
  const q = new PackedPoly(p.size);
  for (const [key, c] of p) addBigTerm(q, table.intern(key), c);
  return q;
}

/** Packed → Map (the exact polynomial type every caller reads). */
export function unpackPolynomial(table: MonomialTable, p: PackedPoly): Polynomial {
  const out = new Map<string, bigint>();
  for (let e = 0; e < p.count; e++) {
    const c = bigAt(p, e);
    if (c !== 0n) out.set(table.keyOf(p.ids[e]!), c);
  }
  return out;
}

/**
 * The packed form of a polynomial ring: arithmetic on typed arrays, every other operation (weights,
 * variables, text) through the Map form, so names and variable numbering stay the ring's own.
 */
export function packedForm(outer: Semiring<Polynomial>): PackedForm {
  const table = new MonomialTable();
  const into = (p: Polynomial) => packPolynomial(table, p);
  const out = (p: unknown) => unpackPolynomial(table, p as PackedPoly);
  const one = new PackedPoly(1);
  addTerm(one, 0, 1);
  const semiring: Semiring<PackedPoly> = {
    name: outer.name,
    zero: new PackedPoly(0),
    one,
    add: addPacked,
    addInPlace: addPackedInPlace,
    mul: (a, b) => mulPacked(table, a, b),
    addProductInPlace: (acc, a, b) => addProductPacked(table, acc, a, b),
    settle: settlePacked,
    isZero: (a) => a.live === 0,
    equals: packedEquals,
    fromInteger: (n) => into(outer.fromInteger(n)),
    variable: (name) => into(outer.variable(name)),
    position: (i, j) => into(outer.position(i, j)),
    ...(outer.strip ? { strip: (letter: 'y' | 't', index: number) => into(outer.strip!(letter, index)) } : {}),
    toText: (a) => outer.toText(out(a)),
    terms: (a) => a.live,
    termBytes: PACKED_BYTES_PER_TERM,
  };
  return { table, semiring: semiring as Semiring<unknown>, into, out };
}
