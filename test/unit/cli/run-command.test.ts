import { afterEach, describe, expect, it, vi } from 'vitest';
import { flagOfField, runCommand } from '../../../src/cli/run-command.js';
import { CodedError } from '../../../src/errors/index.js';

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  vi.spyOn(process.stdout, 'write').mockImplementation((s) => (out.push(String(s)), true));
  vi.spyOn(process.stderr, 'write').mockImplementation((s) => (err.push(String(s)), true));
  return { out, err };
}

// process.exitCode is global: put it back so no other test (or the runner) sees ours.
afterEach(() => {
  vi.restoreAllMocks();
  process.exitCode = undefined;
});

describe('runCommand (the CLI edge)', () => {
  it('turns the body’s number into the exit status', async () => {
    await runCommand(false, () => 1);
    expect(process.exitCode).toBe(1);
  });

  it('prints a coded error, as JSON too with --json, and exits 2 for bad input (README, "Exit codes")', async () => {
    const { out, err } = capture();
    await runCommand(true, () => {
      throw new CodedError('invalid_argument', { what: '--workers', expected: 'a positive integer', received: '0' }, { path: '--workers' });
    });
    const exit = process.exitCode;
    vi.restoreAllMocks();
    expect(exit).toBe(2);
    expect(JSON.parse(out.join(''))).toMatchObject({ error: { code: 'invalid_argument', path: '--workers' } });
    expect(err.join('')).toContain('✖ --workers: expected a positive integer, received 0\n  → at --workers');
  });

  it('names the flag of a field the claims layer reports (max, instance); a claim file\'s own paths stay', async () => {
    const { out } = capture();
    await runCommand(true, () => {
      throw new CodedError('invalid_argument', { what: "Variable bound", expected: "one of 'n'", received: "'m'" }, { path: 'max' });
    });
    await runCommand(true, () => {
      throw new CodedError('invalid_claim', { what: 'Theory', expected: 'a built-in theory', received: "'x'" }, { path: 'max', file: 'c.json' });
    });
    vi.restoreAllMocks();
    const [first, second] = out.join('').trim().split('\n').map((l) => JSON.parse(l) as { error: { path: string } });
    expect(first!.error.path).toBe('--max');
    expect(second!.error.path).toBe('max');
  });

  it('reports anything else as an internal error with exit 3', async () => {
    const { err } = capture();
    await runCommand(false, async () => {
      throw new TypeError('oops');
    });
    const exit = process.exitCode;
    vi.restoreAllMocks();
    expect(exit).toBe(3);
    expect(err.join('')).toContain('[internal_error]');
  });

  it('maps the fields the layers below report to the flags typed, keeping a side index', () => {
    expect(flagOfField('sides[4]')).toBe('--sides[4]');
    expect(flagOfField('sides')).toBe('--sides');
    expect(flagOfField('theory')).toBe('--theory');
    expect(flagOfField('statistic')).toBe('--statistic');
    expect(flagOfField('family.sides[0]')).toBeUndefined();
    expect(flagOfField(undefined)).toBeUndefined();
  });
});
