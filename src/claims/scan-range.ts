import type { ScanTally } from './claim-api.js';
import type { Cell, InnerSums } from './family-cells.js';
import type { ClassBounds } from './residue-tables.js';

// The hot loop of the bulk scan (family-scan.ts), a function of its own: the JIT then optimizes this loop
// alone, once, instead of the whole per-chunk set-up around it, again after every deoptimization there
// (that recompilation cost about as much CPU as the loop itself, once per worker thread).

/** One group of the class index as the scan reads it: sides, size, content offsets and strings per content. */
export interface GroupDigits {
  readonly sides: readonly number[];
  readonly single: boolean;
  readonly size: number;
  readonly offsets: Float64Array;
  readonly strings: Float64Array;
}

/** What one chunk's scan reads: the class's groups, the claim's side map and the cells (built on first use). */
export interface ScanRange {
  readonly groups: readonly GroupDigits[];
  readonly digit: Int32Array;
  readonly contents: number[];
  /** Side j of T(b) is side from[j] of b. */
  readonly from: readonly number[];
  readonly outerK: readonly number[];
  readonly outerJ: readonly number[];
  readonly involutive: boolean;
  readonly nonzeroOnly: boolean;
  readonly bound: ClassBounds | undefined;
  /** The cell being scanned and its key; the caller sets them when `need` is NEED_CELL. */
  cell: Cell;
  cellKey: number;
  /** Set by scanRange on return: what it needs (0: nothing, it reached `end`), the cell key or content c. */
  need: number;
  key: number;
  c: number;
}

// A decision from residue codes, as the per-instance path tallies a modular result.
function modular(tally: ScanTally, bound: number): void {
  tally.errorBound = (tally.errorBound ?? 0) + bound;
  tally.exact = false;
}

/** Why `scanRange` returned before `end`. */
export const NEED_CELL = 1;
export const NEED_SUMS = 2;
export const NEED_FALLBACK = 3;

function stop(s: ScanRange, need: number, i: number): number {
  s.need = need;
  return i;
}

/**
 * Decides instances [start, end) of a class (see FamilyScanner.scan) while they fall in `s.cell`, and
 * returns where it stopped: `end`, or an index that needs what `s.need` says (the cell `s.key` of
 * `s.contents`, the inner sums of content `s.c` of this cell, or the per-instance path). The caller does that
 * and resumes there (after a fallback, at the next index): nothing cold is called from this loop, so the JIT
 * compiles the loop alone and never inlines the cells' construction into it.
 */
export function scanRange(s: ScanRange, start: number, end: number, tally: ScanTally): number {
  const { groups, digit, contents, from, outerK, outerJ, involutive, nonzeroOnly, bound } = s;
  const last = groups.length - 1;
  const L = groups[last]!;
  const cellKey = s.cellKey;
  const cell = s.cell;
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
  for (let i = start; i < end; i++) {
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
      s.key = key;
      return stop(s, NEED_CELL, i);
    }
    if (!cell.ok) return stop(s, NEED_FALLBACK, i);
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
      const cached = cell.inner.get(c);
      if (!cached) {
        s.c = c;
        return stop(s, NEED_SUMS, i);
      }
      sums = cached;
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
      if (bound) modular(tally, bound.zero);
      continue;
    }
    if (l !== right[at]) {
      // A failure (or a zero beside a nonzero partner): the per-instance path builds and confirms its rows.
      return stop(s, NEED_FALLBACK, i);
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
  s.need = 0;
  return end;
}

// The cell key of the outer groups (all but the last) at outer index q: mixed radix of their content indices.
export function outerKeyAt(groups: readonly GroupDigits[], q: number): number {
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
