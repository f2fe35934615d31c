import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  fillingCountSemiring,
  makeRegion,
  modularSemiring,
  polynomialSemiring,
  polyEquals,
  theoryPieceSet,
} from '../../../src/engine/index.js';
import { regionShapes } from '../../helpers/boundaries.js';

// A seeded generator (mulberry32), so a failure names a reproducible boundary.
function generator(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Property: pruning never changes a value. The pruned sweeps (backward, meet in the middle, and the
// per-theory default, defaultStrategy) equal the plain forward sweep on random 0/1 boundaries of every region with N ≤ 5, weighted towards boundaries
// whose sides have equal numbers of 1s (the ones with puzzles) [definition: the three sweeps sum the
// same paths of one transfer matrix].
describe('pruned = unpruned on boundaries with N ≤ 5', () => {
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant'])('%s', (theory) => {
    const pieces = theoryPieceSet(theory);
    const random = generator(20261202);
    const modular = modularSemiring(3);
    let nonzero = 0;
    for (const lengths of regionShapes(5)) {
      const region = makeRegion(lengths);
      const ring = polynomialSemiring(region.size);
      for (let trial = 0; trial < 40; trial++) {
        const sides = lengths.map((len) => Array.from({ length: len }, () => (random() < 0.5 ? '0' : '1')).join(''));
        const f = countBoundary(region, sides, pieces, { semiring: fillingCountSemiring, strategy: 'forward' });
        const p = countBoundary(region, sides, pieces, { semiring: ring, strategy: 'forward' });
        const m = countBoundary(region, sides, pieces, { semiring: modular, strategy: 'forward' });
        if (f !== 0) nonzero++;
        for (const strategy of ['backward', 'meet', undefined] as const) {
          const at = `${lengths} ${sides} ${strategy ?? 'default'}`;
          expect(countBoundary(region, sides, pieces, { semiring: fillingCountSemiring, strategy }), at).toBe(f);
          expect(polyEquals(countBoundary(region, sides, pieces, { semiring: ring, strategy }), p), at).toBe(true);
          expect(countBoundary(region, sides, pieces, { semiring: modular, strategy }), at).toEqual(m);
        }
      }
    }
    // The sample must exercise boundaries that have puzzles, not only empty ones.
    expect(nonzero).toBeGreaterThan(100);
  });
});
