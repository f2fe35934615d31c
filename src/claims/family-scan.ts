import { fillingCountSemiring, integerSemiring, type SafeInt, type Semiring } from '../engine/index.js';
import type { ScanTally, SharedTables, SizeClass } from './claim-api.js';
import type { ClaimProgram } from './compile-claim-program.js';
import { familyCells, NOT_TABULATED, type Ahead, type Cell, type FamilyValues, type InnerSums, type LeftTable, type RightValues, type SharedView } from './family-cells.js';
import type { ClaimPlanExt } from './plan-claim.js';
import { TABLE_PARTS, tableShape } from './shared-tables.js';
import { residueScannable, residueTables, type ClassBounds } from './residue-tables.js';
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

// A decision from residue codes, as the per-instance path tallies a modular result.
function modular(tally: ScanTally, bound: number): void {
  tally.errorBound = (tally.errorBound ?? 0) + bound;
  tally.exact = false;
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
      offsets: [...g.contents.map((c) => Number(c.offset)), Number(g.size)],
      strings: g.contents.map((c) => Number(c.strings)),
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
      if (pairs && inClass) {
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
        if (bound) modular(tally, bound.zero);
        continue;
      }
      if (l !== right[at]) {
        // A failure (or a zero beside a nonzero partner): the per-instance path builds and confirms its rows.
        fallback(BigInt(i));
        continue;
      }
      const both = pairable ? 2 : 1;
      tally.checked++;
      if (bound) modular(tally, bound.holds);
      if (nonzeroOnly && l === 0) tally.skippedZero += both;
      else {
        tally.holds += both;
        if (l === 0) tally.vacuous += both;
        else tally.nonzero += both;
      }
    }
    return true;
  };

  return { scan };
}

interface GroupDigits {
  readonly sides: readonly number[];
  readonly single: boolean;
  readonly size: number;
  readonly offsets: readonly number[];
  readonly strings: readonly number[];
}

// The cell key of the outer groups (all but the last) at outer index q: mixed radix of their content indices.
function outerKeyAt(groups: readonly GroupDigits[], q: number): number {
  let rest = Math.floor(q);
  let key = 0;
  let scale = 1;
  for (let g = groups.length - 2; g >= 0; g--) {
    const G = groups[g]!;
    let x = rest % G.size;
    rest = (rest - x) / G.size;
    let c = 0;
    if (!G.single) while (x >= G.offsets[c + 1]!) c++;
    key += c * scale;
    scale *= G.strings.length;
  }
  return key;
}
