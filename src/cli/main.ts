#!/usr/bin/env node
import yargs from 'yargs';
import { hideBin } from 'yargs/helpers';
import { joinDashValues } from './dash-values.js';
import { COMMANDS, invokedCommand } from './command-registry.js';

const argv = joinDashValues(hideBin(process.argv));
const invoked = invokedCommand(argv);
const cli = yargs(argv).scriptName('puzzlesweep');
// The invoked command is loaded in full; every other one is listed by name and description only.
for (const c of COMMANDS) {
  if (c.name === invoked) cli.command(await c.load());
  else cli.command(c.command, c.describe, () => {}, () => {});
}
await cli
  .demandCommand(1, 'Command: expected one of the commands listed above, received none')
  .strict()
  .fail((msg, err) => {
    if (err) throw err;
    process.stderr.write(`✖ ${msg}\n  Hint: run 'puzzlesweep --help'\n  [invalid_argument]\n`);
    process.exit(2);
  })
  .help()
  .parseAsync();
