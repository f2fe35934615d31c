import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, query } from '../../e2e/cli-process.js';
import { exchangeReverseClaim } from '../../helpers/exchange-reverse-brute-force.js';
import { expectSameStore } from '../../helpers/same-store.js';

// The bulk path (class value tables, src/claims/family-scan.ts) must write exactly the store the
// per-instance path writes (PUZZLESWEEP_PER_INSTANCE=1): same chunks and tallies, same counterexample rows
// (pair partners included), same verified classes. A fixed --chunk-size makes the chunk rows comparable.

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-bulk-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function sweep(claim: string, name: string, perInstance: boolean): string {
  const db = join(dir, `${name}-${perInstance ? 'one' : 'bulk'}.sqlite`);
  const r = cli(['run', claim, '--db', db, '--workers', '2', '--chunk-size', '53', '--json'], perInstance ? { PUZZLESWEEP_PER_INSTANCE: '1' } : {});
  // exit 0: holds; exit 1: counterexamples found (README, "Exit codes")
  expect([0, 1], r.stderr).toContain(r.status);
  return db;
}

const written = (file: string, data: object) => {
  const path = join(dir, file);
  writeFileSync(path, JSON.stringify(data));
  return path;
};

// A false claim with pairs and nonzeroOnly: exchanging sides 1 and 2 of a rhombus (a,a,0,a,a,0), K-theory.
const falseNonzero = {
  id: 'exchange-1-2-rhombus-nonzero',
  statement: 'Exchanging sides 1 and 2 of a rhombus keeps a nonzero K-theory value.',
  theory: 'k-theory',
  family: { sides: ['a', 'a', 0, 'a', 'a', 0], variables: [{ name: 'a', min: 1, max: 3 }], nonzeroOnly: true },
  transform: [{ type: 'exchange', sides: [1, 2] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
};

const cases: [string, string][] = [
  ['rotation', 'conjectures/cohomology-triangle-rotation.json'],
  ['k-equals-cohomology', 'conjectures/k-theory-equals-cohomology.json'],
  ['ssm-exchange', 'conjectures/ssm-parallelogram-exchange.json'],
  ['mirror-complement-puzzles', 'conjectures/cohomology-parallelogram-mirror-complement.json'],
  ['k-rotation-to-dual', 'conjectures/k-theory-rotation-to-dual.json'],
  ['exchange-reverse', written('exchange-reverse.json', exchangeReverseClaim(3, 3))],
  ['false-nonzero', written('false-nonzero.json', falseNonzero)],
];

describe('the bulk path writes the store the per-instance path writes', () => {
  it.each(cases)('%s', (name, claim) => {
    const bulk = sweep(claim, name, false);
    const one = sweep(claim, name, true);
    expectSameStore(bulk, one);
  });

  it('the comparison can fail: the claims with failures do store counterexamples, with pair partners', () => {
    const db = join(dir, 'exchange-reverse-bulk.sqlite');
    const partners = query<{ n: number }>(db, 'SELECT count(*) AS n FROM counterexamples WHERE partner_of IS NOT NULL')[0]!.n;
    // Issue 7: a failing pair {b, T(b)} gives two rows, the partner's marked partner_of (common practice, no source).
    expect(partners).toBeGreaterThan(0);
    const zero = query<{ n: number }>(join(dir, 'false-nonzero-bulk.sqlite'), 'SELECT sum(skipped_zero) AS n FROM chunks')[0]!.n;
    expect(zero).toBeGreaterThan(0);
  });
});
