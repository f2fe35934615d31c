import type { Statement } from 'better-sqlite3';
import type { Store } from './open-store.js';

// Statements prepared once per store: preparing one costs about as much as running it, and a sweep runs the same
// few for every chunk and every class. Only for statements run with get, all or run (an iterate() in progress
// keeps a statement busy), never toggled by their callers (pluck, raw, expand); safeIntegers is part of the key.
const statements = new WeakMap<Store, Map<string, Statement>>();

/** The store's prepared statement for `sql` (with `safeIntegers` set as asked), prepared on first use. */
export function preparedStatement(db: Store, sql: string, safeIntegers = false): Statement {
  let byText = statements.get(db);
  if (!byText) statements.set(db, (byText = new Map()));
  const key = `${safeIntegers ? 'bigint' : 'number'}:${sql}`;
  let statement = byText.get(key);
  if (!statement) {
    statement = db.prepare(sql);
    if (safeIntegers) statement.safeIntegers(true);
    byText.set(key, statement);
  }
  return statement;
}
