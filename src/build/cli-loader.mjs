#!/usr/bin/env node
// dist/cli/main.js, written by src/build/bundle-cli.mjs from src/build/cli-loader.mjs. Runs the CLI bundle
// (main-bundle.cjs) with the V8 code cache the build made for it: compiling the bundle was about a fifth of a
// small `run`, and the cache also holds the functions a typical run compiles lazily (cached-bundle.mjs). A cache
// from another build is never read (its name carries the build's hash of the bundle).
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
// dist/cached-bundle.mjs, copied there by the build from src/build/cached-bundle.mjs.
import { compileBundle, runBundle, tryRead } from '../cached-bundle.mjs';

const BUILD = '__PUZZLESWEEP_BUILD__';
const dir = fileURLToPath(new URL('.', import.meta.url));
const bundle = `${dir}main-bundle.cjs`;

// `--help` alone prints the copy yargs rendered at build time (help.txt), without loading the bundle. yargs wraps
// at min(80, terminal columns), so the copy serves only 80 columns or more; PUZZLESWEEP_RENDER_HELP=1 makes
// yargs render it again (the build sets it to make the copy, a test to compare the two).
const args = process.argv.slice(2);
const help = args.length === 1 && args[0] === '--help' && !process.env.PUZZLESWEEP_RENDER_HELP && (process.stdout.columns ?? 80) >= 80 ? tryRead(`${dir}help.txt`, 'utf8') : undefined;
if (help !== undefined) process.stdout.write(help);
else {
  const { script } = compileBundle(bundle, `${dir}main-bundle.${BUILD}.cache`);
  // The build's training runs (src/build/bundle-cli.mjs) write the cache: the bundle plus what they compiled.
  const out = process.env.PUZZLESWEEP_WRITE_CODE_CACHE;
  if (out) process.once('exit', () => writeFileSync(out, script.createCachedData()));
  runBundle(script, bundle);
}
