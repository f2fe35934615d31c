import { readFileSync } from 'node:fs';
import { hostname } from 'node:os';

/**
 * Which process holds a run: host, pid and a start token. The token (Linux: boot id and the process's
 * start time in clock ticks) tells a live holder from a new process that was given the same pid.
 */
export interface ProcessIdentity {
  readonly host: string;
  readonly pid: number;
  /** Undefined where /proc is not available; the heartbeat then decides. */
  readonly startToken: string | undefined;
}

function bootId(): string | undefined {
  try {
    return readFileSync('/proc/sys/kernel/random/boot_id', 'utf8').trim();
  } catch {
    return undefined;
  }
}

/** The start token of a process on this host, or undefined when it does not exist (or /proc is absent). */
export function startTokenOf(pid: number): string | undefined {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    // Fields after the parenthesised command name start with field 3 (state); the start time is field 22.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    const boot = bootId();
    return boot ? `${boot}:${fields[19]}` : fields[19];
  } catch {
    return undefined;
  }
}

let own: ProcessIdentity | undefined;

/** This process. */
export function ownIdentity(): ProcessIdentity {
  own ??= { host: hostname(), pid: process.pid, startToken: startTokenOf(process.pid) };
  return own;
}

function pidAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** A run's holder as stored, with its last heartbeat (ISO time). */
export interface HolderRow {
  readonly host: string;
  readonly pid: number;
  readonly process_start?: string | null;
  readonly heartbeat_at: string;
}

/** A run counts as abandoned once its heartbeat is this old, wherever it ran (a live run beats every few seconds). */
export const HEARTBEAT_EXPIRY_MS = 60_000;

/** Why a holder is considered gone, or undefined when it looks alive. */
export function holderGone(r: HolderRow, now = Date.now()): 'no process' | 'pid reused' | 'heartbeat expired' | undefined {
  const stale = now - Date.parse(r.heartbeat_at) > HEARTBEAT_EXPIRY_MS;
  if (r.host !== hostname()) return stale ? 'heartbeat expired' : undefined;
  if (!pidAlive(r.pid)) return 'no process';
  if (r.process_start) {
    const token = startTokenOf(r.pid);
    if (token !== undefined && token !== r.process_start) return 'pid reused';
    if (token !== undefined) return undefined;
  }
  return stale ? 'heartbeat expired' : undefined;
}
