import { describe, expect, it } from 'vitest';
import { CodedError } from '../../../src/errors/index.js';
import { deserializeError, serializeError } from '../../../src/run/serialize-error.js';

describe('errors crossing the worker boundary', () => {
  it('keeps a coded error as it was: code, parts, path, hint', () => {
    const sent = new CodedError('invalid_claim', { what: 'Odd', expected: 'wording', received: 'kept' }, { path: 'family.sides', hint: 'h' });
    const e = deserializeError(serializeError(sent), 'chunk x');
    expect(e).toMatchObject({ code: 'invalid_claim', message: 'Odd: expected wording, received kept', path: 'family.sides', hint: 'h' });
    expect(e.parts).toEqual(sent.parts);
    // A code with its own parameters crosses as its parts and reads the same.
    const theory = new CodedError('unknown_theory', { received: 'x', choices: ['a', 'b'] }, { path: 'theory' });
    expect(deserializeError(serializeError(theory), 'w').message).toBe(theory.message);
  });

  it('frames anything else, even an error with a code property and a message that looks like ours (no behaviour keyed on message text)', () => {
    const plain = Object.assign(new Error('Lookalike: expected a, received b'), { code: 'store_error' });
    const e = deserializeError(serializeError(plain), 'chunk n=2:0-10');
    expect(e.code).toBe('internal_error');
    expect(e.message).toBe('Worker (chunk n=2:0-10): expected no error, received Lookalike: expected a, received b');
  });
});
