/**
 * An open-addressing hash table from packed profiles (safe integers below 2^53) to a fixed number of
 * value lanes, over typed arrays: entries are stored densely in insertion order (so a sweep iterates
 * them without a hash walk), and a power-of-two slot array indexes them by linear probing.
 */
export class ProfileTable {
  /** Entry keys, dense, `count` of them. */
  keys: Float64Array;
  /** Entry values, `lanes` per entry (entry e owns vals[e·lanes .. e·lanes + lanes − 1]). */
  vals: Float64Array | Uint32Array;
  count = 0;
  private slots: Int32Array;
  private mask: number;

  constructor(
    readonly lanes: number,
    /** Residue lanes are stored as uint32; integer lanes as float64 holding safe integers. */
    readonly residues: boolean,
    capacity = 16,
  ) {
    const cap = Math.max(16, capacity);
    this.keys = new Float64Array(cap);
    this.vals = residues ? new Uint32Array(cap * lanes) : new Float64Array(cap * lanes);
    let size = 32;
    while (size < cap * 2) size *= 2;
    this.slots = new Int32Array(size);
    this.mask = size - 1;
  }

  /** Bytes held by the typed arrays (keys, values, slots). */
  get bytes(): number {
    return this.keys.byteLength + this.vals.byteLength + this.slots.byteLength;
  }

  private static hash(key: number): number {
    // Mix the low and high 32-bit halves of the integer key (murmur-style finalizer).
    let h = (key >>> 0) ^ Math.imul((key / 4294967296) | 0, 0x9e3779b1);
    h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
    h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
    return h ^ (h >>> 16);
  }

  /** Entry index of `key`, or −1. */
  find(key: number): number {
    let h = ProfileTable.hash(key) & this.mask;
    for (;;) {
      const e = this.slots[h]!;
      if (e === 0) return -1;
      if (this.keys[e - 1] === key) return e - 1;
      h = (h + 1) & this.mask;
    }
  }

  /** Entry index of `key`, inserting it with all lanes 0 when absent. */
  slot(key: number): number {
    let h = ProfileTable.hash(key) & this.mask;
    for (;;) {
      const e = this.slots[h]!;
      if (e === 0) break;
      if (this.keys[e - 1] === key) return e - 1;
      h = (h + 1) & this.mask;
    }
    const idx = this.count;
    if (idx === this.keys.length) this.growEntries();
    this.keys[idx] = key;
    this.count = idx + 1;
    if (this.count * 2 > this.slots.length) this.rehash(this.slots.length * 2);
    else this.slots[h] = idx + 1;
    return idx;
  }

  /** Empties the table, keeping its memory. */
  clear(): void {
    if (this.count === 0) return;
    this.slots.fill(0);
    this.vals.fill(0, 0, this.count * this.lanes);
    this.count = 0;
  }

  private growEntries(): void {
    const cap = this.keys.length * 2;
    const keys = new Float64Array(cap);
    keys.set(this.keys);
    this.keys = keys;
    const vals = this.residues ? new Uint32Array(cap * this.lanes) : new Float64Array(cap * this.lanes);
    vals.set(this.vals);
    this.vals = vals;
  }

  private rehash(size: number): void {
    this.slots = new Int32Array(size);
    this.mask = size - 1;
    for (let e = 0; e < this.count; e++) {
      let h = ProfileTable.hash(this.keys[e]!) & this.mask;
      while (this.slots[h] !== 0) h = (h + 1) & this.mask;
      this.slots[h] = e + 1;
    }
  }
}
