import { hostname } from 'node:os';
import type { Store } from './open-store.js';

export type RunStatus = 'running' | 'completed' | 'interrupted' | 'failed';

/** Why a run stopped handing out chunks. */
export type StopReason = 'finished' | 'stop_at_first' | 'max_counterexamples' | 'time_limit' | 'signal' | 'error';

/** A run row as `status` reads it. */
export interface RunRecord {
  readonly runId: number;
  readonly fingerprint: string;
  readonly startedAt: string;
  readonly endedAt: string | null;
  readonly status: RunStatus;
  readonly stopReason: StopReason | null;
  readonly instancesChecked: number;
  readonly holds: number;
  readonly counterexamples: number;
  /** A `running` run whose process is gone (killed); the next run on the store reaps it. */
  readonly abandoned: boolean;
}

// A run on another host counts as dead once its heartbeat is this old (on this host the pid decides).
const STALE_HEARTBEAT_MS = 120_000;

/** Opens a run row for one claim; `options` is stored as JSON for later reading. */
export function startRun(db: Store, fingerprint: string, options: object): number {
  const now = new Date().toISOString();
  const info = db
    .prepare(`INSERT INTO runs (fingerprint, started_at, heartbeat_at, host, pid, options_json, status) VALUES (?, ?, ?, ?, ?, ?, 'running')`)
    .run(fingerprint, now, now, hostname(), process.pid, JSON.stringify(options));
  return Number(info.lastInsertRowid);
}

/** Tells other processes this run is alive. */
export function touchRun(db: Store, runId: number): void {
  db.prepare('UPDATE runs SET heartbeat_at = ? WHERE run_id = ?').run(new Date().toISOString(), runId);
}

/** Closes a run; its counts were kept up to date chunk by chunk. */
export function finishRun(db: Store, runId: number, status: Exclude<RunStatus, 'running'>, stopReason: StopReason, error?: object): void {
  db.prepare('UPDATE runs SET status = ?, stop_reason = ?, ended_at = ?, error_json = ? WHERE run_id = ?').run(
    status,
    stopReason,
    new Date().toISOString(),
    error ? JSON.stringify(error) : null,
    runId,
  );
}

function pidAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

// On this host the pid decides; elsewhere a stale heartbeat does.
function looksDead(r: { host: string; pid: number; heartbeat_at: string }): boolean {
  if (r.host === hostname()) return !pidAlive(r.pid);
  return Date.now() - Date.parse(r.heartbeat_at) > STALE_HEARTBEAT_MS;
}

/** Marks runs whose process is gone (kill -9, power loss) interrupted and frees their leased chunks. */
export function reapDeadRuns(db: Store, ownRuns: ReadonlySet<number> = new Set()): number {
  const here = hostname();
  return db
    .transaction(() => {
      const rows = db.prepare(`SELECT run_id, host, pid, heartbeat_at FROM runs WHERE status = 'running'`).all() as {
        run_id: number;
        host: string;
        pid: number;
        heartbeat_at: string;
      }[];
      const dead = rows.filter((r) => !ownRuns.has(r.run_id) && (r.pid === process.pid && r.host === here ? true : looksDead(r)));
      for (const r of dead) {
        db.prepare(`DELETE FROM chunks WHERE run_id = ? AND state = 'leased'`).run(r.run_id);
        db.prepare(`UPDATE runs SET status = 'interrupted', stop_reason = 'signal', ended_at = heartbeat_at WHERE run_id = ?`).run(r.run_id);
      }
      return dead.length;
    })
    .immediate();
}

/** Runs of one claim, newest first. */
export function listRuns(db: Store, fingerprint: string, limit = 1): RunRecord[] {
  const rows = db.prepare('SELECT * FROM runs WHERE fingerprint = ? ORDER BY run_id DESC LIMIT ?').all(fingerprint, limit) as Record<string, unknown>[];
  return rows.map((r) => ({
    runId: r.run_id as number,
    fingerprint: r.fingerprint as string,
    startedAt: r.started_at as string,
    endedAt: (r.ended_at as string | null) ?? null,
    status: r.status as RunStatus,
    stopReason: (r.stop_reason as StopReason | null) ?? null,
    instancesChecked: r.instances_checked as number,
    holds: r.holds as number,
    counterexamples: r.counterexamples as number,
    abandoned: r.status === 'running' && looksDead(r as { host: string; pid: number; heartbeat_at: string }),
  }));
}
