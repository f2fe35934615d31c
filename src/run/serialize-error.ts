import { EngineError } from '../engine/index.js';
import { AppError, type ErrorCode } from '../errors.js';
import type { SerializedError } from './worker-task.js';

/** Flattens any thrown value into `{code, message, stack, path, hint}` for the trip to the main thread. */
export function serializeError(e: unknown): SerializedError {
  if (e instanceof Error) {
    const coded = e as Error & { code?: unknown; path?: unknown; hint?: unknown };
    return {
      code: typeof coded.code === 'string' ? coded.code : 'internal_error',
      message: e.message,
      stack: e.stack,
      path: typeof coded.path === 'string' ? coded.path : undefined,
      hint: typeof coded.hint === 'string' ? coded.hint : undefined,
      // Our own coded errors already read "<What>: expected X, received Y"; anything else gets that frame.
      coded: e instanceof AppError || e instanceof EngineError,
    };
  }
  return { code: 'internal_error', message: String(e) };
}

/** Rebuilds a coded error on the main thread; the worker's stack is kept as the cause. */
export function deserializeError(s: SerializedError, where: string): AppError {
  const cause = Object.assign(new Error(s.message), { stack: s.stack });
  const known = s.code !== 'internal_error' && s.coded === true;
  const message = known ? s.message : `Worker (${where}): expected no error, received ${s.message}`;
  return new AppError(s.code as ErrorCode, message, { cause, ...(s.path ? { path: s.path } : {}), ...(s.hint ? { hint: s.hint } : {}) });
}
