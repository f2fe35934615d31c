import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

/** Every src/**\/*.ts whose compiled dist/**\/*.js is missing or older than the source. */
export function staleBuildFiles(root: string): string[] {
  const srcDir = join(root, 'src');
  const stale: string[] = [];
  const walk = (dir: string): void => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) walk(path);
      else if (entry.name.endsWith('.ts') && !entry.name.endsWith('.d.ts')) {
        const rel = relative(srcDir, path);
        const built = join(root, 'dist', rel.replace(/\.ts$/, '.js'));
        let builtTime: number | undefined;
        try {
          builtTime = statSync(built).mtimeMs;
        } catch {
          builtTime = undefined;
        }
        if (builtTime === undefined) stale.push(`${rel} (dist/${rel.replace(/\.ts$/, '.js')} is missing)`);
        else if (builtTime < statSync(path).mtimeMs) stale.push(`${rel} (changed after the last build)`);
      }
    }
  };
  walk(srcDir);
  return stale;
}

// Integration tests start worker threads and the CLI from dist/, so a stale build would test old code.
// The build is done once by the npm script, before any test; this only refuses to go on without it.
export default function setup(): void {
  assertFreshBuild(process.cwd());
}

/** Throws a message naming `npm run build` when dist/ under `root` is missing or older than src/. */
export function assertFreshBuild(root: string): void {
  const stale = staleBuildFiles(root);
  if (stale.length === 0) return;
  const shown = stale.slice(0, 5).map((s) => `  src/${s}`).join('\n');
  const more = stale.length > 5 ? `\n  … and ${stale.length - 5} more` : '';
  throw new Error(
    `Build: expected dist/ to be built from the current src/, received ${stale.length} stale file(s):\n${shown}${more}\n` +
      'hint: run `npm run build` (or `npm run test:integration`, which builds first), then run the tests again',
  );
}
