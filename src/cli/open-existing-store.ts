import { existsSync } from 'node:fs';
import { CodedError } from '../errors/index.js';
import { openStore, type Store } from '../store/index.js';

/** Opens an existing store for reading (an older one is migrated first); a missing file is an input error, never a new empty store. */
export function openExistingStore(path: string): Store {
  if (!existsSync(path)) {
    throw new CodedError('file_not_found', { what: 'Store', expected: 'an existing SQLite file', file: path }, {
      path: '--db',
      hint: "run 'puzzlesweep run <claim.json>' first, or point --db at your store",
    });
  }
  return openStore(path, { readonly: true, upgrade: true });
}

