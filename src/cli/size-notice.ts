import type { Region } from '../engine/index.js';

/** Regions with at least this many unit triangles get a notice on stderr before a long computation. */
export const LARGE_REGION = 400;

function unitTriangles(r: Region): number {
  // The completed triangle has N² unit triangles; each cut-off corner of side s removes s².
  const [, s2, , s4, , s6] = r.lengths;
  return r.size ** 2 - s2 ** 2 - s4 ** 2 - s6 ** 2;
}

// 12,345: as toLocaleString('en-US') writes it, without loading ICU's locale data (30–50 ms of a count's start).
function thousands(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** Says on stderr what is about to be computed when the region is large, so a long wait is not silent. */
export function announceLargeRegion(region: Region, what: string): void {
  const n = unitTriangles(region);
  if (n < LARGE_REGION) return;
  process.stderr.write(`${what}: a region of ${thousands(n)} unit triangles (completed triangle N = ${region.size}); this may take minutes…\n`);
}
