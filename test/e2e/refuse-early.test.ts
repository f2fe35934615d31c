import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cli, storeFingerprint } from './cli-process.js';

const dir = mkdtempSync(join(tmpdir(), 'puzzlesweep-refuse-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const CLAIM = 'conjectures/cohomology-triangle-rotation.json';

describe('absurd sizes and bad bounds are refused before anything is written (built CLI)', () => {
  it('a bound of 10^9 is refused with the estimated size, and no store is created', () => {
    const db = join(dir, 'absurd', 'store.sqlite');
    const r = cli(['run', CLAIM, '--max', 'n=1000000000', '--db', db]);
    expect(r.status).toBe(2);
    // n from 1 to 10^9 is 10^9 classes of the triangle family (common practice, no source).
    expect(r.stderr).toContain('received about 1.0e+9');
    expect(r.stderr).toContain('[family_too_large]');
    expect(r.stderr).toContain('→ at --max');
    expect(existsSync(join(dir, 'absurd'))).toBe(false);
  });

  it('a bound whose instance count is absurd is refused with that count', () => {
    const r = cli(['run', CLAIM, '--max', 'n=60', '--db', join(dir, 'n60', 'store.sqlite')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/expected at most about 1\.0e\+12 instances, received about \d\.\de\+\d+/);
    expect(existsSync(join(dir, 'n60'))).toBe(false);
  });

  it('replay of an absurd class is refused before its region is built', () => {
    const r = cli(['replay', CLAIM, '--instance', 'n=100000:1']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('received 100,000 (class n=100000)');
    expect(r.stderr).toContain('[family_too_large]');
  });

  it('an invalid --max leaves an existing store byte for byte as it was', () => {
    const db = join(dir, 'kept.sqlite');
    expect(cli(['run', CLAIM, '--max', 'n=2', '--db', db, '--json']).status).toBe(0);
    const before = storeFingerprint(db);
    for (const bad of ['bogus=3', 'n=0']) {
      const r = cli(['run', CLAIM, '--max', bad, '--db', db]);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain('→ at --max');
    }
    expect(storeFingerprint(db)).toBe(before);
  });

  it('--workers above the core count warns', () => {
    const r = cli(['run', CLAIM, '--max', 'n=1', '--workers', String(availableParallelism() + 3), '--db', join(dir, 'w.sqlite'), '--json']);
    expect(r.status).toBe(0);
    expect(r.stderr).toContain(`is above this machine's ${availableParallelism()} cores`);
  });
});
