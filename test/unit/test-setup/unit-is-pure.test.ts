import { execFileSync, spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import { openStore } from '../../../src/store/index.js';

// test/setup/unit-is-pure.ts is what keeps the quick loop quick; these checks make sure it is active.
describe('unit-is-pure (unit setup file)', () => {
  it('refuses child processes and worker threads, naming where the test belongs', () => {
    expect(() => spawnSync(process.execPath, ['--version'])).toThrow(/expected no child process.*move the test to test\/integration/);
    expect(() => execFileSync(process.execPath, ['--version'])).toThrow(/child process/);
    expect(() => new Worker('export {}', { eval: true })).toThrow(/expected no worker thread/);
  });

  it("refuses SQLite files but allows ':memory:'", () => {
    expect(() => openStore(join(tmpdir(), 'puzzlesweep-never-created.sqlite'))).toThrow(/SQLite file/);
    const db = openStore(':memory:');
    expect(db.prepare('SELECT 1 AS one').get()).toEqual({ one: 1 });
    db.close();
  });
});
