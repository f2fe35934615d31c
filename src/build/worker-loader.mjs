// dist/run/sweep-worker.loader.mjs, written by src/build/bundle-worker.mjs from src/build/worker-loader.mjs: the file
// piscina loads in each worker thread (src/run/worker-pool.ts). Runs the worker bundle (sweep-worker.bundle.cjs)
// with the V8 code cache the build made for it, as the CLI's loader does (src/build/cli-loader.mjs): compiling the
// bundle was most of a worker's start before its first chunk. A cache V8 rejects (another Node version, other V8
// flags) is ignored and the bundle compiles as usual; a cache from another build is never read (its name carries
// the build's hash of the bundle). Exports the bundle's task handler as piscina's default export.
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
// dist/cached-bundle.mjs, copied there by the build from src/build/cached-bundle.mjs.
import { compileBundle, runBundle } from '../cached-bundle.mjs';

const BUILD = '__PUZZLESWEEP_BUILD__';
const dir = fileURLToPath(new URL('.', import.meta.url));
const bundle = `${dir}sweep-worker.bundle.cjs`;

const compiled = compileBundle(bundle, `${dir}sweep-worker.bundle.${BUILD}.cache`);
const script = compiled.script;
/** Whether this thread compiled the bundle from the build's cache ('accepted'); a test reads it. */
export const codeCache = compiled.codeCache;
const bundled = runBundle(script, bundle).default;
// In Node 20 a function compiled from a code cache cannot import() ("A dynamic import callback was not specified",
// whatever importModuleDynamically says), so a task that names its runtime module by URL (a test double,
// src/run/claim-runtime-module.ts) runs through tsc's unbundled worker module instead, loaded on first need.
let unbundled;
const runTask = (task) => (task.runtimeModule === undefined ? bundled(task) : (unbundled ??= import('./sweep-worker.js').then((m) => m.default)).then((run) => run(task)));

// The build's training run (src/build/bundle-worker.mjs, one worker) writes the cache after each task: the bundle plus
// what the tasks so far compiled.
const out = process.env.PUZZLESWEEP_WRITE_WORKER_CODE_CACHE;
export default out
  ? async function runTaskAndWriteCache(task) {
      try {
        return await runTask(task);
      } finally {
        writeFileSync(out, script.createCachedData());
      }
    }
  : runTask;
