import type { CommandModule } from 'yargs';
import { INCOMPLETE_MERGE_EXIT, mergeStoreFiles } from '../../run/merge-store-files.js';
import type { ClaimMergeReport, MergeReport } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { summaryJson } from '../sweep-summary-text.js';
import { JSON_FORMAT_VERSION } from '../../report/value-json.js';

interface MergeArgs {
  stores: string[];
  into: string;
  json: boolean;
}

const list = (xs: readonly (string | number)[]) => (xs.length ? xs.join(', ') : 'none');

function claimText(c: ClaimMergeReport): string[] {
  const lines = [`${c.claimId} (${c.fingerprint.slice(0, 12)})`];
  const s = c.shards;
  if (s) {
    lines.push(`  shards: ${s.present.length} of ${s.count} present; missing: ${list(s.missing)}; unfinished: ${list(s.unfinished.map((u) => `${u.index} (${u.remaining} instances left, ${u.store})`))}`);
    if (s.repeated.length) lines.push(`  shards found in more than one store: ${s.repeated.map((r) => `${r.index} (${r.stores.join(', ')})`).join('; ')}`);
  }
  lines.push(`  added: ${c.added.chunks} chunks, ${c.added.counterexamples} counterexamples, ${c.added.permutations} permutations`);
  lines.push(`  duplicates kept once: ${c.duplicates.chunks} chunks, ${c.duplicates.counterexamples} counterexamples, ${c.duplicates.permutations} permutations`);
  if (c.overlaps.length) lines.push(`  chunks overlapping another store's (instances counted twice in chunk sums): ${c.overlaps.slice(0, 5).map((o) => `${o.classKey}:${o.start}-${o.end} (${o.store})`).join('; ')}${c.overlaps.length > 5 ? `; … ${c.overlaps.length} in all` : ''}`);
  lines.push(`  now: ${c.verifiedClasses} verified classes${c.newlyVerified.length ? ` (completed by this merge: ${c.newlyVerified.join('; ')})` : ''}, ${c.counterexamples} counterexamples`);
  return lines;
}

function mergeText(r: MergeReport, into: string): string {
  const open = r.claims.flatMap((c) => (c.shards ? [...c.shards.missing, ...c.shards.unfinished.map((u) => u.index)] : []));
  const verdict = r.complete
    ? 'complete: every shard present and finished'
    : `incomplete: shards ${[...new Set(open)].sort((a, b) => a - b).join(', ')} missing or unfinished; run them (they resume), then merge again`;
  return [`merged ${r.sources.length} store(s) into ${into}`, ...r.claims.flatMap(claimText), ...r.otherTables.filter((t) => t.added + t.duplicates > 0).map((t) => `table ${t.table}: ${t.added} rows added, ${t.duplicates} duplicates`), `result: ${verdict}`].join('\n');
}

export const mergeCommand: CommandModule<object, MergeArgs> = {
  command: 'merge <stores..>',
  describe: 'Merge store files (e.g. the shards of a cluster sweep) into one; refuses conflicting results and reports missing shards',
  builder: (y) =>
    y
      .positional('stores', { type: 'string', array: true, describe: 'store files to merge (read only)' })
      .option('into', { type: 'string', demandOption: true, describe: 'store file to merge into (created if absent; merging again is harmless)' })
      .option('json', { type: 'boolean', default: false, describe: 'print the merge report as one JSON object' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      const report = mergeStoreFiles(args.stores, args.into);
      process.stdout.write(`${args.json ? summaryJson({ formatVersion: JSON_FORMAT_VERSION, ...report }) : mergeText(report, args.into)}\n`);
      return report.complete ? 0 : INCOMPLETE_MERGE_EXIT;
    }),
};
