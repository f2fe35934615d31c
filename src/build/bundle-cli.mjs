// `npm run build`, after tsc: bundles the CLI entry (dist/cli/main.js) with esbuild so that a start-up reads
// a few files instead of ~100 modules (yargs and its dependencies, the engine, the command). The commands
// that start worker threads or find files next to their own module (new URL(…, import.meta.url)) stay
// tsc's separate files, imported at run time by the same relative path, so their paths keep working.
// Then renders the top-level --help once with yargs into dist/cli/help.txt (main.ts prints that copy).
import { build } from 'esbuild';
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const outdir = join(root, 'dist', 'cli');
// Commands bundled into the entry's chunks; every other command module is loaded from tsc's dist/cli/commands.
const BUNDLED = new Set(['count', 'status', 'show', 'expand', 'schema', 'counterexamples', 'replay', 'report', 'merge', 'run-claims']);
// Bundled modules that use import.meta only for a path valid from both dist/<dir>/ and dist/cli/.
const LOCATION_FREE = new Set(['src/run/worker-pool.ts']);
const CHUNK_PREFIX = 'main-chunk-';

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

for (const f of readdirSync(outdir)) if (f.startsWith(CHUNK_PREFIX)) rmSync(join(outdir, f));
const result = await build({
  absWorkingDir: root,
  entryPoints: { main: 'src/cli/main.ts' },
  outdir,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  chunkNames: `${CHUNK_PREFIX}[hash]`,
  // Native addon and worker-thread pool: resolved from node_modules at run time.
  external: ['better-sqlite3', 'piscina'],
  // CommonJS dependencies inside an ES module bundle call require() for Node's built-ins.
  banner: { js: "import { createRequire as __bundleRequire } from 'node:module'; const require = __bundleRequire(import.meta.url);" },
  // main.ts prints help.txt only in this bundle (both come from the same build).
  define: { PUZZLESWEEP_BUNDLE: 'true' },
  sourcemap: 'linked',
  metafile: true,
  logLevel: 'warning',
  plugins: [commandsExternal, lazyStringWidth],
});

// A bundled module that resolves a path from its own location would now resolve it from dist/cli/.
const moved = Object.keys(result.metafile.inputs).filter((f) => f.startsWith('src/') && f !== 'src/cli/main.ts' && !LOCATION_FREE.has(f) && readFileSync(join(root, f), 'utf8').includes('import.meta'));
if (moved.length > 0) {
  process.stderr.write(`bundle-cli: expected no bundled module to use import.meta, received ${moved.join(', ')}\nhint: leave its command out of BUNDLED in src/build/bundle-cli.mjs\n`);
  process.exit(1);
}

const help = spawnSync(process.execPath, [join(outdir, 'main.js'), '--help'], { encoding: 'utf8', env: { ...process.env, PUZZLESWEEP_RENDER_HELP: '1' } });
if (help.status !== 0 || help.stdout.length === 0) {
  process.stderr.write(`bundle-cli: expected --help to print the help, received exit ${help.status}\n${help.stderr}`);
  process.exit(1);
}
writeFileSync(join(outdir, 'help.txt'), help.stdout);
