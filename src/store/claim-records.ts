import type { Store } from './open-store.js';

/** A claim as the store keeps it: its fingerprint covers the canonical JSON and the engine version. */
export interface ClaimRecord {
  readonly fingerprint: string;
  readonly claimId: string;
  readonly canonicalJson: string;
  readonly engineVersion: string;
  readonly sourceFile?: string | undefined;
  /** The claim as the user wrote it, as JSON text (its keys in their order, no defaults added). */
  readonly sourceJson?: string | undefined;
}

interface ClaimRow {
  fingerprint: string;
  claim_id: string;
  canonical_json: string;
  engine_version: string;
  source_file: string | null;
  source_json: string | null;
}

function fromRow(r: ClaimRow): ClaimRecord {
  return { fingerprint: r.fingerprint, claimId: r.claim_id, canonicalJson: r.canonical_json, engineVersion: r.engine_version, sourceFile: r.source_file ?? undefined, sourceJson: r.source_json ?? undefined };
}

/**
 * Stores a claim once per fingerprint (a changed claim gets a new row, never the old results). The same
 * mathematics written again (reworded, bounds raised) keeps its row and takes the latest wording.
 */
export function saveClaim(db: Store, claim: ClaimRecord): void {
  db.prepare(
    `INSERT INTO claims (fingerprint, claim_id, canonical_json, engine_version, source_file, source_json, first_seen_at)
     VALUES (?, ?, ?, ?, ?, ?, ?)
     ON CONFLICT (fingerprint) DO UPDATE SET source_file = COALESCE(excluded.source_file, claims.source_file),
       source_json = COALESCE(excluded.source_json, claims.source_json),
       canonical_json = CASE WHEN excluded.source_json IS NOT NULL THEN excluded.canonical_json ELSE claims.canonical_json END`,
  ).run(claim.fingerprint, claim.claimId, claim.canonicalJson, claim.engineVersion, claim.sourceFile ?? null, claim.sourceJson ?? null, new Date().toISOString());
}

/** Claims whose id or fingerprint is `key` (all claims without a key), newest first. */
export function findClaims(db: Store, key?: string): ClaimRecord[] {
  const rows = key
    ? db.prepare('SELECT * FROM claims WHERE claim_id = ? OR fingerprint = ? ORDER BY first_seen_at DESC, rowid DESC').all(key, key)
    : db.prepare('SELECT * FROM claims ORDER BY claim_id, first_seen_at DESC, rowid DESC').all();
  return (rows as ClaimRow[]).map(fromRow);
}
