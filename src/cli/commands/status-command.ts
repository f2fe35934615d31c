import type { CommandModule } from 'yargs';
import { findClaims, listCounterexamples, listRuns, listVerified, DEFAULT_STORE_PATH, type ClaimRecord, type Store } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { openExistingStore, storedClaims } from '../stored-claims.js';
import { summaryJson } from '../sweep-summary-text.js';

interface StatusArgs {
  claim?: string;
  db: string;
  json: boolean;
}

function claimStatus(db: Store, c: ClaimRecord) {
  const counterexamples = listCounterexamples(db, c.fingerprint).filter((x) => x.recheck !== 'holds');
  const last = listRuns(db, c.fingerprint, 1)[0];
  return {
    claimId: c.claimId,
    fingerprint: c.fingerprint,
    engineVersion: c.engineVersion,
    file: c.sourceFile ?? null,
    verified: listVerified(db, c.fingerprint).map((v) => ({ classKey: v.classKey, lengths: v.lengths, method: v.method, instances: v.instances.toString(), errorBound: v.errorBound })),
    counterexamples: counterexamples.length,
    smallestCounterexample: counterexamples[0] ? { classKey: counterexamples[0].classKey, index: counterexamples[0].index.toString(), size: counterexamples[0].size } : null,
    lastRun: last ?? null,
  };
}

function statusText(s: ReturnType<typeof claimStatus>): string {
  const lines = [`${s.claimId}  (fingerprint ${s.fingerprint.slice(0, 12)}, engine ${s.engineVersion}${s.file ? `, ${s.file}` : ''})`];
  lines.push(`  verified classes: ${s.verified.length ? s.verified.map((v) => `${v.classKey} [${v.method}]`).join('; ') : 'none'}`);
  lines.push(`  counterexamples: ${s.counterexamples}${s.smallestCounterexample ? ` (smallest in class ${s.smallestCounterexample.classKey}, index ${s.smallestCounterexample.index})` : ''}`);
  const r = s.lastRun;
  lines.push(r ? `  last run ${r.runId}: ${r.abandoned ? 'running, but its process is gone (killed?); the next run frees its chunks and resumes' : r.status}${r.stopReason && r.stopReason !== 'finished' ? ` (${r.stopReason.replace(/_/g, ' ')})` : ''}, started ${r.startedAt}, ${r.instancesChecked} instances checked` : '  no runs');
  return lines.join('\n');
}

export const statusCommand: CommandModule<object, StatusArgs> = {
  command: 'status [claim]',
  describe: 'Verified classes, counterexample counts and the last run, per stored claim',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, id or fingerprint (default: every stored claim)' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON array' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const db = openExistingStore(args.db);
      try {
        const claims = args.claim ? storedClaims(db, args.claim).claims : findClaims(db);
        const report = claims.map((c) => claimStatus(db, c));
        if (args.json) process.stdout.write(`${summaryJson(report)}\n`);
        else process.stdout.write(`${report.length ? report.map(statusText).join('\n\n') : `no claims stored in ${args.db}`}\n`);
      } finally {
        db.close();
      }
    }),
};
