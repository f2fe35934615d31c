import { existsSync, realpathSync } from 'node:fs';
import { resolve } from 'node:path';
import { AppError } from '../errors.js';
import { mergeStores, openStore, type MergeReport, type Store } from '../store/index.js';

/** Exit status of `merge` when it merged, but some shards are missing or unfinished. */
export const INCOMPLETE_MERGE_EXIT = 4;

const real = (p: string) => (existsSync(p) ? realpathSync(p) : resolve(p));

/** Opens the source stores read-only and the target read-write (created if absent), merges, closes all. */
export function mergeStoreFiles(paths: readonly string[], into: string): MergeReport {
  if (paths.length === 0) throw new AppError('invalid_argument', 'Stores: expected at least one store file to merge, received none', { path: 'stores' });
  const intoReal = real(into);
  const unique = [...new Map(paths.map((p) => [real(p), p])).values()];
  for (const p of unique) {
    if (!existsSync(p)) throw new AppError('file_not_found', `Store: expected an existing store file, received '${p}'`, { path: 'stores', hint: 'a shard that never ran has no store; merge the others and resubmit it' });
    if (real(p) === intoReal) throw new AppError('invalid_argument', `--into: expected a store other than the ones merged, received '${into}'`, { path: '--into' });
  }
  const sources: { name: string; db: Store }[] = [];
  let target: Store | undefined;
  try {
    for (const p of unique) sources.push({ name: p, db: openStore(p, { readonly: true }) });
    target = openStore(into);
    return mergeStores(target, into, sources);
  } finally {
    for (const s of sources) s.db.close();
    target?.close();
  }
}
