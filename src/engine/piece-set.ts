
import type { Orientation } from './lattice.js';
import type { FormulaNode } from './weight-formula.js';
import { CodedError } from '../errors/index.js';

/** How a piece contributes to the value: a constant, a named formal variable, y_j − y_i by position, or a formula. */
export type WeightSpec =
  | { readonly type: 'integer'; readonly value: number }
  | { readonly type: 'variable'; readonly name: string }
  | { readonly type: 'position' }
  | { readonly type: 'formula'; readonly text: string; readonly formula: FormulaNode };

/** One unit triangle a puzzle may use; `labels` are clockwise: up = (left, right, bottom), down = (top, right, left). */
export interface Piece {
  readonly name: string;
  readonly kind: string;
  readonly orientation: Orientation;
  readonly labels: readonly [string, string, string];
  readonly weight: WeightSpec;
}

/** A validated piece set over a finite alphabet; boundary labels are single characters. */
export interface PieceSet {
  readonly name: string;
  readonly boundaryLabels: readonly string[];
  /** Every label, boundary labels first, in a fixed order (labels are matched by index). */
  readonly labels: readonly string[];
  readonly pieces: readonly Piece[];
}

/** A triangle's edge labels named by the direction of the edge they sit on: horizontal, rising (/), falling (\\). */
export interface EdgeLabels {
  readonly horizontal: string;
  readonly rising: string;
  readonly falling: string;
}

/** A piece as a user states it: its edge labels by direction, allowed orientations, optionally all three rotations. */
export interface PieceSpec {
  readonly name?: string;
  readonly kind?: string;
  readonly edges: EdgeLabels;
  readonly orientations: readonly Orientation[];
  readonly rotations?: boolean;
  readonly weight?: WeightSpec;
}

export interface PieceSetSpec {
  readonly name: string;
  readonly boundaryLabels: readonly string[];
  readonly pieces: readonly PieceSpec[];
}

const ONE: WeightSpec = { type: 'integer', value: 1 };

// Which lattice direction each clockwise slot lies on: up (left, right, bottom) = (r, l, h);
// down (top, right, left) = (h, r, l). Two triangles meet on an edge only along the same direction.
const SLOT_DIRECTIONS: Record<Orientation, readonly ['h' | 'r' | 'l', 'h' | 'r' | 'l', 'h' | 'r' | 'l']> = {
  up: ['r', 'l', 'h'],
  down: ['h', 'r', 'l'],
};

/** Clockwise label list of a triangle from its labels by direction: up (left, right, bottom), down (top, right, left). */
export function clockwiseLabels(orientation: Orientation, edges: EdgeLabels): [string, string, string] {
  return orientation === 'up' ? [edges.rising, edges.falling, edges.horizontal] : [edges.horizontal, edges.rising, edges.falling];
}

/** Labels by direction of a placed triangle, the inverse of `clockwiseLabels`. */
export function edgeLabels(orientation: Orientation, labels: readonly [string, string, string]): EdgeLabels {
  return orientation === 'up'
    ? { rising: labels[0], falling: labels[1], horizontal: labels[2] }
    : { horizontal: labels[0], rising: labels[1], falling: labels[2] };
}

const DIRECTION_NAME = { h: 'horizontal', r: 'rising', l: 'falling' } as const;

const edgeText = (e: EdgeLabels) => `(horizontal ${e.horizontal}, rising ${e.rising}, falling ${e.falling})`;

function rotate(labels: readonly [string, string, string], by: number): [string, string, string] {
  return [labels[by % 3]!, labels[(by + 1) % 3]!, labels[(by + 2) % 3]!];
}

/** Expands orientations and rotations, then checks the set; throws `invalid_piece_set` with a JSON path. */
export function buildPieceSet(spec: PieceSetSpec): PieceSet {
  checkBoundaryLabels(spec.boundaryLabels);
  const pieces: Piece[] = [];
  const seen = new Map<string, string>();
  spec.pieces.forEach((p, i) => {
    const name = p.name ?? `piece-${i + 1}`;
    if (p.orientations.length === 0) {
      throw new CodedError('invalid_piece_set', { what: 'Piece orientations', expected: `at least one of 'up' | 'down'`, received: 'none' }, { path: `pieces[${i}].orientations` });
    }
    for (const orientation of p.orientations) {
      const turns = p.rotations ? [0, 1, 2] : [0];
      const clockwise = clockwiseLabels(orientation, p.edges);
      const variants = new Set(turns.map((t) => rotate(clockwise, t).join('\u0000')));
      for (const v of variants) {
        const labels = v.split('\u0000') as [string, string, string];
        const key = `${orientation}:${v}`;
        const earlier = seen.get(key);
        if (earlier !== undefined) {
          throw new CodedError('invalid_piece_set', { what: 'Duplicate piece', expected: `each ${orientation} triangle ${edgeText(edgeLabels(orientation, labels))} once`, received: `it in '${earlier}' and '${name}'` }, { path: `pieces[${i}]`, hint: 'remove one of them, or give them different labels' });
        }
        seen.set(key, name);
        pieces.push({ name, kind: p.kind ?? name, orientation, labels, weight: p.weight ?? ONE });
      }
    }
  });
  const labels = collectLabels(spec.boundaryLabels, pieces);
  checkMatchable(spec, pieces);
  return { name: spec.name, boundaryLabels: [...spec.boundaryLabels], labels, pieces };
}

function checkBoundaryLabels(boundaryLabels: readonly string[]): void {
  if (boundaryLabels.length === 0) {
    throw new CodedError('invalid_piece_set', { what: 'Boundary labels', expected: 'at least one label', received: 'none' }, { path: 'boundaryLabels' });
  }
  const unique = new Set<string>();
  boundaryLabels.forEach((l, i) => {
    if ([...l].length !== 1 || l === ',' || l === '-') {
      throw new CodedError('invalid_piece_set', { what: 'Boundary label', expected: `a single character other than ',' and '-'`, received: `'${l}'` }, { path: `boundaryLabels[${i}]`, hint: 'boundary strings are read one character per edge' });
    }
    if (unique.has(l)) throw new CodedError('invalid_piece_set', { what: 'Boundary label', expected: 'distinct labels', received: `'${l}' twice` }, { path: `boundaryLabels[${i}]` });
    unique.add(l);
  });
}

function collectLabels(boundaryLabels: readonly string[], pieces: readonly Piece[]): string[] {
  const labels = [...boundaryLabels];
  for (const p of pieces) for (const l of p.labels) if (!labels.includes(l)) labels.push(l);
  return labels;
}

// A label on an up triangle's slot must meet the same label on a down triangle along the same
// direction (or sit on the boundary); otherwise the piece can never be placed.
function checkMatchable(spec: PieceSetSpec, pieces: readonly Piece[]): void {
  const present = new Set<string>();
  for (const p of pieces) p.labels.forEach((l, s) => present.add(`${p.orientation}:${SLOT_DIRECTIONS[p.orientation][s]}:${l}`));
  const boundary = new Set(spec.boundaryLabels);
  for (const p of pieces) {
    p.labels.forEach((l, s) => {
      const dir = SLOT_DIRECTIONS[p.orientation][s]!;
      const other = p.orientation === 'up' ? 'down' : 'up';
      if (!boundary.has(l) && !present.has(`${other}:${dir}:${l}`)) {
        const index = spec.pieces.findIndex((q) => (q.name ?? '') === p.name);
        throw new CodedError('invalid_piece_set', { what: 'Unmatched label', expected: `some ${other} piece with '${l}' on its ${DIRECTION_NAME[dir]} edge`, received: `none (piece '${p.name}')` }, { path: index >= 0 ? `pieces[${index}].edges.${DIRECTION_NAME[dir]}` : 'pieces', hint: `'${l}' is not a boundary label, so it must be matched inside; add the matching piece or make '${l}' a boundary label` });
      }
    });
  }
}
