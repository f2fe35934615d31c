import { CodedError, errorJson, exitCodeFor, formatError, toCodedError } from '../errors/index.js';

// The layers below name the field of a command-line value (`max`, `sides[2]`); at this edge the field
// becomes the flag the user typed. A path inside a file (`file` set) is a JSON path and stays.
const FIELD_FLAGS: Readonly<Record<string, string>> = {
  max: '--max',
  instance: '--instance',
  theory: '--theory',
  statistic: '--statistic',
  sides: '--sides',
  triangle: '--triangle',
};

/** The flag a field names, keeping an index: `sides[2]` → `--sides[2]`; undefined for any other path. */
export function flagOfField(path: string | undefined): string | undefined {
  if (path === undefined) return undefined;
  const m = /^([A-Za-z]+)(\[\d+\])?$/.exec(path);
  const flag = m ? FIELD_FLAGS[m[1]!] : undefined;
  return flag ? flag + (m![2] ?? '') : undefined;
}

/** An error of the value given to `flag`: a side index the engine names is kept (`--sides[2]`). */
export function underFlag(e: unknown, flag: string): CodedError {
  const err = toCodedError(e);
  const index = err.path?.startsWith('sides[') ? err.path.slice('sides'.length) : '';
  return err.relocated({ path: flag + index });
}

function atFlag(e: CodedError): CodedError {
  const flag = e.file === undefined ? flagOfField(e.path) : undefined;
  return flag ? e.relocated({ path: flag }) : e;
}

/** Prints a coded error at the edge (JSON too with --json) and returns its exit status. */
export function reportError(e: unknown, json: boolean | undefined): number {
  const err = atFlag(toCodedError(e));
  if (json) process.stdout.write(`${JSON.stringify(errorJson(err))}\n`);
  process.stderr.write(`${formatError(err)}\n`);
  if (err.code === 'internal_error' && err.cause instanceof Error && process.env.PUZZLESWEEP_DEBUG) process.stderr.write(`${err.cause.stack}\n`);
  return exitCodeFor(err);
}

/** Runs a command body; coded errors are printed at this edge and become the exit status. */
export async function runCommand(json: boolean | undefined, body: () => Promise<number | void> | number | void): Promise<void> {
  try {
    const code = await body();
    if (typeof code === 'number') process.exitCode = code;
  } catch (e) {
    process.exitCode = reportError(e, json);
  }
}
