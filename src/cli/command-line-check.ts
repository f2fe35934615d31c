import { CodedError } from '../errors/index.js';

/** What the invoked command declares to yargs, read from yargs once its builder has run. */
export interface CommandLineSpec {
  /** The yargs command string, e.g. `run <claims..>`. */
  readonly usage: string;
  readonly keys: readonly string[];
  readonly aliases: Readonly<Record<string, readonly string[]>>;
  readonly booleans: readonly string[];
  readonly numbers: readonly string[];
  readonly arrays: readonly string[];
  readonly choices: Readonly<Record<string, readonly unknown[]>>;
  readonly demanded: readonly string[];
}

const camel = (s: string) => s.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
const kebab = (s: string) => s.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

// A negative number is a value, as yargs reads it.
const isFlag = (t: string) => t.startsWith('-') && t !== '-' && !/^-\d/.test(t);

function positionals(usage: string): { name: string; required: boolean; variadic: boolean }[] {
  return [...usage.matchAll(/([<[])([^>\]]+?)(\.\.)?[>\]]/g)].map((m) => ({ name: m[2]!, required: m[1] === '<', variadic: m[3] !== undefined }));
}

/**
 * The first thing wrong with a command line, as a coded error naming the flag; undefined when it is fine.
 * The same checks as yargs' own (strict options, choices, required options and arguments), decided from the
 * command's declared options so that no refusal depends on the wording of yargs' messages; it also refuses
 * a one-value flag given twice (yargs would sum or collect them) and a number flag given a non-number.
 */
export function commandLineError(tokens: readonly string[], commands: readonly string[], command: string | undefined, spec: CommandLineSpec | undefined): CodedError | undefined {
  const dash = tokens.indexOf('--');
  const before = dash < 0 ? tokens : tokens.slice(0, dash);
  if (command === undefined) {
    if (before.some((t) => t === '--help' || t === '-h' || t === '--version')) return undefined;
    return new CodedError('missing_command', { commands });
  }
  if (!commands.includes(command)) return new CodedError('unknown_command', { received: command, commands }, { path: command });
  if (!spec) return undefined;
  const main = new Map<string, string>();
  for (const k of spec.keys) main.set(k, k);
  for (const [k, as] of Object.entries(spec.aliases)) for (const a of as) main.set(a, k);
  const canonical = (name: string) => main.get(name) ?? main.get(camel(name)) ?? main.get(kebab(name));
  const seen = new Map<string, number>();
  const words: string[] = [];
  for (let i = 0; i < before.length; i++) {
    const t = before[i]!;
    if (!isFlag(t)) {
      words.push(t);
      continue;
    }
    const m = /^--?([^=]+)(?:=([\s\S]*))?$/.exec(t)!;
    let name = m[1]!;
    let key = canonical(name);
    if (key === undefined && name.startsWith('no-') && spec.booleans.includes(canonical(name.slice(3)) ?? '')) key = canonical((name = name.slice(3)));
    if (key === undefined) return new CodedError('unknown_option', { flag: name, command: spec.usage.split(' ')[0]! }, { path: t.startsWith('--') ? `--${name}` : `-${name}` });
    const flag = `--${kebab(key)}`;
    seen.set(key, (seen.get(key) ?? 0) + 1);
    if (seen.get(key)! > 1 && !spec.arrays.includes(key)) return new CodedError('repeated_option', { flag, times: before.filter((x) => canonical(/^--?([^=]+)/.exec(x)?.[1] ?? '') === key).length }, { path: flag });
    if (spec.booleans.includes(key)) continue;
    const values: string[] = [];
    if (m[2] !== undefined) values.push(m[2]);
    else if (spec.arrays.includes(key)) while (i + 1 < before.length && !isFlag(before[i + 1]!)) values.push(before[++i]!);
    else if (i + 1 < before.length && !before[i + 1]!.startsWith('--')) values.push(before[++i]!);
    for (const v of values) {
      if (spec.numbers.includes(key) && (v.trim() === '' || !Number.isFinite(Number(v)))) return new CodedError('invalid_option_value', { flag, type: 'a number', received: `'${v}'` }, { path: flag });
      const choices = spec.choices[key];
      if (choices && !choices.map(String).includes(v)) return new CodedError('invalid_choice', { flag, choices: choices.map(String), received: v }, { path: flag });
    }
  }
  if (dash >= 0) words.push(...tokens.slice(dash + 1));
  // The first word is the command itself.
  const given = words.slice(1);
  const wanted = positionals(spec.usage);
  const required = wanted.filter((p) => p.required);
  if (given.length < required.length) {
    const missing = required[given.length]!;
    return new CodedError('missing_argument', { name: missing.name, usage: spec.usage }, { path: `<${missing.name}>` });
  }
  if (!wanted.some((p) => p.variadic) && given.length > wanted.length) {
    return new CodedError('unexpected_argument', { received: given[wanted.length]!, command: spec.usage.split(' ')[0]! }, { path: given[wanted.length]! });
  }
  // yargs lists required positionals among the demanded options too; they were counted above.
  const named = new Set(wanted.map((p) => p.name));
  for (const key of spec.demanded) if (!seen.has(key) && !named.has(key)) return new CodedError('missing_option', { flag: kebab(key), command: spec.usage.split(' ')[0]! }, { path: `--${kebab(key)}` });
  return undefined;
}
