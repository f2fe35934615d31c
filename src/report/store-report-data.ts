import { theoryPieceSet, type PieceSet } from '../engine/index.js';
import { compileClaimProgram, permutationText, planClaim, type ClaimProgram, type SizeClass } from '../claims/index.js';
import { classCommonPermutations, classTallies, listCounterexamples, listVerified, type ClaimRecord, type ClassTally, type Store } from '../store/index.js';
import type { PieceSetResolver } from './counterexample-html.js';
import type { ReportClass, ReportCounterexample, ReportData } from './report-data.js';

function familyText(p: ClaimProgram, classes: readonly SizeClass[]): string {
  const ranges = p.variables.map((v) => {
    // The store may hold classes beyond the file's bounds (run --max): report the range actually swept.
    const seen = classes.map((c) => c.variables[v.name] ?? v.max);
    return `${Math.min(v.min, ...seen)} ≤ ${v.name} ≤ ${Math.max(v.max, ...seen)}`;
  });
  return `sides ${p.claim.family.sides.join(',')}${ranges.length ? ` with ${ranges.join(', ')}` : ''}`;
}

const theoryName = (t: unknown): string | undefined => (typeof t === 'string' ? t : t && typeof t === 'object' && 'name' in t ? String((t as { name: unknown }).name) : undefined);

function classRow(db: Store, fingerprint: string, cls: SizeClass, instances: bigint, t: ClassTally | undefined, seconds: number | null, verified: { method: 'exact' | 'modular' } | undefined): ReportClass {
  const fails = t?.fails ?? 0;
  const status: ReportClass['status'] = fails > 0 ? 'refuted' : verified ? 'verified' : 'partial';
  const perms = classCommonPermutations(db, fingerprint, cls.key);
  return {
    key: cls.key,
    lengths: cls.lengths,
    instances,
    checked: BigInt(t?.checked ?? 0),
    holds: BigInt(t?.holds ?? 0),
    nonzero: t?.nonzero === null || t === undefined ? null : BigInt(t.nonzero),
    skipped: BigInt(t?.skippedZero ?? 0),
    counterexamples: fails,
    seconds,
    status,
    ...(verified ? { method: verified.method } : {}),
    ...(perms ? { permutations: { common: perms.common.map((p) => permutationText(p)), truncated: perms.lowerBound, incomplete: status === 'partial' } } : {}),
  };
}

/** Reads one stored claim version into report data, with a resolver for its (possibly custom) theories. */
export function reportDataFromStore(db: Store, record: ClaimRecord): { data: ReportData; resolve: PieceSetResolver } {
  const program = compileClaimProgram(JSON.parse(record.canonicalJson) as unknown);
  const plan = planClaim(program);
  const stored = listCounterexamples(db, record.fingerprint).filter((c) => c.recheck !== 'holds');
  const verified = new Map(listVerified(db, record.fingerprint).map((v) => [v.classKey, v]));
  const tallies = classTallies(db, record.fingerprint);
  const seconds = new Map(
    (db.prepare(`SELECT class_key, SUM(duration_ms) / 1000.0 AS s FROM chunks WHERE fingerprint = ? AND state = 'done' GROUP BY class_key`).all(record.fingerprint) as { class_key: string; s: number | null }[]).map((r) => [r.class_key, r.s]),
  );
  // Every class the store holds, whatever bounds the runs used, in sweep order.
  const keys = [...new Set([...tallies.keys(), ...verified.keys()])];
  const swept = keys.map((k) => plan.classForKey(k));
  const classes = swept.map((c) => classRow(db, record.fingerprint, c, plan.instanceCount(c), tallies.get(c.key), seconds.get(c.key) ?? null, verified.get(c.key)));
  const counterexamples: ReportCounterexample[] = stored.map((c) => ({
    classKey: c.classKey,
    index: c.index,
    size: c.size,
    left: { theory: c.left.theory, lengths: c.left.lengths, sides: c.left.sides, value: c.left.text },
    right: { theory: c.right.theory, lengths: c.right.lengths, sides: c.right.sides, value: c.right.text },
    ...(c.substituted ? { substituted: { value: c.substituted.text, sigma: c.substitution ?? null } } : {}),
    ...(c.partnerOf !== undefined ? { partnerOf: c.partnerOf } : {}),
    ...(c.permutation ? { permutation: c.permutation } : {}),
  }));
  const left = theoryName(program.claim.theory) ?? '?';
  const right = theoryName(program.claim.compare.rightTheory);
  const sets: PieceSet[] = [program.left, program.right];
  const resolve: PieceSetResolver = (name) => sets.find((s) => s.name === name) ?? theoryPieceSet(name);
  return {
    data: {
      claim: {
        id: record.claimId,
        statement: program.claim.statement,
        json: record.sourceJson !== undefined ? (JSON.parse(record.sourceJson) as unknown) : JSON.parse(record.canonicalJson),
        theory: right && right !== left ? `${left} → ${right}` : left,
        family: familyText(program, swept),
        relation: program.relation.text(program.claim.compare.relation),
        failure: program.relation.failure,
        fingerprint: record.fingerprint,
      },
      classes,
      counterexamples,
      generatedAt: new Date().toISOString(),
    },
    resolve,
  };
}
