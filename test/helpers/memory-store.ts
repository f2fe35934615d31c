import { openStore, saveClaim, startRun, type Store } from '../../src/store/index.js';

/** A migrated in-memory store holding one claim `fp` and one running run of it. */
export function memoryStore(fingerprint = 'fp'): { db: Store; runId: number } {
  const db = openStore(':memory:');
  saveClaim(db, { fingerprint, claimId: 'c', canonicalJson: '{}', engineVersion: 'test' });
  return { db, runId: startRun(db, fingerprint, {}) };
}
