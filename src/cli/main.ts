#!/usr/bin/env node
import yargs from 'yargs';
import { hideBin } from 'yargs/helpers';
import { joinDashValues } from './dash-values.js';
import { countCommand } from './commands/count-command.js';
import { crosscheckCommand } from './commands/crosscheck-command.js';
import { showCommand } from './commands/show-command.js';
import { runClaimsCommand } from './commands/run-claims-command.js';
import { statusCommand } from './commands/status-command.js';
import { counterexamplesCommand } from './commands/counterexamples-command.js';
import { replayCommand } from './commands/replay-command.js';
import { schemaCommand } from './commands/schema-command.js';
import { demoCommand } from './commands/demo-command.js';
import { reportCommand } from './commands/report-command.js';
import { discoverCommand } from './commands/discover-command.js';
import { mergeCommand } from './commands/merge-command.js';
import { clusterScriptCommand } from './commands/cluster-script-command.js';
import { expandCommand } from './commands/expand-command.js';
import { tableCommand } from './commands/table-command.js';

await yargs(joinDashValues(hideBin(process.argv)))
  .scriptName('puzzlesweep')
  .command(countCommand)
  .command(expandCommand)
  .command(tableCommand)
  .command(showCommand)
  .command(runClaimsCommand)
  .command(statusCommand)
  .command(counterexamplesCommand)
  .command(replayCommand)
  .command(schemaCommand)
  .command(demoCommand)
  .command(crosscheckCommand)
  .command(reportCommand)
  .command(discoverCommand)
  .command(mergeCommand)
  .command(clusterScriptCommand)
  .demandCommand(1, 'Command: expected one of the commands listed above, received none')
  .strict()
  .fail((msg, err) => {
    if (err) throw err;
    process.stderr.write(`✖ ${msg}\n  Hint: run 'puzzlesweep --help'\n  [invalid_argument]\n`);
    process.exit(2);
  })
  .help()
  .parseAsync();
