import { spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root (benchmarks run their processes from there). */
export const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** One whole process as /usr/bin/time saw it: wall seconds, user + system CPU of every thread, peak resident memory. */
export interface TimedRun {
  readonly wall: number;
  readonly cpu: number;
  readonly rssMB: number;
  readonly out: string;
  readonly status: number | null;
  /** Stopped by the time limit (or a signal) before it finished. */
  readonly stopped: boolean;
}

/** Runs `cmd` from the repository root under /usr/bin/time, stopped after `limit` seconds of wall time. */
export function timed(cmd: string[], limit = 600, env: Record<string, string> = {}): TimedRun {
  const r = spawnSync('/usr/bin/time', ['-f', 'TIME %e %U %S %M', 'timeout', String(limit), ...cmd], { encoding: 'utf8', maxBuffer: 1 << 28, cwd: root, env: { ...process.env, ...env } });
  const line = (r.stderr.split('\n').find((l) => l.startsWith('TIME ')) ?? 'TIME 0 0 0 0').split(' ');
  const [wall, user, sys, kb] = line.slice(1).map(Number) as [number, number, number, number];
  return { wall, cpu: user + sys, rssMB: Math.round(kb / 1024), out: r.stdout, status: r.status, stopped: r.status === 124 || r.status === null };
}
