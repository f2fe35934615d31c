import { claimSchema, type Claim } from './claim-schema.js';
import { claimZodError } from './claim-zod-error.js';
import { compileClaim } from './compile-claim.js';
import { readJsonFile } from './resolve-theory.js';

/** Validates claim data (shape, then meaning); every error is coded `invalid_claim` with a JSON path. */
export function parseClaim(data: unknown, file?: string): Claim {
  const parsed = claimSchema.safeParse(data);
  if (!parsed.success) throw claimZodError(parsed.error, data, file);
  compileClaim(parsed.data, file);
  return parsed.data;
}

/** Reads a claim file and validates it. */
export function loadClaim(file: string): Claim {
  return parseClaim(readJsonFile(file, 'Claim file'), file);
}
