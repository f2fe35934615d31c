import { errorParts, type ErrorCode, type ErrorParams, type ErrorParts } from './error-catalogue.js';

/** Where an error points: a JSON path or a field (the CLI maps fields to flags), the file, a hint. */
export interface ErrorPlace {
  readonly path?: string | undefined;
  readonly file?: string | undefined;
  readonly hint?: string | undefined;
  readonly cause?: unknown;
}

/** The message of a code: `<What>: expected X, received Y`. */
export function errorSentence(parts: ErrorParts): string {
  return `${parts.what}: expected ${parts.expected}, received ${parts.received}`;
}

/** The one error type of the tool: a catalogue code, its typed parameters and where it points. */
export class CodedError<C extends ErrorCode = ErrorCode> extends Error {
  readonly code: C;
  readonly params: ErrorParams<C>;
  readonly parts: ErrorParts;
  readonly path: string | undefined;
  readonly file: string | undefined;
  readonly hint: string | undefined;

  /** `parts` is for `restored` only: the parts of an error rebuilt from its serialized form. */
  constructor(code: C, params: ErrorParams<C>, place: ErrorPlace = {}, parts?: ErrorParts) {
    const made = parts ? { parts, hint: undefined } : errorParts(code, params);
    super(errorSentence(made.parts), place.cause === undefined ? undefined : { cause: place.cause });
    this.name = 'CodedError';
    this.code = code;
    this.params = params;
    this.parts = made.parts;
    this.path = place.path;
    this.file = place.file;
    this.hint = place.hint ?? made.hint;
  }

  /** A coded error rebuilt from its parts (after crossing a thread boundary), whatever its code's parameters. */
  static restored<C extends ErrorCode>(code: C, parts: ErrorParts, place: ErrorPlace = {}): CodedError<C> {
    return new CodedError(code, parts as ErrorParams<C>, place, parts);
  }

  /** The same error pointing elsewhere (a path rebased under a file's field, a field named as its flag). */
  relocated(place: ErrorPlace): CodedError<C> {
    return new CodedError(
      this.code,
      this.params,
      {
        path: 'path' in place ? place.path : this.path,
        file: 'file' in place ? place.file : this.file,
        hint: 'hint' in place ? place.hint : this.hint,
        cause: this.cause,
      },
      this.parts,
    );
  }
}

/**
 * Any thrown value as a coded error; an uncoded one is an internal error that quotes its message.
 * `prefix` rebases the error's path under a JSON path (a piece set inside a claim file), `file` names the file.
 */
export function toCodedError(e: unknown, prefix = '', file?: string): CodedError {
  if (e instanceof CodedError) {
    if (!prefix && file === undefined) return e;
    const path = prefix && e.path ? `${prefix}.${e.path}` : prefix || e.path;
    return e.relocated({ path, ...(file !== undefined ? { file } : {}) });
  }
  const err = e instanceof Error ? e : new Error(String(e));
  return new CodedError('internal_error', { what: 'Internal error', expected: 'none', received: err.message }, { cause: err });
}
