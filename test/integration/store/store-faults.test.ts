import { randomFillSync } from 'node:crypto';
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { openStore, storeFault } from '../../../src/store/index.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-faults-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// Every SQLite file starts with this 16-byte header (SQLite file format documentation).
const HEADER = 'SQLite format 3\0';

function fault(path: string): { code: string; path: string | undefined; hint: string | undefined } {
  try {
    openStore(path).close();
  } catch (e) {
    const err = e as { code: string; path?: string; hint?: string };
    return { code: err.code, path: err.path, hint: err.hint };
  }
  throw new Error(`opening ${path} did not fail`);
}

describe('store faults give a coded error naming --db and the fix, and change nothing', () => {
  it('a damaged SQLite file is store_corrupt', () => {
    const path = join(dir, 'damaged.sqlite');
    const bytes = Buffer.alloc(8192);
    randomFillSync(bytes);
    bytes.write(HEADER, 0, 'latin1');
    writeFileSync(path, bytes);
    expect(fault(path)).toMatchObject({ code: 'store_corrupt', path: '--db' });
    expect(readFileSync(path).equals(bytes)).toBe(true);
  });

  it('a file that is not SQLite at all, and a SQLite database of something else, are store_foreign', () => {
    const text = join(dir, 'notes.sqlite');
    writeFileSync(text, 'my notes\n');
    expect(fault(text)).toMatchObject({ code: 'store_foreign', path: '--db' });
    expect(readFileSync(text, 'utf8')).toBe('my notes\n');
    const other = join(dir, 'other.sqlite');
    const db = new Database(other);
    db.exec('CREATE TABLE recipes (name TEXT)');
    db.close();
    const before = readFileSync(other);
    expect(fault(other)).toMatchObject({ code: 'store_foreign', path: '--db' });
    expect(readFileSync(other).equals(before)).toBe(true);
  });

  it('a folder that cannot exist (its parent is a file) is store_unavailable', () => {
    const file = join(dir, 'plain-file');
    writeFileSync(file, '');
    expect(fault(join(file, 'store.sqlite'))).toMatchObject({ code: 'store_unavailable', path: '--db' });
  });

  it('a read-only store is store_read_only', () => {
    const path = join(dir, 'locked', 'store.sqlite');
    openStore(path).close();
    if (process.getuid?.() === 0) {
      // Root ignores file modes, so the fault is produced as SQLite reports it to a writer of a read-only file.
      const ro = new Database(path, { readonly: true });
      let err: unknown;
      try {
        ro.exec('CREATE TABLE t (x)');
      } catch (e) {
        err = e;
      } finally {
        ro.close();
      }
      expect(storeFault(err, path)).toMatchObject({ code: 'store_read_only', path: '--db' });
      return;
    }
    chmodSync(join(dir, 'locked'), 0o500);
    chmodSync(path, 0o400);
    try {
      expect(fault(path).code).toBe('store_read_only');
    } finally {
      chmodSync(join(dir, 'locked'), 0o700);
      chmodSync(path, 0o600);
    }
  });

  it('a store of this tool opens (control)', () => {
    const path = join(dir, 'fine.sqlite');
    openStore(path).close();
    expect(existsSync(path)).toBe(true);
    openStore(path).close();
  });
});
