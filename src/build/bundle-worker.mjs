// `npm run build`, after tsc: bundles the sweep worker (dist/run/sweep-worker.js with the claims runtime,
// engine and zod) into dist/run/sweep-worker.bundle.js, one file that a worker thread reads and compiles
// once instead of ~60 modules (src/run/worker-pool.ts prefers it when it exists). Every module of the
// worker is in it exactly once, so a CodedError thrown by the claims layer is still one `instanceof` knows.
import { build } from 'esbuild';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const result = await build({
  absWorkingDir: root,
  entryPoints: ['src/run/sweep-worker.ts'],
  outfile: join(root, 'dist', 'run', 'sweep-worker.bundle.js'),
  bundle: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  // Native addon and the pool: resolved from node_modules at run time.
  external: ['better-sqlite3', 'piscina'],
  // CommonJS dependencies inside an ES module bundle call require() for Node's built-ins.
  banner: { js: "import { createRequire as __bundleRequire } from 'node:module'; const require = __bundleRequire(import.meta.url);" },
  sourcemap: 'linked',
  metafile: true,
  logLevel: 'warning',
});

// A bundled module that resolves a path from its own location would now resolve it from dist/run/.
const moved = Object.keys(result.metafile.inputs).filter((f) => f.startsWith('src/') && readFileSync(join(root, f), 'utf8').includes('import.meta'));
if (moved.length > 0) {
  process.stderr.write(`bundle-worker: expected no bundled module to use import.meta, received ${moved.join(', ')}\n`);
  process.exit(1);
}
