import type { Store } from './open-store.js';

/**
 * What the store knows of one class over all runs, in boundaries: done chunks' checked instances, holds
 * (vacuous: both compared values zero; nonzero: some value nonzero), skipped zero values, and fails =
 * the standing counterexample rows (partners included). `nonzero` is null when a chunk written before
 * it was counted (store schema < 5) is among them.
 */
export interface ClassTally {
  readonly checked: number;
  readonly holds: number;
  readonly fails: number;
  readonly skippedZero: number;
  readonly vacuous: number;
  readonly nonzero: number | null;
}

interface Row {
  class_key: string;
  checked: number;
  holds: number;
  skipped: number;
  vacuous: number;
  nonzero: number;
  unknown: number;
}

const SUMS = `SUM(checked) AS checked, SUM(holds) AS holds, SUM(skipped_zero) AS skipped, SUM(vacuous) AS vacuous,
  SUM(COALESCE(nonzero, 0)) AS nonzero, SUM(nonzero IS NULL) AS unknown`;

/** Tallies of every class of a claim that has done chunks or counterexamples, keyed by class. */
export function classTallies(db: Store, fingerprint: string): Map<string, ClassTally> {
  const rows = db.prepare(`SELECT class_key, ${SUMS} FROM chunks WHERE fingerprint = ? AND state = 'done' GROUP BY class_key`).all(fingerprint) as Row[];
  const fails = new Map(
    (db.prepare(`SELECT class_key, COUNT(*) AS n FROM counterexamples WHERE fingerprint = ? AND (recheck IS NULL OR recheck = 'fails') GROUP BY class_key`).all(fingerprint) as { class_key: string; n: number }[]).map(
      (r) => [r.class_key, r.n],
    ),
  );
  const out = new Map<string, ClassTally>();
  for (const r of rows) {
    out.set(r.class_key, { checked: r.checked, holds: r.holds, fails: fails.get(r.class_key) ?? 0, skippedZero: r.skipped, vacuous: r.vacuous, nonzero: r.unknown > 0 ? null : r.nonzero });
  }
  for (const [k, n] of fails) if (!out.has(k)) out.set(k, { checked: 0, holds: 0, fails: n, skippedZero: 0, vacuous: 0, nonzero: 0 });
  return out;
}

/** Vacuous and nonzero holds of the chunks one run finished. */
export function runHoldTallies(db: Store, runId: number): { vacuous: number; nonzero: number | null } {
  const r = db.prepare(`SELECT ${SUMS} FROM chunks WHERE run_id = ? AND state = 'done'`).get(runId) as Row;
  return { vacuous: r.vacuous ?? 0, nonzero: r.unknown > 0 ? null : (r.nonzero ?? 0) };
}
