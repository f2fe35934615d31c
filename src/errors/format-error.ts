import { CodedError } from './coded-error.js';
import { EXIT_STATUS, errorKind } from './error-catalogue.js';

/** The documented exit status of an error (README, "Exit codes"). */
export function exitCodeFor(e: CodedError): number {
  return EXIT_STATUS[errorKind(e.code)];
}

/** The terminal form: `✖ <What>: expected X, received Y`, `→ at path (file)`, optional `Hint:`, `[code]`. */
export function formatError(e: CodedError): string {
  const lines = [`✖ ${e.message}`];
  if (e.path || e.file) lines.push(`  → at ${e.path ?? '(top level)'}${e.file ? ` (${e.file})` : ''}`);
  if (e.hint) lines.push(`  Hint: ${e.hint}`);
  lines.push(`  [${e.code}]`);
  return lines.join('\n');
}

/** JSON form, for `--json` callers. */
export function errorJson(e: CodedError): object {
  return { error: { code: e.code, message: e.message, path: e.path ?? null, file: e.file ?? null, hint: e.hint ?? null } };
}
