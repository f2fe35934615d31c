import { describe, expect, it } from 'vitest';
import { EngineError } from '../../src/engine/index.js';
import { AppError, errorJson, exitCodeFor, formatError, toAppError } from '../../src/errors.js';

describe('errors', () => {
  it('formats message, location, hint and code on their own lines (README, "Exit codes"; DEVELOPERS.md, "How we work")', () => {
    const e = new AppError('invalid_claim', 'Claim id: expected string, received nothing', { path: 'id', file: 'c.json', hint: 'add "id"' });
    expect(formatError(e)).toBe(['✖ Claim id: expected string, received nothing', '  → at id (c.json)', '  Hint: add "id"', '  [invalid_claim]'].join('\n'));
    expect(formatError(new AppError('store_error', 'Store: expected x, received y'))).toBe('✖ Store: expected x, received y\n  [store_error]');
    expect(errorJson(e)).toEqual({ error: { code: 'invalid_claim', message: e.message, path: 'id', file: 'c.json', hint: 'add "id"' } });
  });

  it('maps codes to the documented exit statuses: 2 bad input, 3 internal, 130 interrupted (README, "Exit codes")', () => {
    expect(exitCodeFor(new AppError('invalid_argument', 'x'))).toBe(2);
    expect(exitCodeFor(new AppError('invalid_boundary', 'x'))).toBe(2);
    expect(exitCodeFor(new AppError('worker_crashed', 'x'))).toBe(3);
    expect(exitCodeFor(new AppError('internal_error', 'x'))).toBe(3);
    expect(exitCodeFor(new AppError('interrupted', 'x'))).toBe(130);
  });

  it('rebases engine paths under a JSON path or names the flag, and wraps anything else as internal', () => {
    const engine = new EngineError('invalid_boundary', 'Side 1: expected 2 labels, received 3', 'sides[0]', 'fix it');
    expect(toAppError(engine, 'family')).toMatchObject({ code: 'invalid_boundary', path: 'family.sides[0]', hint: 'fix it' });
    expect(toAppError(engine, '--sides').path).toBe('--sides[0]');
    expect(toAppError(engine).path).toBe('sides[0]');
    const wrapped = toAppError(new RangeError('boom'));
    expect(wrapped.code).toBe('internal_error');
    expect(wrapped.message).toBe('Internal error: expected none, received boom');
    const same = new AppError('invalid_json', 'x');
    expect(toAppError(same)).toBe(same);
  });
});
