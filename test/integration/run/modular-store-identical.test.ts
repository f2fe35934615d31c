import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, query } from '../../e2e/cli-process.js';
import { resultRows } from '../../helpers/same-store.js';

// A modular sweep (residue codes in class value tables, src/claims/residue-tables.ts) must store the verdicts
// and counts an --exact sweep stores: same chunks and tallies, same counterexample rows (each confirmed
// exactly), same verified classes. Only the method and the error bound differ, and the bound must be
// positive and tiny. The modular per-instance path (PUZZLESWEEP_PER_INSTANCE=1) must agree too. A fixed
// --chunk-size makes the chunk rows comparable.

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-modular-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

type Mode = 'modular' | 'per-instance' | 'exact';
function sweep(claim: string, name: string, mode: Mode): string {
  const db = join(dir, `${name}-${mode}.sqlite`);
  const r = cli(['run', claim, '--db', db, '--workers', '2', '--chunk-size', '37', '--json', ...(mode === 'exact' ? ['--exact'] : [])], mode === 'per-instance' ? { PUZZLESWEEP_PER_INSTANCE: '1' } : {});
  // exit 0: holds; exit 1: counterexamples found (README, "Exit codes")
  expect([0, 1], r.stderr).toContain(r.status);
  return db;
}

// The verdicts and counts of a store: every result row without its method and error bound.
function verdicts(db: string): { chunks: Record<string, unknown>[]; counterexamples: Record<string, unknown>[]; verified: Record<string, unknown>[] } {
  const strip = (rows: Record<string, unknown>[]) => rows.map(({ method: _m, error_bound: _e, ...rest }) => rest);
  return {
    chunks: strip(resultRows(db, 'chunks', 'class_key, start_index')),
    counterexamples: strip(resultRows(db, 'counterexamples', 'class_key, instance_index')),
    verified: strip(resultRows(db, 'verified_classes', 'class_key')),
  };
}

const written = (file: string, data: object) => {
  const path = join(dir, file);
  writeFileSync(path, JSON.stringify(data));
  return path;
};

// Built-in equivariant values (polynomials in y): a true claim with pairs and many zero values, and a false one.
const triangleExchange = written('triangle-exchange.json', {
  id: 'equivariant-triangle-exchange-1-3',
  statement: 'Exchanging sides 1 and 3 of a triangle keeps the equivariant value.',
  theory: 'equivariant',
  family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 4 }] },
  transform: [{ type: 'exchange', sides: [1, 3] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
});
const parallelogramExchange = written('parallelogram-exchange.json', {
  id: 'equivariant-parallelogram-exchange-nonzero',
  statement: 'Exchanging sides 1 and 4 of a parallelogram keeps a nonzero equivariant value.',
  theory: 'equivariant',
  family: { sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 3 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }], nonzeroOnly: true },
  transform: [{ type: 'exchange', sides: [1, 4] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
});

// Equal after a substitution σ of y: T(b)'s residues are taken at the σ-moved point. σ an involution
// (a block reversal, with an exchange: pairs) and not (rotation by 120°, σ a reversal then a shift: no pairs).
const exchangeReversesBlock = written('exchange-reverses-block.json', {
  id: 'equivariant-exchange-reverses-block',
  statement: 'Exchanging sides 1 and 4 of an equivariant parallelogram reverses the first block of y.',
  theory: 'equivariant',
  family: { sides: ['a', 0, 'b', 'a', 0, 'b'], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
  transform: [{ type: 'exchange', sides: [1, 4] }],
  compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 1, to: 'a' }] } },
});

const cases: [string, string][] = [
  // shipped: Laurent values in t from a piece file (fails at a ≥ 2, per its statement)
  ['equivariant-k-exchange', 'conjectures/equivariant-k-parallelogram-exchange.json'],
  ['triangle-exchange', triangleExchange],
  ['parallelogram-exchange-nonzero', parallelogramExchange],
  ['exchange-reverses-block', exchangeReversesBlock],
  ['rotation-substitution', 'test/fixtures/claims/valid/equivariant-rotation-substitution.json'],
];

describe('a modular sweep stores the verdicts and counts of an exact one', () => {
  it.each(cases)('%s', (name, claim) => {
    const modular = sweep(claim, name, 'modular');
    const exact = sweep(claim, name, 'exact');
    const perInstance = sweep(claim, name, 'per-instance');
    const m = verdicts(modular);
    expect(m.chunks.length, 'a store without chunks compares nothing').toBeGreaterThan(0);
    expect(m).toEqual(verdicts(exact));
    expect(m).toEqual(verdicts(perInstance));
    // The exact store claims nothing probabilistic; the modular one labels its "holds" with a bound.
    const bound = (db: string) => query<{ b: number; methods: string }>(db, "SELECT sum(error_bound) AS b, group_concat(DISTINCT method) AS methods FROM chunks")[0]!;
    expect(bound(exact)).toEqual({ b: 0, methods: 'exact' });
    const b = bound(modular);
    expect(b.methods).toContain('modular');
    expect(b.b).toBeGreaterThan(0);
    // Schwartz–Zippel over F_p for two primes near 2^26 and degrees of a few dozen: far below 10^-6 per class
    // (MAX_MODULAR_ERROR; common practice, no source).
    expect(b.b).toBeLessThan(1e-6);
  });

  it('the comparison can fail: the false claims store counterexamples, confirmed exactly', () => {
    for (const name of ['equivariant-k-exchange', 'parallelogram-exchange-nonzero', 'exchange-reverses-block', 'rotation-substitution']) {
      const n = query<{ n: number }>(join(dir, `${name}-modular.sqlite`), 'SELECT count(*) AS n FROM counterexamples')[0]!.n;
      expect(n, name).toBeGreaterThan(0);
    }
    const zero = query<{ n: number }>(join(dir, 'parallelogram-exchange-nonzero-modular.sqlite'), 'SELECT sum(skipped_zero) AS n FROM chunks')[0]!.n;
    expect(zero).toBeGreaterThan(0);
  });
});
