import type { CommandModule } from 'yargs';
import { CodedError } from '../../errors/index.js';
import { listCounterexamples, DEFAULT_STORE_PATH } from '../../store/index.js';
import { runCommand } from '../run-command.js';
import { openExistingStore, storedClaims } from '../stored-claims.js';
import { summaryJson } from '../sweep-summary-text.js';

interface CounterexamplesArgs {
  claim: string;
  smallest: boolean;
  limit?: number;
  db: string;
  json: boolean;
}

const sidesText = (sides: readonly string[]) => sides.map((s) => s || '-').join(' | ');

export const counterexamplesCommand: CommandModule<object, CounterexamplesArgs> = {
  command: 'counterexamples <claim>',
  describe: 'List the stored counterexamples of a claim in sweep order',
  builder: (y) =>
    y
      .positional('claim', { type: 'string', describe: 'claim file, id or fingerprint' })
      .option('smallest', { type: 'boolean', default: false, describe: 'only those of the smallest side-length class' })
      .option('limit', { type: 'number', describe: 'at most this many' })
      .option('db', { type: 'string', default: DEFAULT_STORE_PATH, describe: 'SQLite store file' })
      .option('json', { type: 'boolean', default: false, describe: 'print one JSON array' }) as never,
  handler: (args) =>
    runCommand(args.json, () => {
      if (args.limit !== undefined && (!Number.isInteger(args.limit) || args.limit < 1)) {
        throw new CodedError('invalid_argument', { what: '--limit', expected: 'a positive integer', received: `${args.limit}` }, { path: '--limit' });
      }
      const db = openExistingStore(args.db);
      try {
        // A claim file names its current version; an id names the newest stored version.
        const claim = storedClaims(db, args.claim).claims[0]!;
        let list = listCounterexamples(db, claim.fingerprint).filter((c) => c.recheck !== 'holds');
        if (args.smallest && list.length) list = list.filter((c) => c.classKey === list[0]!.classKey);
        if (args.limit !== undefined) list = list.slice(0, args.limit);
        if (args.json) {
          process.stdout.write(`${summaryJson(list.map((c) => ({ ...c, index: c.index.toString() })))}\n`);
          return;
        }
        if (!list.length) {
          process.stdout.write(`no counterexamples stored for ${claim.claimId} (${claim.fingerprint.slice(0, 12)})\n`);
          return;
        }
        const lines = list.map((c) =>
          [
            `${c.classKey}:${c.index}  sides ${c.lengths.join(',')} (size ${c.size})${c.permutation ? `  permutation [${c.permutation.join(',')}]` : ''}`,
            `  left  ${c.left.theory}: ${sidesText(c.left.sides)} → ${c.left.text}`,
            `  right ${c.right.theory}: ${sidesText(c.right.sides)} → ${c.right.text}`,
          ].join('\n'),
        );
        process.stdout.write(`${lines.join('\n')}\n`);
      } finally {
        db.close();
      }
    }),
};
