#!/usr/bin/env node
import { readFileSync } from 'node:fs';
import { joinDashValues } from './dash-values.js';
import { COMMANDS, invokedCommand } from './command-registry.js';

// process.argv minus node and the script (what yargs' hideBin does for a plain Node process; importing
// yargs/helpers alone cost ~90 ms).
const argv = joinDashValues(process.argv.slice(2));

/** Set to render `--help` with yargs even when the build's copy of it exists (the build sets it to make that copy). */
const RENDER_HELP_ENV = 'PUZZLESWEEP_RENDER_HELP';

/**
 * The top-level help as yargs rendered it at build time (scripts/bundle-cli.mjs writes dist/cli/help.txt), when
 * it applies: yargs wraps at min(80, terminal columns), so the copy serves only 80 columns or more.
 */
function builtHelp(): string | undefined {
  if (argv.length !== 1 || argv[0] !== '--help' || process.env[RENDER_HELP_ENV]) return undefined;
  if ((process.stdout.columns ?? 80) < 80) return undefined;
  try {
    return readFileSync(new URL('./help.txt', import.meta.url), 'utf8');
  } catch {
    return undefined; // run from src/ or an unbundled build: yargs renders it
  }
}

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

async function parse(): Promise<void> {
  const { default: yargs } = await import('yargs');
  const invoked = invokedCommand(argv);
  const cli = yargs(argv).scriptName('puzzlesweep');
  // yargs renders the invoked command's whole help after starting its handler, only to show it should the
  // handler fail; our .fail never shows help, and that rendering (string widths of every line) cost 25–60 ms
  // of every run. yargs is pinned; test/e2e/cli-startup.test.ts checks that help and errors still print.
  (cli as unknown as { getInternalMethods(): { getUsageInstance(): { cacheHelpMessage(): void } } }).getInternalMethods().getUsageInstance().cacheHelpMessage = () => {};
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
}

const help = builtHelp();
if (help !== undefined) process.stdout.write(help);
else await parse();
