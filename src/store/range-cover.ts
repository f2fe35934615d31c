/** Half-open index ranges of one class, merged into disjoint sorted intervals for coverage questions. */
export class RangeCover {
  private readonly raw: [bigint, bigint][] = [];
  private merged: [bigint, bigint][] | undefined;

  add(start: bigint, end: bigint): void {
    this.raw.push([start, end]);
    this.merged = undefined;
  }

  private intervals(): [bigint, bigint][] {
    if (!this.merged) {
      const sorted = [...this.raw].sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0));
      const out: [bigint, bigint][] = [];
      for (const [s, e] of sorted) {
        const last = out[out.length - 1];
        if (last && s <= last[1]) {
          if (e > last[1]) last[1] = e;
        } else out.push([s, e]);
      }
      this.merged = out;
    }
    return this.merged;
  }

  /** Whether index lies in some range (binary search over the merged intervals). */
  has(index: bigint): boolean {
    const iv = this.intervals();
    let lo = 0;
    let hi = iv.length - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const [s, e] = iv[mid]!;
      if (index < s) hi = mid - 1;
      else if (index >= e) lo = mid + 1;
      else return true;
    }
    return false;
  }

  /** How many indices of [start, end) the ranges cover. */
  coveredWithin(start: bigint, end: bigint): bigint {
    let n = 0n;
    for (const [s, e] of this.intervals()) {
      const a = s > start ? s : start;
      const b = e < end ? e : end;
      if (b > a) n += b - a;
    }
    return n;
  }
}

/** Range covers keyed by `fingerprint|class_key`. */
export class CoverMap {
  private readonly covers = new Map<string, RangeCover>();

  add(fingerprint: string, classKey: string, start: bigint, end: bigint): void {
    const k = `${fingerprint}|${classKey}`;
    let c = this.covers.get(k);
    if (!c) this.covers.set(k, (c = new RangeCover()));
    c.add(start, end);
  }

  get(fingerprint: string, classKey: string): RangeCover | undefined {
    return this.covers.get(`${fingerprint}|${classKey}`);
  }
}
