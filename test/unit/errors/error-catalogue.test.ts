import { describe, expect, it } from 'vitest';
import { CodedError, ERROR_CATALOGUE, errorJson, errorKind, EXIT_STATUS, exitCodeFor, formatError, toCodedError, type ErrorCode, type ErrorParams } from '../../../src/errors/index.js';

// Sample parameters for every code: a record over ErrorCode, so a new code without a sample fails to compile.
const P = (what: string) => ({ what, expected: 'x', received: 'y' });
const SAMPLES: { [C in ErrorCode]: ErrorParams<C> } = {
  invalid_argument: P('Workers'),
  invalid_region: P('Side lengths'),
  invalid_boundary: P('Side 1'),
  invalid_piece_set: P('Pieces'),
  invalid_piece: P('Piece'),
  invalid_string: P('0/1 string'),
  invalid_weight_formula: P('Weight formula'),
  division_by_zero: P('Weight quotient'),
  invalid_claim: P('Claim id'),
  claim_not_found: P('Claim'),
  store_corrupt: P('Store'),
  store_foreign: P('Store'),
  store_read_only: P('Store'),
  store_unavailable: P('Store'),
  family_too_large: P('Family size'),
  fingerprint_mismatch: P('Fingerprint'),
  shard_mismatch: P('Shards'),
  merge_conflict: P('Merge'),
  unknown_theory: { received: 'quantum', choices: ['cohomology', 'k-theory'], orFile: true },
  file_not_found: { what: 'Claim file', file: 'c.json' },
  invalid_json: { what: 'Claim file', token: "','", received: "'}'" },
  missing_command: { commands: ['run', 'count'] },
  unknown_command: { received: 'rnu', commands: ['run', 'count'] },
  unknown_option: { flag: 'wokers', command: 'run' },
  unexpected_argument: { received: 'extra', command: 'count' },
  missing_option: { flag: 'theory', command: 'count' },
  missing_argument: { name: 'claim', usage: 'replay <claim>' },
  invalid_choice: { flag: 'form', choices: ['y', 'roots'], received: 'z' },
  invalid_option_value: { flag: 'workers', type: 'a number', received: "'two'" },
  repeated_option: { flag: 'workers', times: 2 },
  invalid_command_line: P('Command line'),
  overflow: P('Integer value'),
  limit_exceeded: P('Memory'),
  inexact_division: P('Division'),
  store_error: P('Store'),
  worker_crashed: P('Worker'),
  internal_error: P('Internal error'),
  interrupted: P('Run'),
};

// The grammar of TEAM.md, "How we build" (common practice there, no other source): `<What>: expected X, received Y`.
const GRAMMAR = /^[^:\n]+: expected [^\n]+, received [^\n]+$/;

describe('the error catalogue', () => {
  it('formats every code in the grammar `<What>: expected X, received Y`', () => {
    for (const code of Object.keys(ERROR_CATALOGUE) as ErrorCode[]) {
      const e = new CodedError(code, SAMPLES[code] as never);
      expect(e.message, code).toMatch(GRAMMAR);
      expect(e.message).toBe(`${e.parts.what}: expected ${e.parts.expected}, received ${e.parts.received}`);
      expect(formatError(e).split('\n').at(-1)).toBe(`  [${code}]`);
    }
  });

  it('states the sentence of a code with its own parameters once', () => {
    expect(new CodedError('unknown_theory', SAMPLES.unknown_theory).message).toBe("Theory: expected one of 'cohomology' | 'k-theory' or a piece-set file, received 'quantum'");
    expect(new CodedError('repeated_option', { flag: 'workers', times: 3 }).message).toBe('Option --workers: expected one value, received 3');
    expect(new CodedError('repeated_option', { flag: 'workers', times: 3 }).hint).toBe('give --workers once');
    expect(new CodedError('unknown_option', { flag: 'x', command: 'count' }).message).toBe("Option: expected an option of 'count', received '-x'");
    expect(new CodedError('file_not_found', SAMPLES.file_not_found, { hint: 'run it first' }).hint).toBe('run it first');
  });

  it('maps each kind to the documented exit status: input 2, internal 3, incomplete 4, interrupted 130 (README, "Exit codes")', () => {
    expect(EXIT_STATUS).toEqual({ input: 2, internal: 3, incomplete: 4, interrupted: 130 });
    const exit = (code: ErrorCode) => exitCodeFor(new CodedError(code, SAMPLES[code] as never));
    for (const code of ['invalid_argument', 'invalid_boundary', 'invalid_claim', 'store_corrupt', 'unknown_option', 'missing_option', 'family_too_large'] as const) expect(exit(code), code).toBe(2);
    for (const code of ['worker_crashed', 'internal_error', 'store_error', 'limit_exceeded'] as const) expect(exit(code), code).toBe(3);
    expect(exit('interrupted')).toBe(130);
    for (const code of Object.keys(ERROR_CATALOGUE) as ErrorCode[]) expect(Object.keys(EXIT_STATUS)).toContain(errorKind(code));
  });

  it('formats message, location, hint and code on their own lines; JSON keeps code, message, path, file, hint', () => {
    const e = new CodedError('invalid_claim', { what: 'Claim id', expected: 'string', received: 'nothing' }, { path: 'id', file: 'c.json', hint: 'add "id"' });
    expect(formatError(e)).toBe(['✖ Claim id: expected string, received nothing', '  → at id (c.json)', '  Hint: add "id"', '  [invalid_claim]'].join('\n'));
    expect(formatError(new CodedError('store_error', { what: 'Store', expected: 'x', received: 'y' }))).toBe('✖ Store: expected x, received y\n  [store_error]');
    expect(errorJson(e)).toEqual({ error: { code: 'invalid_claim', message: e.message, path: 'id', file: 'c.json', hint: 'add "id"' } });
  });

  it('rebases a path under a JSON path, and wraps anything uncoded as an internal error', () => {
    const engine = new CodedError('invalid_boundary', { what: 'Side 1', expected: '2 labels', received: '3' }, { path: 'sides[0]', hint: 'fix it' });
    expect(toCodedError(engine, 'family')).toMatchObject({ code: 'invalid_boundary', path: 'family.sides[0]', hint: 'fix it', message: engine.message });
    expect(toCodedError(engine)).toBe(engine);
    const wrapped = toCodedError(new RangeError('boom'));
    expect(wrapped.code).toBe('internal_error');
    expect(wrapped.message).toBe('Internal error: expected none, received boom');
  });
});

describe('README, "Exit codes"', () => {
  it('lists every code with the exit status of its kind', async () => {
    const { readFileSync } = await import('node:fs');
    const readme = readFileSync('README.md', 'utf8');
    for (const [code, spec] of Object.entries(ERROR_CATALOGUE)) expect(readme, code).toContain(`| \`${code}\` | ${EXIT_STATUS[spec.kind]} | ${spec.means} |`);
  });
});
