import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { assertFreshBuild, staleBuildFiles } from '../../setup/dist-is-fresh.js';

// The guard that keeps integration tests off a stale build must itself be able to fail.
const root = mkdtempSync(join(tmpdir(), 'puzzlesweep-dist-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

function file(path: string, secondsAgo: number): void {
  const full = join(root, path);
  mkdirSync(join(full, '..'), { recursive: true });
  writeFileSync(full, '');
  const t = Date.now() / 1000 - secondsAgo;
  utimesSync(full, t, t);
}

describe('dist-is-fresh (integration global setup)', () => {
  it('names sources whose build is missing or older, and accepts a fresh one', () => {
    file('src/a.ts', 100);
    file('dist/a.js', 50); // built after the source: fresh
    file('src/sub/b.ts', 10);
    file('dist/sub/b.js', 60); // built before the last edit: stale
    file('src/c.ts', 10); // never built
    file('src/types.d.ts', 10); // declarations compile to nothing
    expect(staleBuildFiles(root).sort()).toEqual(['c.ts (dist/c.js is missing)', join('sub', 'b.ts') + ' (changed after the last build)']);
  });

  it('throws a message that says to run npm run build', () => {
    expect(() => assertFreshBuild(root)).toThrow(/expected dist\/ to be built from the current src\/, received 2 stale file\(s\)[\s\S]*npm run build/);
  });
});
