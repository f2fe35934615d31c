import type { MonomialTable } from './monomial-table.js';

/**
 * A polynomial as parallel typed arrays: monomial ids (a `MonomialTable`) and coefficients, with an
 * open-addressing index from id to entry. A sweep holds millions of terms; as Map entries with
 * string keys and bigints they cost ~150 bytes each and keep the garbage collector busy, here ~25.
 * Coefficients are safe integers in a Float64Array until one sum or product would leave ±(2^53 − 1);
 * that polynomial then holds bigints (`big`) from then on. Entries whose coefficient cancelled to 0
 * stay in place (`live` counts the others), so the index never needs deletions.
 */
export class PackedPoly {
  count = 0;
  live = 0;
  ids: Int32Array;
  coefs: Float64Array;
  big: bigint[] | null = null;
  /** entry + 1 per slot, 0 when empty; power-of-two length, at most half full. */
  slots: Int32Array;

  constructor(capacity: number) {
    const cap = Math.max(2, capacity);
    this.ids = new Int32Array(cap);
    this.coefs = new Float64Array(cap);
    this.slots = new Int32Array(slotLength(cap));
  }
}

const MAX = Number.MAX_SAFE_INTEGER;

function slotLength(capacity: number): number {
  let n = 4;
  while (n < 2 * capacity) n *= 2;
  return n;
}

function hashSlot(id: number, mask: number): number {
  return (Math.imul(id, 0x9e3779b1) >>> 7) & mask;
}

const NO_SLOTS = new Int32Array(0);

/** Drops the index (rebuilt on the next lookup): a table's finished values are only read. */
export function settlePacked(p: PackedPoly): void {
  p.slots = NO_SLOTS;
}

/** The entry of monomial `id`, or −1. */
export function entryOf(p: PackedPoly, id: number): number {
  if (p.slots.length === 0) rehash(p, slotLength(p.count));
  const slots = p.slots;
  const mask = slots.length - 1;
  for (let h = hashSlot(id, mask); ; h = (h + 1) & mask) {
    const e = slots[h]! - 1;
    if (e < 0) return -1;
    if (p.ids[e] === id) return e;
  }
}

// The entry of `id`, appended with coefficient 0 when absent.
function entryFor(p: PackedPoly, id: number): number {
  if (p.slots.length === 0) rehash(p, slotLength(p.count + 1));
  let slots = p.slots;
  let mask = slots.length - 1;
  let h = hashSlot(id, mask);
  for (; ; h = (h + 1) & mask) {
    const e = slots[h]! - 1;
    if (e < 0) break;
    if (p.ids[e] === id) return e;
  }
  const e = p.count;
  if (e === p.ids.length) grow(p);
  if (2 * (e + 1) > slots.length) {
    rehash(p, slots.length * 2);
    slots = p.slots;
    mask = slots.length - 1;
    for (h = hashSlot(id, mask); slots[h] !== 0; h = (h + 1) & mask);
  }
  slots[h] = e + 1;
  p.ids[e] = id;
  if (p.big) p.big[e] = 0n;
  else p.coefs[e] = 0;
  p.count = e + 1;
  return e;
}

function grow(p: PackedPoly): void {
  const cap = p.ids.length * 2;
  const ids = new Int32Array(cap);
  ids.set(p.ids);
  p.ids = ids;
  if (!p.big) {
    const coefs = new Float64Array(cap);
    coefs.set(p.coefs);
    p.coefs = coefs;
  }
}

function rehash(p: PackedPoly, length: number): void {
  const slots = new Int32Array(length);
  const mask = length - 1;
  for (let e = 0; e < p.count; e++) {
    let h = hashSlot(p.ids[e]!, mask);
    while (slots[h] !== 0) h = (h + 1) & mask;
    slots[h] = e + 1;
  }
  p.slots = slots;
}

// From here on the coefficients of p are bigints.
function promote(p: PackedPoly): bigint[] {
  const big = new Array<bigint>(p.count);
  for (let e = 0; e < p.count; e++) big[e] = BigInt(p.coefs[e]!);
  p.big = big;
  p.coefs = new Float64Array(0);
  return big;
}

/** p += c·x^id for a safe integer c. */
export function addTerm(p: PackedPoly, id: number, c: number): void {
  const e = entryFor(p, id);
  if (p.big) return addBigAt(p, e, BigInt(c));
  const old = p.coefs[e]!;
  const s = old + c;
  if (s > MAX || s < -MAX) {
    promote(p);
    return addBigAt(p, e, BigInt(c));
  }
  p.coefs[e] = s;
  if (old === 0) p.live++;
  else if (s === 0) p.live--;
}

/** p += c·x^id for any integer c. */
export function addBigTerm(p: PackedPoly, id: number, c: bigint): void {
  const e = entryFor(p, id);
  if (!p.big) {
    if (c >= -MAX && c <= MAX) return addTerm(p, id, Number(c));
    promote(p);
  }
  addBigAt(p, e, c);
}

function addBigAt(p: PackedPoly, e: number, c: bigint): void {
  const big = p.big!;
  const old = big[e]!;
  const s = old + c;
  big[e] = s;
  if (old === 0n) {
    if (s !== 0n) p.live++;
  } else if (s === 0n) p.live--;
}

/** The coefficient of entry e as a bigint. */
export function bigAt(p: PackedPoly, e: number): bigint {
  return p.big ? p.big[e]! : BigInt(p.coefs[e]!);
}

/** A copy of p that may be mutated. */
export function clonePacked(p: PackedPoly): PackedPoly {
  const q = new PackedPoly(0);
  q.count = p.count;
  q.live = p.live;
  q.ids = p.ids.slice();
  q.coefs = p.coefs.slice();
  q.big = p.big ? p.big.slice() : null;
  q.slots = p.slots.slice();
  return q;
}

/** acc += b, mutating acc; returns acc. */
export function addPackedInPlace(acc: PackedPoly, b: PackedPoly): PackedPoly {
  const n = b.count;
  const ids = b.ids;
  if (b.big) {
    for (let e = 0; e < n; e++) if (b.big[e] !== 0n) addBigTerm(acc, ids[e]!, b.big[e]!);
    return acc;
  }
  const coefs = b.coefs;
  for (let e = 0; e < n; e++) {
    const c = coefs[e]!;
    if (c !== 0) addTerm(acc, ids[e]!, c);
  }
  return acc;
}

export function addPacked(a: PackedPoly, b: PackedPoly): PackedPoly {
  if (b.live === 0) return a;
  if (a.live === 0) return b;
  return a.count >= b.count ? addPackedInPlace(clonePacked(a), b) : addPackedInPlace(clonePacked(b), a);
}

/** a·b; monomial products through `table`. */
export function mulPacked(table: MonomialTable, a: PackedPoly, b: PackedPoly): PackedPoly {
  if (a.live === 0 || b.live === 0) return new PackedPoly(0);
  return addProductPacked(table, new PackedPoly(Math.min(Math.max(a.count, b.count) * Math.min(a.live, b.live), 1 << 20)), a, b);
}

/** out += a·b, mutating out (which must be neither a nor b); returns out. */
export function addProductPacked(table: MonomialTable, out: PackedPoly, a: PackedPoly, b: PackedPoly): PackedPoly {
  // Let the outer loop run over the smaller factor (usually a weight of one or two terms).
  if (a.live < b.live) [a, b] = [b, a];
  const n = a.count;
  for (let f = 0; f < b.count; f++) {
    if (b.big ? b.big[f] === 0n : b.coefs[f] === 0) continue;
    const mid = b.ids[f]!;
    const k = table.variableOf(mid);
    if (a.big || b.big) {
      const cb = bigAt(b, f);
      for (let e = 0; e < n; e++) {
        const ca = bigAt(a, e);
        if (ca !== 0n) addBigTerm(out, k >= 0 ? table.timesVariable(a.ids[e]!, k) : table.times(a.ids[e]!, mid), ca * cb);
      }
      continue;
    }
    const cb = b.coefs[f]!;
    for (let e = 0; e < n; e++) {
      const ca = a.coefs[e]!;
      if (ca === 0) continue;
      const id = k >= 0 ? table.timesVariable(a.ids[e]!, k) : table.times(a.ids[e]!, mid);
      const c = ca * cb;
      if (c > MAX || c < -MAX) addBigTerm(out, id, BigInt(ca) * BigInt(cb));
      else addTerm(out, id, c);
    }
  }
  return out;
}

export function packedEquals(a: PackedPoly, b: PackedPoly): boolean {
  if (a.live !== b.live) return false;
  for (let e = 0; e < a.count; e++) {
    const ca = a.big ? a.big[e]! : a.coefs[e]!;
    if (ca === 0 || ca === 0n) continue;
    const f = entryOf(b, a.ids[e]!);
    if (f < 0) return false;
    if (a.big || b.big ? bigAt(a, e) !== bigAt(b, f) : ca !== b.coefs[f]) return false;
  }
  return true;
}
