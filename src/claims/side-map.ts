import { reverseString } from '../engine/index.js';

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

/** Indices of chosen sides, 0-based; absent means all (the schema's default). */
export function chosenSides(sides: 'all' | readonly number[] | undefined): number[] {
  return sides === undefined || sides === 'all' ? [0, 1, 2, 3, 4, 5] : [...new Set(sides)].map((s) => s - 1);
}

/** A side map that moves sides: new side i is old side `froms[i]`, all reversed or none. */
export function permutedSides(froms: readonly number[], reversed: boolean): SideMap {
  return froms.map((from) => ({ from, reversed, labelMap: {} }));
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
