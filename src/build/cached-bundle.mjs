// dist/cached-bundle.mjs, copied there by src/build/code-cache-build.mjs: what the CLI's loader (cli-loader.mjs) and
// the worker's loader (worker-loader.mjs) share. Node 20 has no module.enableCompileCache, so a bundle is a CommonJS
// script compiled through vm.Script with the V8 code cache the build made for it. A cache V8 rejects (another Node
// version, other V8 flags) is ignored and the bundle compiles as usual; a missing one likewise.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, sep } from 'node:path';
import vm from 'node:vm';

/** The file's contents, or undefined when it cannot be read. */
export function tryRead(file, encoding) {
  try {
    return readFileSync(file, encoding);
  } catch {
    return undefined;
  }
}

/** Compiles the CommonJS `bundle` with the cache in `cacheFile`; `codeCache` says whether V8 took it. */
export function compileBundle(bundle, cacheFile) {
  const cachedData = tryRead(cacheFile);
  // The CommonJS wrapper on the bundle's first line, so its line numbers stay the bundle's own. Strict, as the ES
  // modules it was bundled from (the bundle's own "use strict" follows the build's banner, so it is no directive).
  const source = `(function (exports, require, module, __filename, __dirname) {'use strict';${readFileSync(bundle, 'utf8')}\n})`;
  const script = new vm.Script(source, { filename: bundle, ...(cachedData ? { cachedData } : {}) });
  const codeCache = cachedData === undefined ? 'absent' : script.cachedDataRejected ? 'rejected' : 'accepted';
  return { script, codeCache };
}

/** Runs a compiled bundle as the module at `bundle` and returns its exports. */
export function runBundle(script, bundle) {
  const module = { exports: {} };
  script.runInThisContext()(module.exports, createRequire(bundle), module, bundle, `${dirname(bundle)}${sep}`);
  return module.exports;
}
