import { AppError, errorJson, exitCodeFor, formatError, toAppError } from '../errors.js';

// The claims layer names the field of a bound or an instance; here, at the edge, it becomes the flag.
const FIELD_FLAGS: Readonly<Record<string, string>> = { max: '--max', instance: '--instance' };

function atFlag(e: AppError): AppError {
  const flag = e.file === undefined && e.path !== undefined ? FIELD_FLAGS[e.path] : undefined;
  return flag ? new AppError(e.code, e.message, { path: flag, ...(e.hint ? { hint: e.hint } : {}), cause: e.cause }) : e;
}

/** Runs a command body; coded errors are printed at this edge and become the exit status. */
export async function runCommand(json: boolean | undefined, body: () => Promise<number | void> | number | void): Promise<void> {
  try {
    const code = await body();
    if (typeof code === 'number') process.exitCode = code;
  } catch (e) {
    const err: AppError = atFlag(toAppError(e));
    if (json) process.stdout.write(`${JSON.stringify(errorJson(err))}\n`);
    process.stderr.write(`${formatError(err)}\n`);
    if (err.code === 'internal_error' && err.cause instanceof Error && process.env.PUZZLESWEEP_DEBUG) process.stderr.write(`${err.cause.stack}\n`);
    process.exitCode = exitCodeFor(err);
  }
}
