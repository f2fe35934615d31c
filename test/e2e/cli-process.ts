import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import Database from 'better-sqlite3';

/** The built CLI (npm test builds it first). */
export const CLI = 'dist/cli/main.js';

/** Runs the CLI to completion. */
export function cli(args: string[], env: Record<string, string> = {}): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [CLI, ...args], { encoding: 'utf8', env: { ...process.env, ...env } });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** Starts the CLI without waiting. */
export function cliAsync(args: string[], env: Record<string, string> = {}) {
  return spawn(process.execPath, [CLI, ...args], { env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
}

/** Hash of a store file and of its write-ahead log (if any): equal hashes mean an untouched store. */
export function storeFingerprint(path: string): string {
  const hash = createHash('sha256').update(readFileSync(path));
  if (existsSync(`${path}-wal`)) hash.update(readFileSync(`${path}-wal`));
  return hash.digest('hex');
}

/** Rows of a query on a store, opened read-only. */
export function query<T>(path: string, sql: string): T[] {
  const db = new Database(path, { readonly: true });
  try {
    return db.prepare(sql).all() as T[];
  } finally {
    db.close();
  }
}
