// The one catalogue of error codes. A leaf module: it imports nothing, so the engine, the references, the
// claims layer, runs, the store and the CLI all raise errors from the same list.

/** The three parts every message is made of: `<What>: expected X, received Y`. */
export interface ErrorParts {
  readonly what: string;
  readonly expected: string;
  readonly received: string;
}

/** What an error means for the exit status: bad input 2, internal 3, incomplete work 4, interrupted 130. */
export type ErrorKind = 'input' | 'internal' | 'incomplete' | 'interrupted';

export const EXIT_STATUS: Readonly<Record<ErrorKind, number>> = { input: 2, internal: 3, incomplete: 4, interrupted: 130 };

interface CodeSpec<P> {
  readonly kind: ErrorKind;
  /** One line for the README's list of codes. */
  readonly means: string;
  /** Builds the message parts from the code's typed parameters. */
  readonly parts: (p: P) => ErrorParts;
  /** A hint the code always carries unless the raiser gives a more specific one. */
  readonly hint?: (p: P) => string;
}

const quoted = (s: string) => `'${s}'`;
const oneOf = (choices: readonly string[]) => (choices.length ? `one of ${choices.map(quoted).join(' | ')}` : 'none (there are no choices)');
const flagText = (name: string) => (name.startsWith('-') ? name : name.length === 1 ? `-${name}` : `--${name}`);

// Most codes take the three parts directly; the codes below them take their own parameters and state
// the sentence once, so every raiser of that code reads alike.
const free = (kind: ErrorKind, means: string): CodeSpec<ErrorParts> => ({ kind, means, parts: (p) => p });

export const ERROR_CATALOGUE = {
  // Bad input (exit 2): the message names the field, the path locates it, the hint says the fix.
  invalid_argument: free('input', 'a command-line value or library argument is malformed'),
  invalid_region: free('input', 'side lengths that do not make a lattice hexagon'),
  invalid_boundary: free('input', 'a boundary labeling that does not fit the region or the labels'),
  invalid_piece_set: free('input', 'a custom piece set that is malformed or inconsistent'),
  invalid_piece: free('input', 'a piece given to a reference computation is malformed'),
  invalid_string: free('input', 'a 0/1 string or partition that does not index a Schubert class'),
  invalid_weight_formula: free('input', 'a weight formula that does not parse or cannot be evaluated in the value ring'),
  division_by_zero: free('input', 'a weight formula divides by zero on some piece'),
  invalid_claim: free('input', 'a claim file that is malformed or inconsistent'),
  claim_not_found: free('input', 'no stored claim matches the id or fingerprint given'),
  store_corrupt: free('input', 'the --db file is not a readable SQLite database'),
  store_foreign: free('input', 'the --db file is not a puzzlesweep store'),
  store_read_only: free('input', 'the --db file or its folder is not writable'),
  store_unavailable: free('input', 'SQLite cannot open or write the --db file'),
  family_too_large: free('input', 'a family or bound so large that it is refused before any work'),
  fingerprint_mismatch: free('input', 'stores or shards of different claims'),
  shard_mismatch: free('input', 'shards of different partitions or bounds'),
  merge_conflict: free('input', 'stores that disagree about the same instances'),
  unknown_theory: {
    kind: 'input',
    means: 'a theory that is neither built in nor a piece-set file',
    parts: (p: { readonly received: string; readonly choices: readonly string[]; readonly orFile?: boolean }) => ({
      what: 'Theory',
      expected: `${oneOf(p.choices)}${p.orFile ? ' or a piece-set file' : ''}`,
      received: quoted(p.received),
    }),
  } satisfies CodeSpec<{ received: string; choices: readonly string[]; orFile?: boolean }>,
  file_not_found: {
    kind: 'input',
    means: 'a file that cannot be read',
    parts: (p: { readonly what: string; readonly file: string; readonly expected?: string }) => ({ what: p.what, expected: p.expected ?? 'a readable file', received: quoted(p.file) }),
    hint: () => 'check the path',
  } satisfies CodeSpec<{ what: string; file: string; expected?: string }>,
  invalid_json: {
    kind: 'input',
    means: 'a file that is not valid JSON',
    parts: (p: { readonly what: string; readonly token: string; readonly received: string }) => ({ what: p.what, expected: `valid JSON (${p.token} at that point)`, received: p.received }),
  } satisfies CodeSpec<{ what: string; token: string; received: string }>,

  // The command line itself (yargs' own checks come out as these): the path is the flag.
  missing_command: {
    kind: 'input',
    means: 'no command given',
    parts: (p: { readonly commands: readonly string[] }) => ({ what: 'Command', expected: oneOf(p.commands), received: 'none' }),
    hint: () => "run 'puzzlesweep --help'",
  } satisfies CodeSpec<{ commands: readonly string[] }>,
  unknown_command: {
    kind: 'input',
    means: 'a command that does not exist',
    parts: (p: { readonly received: string; readonly commands: readonly string[] }) => ({ what: 'Command', expected: oneOf(p.commands), received: quoted(p.received) }),
    hint: () => "run 'puzzlesweep --help'",
  } satisfies CodeSpec<{ received: string; commands: readonly string[] }>,
  unknown_option: {
    kind: 'input',
    means: 'a flag the command does not take',
    parts: (p: { readonly flag: string; readonly command: string }) => ({ what: 'Option', expected: `an option of '${p.command}'`, received: quoted(flagText(p.flag)) }),
    hint: (p) => `run 'puzzlesweep ${p.command} --help' for its options`,
  } satisfies CodeSpec<{ flag: string; command: string }>,
  unexpected_argument: {
    kind: 'input',
    means: 'a word the command does not take',
    parts: (p: { readonly received: string; readonly command: string }) => ({ what: 'Argument', expected: `no further arguments to '${p.command}'`, received: quoted(p.received) }),
    hint: () => 'values go after their flag, e.g. --theory equivariant',
  } satisfies CodeSpec<{ received: string; command: string }>,
  missing_argument: {
    kind: 'input',
    means: 'a required positional argument is missing',
    parts: (p: { readonly name: string; readonly usage: string }) => ({ what: `Argument <${p.name}>`, expected: `a value (puzzlesweep ${p.usage})`, received: 'nothing' }),
  } satisfies CodeSpec<{ name: string; usage: string }>,
  missing_option: {
    kind: 'input',
    means: 'a required flag or argument is missing',
    parts: (p: { readonly flag: string; readonly command: string }) => ({ what: `Option ${flagText(p.flag)}`, expected: `a value (required by '${p.command}')`, received: 'nothing' }),
    hint: (p) => `run 'puzzlesweep ${p.command} --help' for its options`,
  } satisfies CodeSpec<{ flag: string; command: string }>,
  invalid_choice: {
    kind: 'input',
    means: 'a flag value outside its list of choices',
    parts: (p: { readonly flag: string; readonly choices: readonly string[]; readonly received: string }) => ({ what: `Option ${flagText(p.flag)}`, expected: oneOf(p.choices), received: quoted(p.received) }),
  } satisfies CodeSpec<{ flag: string; choices: readonly string[]; received: string }>,
  invalid_option_value: {
    kind: 'input',
    means: 'a flag value of the wrong type',
    parts: (p: { readonly flag: string; readonly type: string; readonly received: string }) => ({ what: `Option ${flagText(p.flag)}`, expected: p.type, received: p.received }),
  } satisfies CodeSpec<{ flag: string; type: string; received: string }>,
  repeated_option: {
    kind: 'input',
    means: 'a one-value flag given more than once',
    parts: (p: { readonly flag: string; readonly times: number }) => ({ what: `Option ${flagText(p.flag)}`, expected: 'one value', received: String(p.times) }),
    hint: (p) => `give ${flagText(p.flag)} once`,
  } satisfies CodeSpec<{ flag: string; times: number }>,
  invalid_command_line: free('input', "a command line yargs refuses for a reason not listed above (its own words are the 'received')"),

  // Internal (exit 3): a limit of this machine or a bug; the hint says how to go on.
  overflow: free('internal', 'an exact integer left the range the computation supports'),
  limit_exceeded: free('internal', 'a count stopped at its memory limit'),
  inexact_division: free('internal', 'an exact division in a reference computation left a remainder'),
  store_error: free('internal', 'the store failed in a way not listed above'),
  worker_crashed: free('internal', 'a worker died repeatedly on the same chunk'),
  internal_error: free('internal', 'a bug: an error nobody coded'),

  // Interrupted (exit 130): Ctrl-C or SIGTERM; finished work is kept.
  interrupted: free('interrupted', 'stopped by a signal; finished work is stored'),
} as const;

export type ErrorCode = keyof typeof ERROR_CATALOGUE;

/** The typed parameters of a code: the three parts, or the code's own fields. */
export type ErrorParams<C extends ErrorCode> = Parameters<(typeof ERROR_CATALOGUE)[C]['parts']>[0];

/** Codes whose parameters are the three parts themselves. */
export type FreeCode = { [C in ErrorCode]: ErrorParts extends ErrorParams<C> ? C : never }[ErrorCode];

export function errorKind(code: ErrorCode): ErrorKind {
  return ERROR_CATALOGUE[code].kind;
}

export function isErrorCode(code: unknown): code is ErrorCode {
  return typeof code === 'string' && Object.hasOwn(ERROR_CATALOGUE, code);
}

/** The parts and default hint of a code for its parameters. */
export function errorParts<C extends ErrorCode>(code: C, params: ErrorParams<C>): { parts: ErrorParts; hint: string | undefined } {
  const spec = ERROR_CATALOGUE[code] as unknown as CodeSpec<ErrorParams<C>>;
  return { parts: spec.parts(params), hint: spec.hint?.(params) };
}
