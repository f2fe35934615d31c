import { describe, expect, it } from 'vitest';
import { replayCommand } from '../../../src/run/sweep-summary.js';
import { commandWords } from '../../helpers/contracts.js';

describe('replayCommand', () => {
  // The printed command must give back exactly the words it was built from, however odd the file name.
  it.each([
    ['conjectures/x.json', 'a=2,b=1', 7n, undefined],
    ["my claim's.json", 'all', 0n, 'out/s.sqlite'],
    ['dir with space/c.json', 'n=3', 12345678901234567890n, 'a b/$HOME.sqlite'],
  ] as const)('round-trips %s through shell quoting', (claim, key, index, db) => {
    const words = commandWords(replayCommand(claim, key, index, db));
    expect(words).toEqual(['puzzlesweep', 'replay', claim, '--instance', `${key}:${index}`, ...(db ? ['--db', db] : [])]);
  });
});

describe('commandWords (test helper)', () => {
  it('splits like a POSIX shell on spaces, single quotes and the quote escape \'\\\'\' (POSIX sh quoting rules, by hand)', () => {
    const command = `puzzlesweep replay 'it'\\''s here.json' --instance n=3:5 --db 'x y'`;
    expect(commandWords(command)).toEqual(['puzzlesweep', 'replay', "it's here.json", '--instance', 'n=3:5', '--db', 'x y']);
    expect(commandWords(`a'b c'd e`)).toEqual(['ab cd', 'e']);
  });
});
