// `npm run build`, after tsc: bundles the CLI entry (src/cli/main.ts) with esbuild into one CommonJS script,
// dist/cli/main-bundle.cjs (yargs and its dependencies, zod, the engine, the claims, the store, the light commands),
// and writes dist/cli/main.js, a small loader (src/build/cli-loader.mjs) that runs the bundle with a V8 code cache
// made here by a few training runs. The commands that start worker threads or find files next to their own
// module (new URL(…, import.meta.url)) stay tsc's separate ES modules, which the bundle require()s by the same
// relative path (Node ≥ 20.19 requires ES modules), so their paths keep working.
// Then renders the top-level --help once with yargs into dist/cli/help.txt (the loader prints that copy).
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeBundleAndLoader, writeTrainingClaim } from './code-cache-build.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const outdir = join(root, 'dist', 'cli');
// Commands bundled with the entry; every other command module is loaded from tsc's dist/cli/commands.
const BUNDLED = new Set(['count', 'status', 'show', 'expand', 'schema', 'counterexamples', 'replay', 'report', 'merge', 'run-claims']);
// Bundled modules that use import.meta only for a path valid from both dist/<dir>/ and dist/cli/.
const LOCATION_FREE = new Set(['src/run/worker-pool.ts', 'src/store/open-store.ts']);
// Files of earlier builds: the ES module chunks the bundle used to be split into, and code caches of other builds.
const STALE = /^(main-chunk-.*\.js(\.map)?|main-bundle\.[0-9a-f]+\.cache)$/;

const commandsExternal = {
  name: 'unbundled-commands',
  setup(b) {
    b.onResolve({ filter: /^\.\/commands\/[a-z-]+-command\.js$/ }, (args) => {
      const name = /([a-z-]+)-command\.js$/.exec(args.path)[1];
      return BUNDLED.has(name) ? undefined : { path: args.path, external: true };
    });
  },
};

// string-width (three versions under yargs) builds an Intl.Segmenter and Unicode-property regular
// expressions when its module loads: 50–100 ms of every start-up, though only help and usage text measure
// widths. In the bundle each copy loads on its first call instead (esbuild evaluates a require()d module lazily).
const lazyStringWidth = {
  name: 'lazy-string-width',
  setup(b) {
    b.onResolve({ filter: /^string-width$/ }, async (args) => {
      if (args.pluginData === 'real') return undefined;
      const real = await b.resolve(args.path, { kind: args.kind, resolveDir: args.resolveDir, pluginData: 'real' });
      if (real.errors.length > 0) return undefined;
      return { path: real.path, namespace: 'lazy-string-width' };
    });
    b.onLoad({ filter: /.*/, namespace: 'lazy-string-width' }, (args) => ({
      contents: `export default function stringWidth(...a) { return require(${JSON.stringify(args.path)}).default(...a); }`,
      resolveDir: dirname(args.path),
      loader: 'js',
    }));
  },
};

for (const f of readdirSync(outdir)) if (STALE.test(f)) rmSync(join(outdir, f));
const result = await build({
  absWorkingDir: root,
  entryPoints: ['src/cli/main.ts'],
  outfile: join(outdir, 'main-bundle.cjs'),
  bundle: true,
  // One CommonJS script: vm.Script takes a code cache, an ES module cannot in Node 20. Modules load lazily inside
  // it as before (esbuild runs a dynamically imported module's body on first import).
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  // A dynamic import() inside a vm.Script compiled from a code cache has no loader to call; the unbundled
  // commands are require()d instead (ES modules without top-level await, which Node ≥ 20.19 requires).
  supported: { 'dynamic-import': false },
  // Native addon and worker-thread pool: resolved from node_modules at run time.
  external: ['better-sqlite3', 'piscina'],
  // The loader passes the bundle's own path as __filename: import.meta.url of the bundled modules is the bundle's URL.
  define: { 'import.meta.url': '__bundleUrl' },
  banner: { js: "var __bundleUrl = require('node:url').pathToFileURL(__filename).href;" },
  sourcemap: 'linked',
  metafile: true,
  write: false,
  logLevel: 'warning',
  plugins: [commandsExternal, lazyStringWidth],
});

// A bundled module that resolves a path from its own location would now resolve it from dist/cli/.
const moved = Object.keys(result.metafile.inputs).filter((f) => f.startsWith('src/') && f !== 'src/cli/main.ts' && !LOCATION_FREE.has(f) && readFileSync(join(root, f), 'utf8').includes('import.meta'));
if (moved.length > 0) {
  process.stderr.write(`bundle-cli: expected no bundled module to use import.meta, received ${moved.join(', ')}\nhint: leave its command out of BUNDLED in src/build/bundle-cli.mjs\n`);
  process.exit(1);
}

const buildId = writeBundleAndLoader(result.outputFiles, 'cli-loader.mjs', join(outdir, 'main.js'), 0o755);

const cli = (args, env = {}, cwd = root) => spawnSync(process.execPath, [join(outdir, 'main.js'), ...args], { encoding: 'utf8', cwd, env: { ...process.env, ...env } });
const help = cli(['--help'], { PUZZLESWEEP_RENDER_HELP: '1' });
if (help.status !== 0 || help.stdout.length === 0) {
  process.stderr.write(`bundle-cli: expected --help to print the help, received exit ${help.status}\n${help.stderr}`);
  process.exit(1);
}
writeFileSync(join(outdir, 'help.txt'), help.stdout);

// Training runs: each loads the cache so far and writes it back with what it compiled, so the cache holds what a
// small sweep in the main thread, a count and a status call run (a claim of our own, a few hundred labelings).
const cache = join(outdir, `main-bundle.${buildId}.cache`);
const work = mkdtempSync(join(tmpdir(), 'puzzlesweep-build-'));
try {
  const claim = writeTrainingClaim(work);
  const db = join(work, 'training.sqlite');
  for (const args of [['run', claim, '--db', db, '--json'], ['count', '--theory', 'cohomology', '--partitions', '31,21,421', '--grassmannian', '3,7'], ['status', '--db', db]]) {
    const r = cli(args, { PUZZLESWEEP_WRITE_CODE_CACHE: cache }, work);
    if (r.status !== 0) {
      process.stderr.write(`bundle-cli: expected the training run \`${args[0]}\` to exit 0, received exit ${r.status}\n${r.stderr}`);
      process.exit(1);
    }
  }
} finally {
  rmSync(work, { recursive: true, force: true });
}
