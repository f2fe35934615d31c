import type { Affine } from '../claims/affine.js';
import { composeSideMaps } from '../claims/boundary-transform.js';
import { sideMapKey, type Candidate } from './candidate-space.js';

/**
 * Groups survivors that imply each other through a surviving symmetry S of the family (S maps the
 * family onto itself and keeps the value): T holds iff T∘S holds, and, when T maps the family onto
 * itself, T holds iff S∘T holds (S then in T's right theory). Returns a group number per survivor;
 * groups are numbered by their first member in the given order.
 */
export function groupSurvivors(survivors: readonly Candidate[], lengths: readonly Affine[]): number[] {
  const parent = survivors.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const union = (a: number, b: number) => {
    const [x, y] = [find(a), find(b)];
    if (x !== y) parent[Math.max(x, y)] = Math.min(x, y);
  };
  const byKey = new Map(survivors.map((c, i) => [c.key, i]));
  survivors.forEach((t, i) => {
    for (const s of survivors) {
      if (!s.selfSymmetry) continue;
      if (s.left === t.left) {
        const j = byKey.get(`${t.left.name}|${t.right.name}|${sideMapKey(composeSideMaps(s.map, t.map), lengths)}`);
        if (j !== undefined) union(i, j);
      }
      if (t.mapsFamily && s.left === t.right) {
        const j = byKey.get(`${t.left.name}|${t.right.name}|${sideMapKey(composeSideMaps(t.map, s.map), lengths)}`);
        if (j !== undefined) union(i, j);
      }
    }
  });
  const numbers = new Map<number, number>();
  return survivors.map((_, i) => {
    const root = find(i);
    if (!numbers.has(root)) numbers.set(root, numbers.size + 1);
    return numbers.get(root)!;
  });
}
