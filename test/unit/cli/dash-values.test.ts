import { describe, expect, it } from 'vitest';
import { joinDashValues } from '../../../src/cli/dash-values.js';

describe('joinDashValues', () => {
  it("keeps an empty first side written '-' as the value of --sides (README, Counting one boundary)", () => {
    expect(joinDashValues(['count', '--sides', '-,11,11,-,11,11', '--json'])).toEqual(['count', '--sides=-,11,11,-,11,11', '--json']);
  });

  it('leaves flags alone, so a missing value is still reported', () => {
    expect(joinDashValues(['count', '--sides', '--json'])).toEqual(['count', '--sides', '--json']);
    expect(joinDashValues(['count', '--sides', '-x'])).toEqual(['count', '--sides', '-x']);
    expect(joinDashValues(['count', '--theory', '-,1'])).toEqual(['count', '--theory', '-,1']);
  });
});
