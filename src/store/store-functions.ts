import { claimFingerprint } from '../claims/claim-fingerprint.js';
import type { Claim } from '../claims/claim-schema.js';
import type { Store } from './open-store.js';

/**
 * SQL functions the migrations call: `puzzlesweep_fingerprint(canonical_json, engine_version)` is the
 * claims layer's fingerprint of a stored claim (its mathematics and the engine version).
 */
export function registerStoreFunctions(db: Store): void {
  db.function('puzzlesweep_fingerprint', { deterministic: true }, (json: unknown, engineVersion: unknown) =>
    claimFingerprint(JSON.parse(String(json)) as Claim, String(engineVersion)),
  );
}
