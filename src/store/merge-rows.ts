import type { Store } from './open-store.js';

/** A row read with safe integers: bigint for INTEGER, number for REAL, string, Buffer or null. */
export type Row = Record<string, unknown>;

/** Columns of a table as SQLite lists them (primary key members have pk > 0, in key order). */
export interface TableShape {
  readonly columns: readonly string[];
  readonly primaryKey: readonly string[];
}

/** The columns and primary key of `table`, or undefined when the store has no such table. */
export function tableShape(db: Store, table: string): TableShape | undefined {
  const rows = db.prepare(`SELECT name, pk FROM pragma_table_info(?)`).all(table) as { name: string; pk: number }[];
  if (rows.length === 0) return undefined;
  return { columns: rows.map((r) => r.name), primaryKey: rows.filter((r) => r.pk > 0).sort((a, b) => a.pk - b.pk).map((r) => r.name) };
}

/** User tables of a store (no SQLite internals). */
export function tableNames(db: Store): string[] {
  return (db.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name`).all() as { name: string }[]).map((r) => r.name);
}

/** Columns that hold a run id of the store they were written in; a merge renumbers them. */
export const isRunColumn = (c: string) => c === 'run_id' || c.endsWith('_run');

/**
 * Bookkeeping that may differ between two copies of the same result: when and by which run it was
 * written, how long it took, the re-check of a stored counterexample (compared separately), and whether
 * an older store's partner was derived yet (a later run derives it again harmlessly).
 */
export const isBookkeeping = (c: string) =>
  isRunColumn(c) || c.endsWith('_at') || c === 'duration_ms' || c === 'recheck' || c === 'chunk_id' || c === 'partner_pending';

/** A value as comparable text (bigint and number of the same integer agree). */
export function valueText(v: unknown): string {
  if (v === null || v === undefined) return 'null';
  if (Buffer.isBuffer(v)) return `x'${v.toString('hex')}'`;
  return typeof v === 'string' ? JSON.stringify(v) : String(v);
}

/** The value columns on which two copies of a row differ (bookkeeping ignored). */
export function differingColumns(a: Row, b: Row, columns: readonly string[]): string[] {
  return columns.filter((c) => !isBookkeeping(c) && valueText(a[c]) !== valueText(b[c]));
}

/** Columns both stores have, in the target's order: a column one side lacks is left to its default. */
export function sharedColumns(target: TableShape, source: TableShape): string[] {
  const have = new Set(source.columns);
  return target.columns.filter((c) => have.has(c));
}

/** Outcome of offering one source row to the target. */
export type RowOutcome = { kind: 'added' } | { kind: 'duplicate' } | { kind: 'conflict'; columns: string[]; existing: Row };

/**
 * Copies rows keyed by a primary key: a new key is inserted (run ids renumbered), an existing key with
 * the same values is a duplicate, and one with other values is a conflict (never overwritten).
 */
export function rowCopier(target: Store, table: string, targetShape: TableShape, sourceShape: TableShape, mapRun: (id: unknown) => unknown) {
  const cols = sharedColumns(targetShape, sourceShape).filter((c) => !(targetShape.primaryKey.length === 1 && c === targetShape.primaryKey[0] && /_id$/.test(c)));
  const key = targetShape.primaryKey.length > 0 ? targetShape.primaryKey : cols;
  const insert = target.prepare(`INSERT OR IGNORE INTO ${table} (${cols.join(', ')}) VALUES (${cols.map(() => '?').join(', ')})`);
  const find = target.prepare(`SELECT * FROM ${table} WHERE ${key.map((k) => `${k} IS ?`).join(' AND ')}`).safeIntegers(true);
  return (row: Row): RowOutcome => {
    const values = cols.map((c) => (isRunColumn(c) ? mapRun(row[c]) : row[c]));
    if (insert.run(...values).changes > 0) return { kind: 'added' };
    const existing = find.get(...key.map((k) => (isRunColumn(k) ? mapRun(row[k]) : row[k]))) as Row | undefined;
    if (!existing) return { kind: 'added' }; // ignored for a reason other than the key (cannot happen with our schema)
    const diff = differingColumns(existing, row, cols);
    return diff.length ? { kind: 'conflict', columns: diff, existing } : { kind: 'duplicate' };
  };
}
