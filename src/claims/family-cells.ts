import { countFamily, FAMILY_SIDE_ORDER, makeRegion, type PieceSet, type Region, type SafeInt, type Semiring } from '../engine/index.js';
import type { SizeClass } from './claim-api.js';
import type { ClaimProgram } from './compile-claim-program.js';
import { nextString, rankString } from './multiset-rank.js';
import type { Content, Layout } from './plan-claim.js';
import { TABLE_PARTS, type TableShape } from './shared-tables.js';
import { applySideMap } from './side-map.js';

// The value tables of the bulk scan (family-scan.ts), one content cell at a time.

// One content combination of a class (a content per group): a product family with one candidate list per side.
export interface Cell {
  readonly ok: boolean;
  readonly left: Float64Array;
  readonly leftStride: Float64Array;
  readonly right: Float64Array;
  /** Per side j of T(b): stride of its digit in `right`. */
  readonly rightStride: Float64Array;
  /** Per side j of T(b): source digit (of side `from_j` of b) → digit in `right`. */
  readonly rankMap: Int32Array[];
  /** T(b) is an instance of the class: its index is partnerBase + Σ partnerCoef[j] · digit_j. */
  readonly inClass: boolean;
  readonly partnerBase: number;
  readonly partnerCoef: Float64Array;
  readonly entries: number;
  /** Sums over the last group's sides, per content of that group (`innerSums`). */
  readonly inner: Map<number, InnerSums>;
}

export interface InnerSums {
  readonly own: Float64Array;
  readonly at: Float64Array;
  readonly partner: Float64Array;
}

// Six per-side maps in a packed array (filled in side order), so every cell's rankMap has one shape for the scan's JIT.
const sixMaps = (): Int32Array[] => Array.from({ length: 6 }, () => new Int32Array(0));

export const NOT_TABULATED: Cell = { ok: false, left: new Float64Array(0), leftStride: new Float64Array(6), right: new Float64Array(0), rightStride: new Float64Array(6), rankMap: sixMaps(), inClass: false, partnerBase: 0, partnerCoef: new Float64Array(6), entries: 0, inner: new Map() };

// A cell larger than this is left to the per-instance path.
const MAX_CELL = 1 << 24;

// Views of one run's shared tables in this worker.
export interface SharedView {
  readonly values: Float64Array;
  readonly state: Int32Array;
  readonly shape: TableShape;
}

// Waiting for a part another worker computes; past this, compute it here (that worker may have died).
const PART_PATIENCE_MS = 10_000;
// Entries per part of a shared table, at least.
const PART_ENTRIES = 40_000;

/** Cell keys a chunk will still need, `next` … `last` in key order (advanced as cells are found claimed). */
export interface Ahead {
  next: number;
  readonly last: number;
}

/** A cell's left table: its values by table index and the stride of each side's digit. */
export interface LeftTable {
  readonly values: Float64Array;
  readonly stride: Float64Array;
}

/**
 * One float64 per boundary of a product family (countFamily's order), equal exactly when the values compare
 * equal (integer values, or residue codes: residue-tables.ts); null when the family cannot be tabulated.
 */
export type FamilyValues = (region: Region, candidates: readonly (readonly string[])[], pieces: PieceSet) => Float64Array | null;

/** T(b)'s values under a substitution σ: class cells' tables, and a builder for images outside the class. */
export interface RightValues {
  readonly of: (contents: readonly number[]) => LeftTable | undefined;
  readonly values: FamilyValues;
}

/** Builders of a claim's cells: left tables (private or in shared memory) and the cell that compares b with T(b). */
export function familyCells(program: ClaimProgram, values: FamilyValues | Semiring<SafeInt>, sameTheory: boolean) {
  // An integer semiring: its values as they are, while every one is a safe integer.
  const familyValues: FamilyValues = typeof values === 'function' ? values : (region, candidates, pieces) => countFamily(region, candidates, pieces, { semiring: values }).numbers;
  const alphabet = program.left.boundaryLabels;
  const sideMap = program.sideMap!;

  // Whatever the tables cannot do (values past safe integers, a label the right theory lacks), the per-instance path does, with its own errors.
  function guarded<T>(f: () => T | undefined): T | undefined {
    try {
      return f();
    } catch {
      return undefined;
    }
  }

  // Each content's strings in rank order, listed once per claim: neighbouring cells (and T(b)'s cell) share
  // contents, and unranking every string of every cell was a tenth of a small sweep.
  const listed = new WeakMap<object, string[]>();
  function stringsOf(content: Content): string[] {
    let list = listed.get(content);
    if (!list) {
      list = [];
      const labels = content.counts.flatMap((c, a) => new Array<number>(c).fill(a)); // the first in rank order
      do list.push(labels.map((a) => alphabet[a]!).join(''));
      while (nextString(labels));
      listed.set(content, list);
    }
    return list;
  }

  // A string's rank within its content: its place in the content's list.
  const ranks = new WeakMap<object, Map<string, number>>();
  function rankOf(content: Content, s: string): number {
    let m = ranks.get(content);
    if (!m) {
      m = new Map(stringsOf(content).map((x, r) => [x, r]));
      ranks.set(content, m);
    }
    return m.get(s) ?? Number(rankString([...s].map((ch) => alphabet.indexOf(ch)), content.counts));
  }

  // T(b)'s side j for each candidate of side from_j (reversed and renamed), once per candidate list.
  const imageLists = new WeakMap<object, Map<number, string[]>>();
  function imagesOf(cls: SizeClass, candidates: readonly string[][]): string[][] {
    return sideMap.map((s, j) => {
      const list = candidates[s.from]!;
      let byMap = imageLists.get(list);
      if (!byMap) imageLists.set(list, (byMap = new Map()));
      let images = byMap.get(j);
      if (!images) byMap.set(j, (images = list.map((x) => applySideMap([{ ...s, from: 0 }], [cls.lengths[s.from]!], [x]).sides[0]!)));
      return images;
    });
  }

  function candidatesOf(layout: Layout, contents: readonly number[]): string[][] {
    const candidates: string[][] = [[], [], [], [], [], []];
    layout.groups.forEach((g, gi) => {
      let list: string[];
      if (g.sides.length > 1) list = stringsOf(g.contents[contents[gi]!]!);
      else {
        // A one-side group keeps all its strings in one list, every content in rank order.
        list = listed.get(g) ?? g.contents.flatMap((c) => stringsOf(c));
        listed.set(g, list);
      }
      for (const s of g.sides) candidates[s] = list;
    });
    return candidates;
  }

  // `valuesOf`: another table builder for the same boundaries (the right side's values under a substitution σ).
  function leftTable(cls: SizeClass, layout: Layout, contents: readonly number[], valuesOf: FamilyValues = familyValues): LeftTable | undefined {
    return guarded(() => {
      const candidates = candidatesOf(layout, contents);
      if (candidates.reduce((p, l) => p * l.length, 1) > MAX_CELL) return undefined;
      const values = valuesOf(makeRegion(cls.lengths), candidates, program.left);
      return values ? { values, stride: strides(candidates.map((l) => l.length)) } : undefined;
    });
  }

  // A cell's left table in shared memory, cut into parts (slices of a side the top-down sweep reads first)
  // that workers claim one at a time with compareExchange, so each part is computed once by whoever comes first.
  interface Parts {
    readonly values: Float64Array;
    readonly counts: number[];
    readonly parts: number;
    compute(p: number): boolean;
  }
  function partsOf(cls: SizeClass, layout: Layout, contents: readonly number[], view: SharedView, key: number): Parts | undefined {
    const candidates = candidatesOf(layout, contents);
    const counts = candidates.map((l) => l.length);
    const size = view.shape.sizes[key]!;
    if (size === 0 || counts.reduce((p, n) => p * n, 1) !== size) return undefined;
    const values = view.values.subarray(view.shape.offsets[key]!, view.shape.offsets[key]! + size);
    // Cut along a side the top-down sweep reads first (sides 2 and 3 start at the top), so that the parts
    // share no steps; a part of the table is then a strided set of blocks.
    const split = [1, 2, 0, 3, 5].find((k) => counts[k]! > 1) ?? 1;
    const n = counts[split]!;
    // Enough parts for the workers to share a large cell, few enough that each costs far more than its set-up.
    const parts = Math.max(1, Math.min(TABLE_PARTS, n, Math.floor(size / PART_ENTRIES)));
    const per = Math.ceil(n / parts);
    const at = FAMILY_SIDE_ORDER.indexOf(split as 0 | 1 | 2 | 3 | 4 | 5);
    const outer = FAMILY_SIDE_ORDER.slice(0, at).reduce((q: number, k) => q * counts[k]!, 1);
    const inner = FAMILY_SIDE_ORDER.slice(at + 1).reduce((q: number, k) => q * counts[k]!, 1);
    const region = makeRegion(cls.lengths);
    const compute = (p: number) =>
      guarded(() => {
        const lo = p * per;
        const hi = Math.min(n, lo + per);
        if (hi <= lo) return true;
        const sub = candidates.slice();
        sub[split] = candidates[split]!.slice(lo, hi);
        const t = familyValues(region, sub, program.left);
        if (!t) return undefined;
        const block = (hi - lo) * inner;
        for (let o = 0; o < outer; o++) values.set(t.subarray(o * block, o * block + block), (o * n + lo) * inner);
        return true;
      }) === true;
    return { values, counts, parts, compute };
  }

  // Computes part p of a cell unless another worker claimed it first; true when this worker computed it.
  function claimPart(view: SharedView, key: number, p: number, parts: Parts): boolean {
    const slot = key * TABLE_PARTS + p;
    if (Atomics.compareExchange(view.state, slot, 0, 1) !== 0) return false;
    Atomics.store(view.state, slot, parts.compute(p) ? 2 : 3);
    Atomics.notify(view.state, slot);
    return true;
  }

  // Instead of waiting for a part another worker computes, compute an unclaimed part of a cell in `ahead`
  // (cell keys the current chunk will need, in the order it needs them): a full sweep needs every cell once,
  // so this is work taken off the others, never work done twice. False when nothing is left to claim.
  function helpAhead(cls: SizeClass, layout: Layout, view: SharedView, ahead: Ahead): boolean {
    const radix = layout.groups.map((g) => g.contents.length);
    for (; ahead.next <= ahead.last; ahead.next++) {
      const key = ahead.next;
      const base = key * TABLE_PARTS;
      // Cheap test first: every part slot of the cell already claimed (or the cell is empty).
      let open = false;
      for (let p = 0; p < TABLE_PARTS && !open; p++) open = Atomics.load(view.state, base + p) === 0;
      if (!open || view.shape.sizes[key] === 0) continue;
      const contents = new Array<number>(radix.length);
      let rest = key;
      for (let g = radix.length - 1; g >= 0; g--) {
        contents[g] = rest % radix[g]!;
        rest = (rest - contents[g]!) / radix[g]!;
      }
      const parts = partsOf(cls, layout, contents, view, key);
      if (!parts) continue;
      for (let p = 0; p < parts.parts; p++) if (claimPart(view, key, p, parts)) return true;
    }
    return false;
  }

  function sharedLeftTable(cls: SizeClass, layout: Layout, contents: readonly number[], view: SharedView, key: number, ahead?: Ahead): LeftTable | undefined {
    const parts = partsOf(cls, layout, contents, view, key);
    if (!parts) return undefined;
    const base = key * TABLE_PARTS;
    for (let p = 0; p < parts.parts; p++) claimPart(view, key, p, parts);
    for (let p = 0; p < parts.parts; p++) {
      // Only time spent waiting counts against the other worker (not time spent helping ahead).
      let waited = 0;
      while (Atomics.load(view.state, base + p) === 1) {
        if (ahead && helpAhead(cls, layout, view, ahead)) continue;
        if (waited > PART_PATIENCE_MS) {
          // Its worker is gone or stuck: the values are the same whoever writes them.
          Atomics.store(view.state, base + p, parts.compute(p) ? 2 : 3);
          Atomics.notify(view.state, base + p);
          break;
        }
        const began = Date.now();
        Atomics.wait(view.state, base + p, 1, 50);
        waited += Date.now() - began;
      }
      if (Atomics.load(view.state, base + p) !== 2) return undefined;
    }
    return { values: parts.values, stride: strides(parts.counts) };
  }

  /**
   * `right`: T(b)'s values when they are not b's own kind of value (under a substitution σ): the table of
   * a class cell, and the builder for images outside the class. By default both sides read the left tables.
   */
  function buildCell(cls: SizeClass, layout: Layout, contents: readonly number[], leftOf: (c: readonly number[]) => LeftTable | undefined, right?: RightValues): Cell {
    const own = leftOf(contents);
    if (!own) return NOT_TABULATED;
    return guarded(() => tabulate(cls, layout, contents, own, right?.of ?? leftOf, right?.values ?? familyValues)) ?? NOT_TABULATED;
  }

  function tabulate(
    cls: SizeClass,
    layout: Layout,
    contents: readonly number[],
    own: LeftTable,
    rightOf: (c: readonly number[]) => LeftTable | undefined,
    rightValues: FamilyValues,
  ): Cell | undefined {
    const candidates = candidatesOf(layout, contents);
    const leftStride = own.stride;
    // T(b) side j is side from_j of b, reversed and renamed: map each candidate once.
    const images = imagesOf(cls, candidates);
    const lengths = sideMap.map((s) => cls.lengths[s.from]!);
    const target = targetCell(layout, lengths, cls.lengths, images);
    const partnerCoef = new Float64Array(6);
    let partnerBase = 0;
    if (target) {
      let weight = 1;
      for (let g = layout.groups.length - 1; g >= 0; g--) {
        const group = layout.groups[g]!;
        if (group.sides.length === 1) {
          // the digit of a one-side group already holds its content's offset
          partnerCoef[group.sides[0]!] = weight;
          weight *= Number(group.size);
          continue;
        }
        const content = group.contents[target.contents[g]!]!;
        partnerBase += Number(content.offset) * weight;
        let w = weight;
        for (let k = group.sides.length - 1; k >= 0; k--) {
          partnerCoef[group.sides[k]!] = w;
          w *= Number(content.strings);
        }
        weight *= Number(group.size);
      }
    }
    if (target && sameTheory) {
      // T(b) lies in this class: its values are a cell of the same left tables.
      const other = rightOf(target.contents);
      if (!other) return undefined;
      return { ok: true, left: own.values, leftStride, right: other.values, rightStride: other.stride, rankMap: target.rankMap, inClass: true, partnerBase, partnerCoef, entries: 0, inner: new Map() };
    }
    // Another theory or outside the class: a table of the images themselves, read by b's own digits (no pairing then).
    const right = rightValues(makeRegion(lengths), images, program.right);
    if (!right) return undefined;
    const identity = images.map((list) => Int32Array.from(list, (_, d) => d));
    return { ok: true, left: own.values, leftStride, right, rightStride: strides(images.map((l) => l.length)), rankMap: identity, inClass: false, partnerBase, partnerCoef, entries: right.length, inner: new Map() };
  }

  // The class cell T(b) falls in, with each side's source digit → rank there; undefined if T(b) is not in the class.
  function targetCell(layout: Layout, lengths: readonly number[], classLengths: readonly number[], images: readonly string[][]): { contents: number[]; rankMap: Int32Array[] } | undefined {
    if (lengths.some((l, i) => l !== classLengths[i])) return undefined;
    const countsOf = (s: string) => {
      const c = new Array<number>(alphabet.length).fill(0);
      for (const ch of s) c[alphabet.indexOf(ch)]!++;
      return c;
    };
    const contents: number[] = [];
    const rankMap = sixMaps();
    for (const g of layout.groups) {
      const contentOf = (s: string) => {
        const counts = countsOf(s);
        return g.contents.findIndex((c) => c.counts.every((x, a) => x === counts[a]));
      };
      let shared = -1;
      for (const side of g.sides) {
        const list = images[side]!;
        const ranks = new Int32Array(list.length);
        for (let d = 0; d < list.length; d++) {
          const s = list[d]!;
          const c = contentOf(s);
          if (c < 0) return undefined;
          const content = g.contents[c]!;
          const rank = rankOf(content, s);
          if (g.sides.length === 1) ranks[d] = Number(content.offset) + rank;
          else {
            // the sides of a group share one content (the cell's)
            if (shared >= 0 && c !== shared) return undefined;
            shared = c;
            ranks[d] = rank;
          }
        }
        rankMap[side] = ranks;
      }
      contents.push(Math.max(shared, 0));
    }
    return { contents, rankMap };
  }

  return { leftTable, sharedLeftTable, helpAhead, buildCell };
}

// Strides of a family table's index (FAMILY_SIDE_ORDER: side 5 least significant), per side.
function strides(counts: readonly number[]): Float64Array {
  const out = new Float64Array(6);
  let acc = 1;
  for (const k of [...FAMILY_SIDE_ORDER].reverse()) {
    out[k] = acc;
    acc *= counts[k]!;
  }
  return out;
}
