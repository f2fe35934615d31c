import { hostname } from 'node:os';
import type { CommandModule } from 'yargs';
import { CodedError } from '../../errors/index.js';
import {
  classTallies,
  type ClassTally,
  findClaims,
  freeRun,
  listCounterexamples,
  pendingPartnerCount,
  listLeaseHolders,
  listRuns,
  listVerified,
  openStore,
  partialClasses,
  DEFAULT_STORE_PATH,
  type ClaimRecord,
  type Store,
} from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { openExistingStore } from '../open-existing-store.js';
import { summaryJson } from '../summary-json.js';

interface StatusArgs {
  claim?: string;
  db: string;
  json: boolean;
  'free-run'?: number;
}

const shellQuote = (s: string) => (/^[\w./=:,+-]+$/.test(s) ? s : `'${s.replace(/'/g, `'\\''`)}'`);

// Instance counts of begun classes come from the claim's plan; the claims layer loads only when one is needed.
async function classTotals(c: ClaimRecord, keys: readonly string[]): Promise<Map<string, bigint>> {
  const totals = new Map<string, bigint>();
  if (keys.length === 0) return totals;
  const { compileClaimProgram, planClaim } = await import('../../claims/index.js');
  const plan = planClaim(compileClaimProgram(JSON.parse(c.canonicalJson) as unknown));
  for (const k of keys) {
    try {
      totals.set(k, plan.instanceCount(plan.classForKey(k)));
    } catch {
      // A key the current plan cannot name (older engine): its progress is shown without a total.
    }
  }
  return totals;
}

async function claimStatus(db: Store, c: ClaimRecord, dbArg: string) {
  const counterexamples = listCounterexamples(db, c.fingerprint).filter((x) => x.recheck !== 'holds');
  const last = listRuns(db, c.fingerprint, 1)[0];
  const partial = partialClasses(db, c.fingerprint);
  const totals = await classTotals(c, partial.map((p) => p.classKey));
  const freeHint = (runId: number) => `puzzlesweep status --db ${shellQuote(dbArg)} --free-run ${runId}`;
  return {
    claimId: c.claimId,
    fingerprint: c.fingerprint,
    engineVersion: c.engineVersion,
    file: c.sourceFile ?? null,
    verified: listVerified(db, c.fingerprint).map((v) => ({ classKey: v.classKey, lengths: v.lengths, method: v.method, instances: v.instances.toString(), errorBound: v.errorBound })),
    incomplete: partial.map((p) => ({ classKey: p.classKey, done: p.done.toString(), instances: totals.get(p.classKey)?.toString() ?? null })),
    leases: listLeaseHolders(db, c.fingerprint).map((h) => ({
      runId: h.runId,
      host: h.host,
      pid: h.pid,
      heartbeatAt: h.heartbeatAt,
      chunks: h.chunks,
      instances: h.instances.toString(),
      stuck: h.gone !== undefined,
      why: h.gone ?? null,
      free: h.gone !== undefined ? freeHint(h.runId) : null,
    })),
    counterexamples: counterexamples.length,
    // Counterexamples of an older store whose failing partner T(b) is not yet stored (the next run derives it).
    partnersPending: pendingPartnerCount(db, c.fingerprint),
    // Boundaries over every run: holding (of which with a nonzero value; null when an older store did not count it), failing.
    tallies: totalsOf(classTallies(db, c.fingerprint)),
    smallestCounterexample: counterexamples[0] ? { classKey: counterexamples[0].classKey, index: counterexamples[0].index.toString(), size: counterexamples[0].size } : null,
    lastRun: last ?? null,
  };
}

function totalsOf(t: Map<string, ClassTally>) {
  let [checked, holds, fails, vacuous, nonzero] = [0, 0, 0, 0, 0 as number | null];
  for (const x of t.values()) {
    checked += x.checked;
    holds += x.holds;
    fails += x.fails;
    vacuous += x.vacuous;
    nonzero = nonzero === null || x.nonzero === null ? null : nonzero + x.nonzero;
  }
  return { checked, holds, nonzero, vacuous, fails };
}

function statusText(s: Awaited<ReturnType<typeof claimStatus>>): string {
  const lines = [`${s.claimId}  (fingerprint ${s.fingerprint.slice(0, 12)}, engine ${s.engineVersion}${s.file ? `, ${s.file}` : ''})`];
  const t = s.tallies;
  lines.push(`  boundaries: ${t.checked} checked, ${t.holds} hold (${t.nonzero === null ? 'nonzero not counted by an older store' : `${t.nonzero} nonzero, ${t.vacuous} vacuous: both values 0`}), ${t.fails} fail`);
  lines.push(`  verified classes: ${s.verified.length ? s.verified.map((v) => `${v.classKey} [${v.method}]`).join('; ') : 'none'}`);
  if (s.incomplete.length) {
    lines.push(`  incomplete classes: ${s.incomplete.map((p) => `${p.classKey} (${p.done}${p.instances ? ` of ${p.instances}` : ''} done)`).join('; ')}; run the claim again to finish them`);
  }
  lines.push(`  counterexamples: ${s.counterexamples}${s.smallestCounterexample ? ` (smallest in class ${s.smallestCounterexample.classKey}, index ${s.smallestCounterexample.index})` : ''}`);
  if (s.partnersPending) {
    lines.push(
      `  partners not yet stored: ${s.partnersPending} counterexample${s.partnersPending === 1 ? '' : 's'} of an older store may fail with their partner T(b), which that store counted as holding; run the claim again to derive them`,
    );
  }
  for (const l of s.leases) {
    lines.push(
      l.stuck
        ? `  stuck lease: run ${l.runId} (pid ${l.pid} on ${l.host}, ${l.why}) holds ${l.chunks} chunk${l.chunks === 1 ? '' : 's'}, ${l.instances} instances; the next run frees them, or now: ${l.free}`
        : `  leased: run ${l.runId} (pid ${l.pid} on ${l.host}, alive, heartbeat ${l.heartbeatAt}) is sweeping ${l.chunks} chunk${l.chunks === 1 ? '' : 's'}, ${l.instances} instances`,
    );
  }
  const r = s.lastRun;
  lines.push(r ? `  last run ${r.runId}: ${r.abandoned ? 'running, but its process is gone (killed?); the next run frees its chunks and resumes' : r.status}${r.stopReason && r.stopReason !== 'finished' ? ` (${r.stopReason.replace(/_/g, ' ')})` : ''}, started ${r.startedAt}, ${r.instancesChecked} instances checked` : '  no runs');
  return lines.join('\n');
}

// Frees the leases of a run whose process is gone; a run that looks alive on this host is never freed.
function freeStuckRun(path: string, runId: number): string {
  const db = openStore(path);
  try {
    const holder = listLeaseHolders(db).find((h) => h.runId === runId);
    if (!holder) throw new CodedError('invalid_argument', { what: '--free-run', expected: 'a run holding leased chunks', received: `${runId}` }, { path: '--free-run', hint: "'puzzlesweep status' lists stuck leases" });
    if (holder.gone === undefined && holder.host === hostname()) {
      throw new CodedError('invalid_argument', { what: '--free-run', expected: 'a run whose process is gone', received: `run ${runId} (pid ${holder.pid}, alive)` }, {
        path: '--free-run',
        hint: 'stop that process first (Ctrl-C keeps its finished chunks)',
      });
    }
    const freed = freeRun(db, runId);
    return `freed ${freed} leased chunk${freed === 1 ? '' : 's'} of run ${runId} (${holder.instances} instances); the next run sweeps them`;
  } finally {
    db.close();
  }
}

export const statusCommand: CommandModule<object, StatusArgs> = {
  command: 'status [claim]',
  describe: 'Verified classes, counterexample counts and the last run, per stored claim',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, id or fingerprint (default: every stored claim)' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON array' })
      .option('free-run', { type: 'number', describe: 'free the leased chunks of a run whose process is gone (status lists them)' }) as never,
  handler: (args) =>
    runCommand(args.json, async () => {
      if (args['free-run'] !== undefined) {
        openExistingStore(args.db).close();
        process.stdout.write(`${freeStuckRun(args.db, args['free-run'])}\n`);
        return;
      }
      const db = openExistingStore(args.db);
      try {
        // A claim file is read through the claims layer (zod), loaded only when one is named.
        const claims = args.claim ? (await import('../stored-claims.js')).storedClaims(db, args.claim).claims : findClaims(db);
        const report = [];
        for (const c of claims) report.push(await claimStatus(db, c, args.db));
        if (args.json) process.stdout.write(`${summaryJson(report)}\n`);
        else process.stdout.write(`${report.length ? report.map(statusText).join('\n\n') : `no claims stored in ${args.db}`}\n`);
      } finally {
        db.close();
      }
    }),
};
