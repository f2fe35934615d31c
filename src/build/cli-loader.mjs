#!/usr/bin/env node
// dist/cli/main.js, written by src/build/bundle-cli.mjs from src/build/cli-loader.mjs. Runs the CLI bundle
// (main-bundle.cjs) with the V8 code cache the build made for it: compiling the bundle was about a fifth of a
// small `run`, and the cache also holds the functions a typical run compiles lazily. Node 20 has no
// module.enableCompileCache, so the bundle is a CommonJS script compiled through vm.Script with cachedData.
// A cache V8 rejects (another Node version, other V8 flags) is ignored and the bundle compiles as usual; a
// cache from another build is never read (its name carries the build's hash of the bundle).
import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import vm from 'node:vm';

const BUILD = '__PUZZLESWEEP_BUILD__';
const dir = fileURLToPath(new URL('.', import.meta.url));
const bundle = `${dir}main-bundle.cjs`;

/** The file's text, or undefined when it cannot be read. */
function tryRead(file, encoding) {
  try {
    return readFileSync(file, encoding);
  } catch {
    return undefined;
  }
}

// `--help` alone prints the copy yargs rendered at build time (help.txt), without loading the bundle. yargs wraps
// at min(80, terminal columns), so the copy serves only 80 columns or more; PUZZLESWEEP_RENDER_HELP=1 makes
// yargs render it again (the build sets it to make the copy, a test to compare the two).
const args = process.argv.slice(2);
const help = args.length === 1 && args[0] === '--help' && !process.env.PUZZLESWEEP_RENDER_HELP && (process.stdout.columns ?? 80) >= 80 ? tryRead(`${dir}help.txt`, 'utf8') : undefined;
if (help !== undefined) process.stdout.write(help);
else {
  const cachedData = tryRead(`${dir}main-bundle.${BUILD}.cache`);
  // The CommonJS wrapper on the bundle's first line, so its line numbers stay the bundle's own. Strict, as the ES
  // modules it was bundled from (the bundle's own "use strict" follows the build's banner, so it is no directive).
  const source = `(function (exports, require, module, __filename, __dirname) {'use strict';${readFileSync(bundle, 'utf8')}\n})`;
  const script = new vm.Script(source, { filename: bundle, ...(cachedData ? { cachedData } : {}) });
  const module = { exports: {} };
  // The build's training runs (src/build/bundle-cli.mjs) write the cache: the bundle plus what they compiled.
  const out = process.env.PUZZLESWEEP_WRITE_CODE_CACHE;
  if (out) process.once('exit', () => writeFileSync(out, script.createCachedData()));
  script.runInThisContext()(module.exports, createRequire(bundle), module, bundle, dir);
}
