import { fillingCountSemiring, integerSemiring, type SafeInt, type Semiring } from '../engine/index.js';
import type { ScanTally, SharedTables, SizeClass } from './claim-api.js';
import type { ClaimProgram } from './compile-claim-program.js';
import { familyCells, NOT_TABULATED, type Ahead, type Cell, type FamilyValues, type InnerSums, type LeftTable, type RightValues, type SharedView } from './family-cells.js';
import type { ClaimPlanExt } from './plan-claim.js';
import { TABLE_PARTS, tableShape } from './shared-tables.js';
import { residueScannable, residueTables, type ClassBounds } from './residue-tables.js';
import { NEED_CELL, NEED_FALLBACK, NEED_SUMS, outerKeyAt, scanRange, type ScanRange } from './scan-range.js';
import { applySideMap } from './side-map.js';
import { isInvolution, type Permutation } from './substitution.js';

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
  /** Exact values only (--exact): modular comparisons are not scanned. */
  readonly exact: boolean;
  /** The class's substitution σ (equalAfterSubstitution), as the evaluator takes it; undefined for none or the identity. */
  readonly substitutionOf?: (cls: SizeClass) => Permutation | undefined;
}

// Table entries kept per worker (8 bytes each): the 6×6 parallelogram family needs 0.85 M per theory.
const CACHE_ENTRIES = 6_000_000;
/** Whether a claim's sweeps can be decided from value tables: integer values (or, unless exact, residue codes) compared for equality through a side map. */
export function scannable(program: ClaimProgram): boolean {
  return integerScannable(program) || residueScannable(program);
}

function integerScannable(program: ClaimProgram): boolean {
  const measure = program.claim.compare.measure.type;
  const integer = measure === 'puzzles' || (measure === 'value' && !program.polynomial);
  if (!integer || program.formula || !program.sideMap || program.claim.compare.relation.type !== 'equal' || program.relation.substitution || program.relation.searchSpace) return false;
  return program.left.boundaryLabels.every((a) => a.length === 1);
}

/** The bulk scanner of a claim, or undefined when it is not `scannable` (or its comparison is modular and the run exact). */
export function familyScanner(setup: ScanSetup): FamilyScanner | undefined {
  const { program, plan, involutive, sameTheory } = setup;
  const integer = integerScannable(program);
  if (!integer && (setup.exact || !residueScannable(program))) return undefined;
  const measure = program.claim.compare.measure.type;
  const sideMap = program.sideMap!;
  const views = new Map<string, SharedView | undefined>();
  const semiring: Semiring<SafeInt> = measure === 'puzzles' ? fillingCountSemiring : integerSemiring;
  // Modular comparisons compare residue codes, each decision carrying its Schwartz–Zippel bound.
  const residues = integer ? undefined : residueTables(program);
  const values: FamilyValues | Semiring<SafeInt> = residues ? residues.table : semiring;
  const bounds = new Map<string, ClassBounds | undefined>();
  const { leftTable, sharedLeftTable, buildCell } = familyCells(program, values, sameTheory);
  const nonzeroOnly = program.claim.family.nonzeroOnly;
  // Cells and their left tables, dropped together when the tables outgrow the budget.
  const cells = new Map<string, Cell>();
  const lefts = new Map<string, LeftTable | undefined>();
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
    let bound: ClassBounds | undefined;
    const sigma = residues ? setup.substitutionOf?.(cls) : undefined;
    // Under σ, {b, T(b)} is one pair only when σ is an involution too (the evaluator's rule).
    const pairs = involutive && (sigma === undefined || isInvolution(sigma));
    if (residues) {
      if (!bounds.has(cls.key)) bounds.set(cls.key, residues.classBounds(cls.lengths, applySideMap(sideMap, cls.lengths, cls.lengths.map(() => '')).lengths));
      bound = bounds.get(cls.key);
      // A bound too weak to claim anything: the per-instance path decides such a class exactly.
      if (!bound) return false;
    }
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
      // typed arrays: one shape whatever the values, so the scan's optimized code is not thrown away per class
      offsets: Float64Array.from([...g.contents.map((c) => Number(c.offset)), Number(g.size)]),
      strings: Float64Array.from(g.contents, (c) => Number(c.strings)),
    }));
    // A worker that would wait for another's part computes an unclaimed one instead: first the cells of this
    // chunk (from those of its first outer digits, in key order = index order of the outer groups), then the
    // class's later cells, which later chunks need (every cell of a swept class is needed once).
    const inner = groups[groups.length - 1]!;
    const ahead: Ahead | undefined = shared ? { next: outerKeyAt(groups, Number(start) / inner.size) * inner.strings.length, last: shared.shape.cells - 1 } : undefined;
    const leftOf = (contents: readonly number[]) => {
      const key = `${shared ? `${tables!.id}|` : ''}${cls.key}|${contents.join(',')}`;
      if (!lefts.has(key)) {
        const t = shared ? sharedLeftTable(cls, layout, contents, shared, cellKeyOf(contents), ahead) : leftTable(cls, layout, contents);
        remember(shared ? 0 : (t?.values.length ?? 0));
        lefts.set(key, t);
      }
      return lefts.get(key);
    };
    // T(b) compared after σ: its values are swept at the σ-moved point, in this worker's own tables.
    const substituted: RightValues | undefined = sigma
      ? {
          values: residues!.tableFor(sigma),
          of: (contents) => {
            const key = `σ|${cls.key}|${contents.join(',')}`;
            if (!lefts.has(key)) {
              const t = leftTable(cls, layout, contents, residues!.tableFor(sigma));
              remember(t?.values.length ?? 0);
              lefts.set(key, t);
            }
            return lefts.get(key);
          },
        }
      : undefined;
    const cellOf = (contents: readonly number[]): Cell => {
      const key = `${cls.key}|${contents.join(',')}`;
      let cell = cells.get(key);
      if (!cell) {
        cell = buildCell(cls, layout, contents, leftOf, substituted);
        remember(cell.entries);
        cells.set(key, cell);
      }
      return cell;
    };
    const digit = new Int32Array(6);
    const contents = Array.from({ length: groups.length }, () => 0);
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
    const range: ScanRange = { groups, digit, contents, from, outerK, outerJ, involutive: pairs, nonzeroOnly, bound, cell: NOT_TABULATED, cellKey: -1, need: 0, key: 0, c: 0 };
    for (let i = Number(start), e = Number(end); i < e; ) {
      i = scanRange(range, i, e, tally);
      if (range.need === NEED_CELL) {
        range.cell = cellOf(contents);
        range.cellKey = range.key;
      } else if (range.need === NEED_SUMS) innerSums(range.cell, range.c);
      else if (range.need === NEED_FALLBACK) fallback(BigInt(i++));
    }
    return true;
  };

  return { scan };
}
