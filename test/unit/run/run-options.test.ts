import { describe, expect, it } from 'vitest';
import { parseRunOptions } from '../../../src/run/run-options.js';
import { replayCommand } from '../../../src/run/sweep-summary.js';

describe('run options and replay commands', () => {
  it('maps --max var=value entries to bounds', () => {
    expect(parseRunOptions({ max: ['a=3', 'b=10'] }).max).toEqual({ a: 3, b: 10 });
  });

  it('names the flag in coded errors', () => {
    expect(() => parseRunOptions({ max: ['a:3'] })).toThrow(expect.objectContaining({ code: 'invalid_argument', path: '--max' }));
    expect(() => parseRunOptions({ workers: -1 })).toThrow(expect.objectContaining({ path: '--workers', message: expect.stringMatching(/^--workers: expected .*, received -1$/) }));
    expect(() => parseRunOptions({ maxCounterexamples: 1.5 })).toThrow(expect.objectContaining({ path: '--max-counterexamples' }));
  });

  it('--workers 0 (the main thread) is accepted; absent leaves the choice to the run', () => {
    expect(parseRunOptions({ workers: 0 }).workers).toBe(0);
    expect(parseRunOptions({}).workers).toBeUndefined();
  });

  it('quotes replay arguments only when the shell needs it', () => {
    expect(replayCommand('conjectures/x.json', 'a=2,b=1', 7n)).toBe('puzzlesweep replay conjectures/x.json --instance a=2,b=1:7');
    expect(replayCommand("my claim's.json", 'all', 0n, 'out/s.sqlite')).toBe(`puzzlesweep replay 'my claim'\\''s.json' --instance all:0 --db out/s.sqlite`);
  });
});
