import type { Store } from './open-store.js';

/** How many instances of a claim have a stored permutation, how many distinct ones, and the one if unique. */
export function permutationSummary(db: Store, fingerprint: string): { instances: number; distinct: number; common?: number[] } | undefined {
  const rows = db
    .prepare('SELECT permutation, COUNT(*) AS n FROM permutations WHERE fingerprint = ? GROUP BY permutation ORDER BY n DESC')
    .all(fingerprint) as { permutation: string; n: number }[];
  if (rows.length === 0) return undefined;
  const instances = rows.reduce((acc, r) => acc + r.n, 0);
  return { instances, distinct: rows.length, ...(rows.length === 1 ? { common: JSON.parse(rows[0]!.permutation) as number[] } : {}) };
}

/** Narrows `common` (undefined: nothing yet) to the permutations also in `list`, keyed by their text. */
export function intersectPermutations(common: Map<string, number[]> | undefined, list: readonly (readonly number[])[]): Map<string, number[]> {
  const here = new Map(list.map((p) => [p.join(','), [...p]]));
  return common ? new Map([...common].filter(([k]) => here.has(k))) : here;
}

/**
 * Permutations serving every instance of a class, intersected over its finished chunks; `lowerBound`
 * when some instance's list was truncated (then more permutations may serve all).
 */
export function classCommonPermutations(db: Store, fingerprint: string, classKey: string): { common: number[][]; lowerBound: boolean } | undefined {
  const rows = db
    .prepare(`SELECT common_permutations AS c, permutations_truncated AS t FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done' AND common_permutations IS NOT NULL`)
    .all(fingerprint, classKey) as { c: string; t: number }[];
  if (rows.length === 0) return undefined;
  let common: Map<string, number[]> | undefined;
  for (const r of rows) common = intersectPermutations(common, JSON.parse(r.c) as number[][]);
  return { common: [...common!.values()], lowerBound: rows.some((r) => r.t === 1) };
}
