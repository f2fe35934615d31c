/** merge reads a store of an older schema through a migrated copy, leaving the file itself untouched. */
import { copyFileSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { mergeStoreFiles } from '../../../src/run/merge-store-files.js';
import { openStore, type Store } from '../../../src/store/index.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-merge-old-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function content(db: Store) {
  const rows = (sql: string) => db.prepare(sql).all().map((r) => JSON.stringify(r));
  return {
    claims: rows('SELECT fingerprint, claim_id FROM claims ORDER BY fingerprint'),
    chunks: rows(`SELECT fingerprint, class_key, method, start_index, end_index, checked, holds, fails FROM chunks WHERE state = 'done' ORDER BY fingerprint, class_key, start_index`),
    counterexamples: rows('SELECT * FROM counterexamples ORDER BY fingerprint, class_key, instance_index').map((r) => r.replace(/"(found_run|rechecked_run)":\d+/g, '')),
    verified: rows('SELECT fingerprint, class_key, method, instances FROM verified_classes ORDER BY fingerprint, class_key, method'),
    permutations: rows('SELECT * FROM permutations ORDER BY fingerprint, class_key, instance_index'),
  };
}

describe('merging a store of schema version 2 (fixture test/fixtures/stores/schema-2)', () => {
  it('gives what opening (migrating) the store itself gives, and does not change the file', () => {
    const old = join(dir, 'old.sqlite');
    const raw = new Database(old);
    raw.exec(readFileSync('test/fixtures/stores/schema-2/store.sql', 'utf8'));
    raw.close();
    const before = readFileSync(old);
    const merged = join(dir, 'merged.sqlite');
    mergeStoreFiles([old], merged);
    expect(readFileSync(old).equals(before)).toBe(true);
    const migrated = join(dir, 'migrated.sqlite');
    copyFileSync(old, migrated);
    const a = openStore(migrated);
    const b = openStore(merged, { readonly: true });
    try {
      expect(content(b)).toEqual(content(a));
      expect(content(a).chunks.length).toBeGreaterThan(0);
    } finally {
      a.close();
      b.close();
    }
  });
});
