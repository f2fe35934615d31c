#!/usr/bin/env node
import yargs from 'yargs';
import { hideBin } from 'yargs/helpers';
import { joinDashValues } from './dash-values.js';
import { COMMANDS, invokedCommand } from './command-registry.js';

const argv = joinDashValues(hideBin(process.argv));

// yargs sums a repeated number flag and collects a repeated string flag into an array; a flag that takes
// one value is refused when given twice. Runs once the invoked command has declared its options.
function refuseRepeatedFlags(_args: unknown, y: { getOptions(): { array?: string[] } }): void {
  const repeatable = new Set(y.getOptions().array ?? []);
  const seen = new Map<string, number>();
  for (const token of argv) {
    if (token === '--') break;
    const m = /^--([a-z][a-z0-9-]*)(=|$)/.exec(token);
    if (m && !repeatable.has(m[1]!)) seen.set(m[1]!, (seen.get(m[1]!) ?? 0) + 1);
  }
  for (const [flag, times] of seen) {
    if (times < 2) continue;
    process.stderr.write(`✖ Option --${flag}: expected one value, received ${times}\n  → at --${flag}\n  Hint: give --${flag} once\n  [invalid_argument]\n`);
    process.exit(2);
  }
}

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
  .middleware(refuseRepeatedFlags as never)
  .fail((msg, err) => {
    if (err) throw err;
    process.stderr.write(`✖ ${msg}\n  Hint: run 'puzzlesweep --help'\n  [invalid_argument]\n`);
    process.exit(2);
  })
  .help()
  .parseAsync();
