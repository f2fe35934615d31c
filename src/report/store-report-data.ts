import { theoryPieceSet, type PieceSet } from '../engine/index.js';
import { compileClaimProgram, planClaim, type SizeClass } from '../claims/index.js';
import { listCounterexamples, listVerified, type ClaimRecord, type Store } from '../store/index.js';
import type { PieceSetResolver } from './counterexample-html.js';
import type { ReportClass, ReportCounterexample, ReportData } from './report-data.js';

interface ChunkTotals {
  class_key: string;
  checked: bigint;
  holds: bigint;
  paired: bigint;
  skipped: bigint;
  ms: number | null;
}

// Per-class totals of finished chunks; the store has no reader for them yet, so the report asks SQL itself.
function chunkTotals(db: Store, fingerprint: string): Map<string, ChunkTotals> {
  const rows = db
    .prepare(
      `SELECT class_key, SUM(checked) AS checked, SUM(holds) AS holds, SUM(paired) AS paired, SUM(skipped_zero) AS skipped,
       SUM(duration_ms) * 1.0 AS ms FROM chunks WHERE fingerprint = ? AND state = 'done' GROUP BY class_key`,
    )
    .safeIntegers(true)
    .all(fingerprint) as ChunkTotals[];
  return new Map(rows.map((r) => [r.class_key, { ...r, ms: r.ms === null ? null : Number(r.ms) }]));
}

function familyText(json: { family?: { sides?: unknown[]; variables?: { name: string; min: number; max: number }[] } }): string {
  const f = json.family ?? {};
  const ranges = (f.variables ?? []).map((v) => `${v.min} ≤ ${v.name} ≤ ${v.max}`).join(', ');
  return `sides ${(f.sides ?? []).join(',')}${ranges ? ` with ${ranges}` : ''}`;
}

const theoryName = (t: unknown): string | undefined => (typeof t === 'string' ? t : t && typeof t === 'object' && 'name' in t ? String((t as { name: unknown }).name) : undefined);

function classRow(cls: SizeClass, instances: bigint, totals: ChunkTotals | undefined, cxCount: number, verified: { method: 'exact' | 'modular' } | undefined): ReportClass {
  const checked = totals ? totals.checked : 0n;
  // Paired and zero-skipped instances hold by the claim's own rules, so they count as holds here.
  const holds = totals ? totals.holds + totals.paired + totals.skipped : 0n;
  const status: ReportClass['status'] = cxCount > 0 ? 'refuted' : verified ? 'verified' : 'partial';
  return {
    key: cls.key,
    lengths: cls.lengths,
    instances,
    checked: verified && checked < instances ? instances : checked,
    holds,
    counterexamples: cxCount,
    seconds: totals?.ms == null ? null : totals.ms / 1000,
    status,
    ...(verified ? { method: verified.method } : {}),
  };
}

/** Reads one stored claim version into report data, with a resolver for its (possibly custom) theories. */
export function reportDataFromStore(db: Store, record: ClaimRecord): { data: ReportData; resolve: PieceSetResolver } {
  const json = JSON.parse(record.canonicalJson) as Record<string, unknown> & { compare?: { rightTheory?: unknown } };
  const plan = planClaim(compileClaimProgram(json));
  const stored = listCounterexamples(db, record.fingerprint).filter((c) => c.recheck !== 'holds');
  const verified = new Map(listVerified(db, record.fingerprint).map((v) => [v.classKey, v]));
  const totals = chunkTotals(db, record.fingerprint);
  const swept = plan.classes().filter((c) => totals.has(c.key) || verified.has(c.key));
  const classes = swept.map((c) =>
    classRow(c, plan.instanceCount(c), totals.get(c.key), stored.filter((x) => x.classKey === c.key).length, verified.get(c.key)),
  );
  const counterexamples: ReportCounterexample[] = stored.map((c) => ({
    classKey: c.classKey,
    index: c.index,
    size: c.size,
    left: { theory: c.left.theory, lengths: c.left.lengths, sides: c.left.sides, value: c.left.text },
    right: { theory: c.right.theory, lengths: c.right.lengths, sides: c.right.sides, value: c.right.text },
    ...(c.permutation ? { permutation: c.permutation } : {}),
  }));
  const left = theoryName(json.theory) ?? '?';
  const right = theoryName(json.compare?.rightTheory);
  const sets: PieceSet[] = [plan.compiled.left, plan.compiled.right];
  const resolve: PieceSetResolver = (name) => sets.find((s) => s.name === name) ?? theoryPieceSet(name);
  return {
    data: {
      claim: {
        id: record.claimId,
        statement: String(json.statement ?? ''),
        json,
        theory: right && right !== left ? `${left} → ${right}` : left,
        family: familyText(json as never),
        fingerprint: record.fingerprint,
      },
      classes,
      counterexamples,
      generatedAt: new Date().toISOString(),
    },
    resolve,
  };
}
