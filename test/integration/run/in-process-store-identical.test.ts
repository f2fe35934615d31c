import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, query } from '../../e2e/cli-process.js';
import { exchangeReverseClaim } from '../../helpers/exchange-reverse-brute-force.js';
import { expectSameStore } from '../../helpers/same-store.js';

// A sweep in the main thread (--workers 0, or a small family without --workers) must write exactly the
// store a sweep on worker threads writes: same chunks and tallies, same counterexample rows (pair partners
// included), same verified classes. A fixed --chunk-size makes the chunk rows comparable.

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-in-process-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function sweep(claim: string, name: string, workers: string[], env: Record<string, string> = {}): string {
  const db = join(dir, `${name}-${workers.join('') || 'default'}-${Object.keys(env).length}.sqlite`);
  const r = cli(['run', claim, '--db', db, ...workers, '--chunk-size', '53', '--json'], env);
  // exit 0: holds; exit 1: counterexamples found (README, "Exit codes")
  expect([0, 1], r.stderr).toContain(r.status);
  return db;
}

const workersOf = (db: string) => query<{ options_json: string }>(db, 'SELECT options_json FROM runs').map((r) => (JSON.parse(r.options_json) as { workers: number }).workers);

const written = (file: string, data: object) => {
  const path = join(dir, file);
  writeFileSync(path, JSON.stringify(data));
  return path;
};

const cases: [string, string][] = [
  ['rotation', 'conjectures/cohomology-triangle-rotation.json'],
  ['k-rotation-to-dual', 'conjectures/k-theory-rotation-to-dual.json'],
  ['exchange-reverse', written('exchange-reverse.json', exchangeReverseClaim(3, 3))],
];

describe('the main thread writes the store worker threads write', () => {
  it.each(cases)('%s: --workers 0 against --workers 2, bulk and per-instance paths', (name, claim) => {
    const threads = sweep(claim, name, ['--workers', '2']);
    const main = sweep(claim, name, ['--workers', '0']);
    expect(workersOf(main)).toEqual([0]);
    expectSameStore(main, threads);
    const perInstance = { PUZZLESWEEP_PER_INSTANCE: '1' };
    expectSameStore(sweep(claim, name, ['--workers', '0'], perInstance), sweep(claim, name, ['--workers', '1'], perInstance));
  });

  it('without --workers a small family is swept in the main thread, with the same store', () => {
    const [, claim] = cases[2]!;
    const auto = sweep(claim, 'auto', []);
    expect(workersOf(auto)).toEqual([0]);
    expectSameStore(auto, sweep(claim, 'auto', ['--workers', '1']));
  });

  it('the comparison can fail: the failing claim stores counterexamples with pair partners', () => {
    const partners = query<{ n: number }>(join(dir, 'exchange-reverse---workers0-0.sqlite'), 'SELECT count(*) AS n FROM counterexamples WHERE partner_of IS NOT NULL')[0]!.n;
    // Issue 7: a failing pair {b, T(b)} gives two rows, the partner's marked partner_of (common practice, no source).
    expect(partners).toBeGreaterThan(0);
  });
});
