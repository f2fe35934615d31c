import { CodedError } from '../../src/errors/index.js';

/** The coded error `run` throws; any other error is rethrown, and no error at all fails the test. */
export function codedFailure(run: () => unknown): CodedError {
  try {
    run();
  } catch (e) {
    if (e instanceof CodedError) return e;
    throw e;
  }
  throw new Error('expected a coded error, but the call was accepted');
}
