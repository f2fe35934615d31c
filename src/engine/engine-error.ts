/** Error codes the engine can raise; the CLI maps them to exit status 2 (bad input) or 3 (internal). */
export type EngineErrorCode =
  | 'invalid_region'
  | 'invalid_boundary'
  | 'invalid_piece_set'
  | 'unknown_theory'
  | 'invalid_weight_formula'
  | 'division_by_zero'
  | 'overflow'
  | 'limit_exceeded'
  | 'internal_error';

/** A coded engine error: `message` reads `<What>: expected X, received Y`, `path` names the input field. */
export class EngineError extends Error {
  readonly code: EngineErrorCode;
  readonly path: string;
  readonly hint: string | undefined;

  constructor(code: EngineErrorCode, message: string, path: string, hint?: string) {
    super(message);
    this.name = 'EngineError';
    this.code = code;
    this.path = path;
    this.hint = hint;
  }
}
