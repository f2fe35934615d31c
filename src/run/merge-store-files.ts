import { copyFileSync, existsSync, mkdtempSync, realpathSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { CodedError } from '../errors/index.js';
import { isOlderSchema, mergeStores, openStore, type MergeReport, type Store } from '../store/index.js';

/** Exit status of `merge` when it merged, but some shards are missing or unfinished. */
export const INCOMPLETE_MERGE_EXIT = 4;

const real = (p: string) => (existsSync(p) ? realpathSync(p) : resolve(p));

/** Opens the source stores read-only and the target read-write (created if absent), merges, closes all. */
export function mergeStoreFiles(paths: readonly string[], into: string): MergeReport {
  if (paths.length === 0) throw new CodedError('invalid_argument', { what: 'Stores', expected: 'at least one store file to merge', received: 'none' }, { path: 'stores' });
  const intoReal = real(into);
  const unique = [...new Map(paths.map((p) => [real(p), p])).values()];
  for (const p of unique) {
    if (!existsSync(p)) throw new CodedError('file_not_found', { what: 'Store', expected: 'an existing store file', file: p }, { path: 'stores', hint: 'a shard that never ran has no store; merge the others and resubmit it' });
    if (real(p) === intoReal) throw new CodedError('invalid_argument', { what: '--into', expected: 'a store other than the ones merged', received: `'${into}'` }, { path: '--into' });
  }
  const sources: { name: string; db: Store }[] = [];
  let target: Store | undefined;
  let scratch: string | undefined;
  try {
    for (const [k, p] of unique.entries()) {
      let db = openStore(p, { readonly: true });
      if (isOlderSchema(db)) {
        // A store of an older schema is merged from a migrated copy; the file itself stays as it is.
        db.close();
        scratch ??= mkdtempSync(join(tmpdir(), 'puzzlesweep-merge-'));
        const copy = join(scratch, `${k}.sqlite`);
        copyFileSync(p, copy);
        if (existsSync(`${p}-wal`)) copyFileSync(`${p}-wal`, `${copy}-wal`);
        db = openStore(copy);
      }
      sources.push({ name: p, db });
    }
    target = openStore(into);
    return mergeStores(target, into, sources);
  } finally {
    for (const s of sources) s.db.close();
    target?.close();
    if (scratch) rmSync(scratch, { recursive: true, force: true });
  }
}
