import { countFamily, FAMILY_SIDE_ORDER, fillingCountSemiring, integerSemiring, makeRegion, type SafeInt, type Semiring } from '../engine/index.js';
import type { ScanTally, SharedTables, SizeClass } from './claim-api.js';
import type { ClaimProgram } from './compile-claim-program.js';
import { rankString, unrankString } from './multiset-rank.js';
import type { ClaimPlanExt, Layout } from './plan-claim.js';
import { TABLE_PARTS, tableShape, type TableShape } from './shared-tables.js';
import { applySideMap } from './side-map.js';

/** The bulk path of a sweep: integer values of a whole class from value tables, compared by index arithmetic. */
export interface FamilyScanner {
  /**
   * Decides instances [start, end) of `cls` from value tables, adding to `tally`; every instance it does
   * not decide (a comparison that fails, a cell it cannot tabulate) goes to `fallback`, in index order.
   * False when the class is not scanned at all (then nothing was tallied).
   */
  scan(cls: SizeClass, start: bigint, end: bigint, tally: ScanTally, fallback: (index: bigint) => void, tables?: SharedTables): boolean;
}

/** What the evaluator decided about pairing; the scan must answer exactly as the per-instance path. */
export interface ScanSetup {
  readonly program: ClaimProgram;
  readonly plan: ClaimPlanExt;
  /** {b, T(b)} checked once (the evaluator's own rule: involutive transform, same theory, symmetric relation). */
  readonly involutive: boolean;
  readonly sameTheory: boolean;
}

// One content combination of a class (a content per group): a product family with one candidate list per side.
interface Cell {
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

interface InnerSums {
  readonly own: Float64Array;
  readonly at: Float64Array;
  readonly partner: Float64Array;
}

const NOT_TABULATED: Cell = { ok: false, left: new Float64Array(0), leftStride: new Float64Array(6), right: new Float64Array(0), rightStride: new Float64Array(6), rankMap: [], inClass: false, partnerBase: 0, partnerCoef: new Float64Array(6), entries: 0, inner: new Map() };

// Table entries kept per worker (8 bytes each): the 6×6 parallelogram family needs 0.85 M per theory.
const CACHE_ENTRIES = 6_000_000;
// A cell larger than this is left to the per-instance path.
const MAX_CELL = 1 << 24;

/** Whether a claim's sweeps can be decided from value tables: integer values compared for equality through a side map. */
export function scannable(program: ClaimProgram): boolean {
  const measure = program.claim.compare.measure.type;
  const integer = measure === 'puzzles' || (measure === 'value' && !program.polynomial);
  if (!integer || program.formula || !program.sideMap || program.claim.compare.relation.type !== 'equal' || program.relation.substitution || program.relation.searchSpace) return false;
  return program.left.boundaryLabels.every((a) => a.length === 1);
}

// Views of one run's shared tables in this worker.
interface SharedView {
  readonly values: Float64Array;
  readonly state: Int32Array;
  readonly shape: TableShape;
}

// Waiting for a part another worker computes; past this, compute it here (that worker may have died).
const PART_PATIENCE_MS = 10_000;
// Entries per part of a shared table, at least.
const PART_ENTRIES = 40_000;

/** The bulk scanner of a claim, or undefined when it is not `scannable`. */
export function familyScanner(setup: ScanSetup): FamilyScanner | undefined {
  const { program, plan, involutive, sameTheory } = setup;
  if (!scannable(program)) return undefined;
  const measure = program.claim.compare.measure.type;
  const alphabet = program.left.boundaryLabels;
  const sideMap = program.sideMap!;
  const views = new Map<string, SharedView | undefined>();
  const semiring: Semiring<SafeInt> = measure === 'puzzles' ? fillingCountSemiring : integerSemiring;
  const nonzeroOnly = program.claim.family.nonzeroOnly;
  // Cells and their left tables, dropped together when the tables outgrow the budget.
  const cells = new Map<string, Cell>();
  const lefts = new Map<string, { values: Float64Array; stride: Float64Array } | undefined>();
  let cached = 0;
  const remember = (entries: number) => {
    cached += entries;
    if (cached > CACHE_ENTRIES) {
      cells.clear();
      lefts.clear();
      cached = entries;
    }
  };

  const scan: FamilyScanner['scan'] = (cls, start, end, tally, fallback, tables) => {
    const layout = plan.layoutOf(cls);
    if (layout.count > BigInt(Number.MAX_SAFE_INTEGER)) return false;
    let shared: SharedView | undefined;
    if (tables) {
      const id = `${tables.id}|${cls.key}`;
      if (!views.has(id)) {
        const shape = tableShape(layout);
        const fits = shape !== undefined && tables.values.byteLength >= shape.entries * 8 && tables.state.byteLength >= shape.cells * TABLE_PARTS * 4;
        views.set(id, fits ? { values: new Float64Array(tables.values), state: new Int32Array(tables.state), shape } : undefined);
      }
      shared = views.get(id);
    }
    const cellKeyOf = (contents: readonly number[]) => contents.reduce((k, c, g) => k * layout.groups[g]!.contents.length + c, 0);
    // A group of one side reads its whole digit (content offset + rank) from one candidate list of every
    // content; only groups of several sides split the class into cells, one per content.
    const groups = layout.groups.map((g) => ({
      sides: g.sides,
      single: g.sides.length === 1,
      size: Number(g.size),
      offsets: [...g.contents.map((c) => Number(c.offset)), Number(g.size)],
      strings: g.contents.map((c) => Number(c.strings)),
    }));
    const leftOf = (contents: readonly number[]) => {
      const key = `${shared ? `${tables!.id}|` : ''}${cls.key}|${contents.join(',')}`;
      if (!lefts.has(key)) {
        const t = shared ? sharedLeftTable(cls, layout, contents, shared, cellKeyOf(contents)) : leftTable(cls, layout, contents);
        remember(shared ? 0 : (t?.values.length ?? 0));
        lefts.set(key, t);
      }
      return lefts.get(key);
    };
    const cellOf = (contents: readonly number[]): Cell => {
      const key = `${cls.key}|${contents.join(',')}`;
      let cell = cells.get(key);
      if (!cell) {
        cell = buildCell(cls, layout, contents, leftOf);
        remember(cell.entries);
        cells.set(key, cell);
      }
      return cell;
    };
    const digit = new Int32Array(6);
    const contents = new Array<number>(groups.length).fill(0);
    let cellKey = -1;
    let cell = NOT_TABULATED;
    const from = sideMap.map((s) => s.from);
    // The least significant group changes with every index; the others (and their sums) only every L.size.
    const last = groups.length - 1;
    const L = groups[last]!;
    const innerSide = (k: number) => L.sides.includes(k);
    const sides = [0, 1, 2, 3, 4, 5];
    const outerK = sides.filter((k) => !innerSide(k));
    const innerK = sides.filter(innerSide);
    const outerJ = sides.filter((j) => !innerSide(from[j]!));
    const innerJ = sides.filter((j) => innerSide(from[j]!));
    let outer = -1;
    let outerKey = 0;
    let stale = true;
    let baseOwn = 0;
    let baseAt = 0;
    let basePartner = 0;
    const none: Float64Array<ArrayBufferLike> = new Float64Array(0);
    let sums: InnerSums = { own: none, at: none, partner: none };
    let ownSum = none;
    let atSum = none;
    let partnerSum = none;
    let left = none;
    let right = none;
    let inClass = false;
    // Per cell, for every position r inside the last group's content: that group's sides' terms of the
    // three sums (b's table index, T(b)'s table index, T(b)'s class index), so a position costs three reads.
    const innerSums = (cell: Cell, c: number): InnerSums => {
      const cached = cell.inner.get(c);
      if (cached) return cached;
      const size = L.single ? L.size : L.strings[c]! ** L.sides.length;
      const own = new Float64Array(size);
      const at = new Float64Array(size);
      const partner = new Float64Array(size);
      const d = new Int32Array(6);
      const n = L.strings[c]!;
      for (let r = 0; r < size; r++) {
        if (L.single) d[L.sides[0]!] = r;
        else {
          let x = r;
          for (let k = L.sides.length - 1; k >= 0; k--) {
            const y = x % n;
            d[L.sides[k]!] = y;
            x = (x - y) / n;
          }
        }
        let o = 0;
        let a = 0;
        let p = 0;
        for (const k of innerK) o += cell.leftStride[k]! * d[k]!;
        for (const j of innerJ) {
          const t = cell.rankMap[j]![d[from[j]!]!]!;
          a += cell.rightStride[j]! * t;
          p += cell.partnerCoef[j]! * t;
        }
        own[r] = o;
        at[r] = a;
        partner[r] = p;
      }
      const sumsOf = { own, at, partner };
      cell.inner.set(c, sumsOf);
      return sumsOf;
    };
    for (let i = Number(start), e = Number(end); i < e; i++) {
      // Unrank i: mixed radix over groups (least significant last), then ranks within the group's content.
      let r = i % L.size;
      const q = (i - r) / L.size;
      if (q !== outer) {
        outer = q;
        stale = true;
        let rest = q;
        outerKey = 0;
        let scale = 1;
        for (let g = last - 1; g >= 0; g--) {
          const G = groups[g]!;
          let x = rest % G.size;
          rest = (rest - x) / G.size;
          if (G.single) {
            digit[G.sides[0]!] = x;
            contents[g] = 0;
          } else {
            let c = 0;
            while (x >= G.offsets[c + 1]!) c++;
            x -= G.offsets[c]!;
            contents[g] = c;
            outerKey += c * scale;
            const n = G.strings[c]!;
            for (let k = G.sides.length - 1; k >= 0; k--) {
              const y = x % n;
              digit[G.sides[k]!] = y;
              x = (x - y) / n;
            }
          }
          scale *= G.strings.length;
        }
      }
      let c = 0;
      if (!L.single) {
        while (r >= L.offsets[c + 1]!) c++;
        r -= L.offsets[c]!;
      }
      contents[last] = c;
      const key = outerKey * L.strings.length + c;
      if (key !== cellKey) {
        cell = cellOf(contents);
        cellKey = key;
        stale = true;
      }
      if (!cell.ok) {
        fallback(BigInt(i));
        continue;
      }
      if (stale) {
        baseOwn = 0;
        for (const k of outerK) baseOwn += cell.leftStride[k]! * digit[k]!;
        baseAt = 0;
        basePartner = cell.partnerBase;
        for (const j of outerJ) {
          const t = cell.rankMap[j]![digit[from[j]!]!]!;
          baseAt += cell.rightStride[j]! * t;
          basePartner += cell.partnerCoef[j]! * t;
        }
        sums = innerSums(cell, c);
        ownSum = sums.own;
        atSum = sums.at;
        partnerSum = sums.partner;
        left = cell.left;
        right = cell.right;
        inClass = cell.inClass;
        stale = false;
      }
      // r: the position inside the last group's content, whose sides' terms were summed once per cell
      const at = baseAt + atSum[r]!;
      const partner = basePartner + partnerSum[r]!;
      let pairable = false;
      if (involutive && inClass) {
        if (partner < i) {
          tally.checked++;
          tally.paired++;
          continue;
        }
        pairable = partner > i;
      }
      const l = left[baseOwn + ownSum[r]!]!;
      if (nonzeroOnly && l === 0 && !pairable) {
        tally.checked++;
        tally.skippedZero++;
        continue;
      }
      if (l !== right[at]) {
        // A failure (or a zero beside a nonzero partner): the per-instance path builds and confirms its rows.
        fallback(BigInt(i));
        continue;
      }
      const both = pairable ? 2 : 1;
      tally.checked++;
      if (nonzeroOnly && l === 0) tally.skippedZero += both;
      else {
        tally.holds += both;
        if (l === 0) tally.vacuous += both;
        else tally.nonzero += both;
      }
    }
    return true;
  };

  // Whatever the tables cannot do (values past safe integers, a label the right theory lacks), the per-instance path does, with its own errors.
  function guarded<T>(f: () => T | undefined): T | undefined {
    try {
      return f();
    } catch {
      return undefined;
    }
  }

  function candidatesOf(layout: Layout, contents: readonly number[]): string[][] {
    const candidates: string[][] = [[], [], [], [], [], []];
    layout.groups.forEach((g, gi) => {
      const list: string[] = [];
      for (const content of g.sides.length === 1 ? g.contents : [g.contents[contents[gi]!]!]) {
        for (let r = 0n; r < content.strings; r++) list.push(unrankString(r, content.counts).map((a) => alphabet[a]!).join(''));
      }
      for (const s of g.sides) candidates[s] = list;
    });
    return candidates;
  }

  function leftTable(cls: SizeClass, layout: Layout, contents: readonly number[]): { values: Float64Array; stride: Float64Array } | undefined {
    return guarded(() => {
      const candidates = candidatesOf(layout, contents);
      if (candidates.reduce((p, l) => p * l.length, 1) > MAX_CELL) return undefined;
      const values = countFamily(makeRegion(cls.lengths), candidates, program.left, { semiring }).numbers;
      return values ? { values, stride: strides(candidates.map((l) => l.length)) } : undefined;
    });
  }

  // A cell's left table in shared memory: its parts (slices of the most significant side with several
  // candidates) are claimed one by one, so workers needing the same cell split its work; then wait for the rest.
  function sharedLeftTable(cls: SizeClass, layout: Layout, contents: readonly number[], view: SharedView, key: number): { values: Float64Array; stride: Float64Array } | undefined {
    const candidates = candidatesOf(layout, contents);
    const counts = candidates.map((l) => l.length);
    const size = view.shape.sizes[key]!;
    if (counts.reduce((p, n) => p * n, 1) !== size) return undefined;
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
        const t = countFamily(region, sub, program.left, { semiring }).numbers;
        if (!t) return undefined;
        const block = (hi - lo) * inner;
        for (let o = 0; o < outer; o++) values.set(t.subarray(o * block, o * block + block), (o * n + lo) * inner);
        return true;
      }) === true;
    const base = key * TABLE_PARTS;
    for (let p = 0; p < parts; p++) {
      if (Atomics.compareExchange(view.state, base + p, 0, 1) !== 0) continue;
      Atomics.store(view.state, base + p, compute(p) ? 2 : 3);
      Atomics.notify(view.state, base + p);
    }
    for (let p = 0; p < parts; p++) {
      const began = Date.now();
      while (Atomics.load(view.state, base + p) === 1) {
        if (Date.now() - began > PART_PATIENCE_MS) {
          // Its worker is gone or stuck: the values are the same whoever writes them.
          Atomics.store(view.state, base + p, compute(p) ? 2 : 3);
          Atomics.notify(view.state, base + p);
          break;
        }
        Atomics.wait(view.state, base + p, 1, 50);
      }
      if (Atomics.load(view.state, base + p) !== 2) return undefined;
    }
    return { values, stride: strides(counts) };
  }

  function buildCell(cls: SizeClass, layout: Layout, contents: readonly number[], leftOf: (c: readonly number[]) => { values: Float64Array; stride: Float64Array } | undefined): Cell {
    const own = leftOf(contents);
    if (!own) return NOT_TABULATED;
    return guarded(() => tabulate(cls, layout, contents, own, leftOf)) ?? NOT_TABULATED;
  }

  function tabulate(
    cls: SizeClass,
    layout: Layout,
    contents: readonly number[],
    own: { values: Float64Array; stride: Float64Array },
    leftOf: (c: readonly number[]) => { values: Float64Array; stride: Float64Array } | undefined,
  ): Cell | undefined {
    const candidates = candidatesOf(layout, contents);
    const leftStride = own.stride;
    // T(b) side j is side from_j of b, reversed and renamed: map each candidate once.
    const images = sideMap.map((s) => candidates[s.from]!.map((x) => applySideMap([{ ...s, from: 0 }], [cls.lengths[s.from]!], [x]).sides[0]!));
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
      const other = leftOf(target.contents);
      if (!other) return undefined;
      return { ok: true, left: own.values, leftStride, right: other.values, rightStride: other.stride, rankMap: target.rankMap, inClass: true, partnerBase, partnerCoef, entries: 0, inner: new Map() };
    }
    // Another theory or outside the class: a table of the images themselves, read by b's own digits (no pairing then).
    const right = countFamily(makeRegion(lengths), images, program.right, { semiring }).numbers;
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
    const rankMap: Int32Array[] = [];
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
          const rank = Number(rankString([...s].map((ch) => alphabet.indexOf(ch)), content.counts));
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

  return { scan };
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
