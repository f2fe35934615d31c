import { createHash } from 'node:crypto';
import type { Claim } from './claim-schema.js';

/** Bumped whenever the engine or the claims layer could give a different result for the same claim. */
export const ENGINE_VERSION = '1';

function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(value).sort()) {
      const v = (value as Record<string, unknown>)[k];
      if (v !== undefined) out[k] = canonical(v);
    }
    return out;
  }
  return value;
}

/** The claim as JSON with sorted keys and no `$schema` (it does not change the meaning). */
export function canonicalClaimJson(claim: Claim): string {
  const { $schema: _ignored, ...rest } = claim;
  return JSON.stringify(canonical(rest));
}

/** sha256 (hex) of the canonical claim and the engine version: a changed claim never reuses old results. */
export function claimFingerprint(claim: Claim, engineVersion: string = ENGINE_VERSION): string {
  return createHash('sha256').update(canonicalClaimJson(claim)).update('\u0000').update(engineVersion).digest('hex');
}
