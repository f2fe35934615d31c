import type { Store } from './open-store.js';

/** What discover learnt about one candidate claim in one class. */
export interface DiscoverEvidence {
  readonly classKey: string;
  readonly instances: number;
  readonly nonzero: number;
  /** Permutations serving every instance of the class (polynomial theories), else undefined. */
  readonly commonPermutations?: readonly (readonly number[])[] | undefined;
}

/** Records (or replaces) a candidate's evidence for one class. */
export function saveDiscoverEvidence(db: Store, fingerprint: string, runId: number, e: DiscoverEvidence): void {
  db.prepare(
    `INSERT OR REPLACE INTO discover_evidence (fingerprint, class_key, instances, nonzero, common_permutations, run_id) VALUES (?, ?, ?, ?, ?, ?)`,
  ).run(fingerprint, e.classKey, e.instances, e.nonzero, e.commonPermutations ? JSON.stringify(e.commonPermutations) : null, runId);
}

/** A candidate's evidence, one row per class. */
export function listDiscoverEvidence(db: Store, fingerprint: string): DiscoverEvidence[] {
  const rows = db.prepare('SELECT * FROM discover_evidence WHERE fingerprint = ? ORDER BY class_key').all(fingerprint) as Record<string, unknown>[];
  return rows.map((r) => ({
    classKey: r.class_key as string,
    instances: Number(r.instances),
    nonzero: Number(r.nonzero),
    commonPermutations: r.common_permutations === null ? undefined : (JSON.parse(r.common_permutations as string) as number[][]),
  }));
}
