import { existsSync, statSync } from 'node:fs';
import { CodedError } from '../errors/index.js';
import { loadSweepClaim } from '../run/load-sweep-claim.js';
import { findClaims, type ClaimRecord, type Store } from '../store/index.js';

export { openExistingStore } from './open-existing-store.js';

/**
 * The stored versions of a claim named by file (its current fingerprint only), by id (every version,
 * newest first) or by fingerprint.
 */
export function storedClaims(db: Store, ref: string): { claims: ClaimRecord[]; file?: string } {
  if (existsSync(ref) && statSync(ref).isFile()) {
    const claim = loadSweepClaim(ref);
    const rows = findClaims(db, claim.fingerprint);
    if (rows.length === 0) {
      const older = findClaims(db, claim.id);
      throw new CodedError('claim_not_found', { what: `Claim '${claim.id}'`, expected: `results for its current version ${claim.fingerprint.slice(0, 12)}`, received: 'none' }, {
        path: ref,
        hint: older.length ? `the store holds ${older.length} older version(s); pass the id '${claim.id}' to see them, or run the claim` : `run 'puzzlesweep run ${ref}' first`,
      });
    }
    return { claims: rows, file: ref };
  }
  const rows = findClaims(db, ref);
  if (rows.length === 0) {
    throw new CodedError('claim_not_found', { what: 'Claim', expected: 'a claim file, id or fingerprint in the store', received: `'${ref}'` }, {
      path: 'claim',
      hint: "'puzzlesweep status' lists the stored claims",
    });
  }
  return { claims: rows };
}
