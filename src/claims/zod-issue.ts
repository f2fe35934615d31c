import type { z } from 'zod';
import { AppError, type ErrorCode } from '../errors.js';

/** JSON path of a zod issue, e.g. `family.lengths[2]`. */
export function issuePath(path: readonly PropertyKey[], prefix = ''): string {
  let out = prefix;
  for (const p of path) out += typeof p === 'number' ? `[${p}]` : out ? `.${String(p)}` : String(p);
  return out || '(top level)';
}

function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  const s = JSON.stringify(value);
  return s === undefined ? String(value) : s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

/** Turns the first zod issue into a coded error in our grammar. */
export function fromZodError(error: z.ZodError, code: ErrorCode, input: unknown, file?: string, prefix = ''): AppError {
  const issue = error.issues[0]!;
  let received: unknown = input;
  for (const p of issue.path) received = received && typeof received === 'object' ? (received as Record<PropertyKey, unknown>)[p as PropertyKey] : undefined;
  let message = issue.message;
  if (issue.code === 'invalid_union' || issue.code === 'invalid_type' || issue.code === 'invalid_value') {
    message = `${message.replace(/, received .*$/, '')}, received ${describe(received)}`;
  } else if (issue.code === 'unrecognized_keys') {
    message = `Unrecognized key: expected none of ${issue.keys.map((k) => `'${k}'`).join(', ')}, received ${issue.keys.length === 1 ? 'it' : 'them'}`;
  } else if (!/received/.test(message)) {
    message = `${message}, received ${describe(received)}`;
  }
  return new AppError(code, message, { path: issuePath(issue.path, prefix), ...(file ? { file } : {}) });
}
