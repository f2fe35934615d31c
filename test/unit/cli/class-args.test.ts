import { describe, expect, it } from 'vitest';
import { parseBoundary, parseClassArgs, triangleEchoLines } from '../../../src/cli/boundary-args.js';

describe('classes from --triangle or --partitions', () => {
  it('turns partitions into strings in Gr(k,n) and echoes them as typed, never as the clockwise bottom', () => {
    // 21 ↦ 0010101, 1 ↦ 0001011 and 31 ↦ 0100101 in Gr(3,7): for each 1, the number of 0s to its right
    // [DEVELOPERS.md, "Boundaries"].
    const { sides, triangle } = parseBoundary({ partitions: '21, 1, 31', grassmannian: '3,7' });
    expect(triangle!.strings).toEqual(['0010101', '0001011', '0100101']);
    expect(sides).toEqual(['0010101', '', '0001011', '', '1010010', '']);
    const text = triangleEchoLines(triangle!).join('\n');
    expect(text).toContain('31 → 0100101');
    expect(text).toContain('Gr(3,7)');
    expect(text).not.toContain('1010010');
  });

  it('gives partitions for 0/1 strings typed with --triangle', () => {
    const echo = parseClassArgs({ triangle: '0010101,0001011' }, 2);
    expect(echo.partitions).toEqual(['21', '1']);
    expect(echo.grassmannian).toEqual({ k: 3, n: 7 });
  });

  it('names the missing or conflicting option', () => {
    expect(() => parseClassArgs({ partitions: '21,1' }, 2)).toThrow(/--grassmannian k,n/);
    expect(() => parseBoundary({ partitions: '1,1,1', grassmannian: '2,4', sides: '01,1,01,1,01,1' })).toThrow(/received both/);
    expect(() => parseClassArgs({ partitions: '21,1', grassmannian: '3,7' }, 3)).toThrow(/expected 3 comma-separated partitions/);
  });
});
