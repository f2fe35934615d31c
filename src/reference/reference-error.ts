/** Error codes raised by the reference computations for bad input or an impossible exact operation. */
export type ReferenceErrorCode =
  | 'invalid_string'
  | 'invalid_argument'
  | 'invalid_region'
  | 'invalid_boundary'
  | 'invalid_piece'
  | 'inexact_division';

/** A coded reference error whose message reads `<What>: expected X, received Y`. */
export class ReferenceComputationError extends Error {
  readonly code: ReferenceErrorCode;

  constructor(code: ReferenceErrorCode, message: string) {
    super(message);
    this.name = 'ReferenceComputationError';
    this.code = code;
  }
}
