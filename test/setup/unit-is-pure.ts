import childProcess from 'node:child_process';
import { syncBuiltinESMExports } from 'node:module';
import workerThreads from 'node:worker_threads';
import { vi } from 'vitest';

// test/unit (the quick loop) and test/math (in-process cross-checks): no child processes, no worker threads,
// no SQLite files (`:memory:` is fine).
// These stand-ins make a unit test that reaches for one fail at once, naming where the test belongs.
function refuse(what: string): never {
  throw new Error(`Unit or math test: expected no ${what}, received a call to it; hint: move the test to test/integration`);
}

const processFunctions = ['spawn', 'spawnSync', 'exec', 'execSync', 'execFile', 'execFileSync', 'fork'] as const;
for (const name of processFunctions) {
  (childProcess as unknown as Record<string, unknown>)[name] = () => refuse(`child process (child_process.${name})`);
}
(workerThreads as unknown as Record<string, unknown>).Worker = class {
  constructor() {
    refuse('worker thread');
  }
};
syncBuiltinESMExports();

vi.mock('better-sqlite3', async (importOriginal) => {
  const Real = ((await importOriginal()) as { default: new (path?: string, options?: object) => object }).default;
  function InMemoryOnly(path?: string, options?: object): object {
    if (path !== ':memory:') refuse(`SQLite file ('${String(path)}'; use ':memory:')`);
    return new Real(path, options);
  }
  Object.assign(InMemoryOnly, Real);
  InMemoryOnly.prototype = Real.prototype;
  return { default: InMemoryOnly };
});
