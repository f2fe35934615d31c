import { completeToTriangle, makeRegion, reverseString, type PieceSet } from '../engine/index.js';
import type { TransformStep } from './claim-schema.js';

/** One side of a transformed boundary: the old side `from` (0-based), maybe reversed, labels renamed. */
export interface SideSource {
  readonly from: number;
  readonly reversed: boolean;
  /** Label renaming; absent labels stay. */
  readonly labelMap: Readonly<Record<string, string>>;
}

/** A transform without completion as data: new side i is built from `sources[i]`. */
export type SideMap = readonly SideSource[];

export const IDENTITY_MAP: SideMap = [0, 1, 2, 3, 4, 5].map((from) => ({ from, reversed: false, labelMap: {} }));

const COMPLEMENT: Readonly<Record<string, string>> = { '0': '1', '1': '0' };

/** Indices of chosen sides, 0-based; absent means all (the schema's default). */
export function chosenSides(sides: 'all' | readonly number[] | undefined): number[] {
  return sides === undefined || sides === 'all' ? [0, 1, 2, 3, 4, 5] : [...new Set(sides)].map((s) => s - 1);
}

/** The side map of one step; undefined for `completeToTriangle`, which is not a relabelling of sides. */
export function stepSideMap(step: TransformStep): SideMap | undefined {
  const perm = (froms: number[], reversed: boolean) => froms.map((from) => ({ from, reversed, labelMap: {} }));
  switch (step.type) {
    case 'rotate': {
      // 60° clockwise: new sides [σ6, σ1, σ2, σ3, σ4, σ5].
      const k = (((step.degrees / 60) % 6) + 6) % 6;
      return perm([0, 1, 2, 3, 4, 5].map((i) => (i - k + 6) % 6), false);
    }
    case 'mirror':
      return perm([2, 1, 0, 5, 4, 3], true);
    case 'exchange': {
      const froms = [0, 1, 2, 3, 4, 5];
      const [i, j] = [step.sides[0] - 1, step.sides[1] - 1];
      froms[i] = j;
      froms[j] = i;
      return perm(froms, false);
    }
    case 'reverse': {
      const chosen = chosenSides(step.sides);
      return IDENTITY_MAP.map((s, i) => ({ ...s, reversed: chosen.includes(i) }));
    }
    case 'complement': {
      const chosen = chosenSides(step.sides);
      const map = step.labelMap ?? COMPLEMENT;
      return IDENTITY_MAP.map((s, i) => ({ ...s, labelMap: chosen.includes(i) ? map : {} }));
    }
    case 'completeToTriangle':
      return undefined;
  }
}

/** `then ∘ first`: apply `first`, then `then`. */
export function composeSideMaps(first: SideMap, then: SideMap): SideMap {
  return then.map((t) => {
    const f = first[t.from]!;
    const labels = new Set([...Object.keys(f.labelMap), ...Object.keys(t.labelMap), ...Object.values(f.labelMap)]);
    const labelMap: Record<string, string> = {};
    for (const l of labels) {
      const mid = f.labelMap[l] ?? l;
      const out = t.labelMap[mid] ?? mid;
      if (out !== l) labelMap[l] = out;
    }
    return { from: f.from, reversed: f.reversed !== t.reversed, labelMap };
  });
}

/** The composed side map of all steps, or undefined when some step completes to a triangle. */
export function transformSideMap(steps: readonly TransformStep[]): SideMap | undefined {
  let m: SideMap = IDENTITY_MAP;
  for (const s of steps) {
    const sm = stepSideMap(s);
    if (!sm) return undefined;
    m = composeSideMaps(m, sm);
  }
  return m;
}

export function isIdentityMap(m: SideMap): boolean {
  return m.every((s, i) => s.from === i && !s.reversed && Object.entries(s.labelMap).every(([k, v]) => k === v));
}

function renameLabels(s: string, map: Readonly<Record<string, string>>): string {
  let renames = false;
  for (const _ in map) {
    renames = true;
    break;
  }
  if (!renames) return s;
  let out = '';
  for (const c of s) out += map[c] ?? c;
  return out;
}

/** Applies a side map to concrete lengths and strings. */
export function applySideMap(m: SideMap, lengths: readonly number[], sides: readonly string[]): { lengths: number[]; sides: string[] } {
  return {
    lengths: m.map((s) => lengths[s.from]!),
    sides: m.map((s) => {
      const base = sides[s.from]!;
      return renameLabels(s.reversed ? reverseString(base) : base, s.labelMap);
    }),
  };
}

/** T(b): the steps applied in order to a boundary; completion uses `pieces` for the identity order of labels. */
export function applyTransform(steps: readonly TransformStep[], lengths: readonly number[], sides: readonly string[], pieces: PieceSet): { lengths: number[]; sides: string[] } {
  let cur = { lengths: [...lengths], sides: [...sides] };
  for (const step of steps) {
    const m = stepSideMap(step);
    if (m) cur = applySideMap(m, cur.lengths, cur.sides);
    else {
      const done = completeToTriangle(makeRegion(cur.lengths), cur.sides, pieces);
      cur = { lengths: [...done.region.lengths], sides: done.sides };
    }
  }
  return cur;
}
