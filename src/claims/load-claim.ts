import type { Claim } from './claim-schema.js';
import { compileClaimProgram, type ClaimProgram } from './compile-claim-program.js';
import { readJsonFile } from './resolve-theory.js';

/** Validates claim data (shape, then meaning); every error is coded `invalid_claim` with a JSON path. */
export function parseClaim(data: unknown, file?: string): Claim {
  return compileClaimProgram(data, file).claim;
}

/** Reads a claim file and compiles it. */
export function loadClaimProgram(file: string): ClaimProgram {
  return compileClaimProgram(readJsonFile(file, 'Claim file'), file);
}

/** Reads a claim file and validates it. */
export function loadClaim(file: string): Claim {
  return loadClaimProgram(file).claim;
}
