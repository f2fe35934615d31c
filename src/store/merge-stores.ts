import { CodedError } from '../errors/index.js';
import { classCoverage } from './chunk-records.js';
import { checkFingerprints, checkSchemas, collectShards, shardReport, type MergeSource, type ShardReport } from './merge-checks.js';
import { differingColumns, isRunColumn, rowCopier, sharedColumns, tableNames, tableShape, type Row, type TableShape } from './merge-rows.js';
import type { Store } from './open-store.js';
import { CoverMap } from './range-cover.js';
import { markVerified } from './verified-class-records.js';

export { isOlderSchema, type MergeSource, type ShardReport } from './merge-checks.js';

/** Two stores giving different results for the same thing; a merge with any conflict writes nothing. */
export interface MergeConflict {
  readonly table: string;
  readonly key: string;
  readonly stores: readonly [string, string];
  readonly detail: string;
}

/** What a merge did for one claim version. */
export interface ClaimMergeReport {
  readonly claimId: string;
  readonly fingerprint: string;
  readonly added: { chunks: number; counterexamples: number; permutations: number };
  /** Rows already in the target (or earlier sources) with the same values, kept once. */
  readonly duplicates: { chunks: number; counterexamples: number; permutations: number };
  /** Finished chunks that cover instances another store's chunks also cover (same results, counted twice in chunk sums). */
  readonly overlaps: { classKey: string; start: string; end: string; store: string }[];
  /** Classes the merge found fully done (in some store each) with no counterexample, and marked verified. */
  readonly newlyVerified: string[];
  readonly verifiedClasses: number;
  readonly counterexamples: number;
  readonly shards?: ShardReport | undefined;
}

export interface MergeReport {
  readonly sources: readonly string[];
  readonly claims: ClaimMergeReport[];
  /** Tables this version does not know by name (added by a newer schema step), merged row by row. */
  readonly otherTables: { table: string; added: number; duplicates: number }[];
  /** Every sharded claim has all its shards, each finished. */
  readonly complete: boolean;
}

// Tables merged with rules of their own; any other table is merged generically by primary key.
const SPECIAL = new Set(['schema_version', 'claims', 'runs', 'chunks', 'counterexamples', 'verified_classes', 'permutations']);

type Claim = { -readonly [K in keyof ClaimMergeReport]: ClaimMergeReport[K] };

/** A run is the same run in two stores when claim, host, pid, start time and options agree (a store copied or merged twice). */
function copyRuns(target: Store, shape: TableShape, source: MergeSource): Map<string, bigint> {
  const cols = sharedColumns(shape, tableShape(source.db, 'runs')!).filter((c) => c !== 'run_id');
  const find = target.prepare('SELECT run_id, heartbeat_at FROM runs WHERE fingerprint = ? AND host = ? AND pid = ? AND started_at = ? AND options_json = ?').safeIntegers(true);
  const insert = target.prepare(`INSERT INTO runs (${cols.join(', ')}) VALUES (${cols.map(() => '?').join(', ')})`);
  const update = target.prepare(`UPDATE runs SET ${cols.map((c) => `${c} = ?`).join(', ')} WHERE run_id = ?`);
  const map = new Map<string, bigint>();
  for (const row of source.db.prepare('SELECT * FROM runs ORDER BY run_id').safeIntegers(true).all() as Row[]) {
    const values = cols.map((c) => row[c]);
    const existing = find.get(row.fingerprint, row.host, row.pid, row.started_at, row.options_json) as { run_id: bigint; heartbeat_at: string } | undefined;
    if (existing) {
      // The copy with the newer heartbeat has the later counts and status.
      if (String(row.heartbeat_at) > existing.heartbeat_at) update.run(...values, existing.run_id);
      map.set(String(row.run_id), existing.run_id);
    } else map.set(String(row.run_id), BigInt(insert.run(...values).lastInsertRowid));
  }
  return map;
}

function readCoverage(db: Store, into: CoverMap): void {
  for (const r of db.prepare(`SELECT fingerprint, class_key, start_index, end_index FROM chunks WHERE state = 'done'`).safeIntegers(true).iterate() as Iterable<Row>) {
    into.add(r.fingerprint as string, r.class_key as string, r.start_index as bigint, r.end_index as bigint);
  }
}

/**
 * A stored counterexample and the instance whose evaluation found it: itself, or for a row found through its
 * pair (`partner_of`), the pair's representative. A store that finished the representative must hold the row.
 */
interface FoundCounterexample {
  readonly key: string;
  readonly fingerprint: string;
  readonly classKey: string;
  readonly index: bigint;
  readonly foundAt: bigint;
}

function readCounterexamples(db: Store): { all: Set<string>; standing: FoundCounterexample[] } {
  const all = new Set<string>();
  const standing: FoundCounterexample[] = [];
  const partner = tableShape(db, 'counterexamples')?.columns.includes('partner_of') ? 'partner_of' : 'NULL AS partner_of';
  for (const r of db.prepare(`SELECT fingerprint, class_key, instance_index, recheck, ${partner} FROM counterexamples`).safeIntegers(true).iterate() as Iterable<Row>) {
    const key = `${r.fingerprint as string}|${r.class_key as string}|${r.instance_index as bigint}`;
    all.add(key);
    const index = r.instance_index as bigint;
    if (r.recheck !== 'holds') standing.push({ key, fingerprint: r.fingerprint as string, classKey: r.class_key as string, index, foundAt: (r.partner_of as bigint | null) ?? index });
  }
  return { all, standing };
}

/**
 * Merges stores into `target` in one transaction: claims, runs (renumbered), finished chunks, counterexamples,
 * permutations, verified classes and any newer table. The result does not depend on the order of the sources,
 * and merging again changes nothing. It refuses (writing nothing) two fingerprints of one claim id, shards of
 * different partitions, and conflicts: the same instance with different values, or an instance one store
 * found failing while another store's finished chunk says it holds. A class becomes verified when finished
 * chunks from any of the stores cover all of it and it has no counterexample.
 */
export function mergeStores(target: Store, targetName: string, sources: readonly MergeSource[]): MergeReport {
  checkSchemas(sources);
  checkFingerprints(sources);
  collectShards([{ name: targetName, db: target }, ...sources]);
  const claims = new Map<string, Claim>();
  const claimOf = (fp: string): Claim => {
    let c = claims.get(fp);
    if (!c) {
      c = { claimId: '', fingerprint: fp, added: { chunks: 0, counterexamples: 0, permutations: 0 }, duplicates: { chunks: 0, counterexamples: 0, permutations: 0 }, overlaps: [], newlyVerified: [], verifiedClasses: 0, counterexamples: 0 };
      claims.set(fp, c);
    }
    return c;
  };
  const conflicts: MergeConflict[] = [];
  const covers = new Map<string, CoverMap>();
  const cxs = new Map<string, ReturnType<typeof readCounterexamples>>();
  const otherTables = new Map<string, { table: string; added: number; duplicates: number }>();

  const run = () => {
    // What the target held before, so its results are checked against the sources too.
    covers.set(targetName, new CoverMap());
    readCoverage(target, covers.get(targetName)!);
    cxs.set(targetName, readCounterexamples(target));
    const shapes = new Map(tableNames(target).map((t) => [t, tableShape(target, t)!]));
    for (const source of sources) {
      covers.set(source.name, new CoverMap());
      readCoverage(source.db, covers.get(source.name)!);
      cxs.set(source.name, readCounterexamples(source.db));
      const claimCols = sharedColumns(shapes.get('claims')!, tableShape(source.db, 'claims')!);
      const insertClaim = target.prepare(`INSERT OR IGNORE INTO claims (${claimCols.join(', ')}) VALUES (${claimCols.map(() => '?').join(', ')})`);
      for (const r of source.db.prepare('SELECT * FROM claims').all() as Row[]) {
        insertClaim.run(...claimCols.map((c) => r[c]));
        claimOf(r.fingerprint as string).claimId = r.claim_id as string;
      }
      const runs = copyRuns(target, shapes.get('runs')!, source);
      const mapRun = (id: unknown) => (id === null || id === undefined ? id : (runs.get(String(id)) ?? id));
      copyChunks(target, targetName, shapes.get('chunks')!, source, mapRun, claimOf, conflicts);
      copyKeyed(target, 'counterexamples', shapes, source, mapRun, (r, outcome) => {
        const c = claimOf(r.fingerprint as string);
        if (outcome.kind === 'added') c.added.counterexamples++;
        else if (outcome.kind === 'duplicate') {
          c.duplicates.counterexamples++;
          mergeRecheck(target, targetName, source.name, r, mapRun, conflicts);
        } else conflicts.push({ table: 'counterexamples', key: `${r.class_key as string}:${r.instance_index as bigint}`, stores: [targetName, source.name], detail: `differs in ${outcome.columns.join(', ')}` });
      });
      copyKeyed(target, 'permutations', shapes, source, mapRun, (r, outcome) => {
        const c = claimOf(r.fingerprint as string);
        if (outcome.kind === 'added') c.added.permutations++;
        else if (outcome.kind === 'duplicate') c.duplicates.permutations++;
        else conflicts.push({ table: 'permutations', key: `${r.class_key as string}:${r.instance_index as bigint}`, stores: [targetName, source.name], detail: 'a different permutation' });
      });
      // A verified class stays verified (its store's chunks, now copied, cover it); its error bound may differ by chunking.
      copyKeyed(target, 'verified_classes', shapes, source, mapRun, () => undefined);
      for (const table of tableNames(source.db).filter((t) => !SPECIAL.has(t) && shapes.has(t))) {
        const tally = otherTables.get(table) ?? { table, added: 0, duplicates: 0 };
        otherTables.set(table, tally);
        copyKeyed(target, table, shapes, source, mapRun, (r, outcome) => {
          if (outcome.kind === 'added') tally.added++;
          else if (outcome.kind === 'duplicate') tally.duplicates++;
          else conflicts.push({ table, key: JSON.stringify(r, (_k, v: unknown) => (typeof v === 'bigint' ? v.toString() : v)).slice(0, 120), stores: [targetName, source.name], detail: `differs in ${outcome.columns.join(', ')}` });
        });
      }
    }
    crossCheck(covers, cxs, conflicts);
    if (conflicts.length > 0) {
      const shown = conflicts.slice(0, 5).map((c) => `${c.table} ${c.key}: ${c.stores[0]} vs ${c.stores[1]}, ${c.detail}`);
      throw new CodedError('merge_conflict', { what: 'Merge', expected: 'one result per instance', received: `${conflicts.length} conflict(s): ${shown.join('; ')}${conflicts.length > 5 ? '; …' : ''}` }, {
        path: 'stores',
        hint: 'nothing was written; the stores disagree about the same instances. Run the shards involved again into fresh stores, or leave one of the stores out',
      });
    }
    // Shards as the merged store now holds them: the ones merged before and the ones merged now.
    const merged = new CoverMap();
    readCoverage(target, merged);
    const sourceNames = new Set(sources.map((s) => s.name));
    const held = collectShards([{ name: targetName, db: target }]);
    const now = collectShards(sources);
    for (const [fp, list] of held) {
      if (!claims.has(fp)) continue; // a claim of the target that this merge does not touch
      const c = claimOf(fp);
      // Name the stores of this merge where they hold the shard, the target otherwise.
      const named = list.map((x) => now.get(fp)?.filter((y) => y.record.index === x.record.index) ?? []).flat();
      const byIndex = new Set(named.map((x) => x.record.index));
      c.shards = shardReport([...named, ...list.filter((x) => !byIndex.has(x.record.index))], merged, fp, sourceNames);
      c.newlyVerified = verifyCovered(target, fp, list.flatMap((x) => x.record.classes));
    }
    for (const c of claims.values()) {
      c.verifiedClasses = (target.prepare('SELECT COUNT(DISTINCT class_key) AS n FROM verified_classes WHERE fingerprint = ?').get(c.fingerprint) as { n: number }).n;
      c.counterexamples = (target.prepare(`SELECT COUNT(*) AS n FROM counterexamples WHERE fingerprint = ? AND recheck IS NOT 'holds'`).get(c.fingerprint) as { n: number }).n;
    }
  };
  target.transaction(run).immediate();
  const list = [...claims.values()].sort((a, b) => a.claimId.localeCompare(b.claimId) || a.fingerprint.localeCompare(b.fingerprint));
  return {
    sources: sources.map((s) => s.name),
    claims: list,
    otherTables: [...otherTables.values()],
    complete: list.every((c) => !c.shards || (c.shards.missing.length === 0 && c.shards.unfinished.length === 0)),
  };
}

function copyKeyed(target: Store, table: string, shapes: Map<string, TableShape>, source: MergeSource, mapRun: (id: unknown) => unknown, onRow: (r: Row, outcome: ReturnType<ReturnType<typeof rowCopier>>) => void): void {
  const sourceShape = tableShape(source.db, table);
  const targetShape = shapes.get(table);
  if (!sourceShape || !targetShape) return;
  const copy = rowCopier(target, table, targetShape, sourceShape, mapRun);
  for (const r of source.db.prepare(`SELECT * FROM ${table}`).safeIntegers(true).all() as Row[]) onRow(r, copy(r));
}

/** A re-check outcome is bookkeeping, but two different outcomes for one counterexample are a conflict. */
function mergeRecheck(target: Store, targetName: string, name: string, r: Row, mapRun: (id: unknown) => unknown, conflicts: MergeConflict[]): void {
  if (r.recheck === null) return;
  const where = 'fingerprint = ? AND class_key = ? AND instance_index = ?';
  const existing = target.prepare(`SELECT recheck FROM counterexamples WHERE ${where}`).get(r.fingerprint, r.class_key, r.instance_index) as { recheck: string | null };
  if (existing.recheck === null) target.prepare(`UPDATE counterexamples SET recheck = ?, rechecked_run = ? WHERE ${where}`).run(r.recheck, mapRun(r.rechecked_run), r.fingerprint, r.class_key, r.instance_index);
  else if (existing.recheck !== r.recheck) conflicts.push({ table: 'counterexamples', key: `${r.class_key as string}:${r.instance_index as bigint}`, stores: [targetName, name], detail: `re-checked as ${existing.recheck} and as ${r.recheck as string}` });
}

/** Copies finished chunks: an identical range is a duplicate (its tallies must agree), a range already covered is skipped. */
function copyChunks(target: Store, targetName: string, shape: TableShape, source: MergeSource, mapRun: (id: unknown) => unknown, claimOf: (fp: string) => Claim, conflicts: MergeConflict[]): void {
  const cols = sharedColumns(shape, tableShape(source.db, 'chunks')!).filter((c) => c !== 'chunk_id');
  const insert = target.prepare(`INSERT INTO chunks (${cols.join(', ')}) VALUES (${cols.map(() => '?').join(', ')})`);
  const same = target.prepare(`SELECT * FROM chunks WHERE state = 'done' AND fingerprint = ? AND class_key = ? AND method = ? AND start_index = ? AND end_index = ?`).safeIntegers(true);
  const overlapping = target
    .prepare(`SELECT start_index, end_index, method FROM chunks WHERE state = 'done' AND fingerprint = ? AND class_key = ? AND end_index > ? AND start_index < ? ORDER BY start_index`)
    .safeIntegers(true);
  for (const r of source.db.prepare(`SELECT * FROM chunks WHERE state = 'done' ORDER BY fingerprint, class_key, start_index`).safeIntegers(true).all() as Row[]) {
    const c = claimOf(r.fingerprint as string);
    const start = r.start_index as bigint;
    const end = r.end_index as bigint;
    const twin = same.get(r.fingerprint, r.class_key, r.method, start, end) as Row | undefined;
    if (twin) {
      const diff = differingColumns(twin, r, cols);
      if (diff.length) conflicts.push({ table: 'chunks', key: `${r.class_key as string}:${start}-${end}`, stores: [targetName, source.name], detail: `tallies differ in ${diff.join(', ')}` });
      else c.duplicates.chunks++;
      continue;
    }
    const others = overlapping.all(r.fingerprint, r.class_key, start, end) as { start_index: bigint; end_index: bigint; method: string }[];
    // Covered already by chunks that count for this chunk's method (exact counts for both).
    let cursor = start;
    for (const o of others) {
      if (r.method === 'exact' && o.method !== 'exact') continue;
      if (o.start_index > cursor) break;
      if (o.end_index > cursor) cursor = o.end_index;
    }
    if (cursor >= end) {
      c.duplicates.chunks++;
      continue;
    }
    if (others.length) c.overlaps.push({ classKey: r.class_key as string, start: start.toString(), end: end.toString(), store: source.name });
    insert.run(...cols.map((k) => (isRunColumn(k) ? mapRun(r[k]) : r[k])));
    c.added.chunks++;
  }
}

/**
 * An instance one store found failing must not have been evaluated by another store (a finished chunk holding
 * it, or for a partner row its pair's representative) without that store holding the same counterexample.
 */
function crossCheck(covers: Map<string, CoverMap>, cxs: Map<string, ReturnType<typeof readCounterexamples>>, conflicts: MergeConflict[]): void {
  for (const [holder, { standing }] of cxs) {
    for (const x of standing) {
      for (const [other, cover] of covers) {
        if (other === holder || cxs.get(other)!.all.has(x.key)) continue;
        if (cover.get(x.fingerprint, x.classKey)?.has(x.foundAt)) {
          conflicts.push({ table: 'counterexamples', key: `${x.classKey}:${x.index}`, stores: [holder, other], detail: `a counterexample in ${holder}, but ${other} finished it and found it holds` });
        }
      }
    }
  }
}

/** Marks verified each class the merged chunks cover completely and that has no standing counterexample. */
function verifyCovered(target: Store, fingerprint: string, classes: readonly { key: string; instances: string; size: number; lengths: readonly number[]; variables: Readonly<Record<string, number>> }[]): string[] {
  const out: string[] = [];
  const seen = new Set<string>();
  for (const k of classes) {
    if (seen.has(k.key)) continue;
    seen.add(k.key);
    const instances = BigInt(k.instances);
    const cov = classCoverage(target, fingerprint, k.key, 'modular', instances);
    if (!cov.complete) continue;
    const failing = target.prepare(`SELECT 1 FROM counterexamples WHERE fingerprint = ? AND class_key = ? AND recheck IS NOT 'holds' LIMIT 1`).get(fingerprint, k.key);
    const already = target.prepare('SELECT 1 FROM verified_classes WHERE fingerprint = ? AND class_key = ? AND method = ?').get(fingerprint, k.key, cov.method);
    if (failing || already) continue;
    const last = target.prepare(`SELECT MAX(run_id) AS r FROM chunks WHERE fingerprint = ? AND class_key = ? AND state = 'done'`).get(fingerprint, k.key) as { r: number };
    markVerified(target, fingerprint, last.r, { classKey: k.key, method: cov.method, size: k.size, lengths: k.lengths, variables: k.variables, instances, errorBound: cov.errorBound });
    out.push(k.key);
  }
  return out;
}
