import type { ProgressCallback, Region } from '../engine/index.js';

/** Regions with at least this many unit triangles get a notice on stderr before drawing their puzzles. */
export const LARGE_REGION = 400;

// A count still running after this long says what it is computing (a size alone predicts time badly:
// an n = 20 coefficient with fixed sides takes milliseconds).
export const SLOW_COUNT_MS = 2000;

function unitTriangles(r: Region): number {
  // The completed triangle has N² unit triangles; each cut-off corner of side s removes s².
  const [, s2, , s4, , s6] = r.lengths;
  return r.size ** 2 - s2 ** 2 - s4 ** 2 - s6 ** 2;
}

// 12,345: as toLocaleString('en-US') writes it, without loading ICU's locale data (30–50 ms of a count's start).
function thousands(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

function regionText(region: Region): string {
  return `a region of ${thousands(unitTriangles(region))} unit triangles (completed triangle N = ${region.size})`;
}

/** Says on stderr what is about to be computed when the region is large, so a long wait is not silent. */
export function announceLargeRegion(region: Region, what: string): void {
  if (unitTriangles(region) < LARGE_REGION) return;
  process.stderr.write(`${what}: ${regionText(region)}…\n`);
}

/**
 * A progress callback that says once on stderr what is being counted when the count is still running
 * after SLOW_COUNT_MS, then hands every report on to `next` (a progress line on a terminal).
 */
export function slowCountNotice(region: Region, what: string, next?: ProgressCallback, now: () => number = Date.now): ProgressCallback {
  const start = now();
  let said = false;
  return (p) => {
    if (!said && now() - start >= SLOW_COUNT_MS) {
      said = true;
      process.stderr.write(`${process.stderr.isTTY ? '\r\x1b[K' : ''}${what}: ${regionText(region)}, still counting after ${SLOW_COUNT_MS / 1000} s…\n`);
    }
    next?.(p);
  };
}
