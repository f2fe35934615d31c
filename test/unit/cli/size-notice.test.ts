import { afterEach, describe, expect, it, vi } from 'vitest';
import { triangleRegion } from '../../../src/engine/index.js';
import { announceLargeRegion, LARGE_REGION, SLOW_COUNT_MS, slowCountNotice } from '../../../src/cli/size-notice.js';

describe('size notice', () => {
  afterEach(() => vi.restoreAllMocks());

  it('groups thousands as en-US does, without Intl (N = 40: 1,600 unit triangles; N = 1000: 1,000,000) [common practice, no source]', () => {
    const write = vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
    announceLargeRegion(triangleRegion(40), 'drawing');
    announceLargeRegion(triangleRegion(1000), 'drawing');
    expect(write.mock.calls.map((c) => String(c[0]))).toEqual([
      'drawing: a region of 1,600 unit triangles (completed triangle N = 40)…\n',
      'drawing: a region of 1,000,000 unit triangles (completed triangle N = 1000)…\n',
    ]);
  });

  it('says nothing below the threshold', () => {
    const write = vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
    announceLargeRegion(triangleRegion(Math.floor(Math.sqrt(LARGE_REGION)) - 1), 'drawing');
    expect(write).not.toHaveBeenCalled();
  });

  it('a count speaks only when it is still running after SLOW_COUNT_MS, once, and passes every report on', () => {
    const write = vi.spyOn(process.stderr, 'write').mockImplementation(() => true);
    let clock = 0;
    const seen: number[] = [];
    const notice = slowCountNotice(triangleRegion(20), 'counting', (p) => seen.push(p.done), () => clock);
    const report = (done: number) => notice({ done, total: 40, profiles: 1 });
    report(1);
    clock = SLOW_COUNT_MS - 1;
    report(2);
    expect(write).not.toHaveBeenCalled();
    clock = SLOW_COUNT_MS;
    report(3);
    clock = 10 * SLOW_COUNT_MS;
    report(4);
    expect(write).toHaveBeenCalledTimes(1);
    // N = 20: 400 unit triangles (elementary geometry, common practice, no source).
    expect(String(write.mock.calls[0]![0])).toMatch(/counting: a region of 400 unit triangles \(completed triangle N = 20\), still counting after 2 s…\n$/);
    expect(seen).toEqual([1, 2, 3, 4]);
  });
});
