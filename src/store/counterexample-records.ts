import type { Measured } from '../claims/claim-api.js';
import type { Store } from './open-store.js';
import { preparedStatement } from './prepared-statement.js';

/** A counterexample confirmed with exact arithmetic, as stored and as read back. */
export interface CounterexampleRecord {
  readonly classKey: string;
  readonly index: bigint;
  readonly size: number;
  readonly lengths: readonly number[];
  readonly left: Measured;
  /** T(b) measured in its own right (what `count` prints for it). */
  readonly right: Measured;
  /** Substitution relations: σ(right value), the value compared with the left one, and σ written out. */
  readonly substituted?: Measured | undefined;
  readonly substitution?: string | undefined;
  readonly permutation?: readonly number[] | undefined;
  /** Found through its pair: the index of the representative whose comparison decided this boundary too. */
  readonly partnerOf?: bigint | undefined;
}

/** A stored counterexample with its bookkeeping. */
export interface StoredCounterexample extends CounterexampleRecord {
  readonly fingerprint: string;
  readonly foundRun: number;
  readonly recheckedRun: number | null;
  readonly recheck: 'fails' | 'holds' | null;
}

/** Inserts a confirmed counterexample once (a resumed or concurrent run never duplicates it). */
export function insertCounterexample(db: Store, fingerprint: string, runId: number, c: CounterexampleRecord): boolean {
  const info = db
    .prepare(
      `INSERT OR IGNORE INTO counterexamples (fingerprint, class_key, instance_index, size, lengths,
         left_theory, left_sides, left_value, left_json, right_theory, right_sides, right_value, right_json,
         permutation, confirmed_exact, found_run, partner_of, substitution, substituted_value, substituted_json)
       VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 1, ?, ?, ?, ?, ?)`,
    )
    .run(
      fingerprint,
      c.classKey,
      c.index,
      c.size,
      JSON.stringify(c.lengths),
      c.left.theory,
      JSON.stringify(c.left.sides),
      c.left.text,
      JSON.stringify({ lengths: c.left.lengths, value: c.left.json }),
      c.right.theory,
      JSON.stringify(c.right.sides),
      c.right.text,
      JSON.stringify({ lengths: c.right.lengths, value: c.right.json }),
      c.permutation ? JSON.stringify(c.permutation) : null,
      runId,
      c.partnerOf ?? null,
      c.substitution ?? null,
      c.substituted?.text ?? null,
      c.substituted ? JSON.stringify({ lengths: c.substituted.lengths, value: c.substituted.json }) : null,
    );
  return info.changes > 0;
}

function measured(theory: string, sides: string, text: string, json: string): Measured {
  const j = JSON.parse(json) as { lengths: number[]; value: unknown };
  return { theory, sides: JSON.parse(sides) as string[], text, lengths: j.lengths, json: j.value };
}

function fromRow(r: Record<string, unknown>): StoredCounterexample {
  return {
    fingerprint: r.fingerprint as string,
    classKey: r.class_key as string,
    index: r.instance_index as bigint,
    size: Number(r.size),
    lengths: JSON.parse(r.lengths as string) as number[],
    left: measured(r.left_theory as string, r.left_sides as string, r.left_value as string, r.left_json as string),
    right: measured(r.right_theory as string, r.right_sides as string, r.right_value as string, r.right_json as string),
    permutation: r.permutation ? (JSON.parse(r.permutation as string) as number[]) : undefined,
    partnerOf: r.partner_of === null || r.partner_of === undefined ? undefined : (r.partner_of as bigint),
    substitution: (r.substitution as string | null) ?? undefined,
    substituted: r.substituted_value === null || r.substituted_value === undefined ? undefined : measured(r.right_theory as string, r.right_sides as string, r.substituted_value as string, r.substituted_json as string),
    foundRun: Number(r.found_run),
    recheckedRun: r.rechecked_run === null ? null : Number(r.rechecked_run),
    recheck: (r.recheck as 'fails' | 'holds' | null) ?? null,
  };
}

function compareLengths(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

/** Counterexamples of one claim in sweep order (size, then side lengths, then index). */
export function listCounterexamples(db: Store, fingerprint: string): StoredCounterexample[] {
  const rows = db.prepare('SELECT * FROM counterexamples WHERE fingerprint = ?').safeIntegers(true).all(fingerprint) as Record<string, unknown>[];
  return rows
    .map(fromRow)
    .sort((a, b) => a.size - b.size || compareLengths(a.lengths, b.lengths) || a.classKey.localeCompare(b.classKey) || (a.index < b.index ? -1 : a.index > b.index ? 1 : 0));
}

/** Records the outcome of re-checking a stored counterexample at the start of a run. */
export function recordRecheck(db: Store, fingerprint: string, classKey: string, index: bigint, runId: number, outcome: 'fails' | 'holds'): void {
  db.prepare('UPDATE counterexamples SET rechecked_run = ?, recheck = ? WHERE fingerprint = ? AND class_key = ? AND instance_index = ?').run(
    runId,
    outcome,
    fingerprint,
    classKey,
    index,
  );
}

/** Where each stored counterexample of a claim is and its re-check outcome, without reading its values. */
export function counterexampleKeys(
  db: Store,
  fingerprint: string,
): { classKey: string; index: bigint; recheck: 'fails' | 'holds' | null; partnerPending: boolean }[] {
  const rows = db
    .prepare('SELECT class_key, instance_index, recheck, partner_pending FROM counterexamples WHERE fingerprint = ?')
    .safeIntegers(true)
    .all(fingerprint) as Record<string, unknown>[];
  return rows.map((r) => ({
    classKey: r.class_key as string,
    index: r.instance_index as bigint,
    recheck: (r.recheck as 'fails' | 'holds' | null) ?? null,
    partnerPending: Number(r.partner_pending) === 1,
  }));
}

/** Stored counterexamples of a claim whose failing partner an older store did not keep (see migration 7). */
export function pendingPartnerCount(db: Store, fingerprint: string): number {
  return (db.prepare('SELECT COUNT(*) AS n FROM counterexamples WHERE fingerprint = ? AND partner_pending = 1').get(fingerprint) as { n: number }).n;
}

/**
 * Records what re-deriving the partner of an older store's counterexample found: a failing partner gets its
 * row, and (only if the row is new) leaves the holds of the pre-partner chunk that counted it as holding.
 */
export function recordPartner(db: Store, fingerprint: string, classKey: string, of: bigint, runId: number, partner: CounterexampleRecord | undefined): void {
  if (partner && insertCounterexample(db, fingerprint, runId, { ...partner, partnerOf: of })) {
    db.prepare(
      `UPDATE chunks SET holds = holds - 1
        WHERE chunk_id = (SELECT chunk_id FROM chunks
                           WHERE fingerprint = ? AND class_key = ? AND state = 'done' AND nonzero IS NULL AND holds > 0
                             AND start_index <= ? AND end_index > ? LIMIT 1)`,
    ).run(fingerprint, classKey, partner.index, partner.index);
  }
  db.prepare('UPDATE counterexamples SET partner_pending = 0 WHERE fingerprint = ? AND class_key = ? AND instance_index = ?').run(fingerprint, classKey, of);
}

/** A class holds a stored counterexample that was not overturned by a re-check. */
export function classHasCounterexample(db: Store, fingerprint: string, classKey: string): boolean {
  return preparedStatement(db, `SELECT 1 FROM counterexamples WHERE fingerprint = ? AND class_key = ? AND (recheck IS NULL OR recheck = 'fails') LIMIT 1`).get(fingerprint, classKey) !== undefined;
}
