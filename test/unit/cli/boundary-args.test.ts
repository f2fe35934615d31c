import { describe, expect, it } from 'vitest';
import { parseBoundary, parseBoundaryArgs, triangleEchoJson } from '../../../src/cli/boundary-args.js';
import { codedFailure } from '../../helpers/coded-failure.js';

describe('boundary arguments', () => {
  it('reads --triangle λ,μ,ν as the clockwise sides λ, -, μ, -, reverse(ν), - (README, "Counting one boundary")', () => {
    expect(parseBoundaryArgs({ triangle: '0101,0011,1100' })).toEqual(['0101', '', '0011', '', '0011', '']);
  });

  it("reads --sides with '-' for an empty side", () => {
    expect(parseBoundaryArgs({ sides: '01,-,01,-,10,-' })).toEqual(['01', '', '01', '', '10', '']);
  });

  it('reads --partitions with --grassmannian: (2,1) in Gr(3,7) is 0010101 (each 1 has that many 0s to its right; DEVELOPERS.md, by hand)', () => {
    const { sides, triangle } = parseBoundary({ partitions: '21,1,0', grassmannian: '3,7' });
    expect(triangle!.strings).toEqual(['0010101', '0001011', '0000111']);
    expect(sides[0]).toBe('0010101');
    expect(triangleEchoJson(triangle!)).toMatchObject({ lambda: '0010101', grassmannian: [3, 7] });
  });

  it('names the flag and the fix when the input is wrong', () => {
    expect(codedFailure(() => parseBoundaryArgs({})).path).toBe('--triangle / --partitions / --sides');
    expect(codedFailure(() => parseBoundaryArgs({ triangle: '01,01,01', sides: '01,-,01,-,10,-' })).message).toMatch(/received both/);
    const count = codedFailure(() => parseBoundaryArgs({ sides: '01,01' }));
    expect(count.message).toBe("--sides: expected six comma-separated strings, received 2 ('01,01')");
    expect(count.hint).toMatch(/'-'/);
    expect(codedFailure(() => parseBoundaryArgs({ triangle: '01,011,01' })).message).toMatch(/^--triangle: expected λ,μ,ν of one length, received lengths 2, 3, 2$/);
    expect(codedFailure(() => parseBoundaryArgs({ partitions: '1,1,2' })).path).toBe('--grassmannian');
  });
});
