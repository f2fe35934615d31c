import { openSync, readSync, closeSync } from 'node:fs';
import { CodedError } from '../errors/index.js';

// SQLite result codes (primary code before the first underscore-suffix), as better-sqlite3 reports them.
const primary = (code: string) => code.replace(/^(SQLITE_[A-Z]+).*$/, '$1');

/**
 * A coded error for a store that cannot be used, naming --db and the fix, or undefined when `e` is not a
 * file-system or SQLite fault. `path` is the store file.
 */
export function storeFault(e: unknown, path: string): CodedError | undefined {
  if (e instanceof CodedError) return e;
  const code = (e as { code?: unknown })?.code;
  if (typeof code !== 'string') return undefined;
  const detail = (e as Error).message;
  const at = { path: '--db', cause: e };
  switch (code.startsWith('SQLITE_') ? primary(code) : code) {
    case 'SQLITE_NOTADB':
    case 'SQLITE_CORRUPT':
      if (!hasSqliteHeader(path)) {
        return new CodedError('store_foreign', { what: 'Store', expected: 'a puzzlesweep SQLite store', received: `'${path}', which is not a SQLite file at all` }, {
          ...at,
          hint: 'nothing was written to it; --db names the store file (e.g. results/puzzlesweep.sqlite), not a claim or another file',
        });
      }
      return new CodedError('store_corrupt', { what: 'Store', expected: 'a puzzlesweep SQLite store', received: `'${path}', which is not a readable SQLite database (${detail})` }, {
        ...at,
        hint: 'point --db at another file (a new one is created); if this was a store, restore it from a copy: sqlite3 can .recover a damaged file',
      });
    case 'SQLITE_READONLY':
    case 'EACCES':
    case 'EPERM':
    case 'EROFS':
      return new CodedError('store_read_only', { what: 'Store', expected: 'a writable file and folder', received: `'${path}' (${detail})` }, {
        ...at,
        hint: 'make the file and its folder writable (SQLite writes a -wal and -shm file beside it), or copy the store elsewhere and use that --db',
      });
    case 'SQLITE_CANTOPEN':
    case 'SQLITE_IOERR':
    case 'SQLITE_FULL':
    case 'ENOENT':
    case 'ENOTDIR':
    case 'EEXIST':
    case 'EISDIR':
      return new CodedError('store_unavailable', { what: 'Store', expected: 'a file SQLite can open and write', received: `'${path}' (${detail})` }, {
        ...at,
        hint: 'check that the folder of --db exists and is a folder on a local disk with free space, or choose another --db',
      });
    default:
      return undefined;
  }
}

// Every SQLite database file begins with these 16 bytes (SQLite file format documentation).
const HEADER = 'SQLite format 3\0';

function hasSqliteHeader(path: string): boolean {
  try {
    const fd = openSync(path, 'r');
    try {
      const buf = Buffer.alloc(16);
      const n = readSync(fd, buf, 0, 16, 0);
      return n === 16 && buf.toString('latin1') === HEADER;
    } finally {
      closeSync(fd);
    }
  } catch {
    return false;
  }
}

/** A store that is a SQLite database of something else (its tables are not ours). */
export function foreignStore(path: string, tables: readonly string[]): CodedError {
  return new CodedError('store_foreign', { what: 'Store', expected: 'a puzzlesweep store', received: `'${path}', a SQLite database with other tables (${tables.slice(0, 4).join(', ')}${tables.length > 4 ? ', …' : ''})` }, {
    path: '--db',
    hint: 'nothing was written to it; choose another --db for puzzlesweep results',
  });
}
