import type { Boundary } from './boundary.js';
import { rowCount, rowTriangles, type UnitTriangle } from './lattice.js';
import type { PieceSet } from './piece-set.js';
import type { Region } from './region.js';

/**
 * The sweep is a sequence of steps over a "profile" string: one char per label (char code = label
 * index). Inside row y the profile is: bottoms of the up triangles placed so far (line y), then the
 * tops of the down triangles still to place (line y+1), then the current slanted edge.
 */
export type Step =
  | { readonly type: 'start'; readonly label: number }
  | { readonly type: 'end'; readonly label: number }
  | {
      readonly type: 'up';
      readonly placed: number;
      readonly triangle: UnitTriangle;
      /** The label side 5 prescribes for this bottom edge, if it is fixed. */
      readonly bottom: number | null;
      /** The bottom edge lies on side 5, so only boundary labels may go there even when it is open. */
      readonly onBoundary: boolean;
    }
  | { readonly type: 'down'; readonly placed: number; readonly triangle: UnitTriangle };

export interface UpOption {
  readonly piece: number;
  readonly right: number;
  readonly bottom: number;
}
export interface DownOption {
  readonly piece: number;
  readonly right: number;
}

export interface TransferPlan {
  readonly region: Region;
  readonly pieces: PieceSet;
  readonly alphabetSize: number;
  /** Labels 0 .. boundaryCount−1 are the boundary labels (they come first in `PieceSet.labels`). */
  readonly boundaryCount: number;
  /** Profile before the first row: side 2, left to right. */
  readonly initial: string;
  readonly steps: readonly Step[];
  /** Up pieces by left label; down pieces by top·A + left. */
  readonly upByLeft: readonly (readonly UpOption[])[];
  readonly downByTopLeft: readonly (readonly DownOption[])[];
}

export function labelChar(index: number): string {
  return String.fromCharCode(index);
}

/** Compiles the top-down sweep of a region; side 5 (the bottom) may be open. */
export function compilePlan(region: Region, boundary: Boundary, pieces: PieceSet): TransferPlan {
  const index = new Map(pieces.labels.map((l, i) => [l, i]));
  const codes = (s: string) => [...s].map((c) => index.get(c)!);
  const [side1, side2, side3, side4, side5, side6] = boundary.map((s) => (s === null ? null : codes(s))) as (number[] | null)[];
  const [, , , s4, , s6] = region.lengths;
  const n = region.size;
  // Side 5 runs right to left; the bottom row's up triangles meet it left to right from x = s6.
  const bottomAt = (x: number): number | null => (side5 == null ? null : side5[side5.length - 1 - (x - s6)]!);
  const steps: Step[] = [];
  for (let y = rowCount(region) - 1; y >= 0; y--) {
    const row = rowTriangles(region, y);
    const first = row[0]!;
    const last = row[row.length - 1]!;
    steps.push({ type: 'start', label: first.orientation === 'up' ? side1![y - s6]! : side6![y]! });
    let placed = 0;
    for (const triangle of row) {
      if (triangle.orientation === 'up') {
        steps.push({ type: 'up', placed, triangle, bottom: y === 0 ? bottomAt(triangle.x) : null, onBoundary: y === 0 });
        placed++;
      } else {
        steps.push({ type: 'down', placed, triangle });
      }
    }
    steps.push({ type: 'end', label: last.orientation === 'up' ? side3![n - 1 - y - region.lengths[1]]! : side4![s4 - 1 - y]! });
  }
  const a = pieces.labels.length;
  const upByLeft: UpOption[][] = Array.from({ length: a }, () => []);
  const downByTopLeft: DownOption[][] = Array.from({ length: a * a }, () => []);
  pieces.pieces.forEach((p, piece) => {
    const [l0, l1, l2] = p.labels.map((l) => index.get(l)!) as [number, number, number];
    if (p.orientation === 'up') upByLeft[l0]!.push({ piece, right: l1, bottom: l2 });
    else downByTopLeft[l0 * a + l2]!.push({ piece, right: l1 });
  });
  return { region, pieces, alphabetSize: a, boundaryCount: pieces.boundaryLabels.length, initial: side2!.map(labelChar).join(''), steps, upByLeft, downByTopLeft };
}

/** Calls `emit(next, piece)` for every way to take one step from `key` (`piece` −1 for row ends). */
export function expandStep(plan: TransferPlan, step: Step, key: string, emit: (next: string, piece: number) => void): void {
  const len = key.length;
  switch (step.type) {
    case 'start':
      emit(key + labelChar(step.label), -1);
      return;
    case 'end':
      if (key.charCodeAt(len - 1) === step.label) emit(key.slice(0, len - 1), -1);
      return;
    case 'up': {
      const head = key.slice(0, step.placed);
      const rest = key.slice(step.placed, len - 1);
      for (const o of plan.upByLeft[key.charCodeAt(len - 1)]!) {
        if (step.bottom !== null ? o.bottom !== step.bottom : step.onBoundary && o.bottom >= plan.boundaryCount) continue;
        emit(head + labelChar(o.bottom) + rest + labelChar(o.right), o.piece);
      }
      return;
    }
    case 'down': {
      const top = key.charCodeAt(step.placed);
      const head = key.slice(0, step.placed);
      const rest = key.slice(step.placed + 1, len - 1);
      for (const o of plan.downByTopLeft[top * plan.alphabetSize + key.charCodeAt(len - 1)]!) emit(head + rest + labelChar(o.right), o.piece);
      return;
    }
  }
}
