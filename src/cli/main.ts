#!/usr/bin/env node
import { readFileSync } from 'node:fs';
import type { Argv } from 'yargs';
import { joinDashValues } from './dash-values.js';
import { COMMANDS, invokedCommand } from './command-registry.js';
import { commandLineError, type CommandLineSpec } from './command-line-check.js';
import { reportError } from './run-command.js';
import { CodedError } from '../errors/index.js';

// process.argv minus node and the script (what yargs' hideBin does for a plain Node process; importing
// yargs/helpers alone cost ~90 ms).
const argv = joinDashValues(process.argv.slice(2));
const json = argv.includes('--json');
const asksHelp = argv.includes('--help') || argv.includes('-h') || argv.includes('--version');

interface DeclaredOptions {
  getOptions(): { key: Record<string, unknown>; alias: Record<string, string[]>; boolean: string[]; number: string[]; array: string[]; choices: Record<string, unknown[]> };
  getDemandedOptions(): Record<string, unknown>;
}

const names = COMMANDS.map((c) => c.name);
const invoked = invokedCommand(argv);
// Filled once the invoked command's builder has declared its options, before yargs validates anything.
let spec: CommandLineSpec | undefined;

function refuse(e: CodedError): never {
  process.exit(reportError(e, json));
}

// Our own check of the declared options runs before yargs' validation, so a refusal carries a catalogue
// code and names the flag, whatever yargs' wording; yargs' checks stay as a backstop, coded too (`fail`).
function checkCommandLine(): void {
  const e = commandLineError(argv, names, invoked, spec);
  if (e) refuse(e);
}

// yargs looks for package.json above its own module, which in the bundle is dist/cli/ (it then falls back to
// the working directory); the version is read from this package's own file (dist/cli/ or src/cli/ → root).
function packageVersion(): string {
  try {
    return (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;
  } catch {
    return 'unknown';
  }
}

async function parse(): Promise<void> {
  if ((invoked === undefined || !names.includes(invoked)) && !asksHelp) checkCommandLine();
  const { default: yargs } = await import('yargs');
  // English whatever LANG says, like every message of ours (and the bundle carries no yargs locale files).
  const cli = yargs(argv).scriptName('puzzlesweep').locale('en');
  // yargs renders the invoked command's whole help after starting its handler, only to show it should the
  // handler fail; our .fail never shows help, and that rendering (string widths of every line) cost 25–60 ms
  // of every run. yargs is pinned; test/e2e/cli-startup.test.ts checks that help and errors still print.
  (cli as unknown as { getInternalMethods(): { getUsageInstance(): { cacheHelpMessage(): void } } }).getInternalMethods().getUsageInstance().cacheHelpMessage = () => {};
  // The invoked command is loaded in full; every other one is listed by name and description only.
  for (const c of COMMANDS) {
    if (c.name !== invoked) {
      cli.command(c.command, c.describe, () => {}, () => {});
      continue;
    }
    const module = await c.load();
    const builder = module.builder;
    cli.command({
      ...module,
      builder: (y: Argv) => {
        const built = (typeof builder === 'function' ? builder(y as never) : y.options(builder ?? {})) as unknown as DeclaredOptions;
        const o = built.getOptions();
        spec = {
          usage: c.command,
          keys: Object.keys(o.key),
          aliases: o.alias,
          booleans: o.boolean,
          numbers: o.number,
          arrays: o.array,
          choices: o.choices,
          demanded: Object.keys(built.getDemandedOptions()),
        };
        if (!asksHelp) checkCommandLine();
        return built as never;
      },
    } as never);
  }
  await cli
    .demandCommand(1)
    .strict()
    .fail((msg, err) => {
      if (err) throw err;
      // yargs refused something our check let through: its own words become the `received` part.
      refuse(commandLineError(argv, names, invoked, spec) ?? new CodedError('invalid_command_line', { what: 'Command line', expected: "arguments the command takes (see 'puzzlesweep --help')", received: msg }));
    })
    .version(packageVersion())
    .help()
    .parseAsync();
}

// Not a top-level await: the build bundles this entry as a CommonJS script (src/build/bundle-cli.mjs). A rejection
// is unhandled, which Node reports and exits 1 on, as it did for a rejected top-level await.
void parse();
