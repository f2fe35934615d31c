import type { Store } from './open-store.js';
import { holderGone, ownIdentity, type HolderRow } from './process-identity.js';

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

/** Opens a run row for one claim; `options` is stored as JSON for later reading. */
export function startRun(db: Store, fingerprint: string, options: object): number {
  const now = new Date().toISOString();
  const me = ownIdentity();
  const info = db
    .prepare(`INSERT INTO runs (fingerprint, started_at, heartbeat_at, host, pid, process_start, options_json, status) VALUES (?, ?, ?, ?, ?, ?, ?, 'running')`)
    .run(fingerprint, now, now, me.host, me.pid, me.startToken ?? null, JSON.stringify(options));
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

// A run of this very process that the caller does not own is a leftover of an earlier process with our pid.
function looksDead(r: HolderRow): boolean {
  const me = ownIdentity();
  if (r.host === me.host && r.pid === me.pid) return !(r.process_start && me.startToken && r.process_start === me.startToken) || false;
  return holderGone(r) !== undefined;
}

/** Marks runs whose process is gone (kill -9, power loss, pid reused) interrupted and frees their leased chunks. */
export function reapDeadRuns(db: Store, ownRuns: ReadonlySet<number> = new Set()): number {
  const me = ownIdentity();
  return db
    .transaction(() => {
      const rows = db.prepare(`SELECT run_id, host, pid, process_start, heartbeat_at FROM runs WHERE status = 'running'`).all() as (HolderRow & { run_id: number })[];
      const dead = rows.filter((r) => !ownRuns.has(r.run_id) && (r.pid === me.pid && r.host === me.host && r.process_start === (me.startToken ?? null) ? true : looksDead(r)));
      for (const r of dead) freeRun(db, r.run_id);
      return dead.length;
    })
    .immediate();
}

/** Frees a run's leased chunks and marks it interrupted (its finished chunks stay). */
export function freeRun(db: Store, runId: number): number {
  return db.transaction(() => {
    const freed = db.prepare(`DELETE FROM chunks WHERE run_id = ? AND state = 'leased'`).run(runId).changes;
    db.prepare(`UPDATE runs SET status = 'interrupted', stop_reason = 'signal', ended_at = heartbeat_at WHERE run_id = ? AND status = 'running'`).run(runId);
    return freed;
  })();
}

/** Runs holding leased chunks, with what they hold and whether their process is gone. */
export interface LeaseHolder {
  readonly runId: number;
  readonly fingerprint: string;
  readonly host: string;
  readonly pid: number;
  readonly heartbeatAt: string;
  readonly chunks: number;
  readonly instances: bigint;
  /** Why the holder is considered gone; undefined while it looks alive. */
  readonly gone: 'no process' | 'pid reused' | 'heartbeat expired' | 'run ended' | undefined;
}

/** Every run that holds leased chunks (of one claim, or of all). */
export function listLeaseHolders(db: Store, fingerprint?: string): LeaseHolder[] {
  const rows = db
    .prepare(
      `SELECT r.run_id, r.fingerprint, r.host, r.pid, r.process_start, r.heartbeat_at, r.status, COUNT(*) AS chunks, SUM(c.end_index - c.start_index) AS instances
       FROM chunks c JOIN runs r USING (run_id) WHERE c.state = 'leased' ${fingerprint ? 'AND c.fingerprint = ?' : ''} GROUP BY r.run_id ORDER BY r.run_id`,
    )
    .safeIntegers(true)
    .all(...(fingerprint ? [fingerprint] : [])) as Record<string, unknown>[];
  return rows.map((r) => {
    const holder = { host: r.host as string, pid: Number(r.pid), process_start: r.process_start as string | null, heartbeat_at: r.heartbeat_at as string };
    return {
      runId: Number(r.run_id),
      fingerprint: r.fingerprint as string,
      host: holder.host,
      pid: holder.pid,
      heartbeatAt: holder.heartbeat_at,
      chunks: Number(r.chunks),
      instances: r.instances as bigint,
      gone: r.status !== 'running' ? 'run ended' : holderGone(holder),
    };
  });
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
    abandoned: r.status === 'running' && looksDead(r as unknown as HolderRow),
  }));
}
