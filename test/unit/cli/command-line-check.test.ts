import { describe, expect, it } from 'vitest';
import yargs from 'yargs';
import { commandLineError, type CommandLineSpec } from '../../../src/cli/command-line-check.js';
import { COMMANDS } from '../../../src/cli/command-registry.js';
import { exitCodeFor, formatError } from '../../../src/errors/index.js';

const names = COMMANDS.map((c) => c.name);

// The spec exactly as main.ts reads it: the command module's builder run on a yargs instance.
async function specOf(name: string): Promise<CommandLineSpec> {
  const entry = COMMANDS.find((c) => c.name === name)!;
  const module = await entry.load();
  const built = (module.builder as (y: unknown) => unknown)(yargs([])) as {
    getOptions(): { key: Record<string, unknown>; alias: Record<string, string[]>; boolean: string[]; number: string[]; array: string[]; choices: Record<string, unknown[]> };
    getDemandedOptions(): Record<string, unknown>;
  };
  const o = built.getOptions();
  return { usage: entry.command, keys: Object.keys(o.key), aliases: o.alias, booleans: o.boolean, numbers: o.number, arrays: o.array, choices: o.choices, demanded: Object.keys(built.getDemandedOptions()) };
}

const check = async (argv: string[]) => commandLineError(argv, names, argv.find((a) => !a.startsWith('-')), argv.length && names.includes(argv[0]!) ? await specOf(argv[0]!) : undefined);

describe('command-line refusals (what yargs refuses), coded and naming the flag', () => {
  it('lets a good command line through', async () => {
    expect(await check(['count', '--theory', 'cohomology', '--triangle', '01,01,10', '--json', '--no-completed'])).toBeUndefined();
    expect(await check(['run', 'a.json', 'b.json', '--max', 'n=3', 'm=2', '--workers', '2'])).toBeUndefined();
    expect(await check(['--help'])).toBeUndefined();
    expect(await check(['run', 'a.json', '--time-limit', '-1'])).toBeUndefined(); // refused later, by run's own check
    expect(await check(['discover', 'family.json', '--theory', 'cohomology'])).toBeUndefined();
    expect(await check(['replay', 'c.json', '--instance', 'n=2:0'])).toBeUndefined();
  });

  it('refuses with a code, a flag as the path, and exit 2', async () => {
    const cases: [string[], string, string | undefined, string][] = [
      [[], 'missing_command', undefined, 'Command: expected one of '],
      [['rnu', 'a.json'], 'unknown_command', 'rnu', "received 'rnu'"],
      [['count', '--theory', 'cohomology', '--wokers', '2'], 'unknown_option', '--wokers', "Option: expected an option of 'count', received '--wokers'"],
      [['count', '--triangle', '01,01,10'], 'missing_option', '--theory', "Option --theory: expected a value (required by 'count'), received nothing"],
      [['count', '--theory', 'cohomology', '--form', 'q'], 'invalid_choice', '--form', "received 'q'"],
      [['run', 'a.json', '--workers', 'two'], 'invalid_option_value', '--workers', "Option --workers: expected a number, received 'two'"],
      [['run', 'a.json', '--workers', '2', '--workers=1'], 'repeated_option', '--workers', 'Option --workers: expected one value, received 2'],
      [['replay'], 'missing_argument', '<claim>', 'Argument <claim>: expected a value (puzzlesweep replay <claim>), received nothing'],
      [['report', 'a', 'b'], 'unexpected_argument', 'b', "received 'b'"],
    ];
    for (const [argv, code, path, text] of cases) {
      const e = await check(argv);
      expect(e, argv.join(' ')).toBeDefined();
      expect(e!.code).toBe(code);
      expect(e!.path).toBe(path);
      expect(e!.message).toContain(text);
      expect(e!.message).toMatch(/^[^:]+: expected .+, received .+$/);
      expect(formatError(e!)).toContain(`[${code}]`);
      expect(exitCodeFor(e!)).toBe(2);
    }
  });

  it('a repeated array flag is not a repetition', async () => {
    expect(await check(['run', 'a.json', '--max', 'n=3', '--max', 'm=2'])).toBeUndefined();
  });
});
