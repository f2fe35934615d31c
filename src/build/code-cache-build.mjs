// What the two bundle scripts (bundle-cli.mjs, bundle-worker.mjs) share: writing a bundle with the loader that runs it
// from a V8 code cache, and the claim whose training runs fill the caches.
import { createHash } from 'node:crypto';
import { copyFileSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const dist = join(here, '..', '..', 'dist');

/**
 * Writes esbuild's output files (the CommonJS bundle without a #! line: the loader wraps it in a function) and the
 * loader `loaderName` (in src/build) to `loaderFile`, stamped with the build's id, a hash of the bundle, so a loader
 * never reads the cache of another build. Copies the loaders' shared module to dist/cached-bundle.mjs. Returns the id.
 */
export function writeBundleAndLoader(outputFiles, loaderName, loaderFile, mode) {
  let bundleText = '';
  for (const file of outputFiles) {
    const text = file.path.endsWith('.cjs') ? file.text.replace(/^#!.*/, '') : file.text;
    if (file.path.endsWith('.cjs')) bundleText = text;
    writeFileSync(file.path, text);
  }
  const buildId = createHash('sha256').update(bundleText).digest('hex').slice(0, 16);
  const loader = readFileSync(join(here, loaderName), 'utf8').replace("'__PUZZLESWEEP_BUILD__'", JSON.stringify(buildId));
  writeFileSync(loaderFile, loader, mode === undefined ? {} : { mode });
  copyFileSync(join(here, 'cached-bundle.mjs'), join(dist, 'cached-bundle.mjs'));
  return buildId;
}

/** Writes the training claim, a claim of our own over a few hundred labelings, into `dir` and returns its path. */
export function writeTrainingClaim(dir) {
  const file = join(dir, 'training.json');
  writeFileSync(
    file,
    JSON.stringify({
      id: 'training',
      statement: 'Exchanging sides 1 and 4 keeps the cohomology value.',
      theory: 'cohomology',
      family: { sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }], conditions: [{ type: 'sameContent', sides: [1, 4] }] },
      transform: [{ type: 'exchange', sides: [1, 4] }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    }),
  );
  return file;
}
