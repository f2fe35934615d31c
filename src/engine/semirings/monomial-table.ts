/**
 * Monomials interned as small integer ids, so a polynomial can keep its monomials in an Int32Array.
 * Each id's exponent vector sits in one flat Uint16Array (`stride` exponents per monomial, widened
 * when a new variable appears), found again through an open-addressing hash of the vector. The hash
 * is additive (Σ e_k·R_k mod 2^32), so a product's hash is the sum of its factors' and no string is
 * built on the hot path; `keyOf` gives polynomial.ts's Map key (k-th char code = exponent of variable
 * k, trailing zeros trimmed). id 0 is the constant monomial. Exponents are checked, never wrapped; the
 * product of an id with one variable (all a linear weight needs) is memoised per variable.
 */
const MAX_EXPONENT = 0xffff;

export class MonomialTable {
  private count = 0;
  private stride = 4;
  private exps = new Uint16Array(64 * 4);
  private hashes = new Int32Array(64);
  /** `single[id]` = k when the monomial is the variable k itself, else −1. */
  private single = new Int32Array(64);
  /** id + 1 per slot, 0 when empty; power-of-two length, at most half full. */
  private slots = new Int32Array(128);
  private weights = new Int32Array(0);
  private scratch = new Uint16Array(4);
  private readonly keys: (string | undefined)[] = [];
  /** `byVariable[k][id]` = id of (monomial id)·x_k, or −1 when not yet known. */
  private readonly byVariable: Int32Array[] = [];

  constructor() {
    this.widen(4);
    this.find(0); // the constant monomial: id 0
  }

  get size(): number {
    return this.count;
  }

  /** polynomial.ts's key of monomial `id`. */
  keyOf(id: number): string {
    let key = this.keys[id];
    if (key === undefined) {
      const base = id * this.stride;
      let end = this.stride;
      while (end > 0 && this.exps[base + end - 1] === 0) end--;
      key = '';
      for (let k = 0; k < end; k++) key += String.fromCharCode(this.exps[base + k]!);
      this.keys[id] = key;
    }
    return key;
  }

  /** The id of a monomial key (polynomial.ts's format), adding it when new. */
  intern(key: string): number {
    if (key.length > this.stride) this.widen(key.length);
    const s = this.scratch;
    s.fill(0);
    let h = 0;
    for (let k = 0; k < key.length; k++) {
      s[k] = key.charCodeAt(k);
      h = (h + Math.imul(s[k]!, this.weights[k]!)) | 0;
    }
    return this.find(h);
  }

  /** The variable k when monomial `id` is x_k, else −1. */
  variableOf(id: number): number {
    return this.single[id]!;
  }

  /** The id of (monomial id)·x_k. */
  timesVariable(id: number, k: number): number {
    let memo = this.byVariable[k];
    if (memo === undefined || id >= memo.length) memo = this.growMemo(k, id);
    const hit = memo[id]!;
    if (hit >= 0) return hit;
    if (k >= this.stride) this.widen(k + 1);
    const s = this.scratch;
    s.set(this.exps.subarray(id * this.stride, (id + 1) * this.stride));
    if (s[k] === MAX_EXPONENT) throw new RangeError(`exponent of variable ${k} above ${MAX_EXPONENT}`);
    s[k]!++;
    const out = this.find((this.hashes[id]! + this.weights[k]!) | 0);
    memo[id] = out;
    return out;
  }

  /** The id of the product of two monomials. */
  times(a: number, b: number): number {
    if (a === 0) return b;
    if (b === 0) return a;
    const vb = this.single[b]!;
    if (vb >= 0) return this.timesVariable(a, vb);
    const va = this.single[a]!;
    if (va >= 0) return this.timesVariable(b, va);
    const S = this.stride;
    const e = this.exps;
    const s = this.scratch;
    for (let k = 0, i = a * S, j = b * S; k < S; k++, i++, j++) {
      const x = e[i]! + e[j]!;
      if (x > MAX_EXPONENT) throw new RangeError(`exponent of variable ${k} above ${MAX_EXPONENT}`);
      s[k] = x;
    }
    return this.find((this.hashes[a]! + this.hashes[b]!) | 0);
  }

  // The id of the vector in `scratch` with hash h, added when new.
  private find(h: number): number {
    const S = this.stride;
    const e = this.exps;
    const s = this.scratch;
    const mask = this.slots.length - 1;
    let slot = (Math.imul(h, 0x9e3779b1) >>> 7) & mask;
    for (; ; slot = (slot + 1) & mask) {
      const id = this.slots[slot]! - 1;
      if (id < 0) break;
      if (this.hashes[id] !== h) continue;
      let k = 0;
      for (let i = id * S; k < S && e[i] === s[k]; k++, i++);
      if (k === S) return id;
    }
    const id = this.add(h);
    this.slots[slot] = id + 1;
    if (2 * this.count > this.slots.length) this.rehash(this.slots.length * 2);
    return id;
  }

  // Appends the vector in `scratch` (hash h) as a new id; the caller files it in a slot.
  private add(h: number): number {
    const id = this.count++;
    if (id === this.hashes.length) {
      const n = id * 2;
      const exps = new Uint16Array(n * this.stride);
      exps.set(this.exps);
      this.exps = exps;
      const hashes = new Int32Array(n);
      hashes.set(this.hashes);
      this.hashes = hashes;
      const single = new Int32Array(n);
      single.set(this.single);
      this.single = single;
    }
    const s = this.scratch;
    this.exps.set(s, id * this.stride);
    this.hashes[id] = h;
    let variable = -1;
    for (let k = 0; k < s.length; k++) {
      if (s[k] === 0) continue;
      if (s[k] !== 1 || variable >= 0) {
        variable = -1;
        break;
      }
      variable = k;
    }
    this.single[id] = variable;
    return id;
  }

  private rehash(length: number): void {
    const slots = new Int32Array(length);
    const mask = length - 1;
    for (let id = 0; id < this.count; id++) {
      let slot = (Math.imul(this.hashes[id]!, 0x9e3779b1) >>> 7) & mask;
      while (slots[slot] !== 0) slot = (slot + 1) & mask;
      slots[slot] = id + 1;
    }
    this.slots = slots;
  }

  // Room for `variables` exponents per monomial: re-lays the vectors out and extends the hash weights.
  private widen(variables: number): void {
    const old = this.stride;
    const S = Math.max(variables, old * 2);
    const exps = new Uint16Array(this.hashes.length * S);
    for (let id = 0; id < this.count; id++) exps.set(this.exps.subarray(id * old, (id + 1) * old), id * S);
    this.exps = exps;
    this.stride = S;
    this.scratch = new Uint16Array(S);
    const weights = new Int32Array(S);
    weights.set(this.weights);
    // Fixed pseudo-random odd weights per variable (splitmix-style), the same in every table.
    for (let k = this.weights.length; k < S; k++) {
      let z = Math.imul(k + 1, 0x9e3779b9);
      z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
      z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
      weights[k] = (z ^ (z >>> 16)) | 1;
    }
    this.weights = weights;
  }

  private growMemo(k: number, id: number): Int32Array {
    const old = this.byVariable[k];
    let length = old ? old.length : 256;
    while (length <= Math.max(id, this.count)) length *= 2;
    const memo = new Int32Array(length).fill(-1);
    if (old) memo.set(old);
    this.byVariable[k] = memo;
    return memo;
  }
}
