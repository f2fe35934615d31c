import type { PieceSet } from '../engine/index.js';
import { applySideMap, composeSideMaps, IDENTITY_MAP, type SideMap } from './side-map.js';
import { stepDef, type TransformStep } from './steps/step-registry.js';

export { applySideMap, composeSideMaps, isIdentityMap, IDENTITY_MAP, type SideMap, type SideSource } from './side-map.js';

/** The composed side map of all steps, or undefined when some step is not a relabelling of sides. */
export function transformSideMap(steps: readonly TransformStep[]): SideMap | undefined {
  let m: SideMap = IDENTITY_MAP;
  for (const s of steps) {
    const sm = stepDef(s).sideMap(s);
    if (!sm) return undefined;
    m = composeSideMaps(m, sm);
  }
  return m;
}

/** T(b): the steps applied in order to a boundary; completion uses `pieces` for the identity order of labels. */
export function applyTransform(steps: readonly TransformStep[], lengths: readonly number[], sides: readonly string[], pieces: PieceSet): { lengths: number[]; sides: string[] } {
  let cur = { lengths: [...lengths], sides: [...sides] };
  for (const step of steps) {
    const def = stepDef(step);
    const m = def.sideMap(step);
    if (m) cur = applySideMap(m, cur.lengths, cur.sides);
    else {
      // Every step without a side map has its own action (a registry entry lacking both is a type error).
      const b = def.apply!(step, cur, pieces);
      cur = { lengths: [...b.lengths], sides: [...b.sides] };
    }
  }
  return cur;
}
