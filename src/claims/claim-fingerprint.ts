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

/**
 * The claim's mathematics as canonical JSON: no `$schema`, no `statement` and no variable upper bounds.
 * Rewording a claim changes nothing, and raising a bound only adds classes (each class claims the same).
 */
export function mathematicalClaimJson(claim: Claim): string {
  const { $schema: _schema, statement: _statement, ...rest } = claim;
  const family = { ...rest.family, variables: rest.family.variables.map(({ name, min }) => ({ name, min })) };
  return JSON.stringify(canonical({ ...rest, family }));
}

/** sha256 (hex) of the claim's mathematics and the engine version: a changed claim never reuses old results. */
export function claimFingerprint(claim: Claim, engineVersion: string = ENGINE_VERSION): string {
  return createHash('sha256').update(mathematicalClaimJson(claim)).update('\u0000').update(engineVersion).digest('hex');
}
