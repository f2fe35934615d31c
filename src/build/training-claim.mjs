// The claim the build's training runs sweep to fill the V8 code caches (bundle-cli.mjs, bundle-worker.mjs): a
// claim of our own over a few hundred labelings, small enough to run in a second.
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** Writes the training claim into `dir` and returns its path. */
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
