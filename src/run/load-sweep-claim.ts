import { loadClaimProgram } from '../claims/index.js';
import type { SweepClaim } from './claim-runtime-module.js';

/** Reads and validates a claim file (coded `invalid_claim` errors) and fingerprints it for the store. */
export function loadSweepClaim(file: string): SweepClaim {
  const p = loadClaimProgram(file);
  return { id: p.claim.id, canonicalJson: p.canonicalJson, fingerprint: p.fingerprint, engineVersion: p.engineVersion, sourceJson: JSON.stringify(p.source), file, program: p };
}
