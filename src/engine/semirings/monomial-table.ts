/**
 * Monomials interned as small integer ids, so a polynomial can keep its monomials in an Int32Array.
 * An id stands for the exponent vector whose key (polynomial.ts's format: the k-th char code is the
 * exponent of variable k, trailing zeros trimmed) is `keyOf(id)`; id 0 is the constant monomial.
 * Exponents have no fixed width, so no product of monomials can overflow a packed field; the product
 * of an id with one variable (the only product a linear weight needs) is memoised per variable.
 */
const MAX_EXPONENT = 0xffff; // one UTF-16 unit per exponent

export class MonomialTable {
  private readonly ids = new Map<string, number>();
  private readonly keys: string[] = [];
  /** `single[id]` = k when the monomial is the variable k itself, else −1. */
  private single = new Int32Array(64);
  /** `byVariable[k][id]` = id of (monomial id)·x_k, or −1 when not yet known. */
  private readonly byVariable: Int32Array[] = [];

  constructor() {
    this.intern('');
  }

  get size(): number {
    return this.keys.length;
  }

  keyOf(id: number): string {
    return this.keys[id]!;
  }

  /** The id of a monomial key (polynomial.ts's format), adding it when new. */
  intern(key: string): number {
    const hit = this.ids.get(key);
    if (hit !== undefined) return hit;
    const id = this.keys.length;
    this.keys.push(key);
    this.ids.set(key, id);
    if (id >= this.single.length) {
      const grown = new Int32Array(this.single.length * 2);
      grown.set(this.single);
      this.single = grown;
    }
    this.single[id] = singleVariable(key);
    return id;
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
    const key = this.keys[id]!;
    const e = k < key.length ? key.charCodeAt(k) + 1 : 1;
    if (e > MAX_EXPONENT) throw new RangeError(`exponent of variable ${k} above ${MAX_EXPONENT}`);
    const next = k < key.length ? key.slice(0, k) + String.fromCharCode(e) + key.slice(k + 1) : key + '\0'.repeat(k - key.length) + '\u0001';
    const out = this.intern(next);
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
    let x = this.keys[a]!;
    let y = this.keys[b]!;
    if (x.length < y.length) [x, y] = [y, x];
    const codes = new Array<number>(x.length);
    for (let i = 0; i < x.length; i++) {
      const e = x.charCodeAt(i) + (i < y.length ? y.charCodeAt(i) : 0);
      if (e > MAX_EXPONENT) throw new RangeError(`exponent of variable ${i} above ${MAX_EXPONENT}`);
      codes[i] = e;
    }
    return this.intern(String.fromCharCode(...codes));
  }

  private growMemo(k: number, id: number): Int32Array {
    const old = this.byVariable[k];
    let length = old ? old.length : 256;
    while (length <= Math.max(id, this.keys.length)) length *= 2;
    const memo = new Int32Array(length).fill(-1);
    if (old) memo.set(old);
    this.byVariable[k] = memo;
    return memo;
  }
}

function singleVariable(key: string): number {
  if (key.length === 0 || key.charCodeAt(key.length - 1) !== 1) return -1;
  for (let i = 0; i < key.length - 1; i++) if (key.charCodeAt(i) !== 0) return -1;
  return key.length - 1;
}
