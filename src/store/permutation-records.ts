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
