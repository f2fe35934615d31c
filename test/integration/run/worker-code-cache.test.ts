import { existsSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import { WORKER_RESOURCE_LIMITS } from '../../../src/run/worker-pool.js';

const loader = fileURLToPath(new URL('../../../dist/run/sweep-worker.loader.mjs', import.meta.url));

/** Imports the built worker loader in a fresh worker thread with the pool's heap limits; returns what it exports. */
function loadInThread(): Promise<{ codeCache: string; handler: string }> {
  const code = `import(${JSON.stringify(pathToFileURL(loader).href)}).then((m) => require('node:worker_threads').parentPort.postMessage({ codeCache: m.codeCache, handler: typeof m.default }));`;
  const w = new Worker(code, { eval: true, resourceLimits: WORKER_RESOURCE_LIMITS });
  return new Promise((resolve, reject) => {
    w.once('message', (m) => void w.terminate().then(() => resolve(m)));
    w.once('error', reject);
  });
}

// Issue 8 (speed): the build (src/build/bundle-worker.mjs) writes a V8 code cache for the worker bundle, made by a
// training run on a worker thread. Expected values: a cache made by the same Node binary and V8 flags is accepted
// (Node's vm documentation, `cachedDataRejected`); piscina calls the module's default export (piscina's README).
describe('the built worker loader', () => {
  it('exists after npm run build', () => {
    expect(existsSync(loader)).toBe(true);
  });
  it("compiles the worker bundle from the build's code cache in a worker thread and exports a task handler", async () => {
    const r = await loadInThread();
    expect(r.handler).toBe('function');
    expect(r.codeCache).toBe('accepted');
  });
});
