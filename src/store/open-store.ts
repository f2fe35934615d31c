import { mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname } from 'node:path';
import Database from 'better-sqlite3';
import { CodedError } from '../errors/index.js';
import { registerStoreFunctions } from './store-functions.js';
import { STORE_MIGRATIONS } from './store-migrations.js';
import { foreignStore, storeFault } from './store-fault.js';

/** An open store: the better-sqlite3 handle; every reader and writer in src/store takes it. */
export type Store = Database.Database;

/** Default store file, relative to the working directory. */
export const DEFAULT_STORE_PATH = 'results/puzzlesweep.sqlite';

// better-sqlite3 finds its addon through the 'bindings' package, which reads a stack trace and probes a dozen
// paths: 5–10 ms of every store opening. Its usual place (where npm builds or downloads it) is given instead when
// it is there; otherwise better-sqlite3 searches as before. Resolved from node_modules, so the same from dist/store/
// and from the CLI's bundle in dist/cli/.
let addon: string | null | undefined;
function nativeBinding(): { nativeBinding?: string } {
  if (addon === undefined) {
    try {
      addon = createRequire(import.meta.url).resolve('better-sqlite3/build/Release/better_sqlite3.node');
    } catch {
      addon = null;
    }
  }
  return addon ? { nativeBinding: addon } : {};
}

function schemaVersion(db: Store): number {
  db.exec('CREATE TABLE IF NOT EXISTS schema_version (version INTEGER NOT NULL, applied_at TEXT NOT NULL)');
  const row = db.prepare('SELECT MAX(version) AS v FROM schema_version').get() as { v: number | null };
  return row.v ?? 0;
}

// The schema version without writing anything (0 when the version table does not exist yet).
function readVersion(db: Store): number {
  const table = db.prepare(`SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = 'schema_version'`).get();
  if (!table) return 0;
  return (db.prepare('SELECT MAX(version) AS v FROM schema_version').get() as { v: number | null }).v ?? 0;
}

function migrate(db: Store): void {
  // IMMEDIATE takes the write lock first, so two processes opening a new store do not both migrate.
  db.transaction(() => {
    const current = schemaVersion(db);
    if (current > STORE_MIGRATIONS.length) {
      throw new CodedError('store_error', { what: 'Store schema', expected: `version ≤ ${STORE_MIGRATIONS.length}`, received: `${current}` }, {
        hint: 'this store was written by a newer puzzlesweep; upgrade puzzlesweep or use another --db',
      });
    }
    for (let v = current; v < STORE_MIGRATIONS.length; v++) {
      db.exec(STORE_MIGRATIONS[v]!);
      db.prepare('INSERT INTO schema_version (version, applied_at) VALUES (?, ?)').run(v + 1, new Date().toISOString());
    }
  }).immediate();
}

// Tables of a store (any version); a database holding other tables and none of these is someone else's.
const OWN_TABLES = new Set(['schema_version', 'claims', 'runs', 'chunks']);

function checkOwnership(db: Store, path: string): void {
  const tables = (db.prepare(`SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'`).all() as { name: string }[]).map((r) => r.name);
  if (tables.length > 0 && !tables.some((t) => OWN_TABLES.has(t))) throw foreignStore(path, tables);
}

/**
 * Opens (creating folder and file if needed) and migrates a store; `readonly` never creates anything, and
 * with `upgrade` brings an older store's schema up to date first (the migrations keep every row).
 */
export function openStore(path: string, options: { readonly?: boolean; upgrade?: boolean } = {}): Store {
  let db: Store | undefined;
  try {
    if (!options.readonly) mkdirSync(dirname(path), { recursive: true });
    db = new Database(path, { readonly: options.readonly ?? false, fileMustExist: options.readonly ?? false, ...nativeBinding() });
    db.pragma('busy_timeout = 10000');
    db.pragma('foreign_keys = ON');
    // Reading the schema is the first real read: a file that is not SQLite fails here, before anything is written.
    checkOwnership(db, path);
    if (!options.readonly) {
      db.pragma('journal_mode = WAL');
      db.pragma('synchronous = NORMAL');
      registerStoreFunctions(db);
      migrate(db);
    } else if (options.upgrade && readVersion(db) < STORE_MIGRATIONS.length) {
      // A reader of an older store sees today's tables: the store is brought up to date once (the
      // migrations keep every row), then read as asked; a store that cannot be written says so.
      db.close();
      openStore(path).close();
      return openStore(path, { readonly: true });
    }
    return db;
  } catch (e) {
    db?.close();
    throw (
      storeFault(e, path) ??
      new CodedError('store_error', { what: 'Store', expected: 'a readable SQLite file', received: `'${path}' (${(e as Error).message})` }, {
        path: '--db',
        hint: options.readonly ? 'run a sweep first, or point --db at an existing store' : 'check that the folder is writable',
      })
    );
  }
}
