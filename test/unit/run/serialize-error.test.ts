import { describe, expect, it } from 'vitest';
import { AppError } from '../../../src/errors.js';
import { EngineError } from '../../../src/engine/index.js';
import { deserializeError, serializeError } from '../../../src/run/serialize-error.js';

describe('errors crossing the worker boundary', () => {
  it('keeps a coded error as it was, whatever its wording', () => {
    const e = deserializeError(serializeError(new AppError('invalid_claim', 'Odd wording without the usual frame', { path: 'family.sides', hint: 'h' })), 'chunk x');
    expect(e).toMatchObject({ code: 'invalid_claim', message: 'Odd wording without the usual frame', path: 'family.sides', hint: 'h' });
    expect(deserializeError(serializeError(new EngineError('invalid_region', 'Region: expected x, received y', 'sides')), 'w').message).toBe('Region: expected x, received y');
  });

  it('frames anything else, even a message that looks like ours (no behaviour keyed on message text)', () => {
    const plain = Object.assign(new Error('Lookalike: expected a, received b'), { code: 'store_error' });
    const e = deserializeError(serializeError(plain), 'chunk n=2:0-10');
    expect(e.code).toBe('store_error');
    expect(e.message).toBe('Worker (chunk n=2:0-10): expected no error, received Lookalike: expected a, received b');
  });
});
