import { afterEach, describe, expect, it, vi } from 'vitest';
import { triangleRegion } from '../../../src/engine/index.js';
import { announceLargeRegion, LARGE_REGION } from '../../../src/cli/size-notice.js';

describe('size notice', () => {
  afterEach(() => vi.restoreAllMocks());

  it('groups thousands as en-US does, without Intl (N = 40: 1,600 unit triangles; N = 1000: 1,000,000) [common practice, no source]', () => {
    const write = vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
    announceLargeRegion(triangleRegion(40), 'counting');
    announceLargeRegion(triangleRegion(1000), 'counting');
    expect(write.mock.calls.map((c) => String(c[0]))).toEqual([
      'counting: a region of 1,600 unit triangles (completed triangle N = 40); this may take minutes…\n',
      'counting: a region of 1,000,000 unit triangles (completed triangle N = 1000); this may take minutes…\n',
    ]);
  });

  it('says nothing below the threshold', () => {
    const write = vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
    announceLargeRegion(triangleRegion(Math.floor(Math.sqrt(LARGE_REGION)) - 1), 'counting');
    expect(write).not.toHaveBeenCalled();
  });
});
