import type { Boundary } from './boundary.js';
import { rowCount, rowTriangles, type UnitTriangle } from './lattice.js';
import type { PieceSet } from './piece-set.js';
import type { Region } from './region.js';

export const STEP_START = 0;
export const STEP_END = 1;
export const STEP_UP = 2;
export const STEP_DOWN = 3;

/** Bottom constraint of an up step: none (inside), any boundary label (open side 5), or a fixed label ≥ 0. */
export const BOTTOM_FREE = -2;
export const BOTTOM_OPEN = -1;

/**
 * The geometry of a top-down sweep over packed profiles, independent of the boundary labels, so it is
 * compiled once per region shape and piece set. A packed profile is slant + A·Σ d_i A^i (see
 * transfer-plan.ts for the profile layout); each step's transitions are flat typed arrays indexed
 * forwards (by the labels the step consumes) and backwards (by the labels it produces).
 */
export interface KernelPlan {
  readonly region: Region;
  readonly pieces: PieceSet;
  readonly alphabet: number;
  readonly boundaryCount: number;
  readonly pieceCount: number;
  readonly stepCount: number;
  readonly type: Uint8Array;
  /** A^placed for up and down steps. */
  readonly unit: Float64Array;
  /** For start/end steps: side index (0..5) and character index of the label consumed; for bottom-row up steps: side 5's character index; else −1. */
  readonly labelSide: Int8Array;
  readonly labelPos: Int32Array;
  readonly triangles: readonly (UnitTriangle | null)[];
  /** Packed profiles fit below 2^53 at every step. */
  readonly fits: boolean;
  /** Row index (top row 0) at which each step lies. */
  readonly rowOf: Int32Array;
  /** Up pieces by left (slant) label: options upStart[l] .. upStart[l+1]−1. */
  readonly upStart: Int32Array;
  readonly upRight: Int32Array;
  readonly upBottom: Int32Array;
  readonly upPiece: Int32Array;
  /** Up pieces by (right·A + bottom), giving the left label. */
  readonly upBackStart: Int32Array;
  readonly upBackLeft: Int32Array;
  readonly upBackPiece: Int32Array;
  /** Down pieces by (top·A + left). */
  readonly downStart: Int32Array;
  readonly downRight: Int32Array;
  readonly downPiece: Int32Array;
  /** Down pieces by right, giving top and left. */
  readonly downBackStart: Int32Array;
  readonly downBackTop: Int32Array;
  readonly downBackLeft: Int32Array;
  readonly downBackPiece: Int32Array;
}

// Buckets (key, payload...) rows into a CSR layout: start offsets per key plus one column per payload.
function bucket(keys: number[], rows: number[][], keyCount: number): { start: Int32Array; cols: Int32Array[] } {
  const start = new Int32Array(keyCount + 1);
  for (const k of keys) start[k + 1]!++;
  for (let k = 0; k < keyCount; k++) start[k + 1]! += start[k]!;
  const width = rows[0]?.length ?? 0;
  const cols = Array.from({ length: width }, () => new Int32Array(keys.length));
  const fill = start.slice(0, keyCount);
  keys.forEach((k, r) => {
    const at = fill[k]!++;
    for (let c = 0; c < width; c++) cols[c]![at] = rows[r]![c]!;
  });
  return { start, cols };
}

function compileKernelPlan(region: Region, pieces: PieceSet): KernelPlan {
  const a = pieces.labels.length;
  const index = new Map(pieces.labels.map((l, i) => [l, i]));
  const [, s2, , s4, , s6] = region.lengths;
  const n = region.size;
  const type: number[] = [];
  const unit: number[] = [];
  const labelSide: number[] = [];
  const labelPos: number[] = [];
  const triangles: (UnitTriangle | null)[] = [];
  const rowOf: number[] = [];
  let longest = s2;
  const rows = rowCount(region);
  for (let y = rows - 1; y >= 0; y--) {
    const row = rowTriangles(region, y);
    const first = row[0]!;
    const last = row[row.length - 1]!;
    const push = (t: number, u: number, side: number, pos: number, tri: UnitTriangle | null) => {
      type.push(t);
      unit.push(u);
      labelSide.push(side);
      labelPos.push(pos);
      triangles.push(tri);
      rowOf.push(rows - 1 - y);
    };
    push(STEP_START, 0, first.orientation === 'up' ? 0 : 5, first.orientation === 'up' ? y - s6 : y, null);
    let placed = 0;
    let pending = 0;
    for (const t of row) if (t.orientation === 'down') pending++;
    longest = Math.max(longest, pending + 1);
    for (const t of row) {
      if (t.orientation === 'up') {
        // Side 5 runs right to left; the bottom row's up triangles meet it left to right from x = s6.
        push(STEP_UP, Math.pow(a, placed), y === 0 ? 4 : -1, y === 0 ? region.lengths[4] - 1 - (t.x - s6) : -1, t);
        placed++;
      } else {
        push(STEP_DOWN, Math.pow(a, placed), -1, -1, t);
        pending--;
      }
      longest = Math.max(longest, placed + pending + 1);
    }
    push(STEP_END, 0, last.orientation === 'up' ? 2 : 3, last.orientation === 'up' ? n - 1 - y - s2 : s4 - 1 - y, null);
  }
  const up: { k: number[]; r: number[][]; bk: number[]; br: number[][] } = { k: [], r: [], bk: [], br: [] };
  const down: { k: number[]; r: number[][]; bk: number[]; br: number[][] } = { k: [], r: [], bk: [], br: [] };
  pieces.pieces.forEach((p, piece) => {
    const [l0, l1, l2] = p.labels.map((l) => index.get(l)!) as [number, number, number];
    if (p.orientation === 'up') {
      up.k.push(l0);
      up.r.push([l1, l2, piece]);
      up.bk.push(l1 * a + l2);
      up.br.push([l0, piece]);
    } else {
      down.k.push(l0 * a + l2);
      down.r.push([l1, piece]);
      down.bk.push(l1);
      down.br.push([l0, l2, piece]);
    }
  });
  const uf = bucket(up.k, up.r, a);
  const ub = bucket(up.bk, up.br, a * a);
  const df = bucket(down.k, down.r, a * a);
  const db = bucket(down.bk, down.br, a);
  const empty = new Int32Array(0);
  return {
    region,
    pieces,
    alphabet: a,
    boundaryCount: pieces.boundaryLabels.length,
    pieceCount: pieces.pieces.length,
    stepCount: type.length,
    type: Uint8Array.from(type),
    unit: Float64Array.from(unit),
    labelSide: Int8Array.from(labelSide),
    labelPos: Int32Array.from(labelPos),
    triangles,
    fits: Math.pow(a, longest + 1) < Number.MAX_SAFE_INTEGER,
    rowOf: Int32Array.from(rowOf),
    upStart: uf.start,
    upRight: uf.cols[0] ?? empty,
    upBottom: uf.cols[1] ?? empty,
    upPiece: uf.cols[2] ?? empty,
    upBackStart: ub.start,
    upBackLeft: ub.cols[0] ?? empty,
    upBackPiece: ub.cols[1] ?? empty,
    downStart: df.start,
    downRight: df.cols[0] ?? empty,
    downPiece: df.cols[1] ?? empty,
    downBackStart: db.start,
    downBackTop: db.cols[0] ?? empty,
    downBackLeft: db.cols[1] ?? empty,
    downBackPiece: db.cols[2] ?? empty,
  };
}

const plans = new WeakMap<PieceSet, Map<string, KernelPlan>>();

/** The kernel plan of a region shape and piece set, compiled once and cached (at most 64 shapes per piece set). */
export function kernelPlan(region: Region, pieces: PieceSet): KernelPlan {
  let byShape = plans.get(pieces);
  if (!byShape) {
    byShape = new Map();
    plans.set(pieces, byShape);
  }
  const key = region.lengths.join(',');
  let plan = byShape.get(key);
  if (!plan) {
    plan = compileKernelPlan(region, pieces);
    if (byShape.size >= 64) byShape.delete(byShape.keys().next().value!);
    byShape.set(key, plan);
  }
  return plan;
}

/** The boundary's labels per step: start/end labels, and each up step's bottom constraint. */
export interface StepLabels {
  readonly label: Int32Array;
  /** Packed profile before the first step (side 2, left to right). */
  readonly initial: number;
  /** Packed final profile when side 5 is fixed (line 0 = side 5 reversed), else −1. */
  readonly target: number;
}

/** Resolves a boundary (side 5 may be open) against a kernel plan; requires `plan.fits`. */
export function stepLabels(plan: KernelPlan, boundary: Boundary): StepLabels {
  const index = new Map(plan.pieces.labels.map((l, i) => [l, i]));
  const codes = boundary.map((s) => (s === null ? null : [...s].map((c) => index.get(c)!)));
  const label = new Int32Array(plan.stepCount);
  for (let s = 0; s < plan.stepCount; s++) {
    const side = plan.labelSide[s]!;
    const t = plan.type[s]!;
    if (t === STEP_UP || t === STEP_DOWN) label[s] = side < 0 ? BOTTOM_FREE : codes[4] === null ? BOTTOM_OPEN : codes[4]![plan.labelPos[s]!]!;
    else label[s] = codes[side]![plan.labelPos[s]!]!;
  }
  const a = plan.alphabet;
  const pack = (digits: readonly number[]) => {
    let key = 0;
    for (let i = digits.length - 1; i >= 0; i--) key = key * a + digits[i]!;
    return key;
  };
  return { label, initial: pack(codes[1]!), target: codes[4] === null ? -1 : pack([...codes[4]!].reverse()) };
}
