import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cli, query, storeFingerprint } from './cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-bad-'));
const db = join(dir, 'store.sqlite');
afterAll(() => rmSync(dir, { recursive: true, force: true }));
beforeAll(() => {
  expect(cli(['run', 'conjectures/k-theory-rotation-to-dual.json', '--db', db, '--workers', '1']).status).toBe(0);
});

// One malformed input per error code a `run` can report before sweeping (codes: src/errors/error-catalogue.ts).
const CASES: { name: string; args: string[]; code: string; at: string }[] = [
  { name: 'sides that do not close', args: ['test/fixtures/claims/invalid/sides-do-not-close.json'], code: 'invalid_claim', at: 'family.sides' },
  { name: 'a file that is not JSON', args: ['test/fixtures/claims/invalid/not-json.json'], code: 'invalid_json', at: 'not-json.json' },
  { name: 'a missing claim file', args: [join(dir, 'no-such-claim.json')], code: 'file_not_found', at: 'no-such-claim.json' },
  { name: 'a malformed --max', args: ['conjectures/k-theory-rotation-to-dual.json', '--max', 'n:5'], code: 'invalid_argument', at: '--max' },
  // yargs alone would sum the two values and sweep with 3 workers.
  { name: 'a one-value flag given twice', args: ['--workers', '2', '--workers', '1'], code: 'repeated_option', at: '--workers' },
  // yargs' own refusals come out through the same catalogue, naming the flag.
  { name: 'an unknown flag', args: ['--wokers', '2'], code: 'unknown_option', at: '--wokers' },
  { name: 'a number flag given a word', args: ['--workers', 'two'], code: 'invalid_option_value', at: '--workers' },
];

describe('a command line yargs refuses: coded like every other error, as JSON too', () => {
  it('names the missing argument and the flag of a bad choice, with exit 2', () => {
    const missing = cli(['replay', '--json']);
    expect(missing.status).toBe(2);
    expect(JSON.parse(missing.stdout)).toMatchObject({ error: { code: 'missing_argument', path: '<claim>' } });
    expect(missing.stderr).toContain('✖ Argument <claim>: expected a value (puzzlesweep replay <claim>), received nothing');
    const choice = cli(['count', '--theory', 'cohomology', '--triangle', '01,01,10', '--form', 'q']);
    expect(choice.status).toBe(2);
    expect(choice.stderr).toContain("✖ Option --form: expected one of 'roots' | 'expanded' | 'factored', received 'q'\n  → at --form");
    expect(choice.stderr).toContain('[invalid_choice]');
    const none = cli([]);
    expect(none.status).toBe(2);
    expect(none.stderr).toContain('[missing_command]');
  });
});

describe('malformed input: coded message, exit 2, store untouched', () => {
  for (const c of CASES) {
    it(c.name, () => {
      const before = storeFingerprint(db);
      const rowsBefore = query(db, 'SELECT * FROM runs');
      // The valid claim first: a bad file later in the list must stop the run before anything is written.
      const r = cli(['run', 'conjectures/cohomology-triangle-rotation.json', ...c.args, '--db', db]);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain(`[${c.code}]`);
      expect(r.stderr).toMatch(/expected .*, received /);
      expect(r.stderr).toContain('→ at');
      expect(r.stderr).toContain(c.at);
      expect(storeFingerprint(db)).toBe(before);
      expect(query(db, 'SELECT * FROM runs')).toEqual(rowsBefore);
    });
  }
});
