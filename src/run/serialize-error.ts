import { CodedError, isErrorCode, type ErrorParts } from '../errors/index.js';
import type { SerializedError } from './worker-task.js';

/** Flattens any thrown value into `{code, parts, message, stack, path, hint}` for the trip to the main thread. */
export function serializeError(e: unknown): SerializedError {
  if (e instanceof CodedError) {
    return { code: e.code, parts: e.parts, message: e.message, stack: e.stack, path: e.path, hint: e.hint };
  }
  if (e instanceof Error) return { code: 'internal_error', message: e.message, stack: e.stack };
  return { code: 'internal_error', message: String(e) };
}

/** Rebuilds a coded error on the main thread; the worker's stack is kept as the cause. */
export function deserializeError(s: SerializedError, where: string): CodedError {
  const cause = Object.assign(new Error(s.message), { stack: s.stack });
  const place = { cause, ...(s.path ? { path: s.path } : {}), ...(s.hint ? { hint: s.hint } : {}) };
  // Only a coded error crosses with its parts; anything else is framed as an internal error of the worker.
  if (s.parts && isErrorCode(s.code) && s.code !== 'internal_error') return CodedError.restored(s.code, s.parts, place);
  return new CodedError('internal_error', { what: `Worker (${where})`, expected: 'no error', received: s.message }, place);
}
