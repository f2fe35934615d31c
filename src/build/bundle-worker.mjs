// `npm run build`, after tsc and the CLI bundle: bundles the sweep worker (dist/run/sweep-worker.js with the claims
// runtime, engine and zod) into one CommonJS script, dist/run/sweep-worker.bundle.cjs, and writes
// dist/run/sweep-worker.loader.mjs (from src/build/worker-loader.mjs), the file piscina loads in each worker thread
// (src/run/worker-pool.ts prefers it when it exists). The loader compiles the bundle with a V8 code cache made here
// by a training run of the built CLI on one worker thread. Every module of the worker is in the bundle exactly once,
// so a CodedError thrown by the claims layer is still one `instanceof` knows.
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeBundleAndLoader, writeTrainingClaim } from './code-cache-build.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const outdir = join(root, 'dist', 'run');
// Files of earlier builds: the ES module bundle the loader replaced, and code caches of other builds.
const STALE = /^(sweep-worker\.bundle\.js(\.map)?|sweep-worker\.bundle\.[0-9a-f]+\.cache)$/;

for (const f of readdirSync(outdir)) if (STALE.test(f)) rmSync(join(outdir, f));
const result = await build({
  absWorkingDir: root,
  entryPoints: ['src/run/sweep-worker.ts'],
  outfile: join(outdir, 'sweep-worker.bundle.cjs'),
  bundle: true,
  // One CommonJS script: vm.Script takes a code cache, an ES module cannot in Node 20.
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  // Native addon and the pool: resolved from node_modules at run time.
  external: ['better-sqlite3', 'piscina'],
  sourcemap: 'linked',
  metafile: true,
  write: false,
  logLevel: 'warning',
});

// A bundled module that resolves a path from its own location would now resolve it from dist/run/.
const moved = Object.keys(result.metafile.inputs).filter((f) => f.startsWith('src/') && readFileSync(join(root, f), 'utf8').includes('import.meta'));
if (moved.length > 0) {
  process.stderr.write(`bundle-worker: expected no bundled module to use import.meta, received ${moved.join(', ')}\n`);
  process.exit(1);
}

const buildId = writeBundleAndLoader(result.outputFiles, 'worker-loader.mjs', join(outdir, 'sweep-worker.loader.mjs'));

// Training run: a small sweep of a claim of our own on one worker thread; the worker writes the cache after each task.
const cache = join(outdir, `sweep-worker.bundle.${buildId}.cache`);
const work = mkdtempSync(join(tmpdir(), 'puzzlesweep-build-'));
try {
  const claim = writeTrainingClaim(work);
  const r = spawnSync(process.execPath, [join(root, 'dist', 'cli', 'main.js'), 'run', claim, '--db', join(work, 'training.sqlite'), '--workers', '1', '--json'], {
    encoding: 'utf8',
    cwd: work,
    env: { ...process.env, PUZZLESWEEP_WRITE_WORKER_CODE_CACHE: cache },
  });
  if (r.status !== 0) {
    process.stderr.write(`bundle-worker: expected the training run to exit 0, received exit ${r.status}\n${r.stderr}`);
    process.exit(1);
  }
  if (!existsSync(cache)) {
    process.stderr.write(`bundle-worker: expected the training run to write the worker's code cache, received no ${cache}\nhint: the CLI bundle must be built first (npm run build runs both)\n`);
    process.exit(1);
  }
} finally {
  rmSync(work, { recursive: true, force: true });
}
