import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { loadSweepClaim } from '../../../src/run/load-sweep-claim.js';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { runSweep } from '../../../src/run/run-sweep.js';
import { classTallies, listCounterexamples, openStore, pendingPartnerCount } from '../../../src/store/index.js';
import { STORE_MIGRATIONS } from '../../../src/store/store-migrations.js';
import { exchangeReverseFailures } from '../../helpers/exchange-reverse-brute-force.js';

const fixture = fileURLToPath(new URL('../../fixtures/stores/schema-2/', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-migrate-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const TABLES = ['claims', 'runs', 'chunks', 'counterexamples', 'verified_classes', 'permutations'] as const;

/** A store file of schema version 2, written from the committed dump (see its README). */
function oldStore(name: string): { path: string; counts: Record<string, number>; rights: Map<string, string> } {
  const path = join(dir, name);
  const db = new Database(path);
  db.exec(readFileSync(join(fixture, 'store.sql'), 'utf8'));
  // Counted straight from the dump, before any code of ours touches it.
  const counts = Object.fromEntries(TABLES.map((t) => [t, (db.prepare(`SELECT COUNT(*) AS n FROM ${t}`).get() as { n: number }).n]));
  const rows = db.prepare(`SELECT x.class_key, x.instance_index, x.right_value FROM counterexamples x JOIN claims c USING (fingerprint) WHERE c.claim_id = 'fx-substitution'`).all() as { class_key: string; instance_index: number; right_value: string }[];
  db.close();
  return { path, counts, rights: new Map(rows.map((r) => [`${r.class_key}:${r.instance_index}`, r.right_value])) };
}

describe('a store of schema version 2 (issue 7)', () => {
  it('opens, migrates and keeps every row, now under the fingerprints of the claims\' mathematics', () => {
    const { path, counts, rights } = oldStore('v2.sqlite');
    expect(counts.counterexamples).toBeGreaterThan(0);
    const db = openStore(path);
    try {
      const version = (db.prepare('SELECT MAX(version) AS v FROM schema_version').get() as { v: number }).v;
      expect(version).toBe(STORE_MIGRATIONS.length);
      for (const t of TABLES) expect((db.prepare(`SELECT COUNT(*) AS n FROM ${t}`).get() as { n: number }).n).toBe(counts[t]);
      // Each claim row now has the fingerprint today's code gives the claim file that made it.
      const stored = db.prepare('SELECT claim_id, fingerprint FROM claims').all() as { claim_id: string; fingerprint: string }[];
      for (const c of stored) expect(c.fingerprint).toBe(loadSweepClaim(join(fixture, `${c.claim_id}.json`)).fingerprint);
      // Every row points at an existing claim.
      for (const t of TABLES.slice(1)) {
        expect((db.prepare(`SELECT COUNT(*) AS n FROM ${t} WHERE fingerprint NOT IN (SELECT fingerprint FROM claims)`).get() as { n: number }).n).toBe(0);
      }
      // Substitution rows kept σ(value) as their right value: it moved to the σ(value) column, unchanged.
      const moved = db.prepare(`SELECT x.class_key, x.instance_index, x.substituted_value, x.right_value FROM counterexamples x JOIN claims c USING (fingerprint) WHERE c.claim_id = 'fx-substitution'`).all() as { class_key: string; instance_index: number; substituted_value: string; right_value: string }[];
      expect(moved.length).toBe(rights.size);
      for (const r of moved) {
        expect(r.substituted_value).toBe(rights.get(`${r.class_key}:${r.instance_index}`));
        expect(r.right_value).toMatch(/not kept/);
      }
    } finally {
      db.close();
    }
  });

  it('reuses the old results: sweeping the same claims again (and with the raised bound) checks nothing new', async () => {
    const { path } = oldStore('resume.sqlite');
    const claims = ['fx-rotation', 'fx-permutes-y'].map((id) => loadSweepClaim(join(fixture, `${id}.json`)));
    const s = await runSweep({ claims: [claims[0]!], options: parseRunOptions({ db: path, workers: 1, max: ['n=4'] }) });
    const t = await runSweep({ claims: [claims[1]!], options: parseRunOptions({ db: path, workers: 1 }) });
    // The dump's runs swept n = 1..4 and n = 1..2 of these claims completely (fixture README).
    expect(s.claims[0]!.instancesChecked).toBe(0);
    expect(t.claims[0]!.instancesChecked).toBe(0);
    expect(s.claims[0]!.classes.map((c) => c.state)).toEqual(['verified', 'verified', 'verified', 'verified']);
    expect(s.exitCode).toBe(0);
  });

  it('derives the failing partners the older store counted as holding, so its figures agree with a brute force', async () => {
    const { path } = oldStore('partners.sqlite');
    const claim = loadSweepClaim(join(fixture, 'fx-exchange-reverse.json'));
    const before = openStore(path);
    const pending = pendingPartnerCount(before, claim.fingerprint);
    const rowsBefore = listCounterexamples(before, claim.fingerprint).length;
    before.close();
    // The dump stored one row per failing pair {b, T(b)} (fixture README: written before partners were kept).
    expect(pending).toBe(rowsBefore);
    const s = await runSweep({ claims: [claim], options: parseRunOptions({ db: path, workers: 1 }) });
    expect(s.claims[0]!.instancesChecked).toBe(0);
    const db = openStore(path);
    try {
      expect(s.claims[0]!.rechecked.partnersStored).toBe(listCounterexamples(db, claim.fingerprint).length - rowsBefore);
      expect(pendingPartnerCount(db, claim.fingerprint)).toBe(0);
      const stored = listCounterexamples(db, claim.fingerprint);
      const tallies = classTallies(db, claim.fingerprint);
      // The fixture claim's classes: a ≤ 3, b ≤ 2 (fx-exchange-reverse.json).
      for (let a = 1; a <= 3; a++) {
        for (let b = 1; b <= 2; b++) {
          // Independent brute force: naive backtracking counts, the steps written out by hand.
          const brute = exchangeReverseFailures(a, b);
          const key = `a=${a},b=${b}`;
          const here = stored.filter((x) => x.classKey === key).map((x) => [x.left.sides[0], x.left.sides[1], x.left.sides[3], x.left.sides[4]].join('|'));
          expect(here.sort(), key).toEqual([...brute.failing].sort());
          const t = tallies.get(key)!;
          expect(t.fails, key).toBe(brute.failing.length);
          expect(t.holds, key).toBe(brute.instances - brute.failing.length);
        }
      }
    } finally {
      db.close();
    }
  });

  it('a reader (status, report, counterexamples open stores read-only) sees an older store through today\'s schema', () => {
    const { path, counts } = oldStore('reader.sqlite');
    const db = openStore(path, { readonly: true, upgrade: true });
    try {
      expect((db.prepare('SELECT MAX(version) AS v FROM schema_version').get() as { v: number }).v).toBe(STORE_MIGRATIONS.length);
      expect((db.prepare('SELECT COUNT(*) AS n FROM counterexamples').get() as { n: number }).n).toBe(counts.counterexamples);
    } finally {
      db.close();
    }
  });
});
