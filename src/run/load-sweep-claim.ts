import { canonicalClaimJson, claimFingerprint, ENGINE_VERSION, loadClaim } from '../claims/index.js';
import type { SweepClaim } from './claim-runtime-module.js';

/** Reads and validates a claim file (coded `invalid_claim` errors) and fingerprints it for the store. */
export function loadSweepClaim(file: string): SweepClaim {
  const claim = loadClaim(file);
  return { id: claim.id, canonicalJson: canonicalClaimJson(claim), fingerprint: claimFingerprint(claim), engineVersion: ENGINE_VERSION, file };
}
