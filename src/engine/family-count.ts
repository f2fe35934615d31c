import { checkBoundary } from './boundary.js';
import { genericWeights, numericLanes } from './count-kernel.js';

import { genericStep } from './generic-sweep.js';
import { BOTTOM_OPEN, kernelPlan, STEP_END, STEP_START, type KernelPlan } from './kernel-plan.js';
import { forwardStep, newTable, NumericOverflow, residueLanes, type Lanes } from './numeric-kernel.js';
import type { PieceSet } from './piece-set.js';
import type { ProfileTable } from './profile-table.js';
import type { Region } from './region.js';
import type { Semiring } from './semiring.js';
import type { CountOptions } from './transfer-count.js';
import { declaredWeigher, type Weigher } from './weigher.js';
import { CodedError } from '../errors/index.js';

/** Sides in table-index order, most significant first: 1, 2, 3, 4, 6, then 5 (least significant). */
export const FAMILY_SIDE_ORDER = [0, 1, 2, 3, 5, 4] as const;

/**
 * Values of every boundary of a product family (one candidate list per side), computed in bulk:
 * entry `index` is the boundary whose side k is `candidates[k][i_k]`, with
 * index = ((((i1·n2 + i2)·n3 + i3)·n4 + i4)·n6 + i6)·n5 + i5 (side 5 least significant).
 */
export interface FamilyTable<T> {
  /** Candidate counts per side, sides 1..6 in clockwise order. */
  readonly counts: readonly number[];
  readonly size: number;
  /** Integer semirings whose values all stay safe integers: the values, by index (no objects). */
  readonly numbers: Float64Array | null;
  /** The modular semiring: residues, `lanes` per entry (float64 when a bound lane rides along, numeric-kernel.ts). */
  readonly residues: Uint32Array | Float64Array | null;
  readonly lanes: number;
  /** The value of one entry, as the semiring's value (allocates for residues; fine off the hot path). */
  value(index: number): T;
  /** Table index of a boundary whose sides are all candidates, or −1. */
  indexOf(sides: readonly string[]): number;
}

interface Tables<S> {
  fresh(): S;
  /** Hands the walk's tables back once its values are harvested (numeric tables are reused by the next walk). */
  release?(tables: S[]): void;
  step(s: number, label: Int32Array, cur: S, next: S): void;
  seed(table: S, key: number): void;
  /** Writes the final table's values for each side-5 candidate key at out positions base + j. */
  harvest(final: S, side5Keys: Float64Array, base: number): void;
}

// Each side's candidates sorted by the order the sweep reads its characters, so the candidates
// sharing the characters read so far form one contiguous range: the trie over the boundary.
interface SideTrie {
  readonly perm: Int32Array;
  /** Character codes, candidate-major: codes[c·len + position]. */
  readonly codes: Int32Array;
  readonly len: number;
}

function sideTrie(candidates: readonly string[], order: readonly number[], index: ReadonlyMap<string, number>): SideTrie {
  const len = order.length;
  const codes = new Int32Array(candidates.length * Math.max(len, 1));
  candidates.forEach((s, c) => [...s].forEach((ch, p) => (codes[c * len + p] = index.get(ch)!)));
  const perm = Int32Array.from(candidates.keys()).sort((x, y) => {
    for (const p of order) {
      const d = codes[x * len + p]! - codes[y * len + p]!;
      if (d !== 0) return d;
    }
    return x - y;
  });
  return { perm, codes, len };
}

function walkFamily<S>(plan: KernelPlan, candidates: readonly (readonly string[])[], tables: Tables<S>, size: number): void {
  const index = new Map(plan.pieces.labels.map((l, i) => [l, i]));
  const n = plan.stepCount;
  // For each side, the positions the sweep reads, in reading order; and, per step, which read it is.
  const order: number[][] = [[], [], [], [], [], []];
  const readAt = new Int32Array(n).fill(-1);
  for (let s = 0; s < n; s++) {
    const t = plan.type[s]!;
    if (t === STEP_START || t === STEP_END) {
      const k = plan.labelSide[s]!;
      readAt[s] = order[k]!.length;
      order[k]!.push(plan.labelPos[s]!);
    }
  }
  const tries = candidates.map((c, k) => sideTrie(c, order[k]!, index));
  const counts = candidates.map((c) => c.length);
  const a = plan.alphabet;
  const side5Keys = Float64Array.from(candidates[4]!, (s) => {
    let key = 0;
    for (const ch of [...s]) key = key * a + index.get(ch)!; // line 0 is side 5 reversed: the last char is digit 0
    return key;
  });
  const label = new Int32Array(n);
  for (let s = 0; s < n; s++) if (plan.type[s] !== STEP_START && plan.type[s] !== STEP_END) label[s] = plan.labelSide[s]! === 4 ? BOTTOM_OPEN : -2;
  const pool: S[] = Array.from({ length: n + 1 }, () => tables.fresh());
  const lo = [0, 0, 0, 0, 0, 0];
  const hi = counts.slice();
  const stride = [0, 0, 0, 0, 0, 0];
  let acc = 1;
  for (const k of [...FAMILY_SIDE_ORDER].reverse()) {
    stride[k] = acc;
    acc *= counts[k]!;
  }
  if (acc !== size) throw new CodedError('internal_error', { what: 'Family table', expected: `${size} entries`, received: `${acc}` }, { path: 'candidates' });
  const leaf = (final: S, k: number, base: number) => {
    // Sides 1, 2, 3, 4, 6 are now fixed up to repeated candidates: one entry per remaining choice.
    if (k === 5) return tables.harvest(final, side5Keys, base);
    const side = FAMILY_SIDE_ORDER[k]!;
    for (let r = lo[side]!; r < hi[side]!; r++) leaf(final, k + 1, base + tries[side]!.perm[r]! * stride[side]!);
  };
  const walk = (s: number) => {
    if (s === n) return leaf(pool[n]!, 0, 0);
    const k = readAt[s]!;
    if (k < 0) {
      tables.step(s, label, pool[s]!, pool[s + 1]!);
      return walk(s + 1);
    }
    // Branch on the character this step reads, over the side's candidates that agree so far.
    const side = plan.labelSide[s]!;
    const trie = tries[side]!;
    const pos = order[side]![k]!;
    const from = lo[side]!;
    const to = hi[side]!;
    let r = from;
    while (r < to) {
      const ch = trie.codes[trie.perm[r]! * trie.len + pos]!;
      let end = r + 1;
      while (end < to && trie.codes[trie.perm[end]! * trie.len + pos] === ch) end++;
      lo[side] = r;
      hi[side] = end;
      label[s] = ch;
      tables.step(s, label, pool[s]!, pool[s + 1]!);
      walk(s + 1);
      r = end;
    }
    lo[side] = from;
    hi[side] = to;
  };
  // Side 2 is the initial profile: one root per distinct string.
  const top = tries[1]!;
  let r = 0;
  while (r < counts[1]!) {
    const first = top.perm[r]!;
    let end = r + 1;
    const same = (c: number) => candidates[1]![c] === candidates[1]![first];
    while (end < counts[1]! && same(top.perm[end]!)) end++;
    let key = 0;
    const s2 = candidates[1]![first]!;
    for (let i = [...s2].length - 1; i >= 0; i--) key = key * a + index.get([...s2][i]!)!;
    lo[1] = r;
    hi[1] = end;
    tables.seed(pool[0]!, key);
    walk(0);
    r = end;
  }
  tables.release?.(pool);
}

// Numeric tables of finished walks, by lane layout: a sweep of many small cells (one countFamily each) allocated
// a few typed arrays per step of every walk. Every step and seed clears the table it writes. Only small tables
// are kept, and only so many, so a large family's tables are not held after its walk.
const SPARE_TABLES = 512;
const SPARE_ENTRIES = 1 << 12;
const spareTables = new Map<string, ProfileTable[]>();

function numericTables(plan: KernelPlan, lanes: Lanes, numbers: Float64Array | Uint32Array): Tables<ProfileTable> {
  const L = lanes.count;
  const spares = spareTables.get(`${L}:${residueLanes(lanes)}`) ?? [];
  spareTables.set(`${L}:${residueLanes(lanes)}`, spares);
  return {
    fresh: () => spares.pop() ?? newTable(lanes),
    release: (tables) => {
      for (const t of tables) if (spares.length < SPARE_TABLES && t.keys.length <= SPARE_ENTRIES) spares.push(t);
    },
    step: (s, label, cur, next) => forwardStep(plan, label, s, lanes, cur, next),
    seed: (t, key) => {
      t.clear();
      const e = t.slot(key);
      for (let l = 0; l < L; l++) t.vals[e * L + l] = 1;
    },
    harvest: (final, keys, base) => {
      for (let j = 0; j < keys.length; j++) {
        const e = final.find(keys[j]!);
        if (e < 0) continue;
        for (let l = 0; l < L; l++) numbers[(base + j) * L + l] = final.vals[e * L + l]!;
      }
    },
  };
}

function genericTables<T>(plan: KernelPlan, semiring: Semiring<T>, weights: readonly (T | undefined)[], values: (T | undefined)[]): Tables<{ map: Map<number, T> }> {
  return {
    fresh: () => ({ map: new Map() }),
    step: (s, label, cur, next) => {
      next.map = genericStep(plan, label, s, semiring, weights, cur.map, false);
    },
    seed: (t, key) => {
      t.map = new Map([[key, semiring.one]]);
    },
    harvest: (final, keys, base) => {
      for (let j = 0; j < keys.length; j++) {
        const v = final.map.get(keys[j]!);
        if (v !== undefined) values[base + j] = v;
      }
    },
  };
}

/**
 * Values of every boundary of a product family in one depth-first walk over the boundary trie in
 * sweep order: boundaries that agree on the part of the boundary swept so far share those steps, and
 * side 5 is left open, so each distinct (sides 1, 2, 3, 4, 6) costs at most one sweep's last rows.
 * `candidates[k]` lists side k+1's strings (any order, duplicates allowed); side 5's list picks the
 * completions kept. No object is allocated per boundary for integer and modular semirings.
 */
export function countFamily<T>(region: Region, candidates: readonly (readonly string[])[], pieces: PieceSet, options: CountOptions<T>): FamilyTable<T> {
  if (candidates.length !== 6) throw new CodedError('invalid_boundary', { what: 'Family candidates', expected: '6 lists', received: `${candidates.length}` }, { path: 'candidates' });
  const filler = pieces.boundaryLabels[0]!;
  const allowed = new Set(pieces.boundaryLabels);
  candidates.forEach((list, k) => {
    for (const s of list) {
      // A candidate of the right length in boundary labels passes; checkBoundary words the error of any other.
      let length = 0;
      let labels = true;
      for (const ch of s) {
        length++;
        labels &&= allowed.has(ch);
      }
      if (labels && length === region.lengths[k]) continue;
      checkBoundary(region, region.lengths.map((len, j) => (j === k ? s : filler.repeat(len))), pieces);
    }
  });
  const plan = kernelPlan(region, pieces);
  if (!plan.fits) throw new CodedError('invalid_region', { what: 'Family region', expected: 'profiles below 2^53', received: `side lengths ${region.lengths.join(',')}` }, { path: 'lengths', hint: 'count these boundaries one by one' });
  const counts = candidates.map((c) => c.length);
  const size = counts.reduce((x, y) => x * y, 1);
  const { semiring } = options;
  const weigher: Weigher<T> = options.weigher ?? declaredWeigher(semiring);
  const cacheable = options.weigher === undefined;
  const lanes = numericLanes(plan, [{ semiring: semiring as Semiring<unknown>, weigher: weigher as Weigher<unknown>, cacheable }]);
  const locate = familyIndex(candidates);
  if (lanes) {
    const L = lanes.count;
    const out = residueLanes(lanes) ? new Uint32Array(size * L) : new Float64Array(size * L);
    try {
      walkFamily(plan, candidates, numericTables(plan, lanes, out), size);
      const residues = lanes.moduli ? out : null;
      const numbers = lanes.moduli ? null : (out as Float64Array);
      return {
        counts,
        size,
        numbers,
        residues,
        lanes: L,
        value: (i) => (residues ? (Array.from(residues.subarray(i * L, i * L + L)) as T) : (numbers![i]! as T)),
        indexOf: locate,
      };
    } catch (e) {
      if (!(e instanceof NumericOverflow)) throw e;
    }
  }
  // Family values are many small ones: the caller's form, no work form (see WORK_FORM_TERMS).
  const values = new Array<T | undefined>(size);
  walkFamily(plan, candidates, genericTables(plan, semiring, genericWeights(plan, semiring, weigher, cacheable), values), size);
  return { counts, size, numbers: null, residues: null, lanes: 1, value: (i) => values[i] ?? semiring.zero, indexOf: locate };
}

function familyIndex(candidates: readonly (readonly string[])[]): (sides: readonly string[]) => number {
  const positions = candidates.map((list) => {
    const m = new Map<string, number>();
    list.forEach((s, i) => {
      if (!m.has(s)) m.set(s, i);
    });
    return m;
  });
  return (sides) => {
    let index = 0;
    for (const k of FAMILY_SIDE_ORDER) {
      const i = positions[k]!.get(sides[k]!);
      if (i === undefined) return -1;
      index = index * candidates[k]!.length + i;
    }
    return index;
  };
}
