import { EngineError, type EngineErrorCode } from './engine/index.js';

/** Every error code the tool can report; engine codes plus those of the outer layers. */
export type ErrorCode =
  | EngineErrorCode
  | 'invalid_argument'
  | 'invalid_claim'
  | 'invalid_json'
  | 'file_not_found'
  | 'claim_not_found'
  | 'store_error'
  | 'store_corrupt'
  | 'store_foreign'
  | 'store_read_only'
  | 'store_unavailable'
  | 'family_too_large'
  | 'worker_crashed'
  | 'fingerprint_mismatch'
  | 'shard_mismatch'
  | 'merge_conflict'
  | 'interrupted';

/** A coded error: `message` reads `<What>: expected X, received Y`; `path` is a JSON path or argument name. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly path: string | undefined;
  readonly file: string | undefined;
  readonly hint: string | undefined;

  constructor(code: ErrorCode, message: string, options: { path?: string; file?: string; hint?: string; cause?: unknown } = {}) {
    super(message, { cause: options.cause });
    this.name = 'AppError';
    this.code = code;
    this.path = options.path;
    this.file = options.file;
    this.hint = options.hint;
  }
}

/** Wraps engine errors so the outer layers see one error type; `prefix` rebases the JSON path. */
export function toAppError(e: unknown, prefix = '', file?: string): AppError {
  if (e instanceof AppError) return e;
  if (e instanceof EngineError) {
    // A command-line flag names the argument itself; inside a file the engine's path is rebased.
    const path = prefix.startsWith('--')
      ? prefix + (e.path.startsWith('sides[') ? e.path.slice('sides'.length) : '')
      : prefix && e.path
        ? `${prefix}.${e.path}`
        : prefix || e.path;
    return new AppError(e.code, e.message, { path, hint: e.hint, ...(file ? { file } : {}) });
  }
  const err = e instanceof Error ? e : new Error(String(e));
  return new AppError('internal_error', `Internal error: expected none, received ${err.message}`, { cause: err });
}

const INPUT_ERRORS: ReadonlySet<ErrorCode> = new Set([
  'invalid_region',
  'invalid_boundary',
  'invalid_piece_set',
  'unknown_theory',
  'invalid_weight_formula',
  'division_by_zero',
  'invalid_argument',
  'invalid_claim',
  'invalid_json',
  'file_not_found',
  'claim_not_found',
  'store_corrupt',
  'store_foreign',
  'store_read_only',
  'store_unavailable',
  'family_too_large',
  'fingerprint_mismatch',
  'shard_mismatch',
  'merge_conflict',
]);

/** Documented exit statuses: 2 bad input, 3 internal error, 130 interrupted. */
export function exitCodeFor(e: AppError): number {
  if (e.code === 'interrupted') return 130;
  return INPUT_ERRORS.has(e.code) ? 2 : 3;
}

/** The terminal form: `✖ message`, `→ at path (file)`, optional `Hint:` line. */
export function formatError(e: AppError): string {
  const lines = [`✖ ${e.message}`];
  if (e.path || e.file) lines.push(`  → at ${e.path ?? '(top level)'}${e.file ? ` (${e.file})` : ''}`);
  if (e.hint) lines.push(`  Hint: ${e.hint}`);
  lines.push(`  [${e.code}]`);
  return lines.join('\n');
}

/** JSON form, for `--json` callers. */
export function errorJson(e: AppError): object {
  return { error: { code: e.code, message: e.message, path: e.path ?? null, file: e.file ?? null, hint: e.hint ?? null } };
}
