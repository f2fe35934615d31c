import { describe, expect, it } from 'vitest';
import { compileClaimProgram, planClaim } from '../../../src/claims/index.js';
import { IN_PROCESS_WORK, workerThreads } from '../../../src/run/worker-threads.js';

// The rule of README, "Run options": --workers as given; without it, the main thread for a family of
// small estimated work (instances × unit triangles), else one thread per core.
const exchange = (sides: (number | string)[], variables: { name: string; min: number; max: number }[]) =>
  planClaim(
    compileClaimProgram({
      id: 'exchange',
      statement: 'Exchanging sides 1 and 4 keeps the cohomology value.',
      theory: 'cohomology',
      family: { sides, variables, conditions: [{ type: 'sameContent', sides: [1, 4] }, { type: 'sameContent', sides: [2, 5] }] },
      transform: [{ type: 'exchange', sides: [1, 4] }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    }),
  );

describe('worker threads of a run', () => {
  const small = exchange(['a', 'b', 0, 'a', 'b', 0], [{ name: 'a', min: 1, max: 4 }, { name: 'b', min: 1, max: 3 }]);
  // 6×6 parallelogram, sides 1, 4 and 2, 5 of equal content: Σ_k C(6,k)² = C(12,6) = 924 per pair of sides,
  // 924² = 853,776 labelings (Vandermonde's identity), each of 12² − 3·6² = 36 unit triangles.
  const large = exchange([6, 6, 0, 6, 6, 0], []);

  it('honours --workers as given, 0 included', () => {
    expect(workerThreads(3, [small], {}, 2)).toBe(3);
    expect(workerThreads(0, [large], {}, 2)).toBe(0);
    expect(workerThreads(1, [small], {}, 2)).toBe(1);
  });

  it('without --workers: the main thread for a small family, one thread per core for a large one', () => {
    expect(workerThreads(undefined, [small], {}, 2)).toBe(0);
    expect(853_776n * 36n).toBeGreaterThan(IN_PROCESS_WORK);
    expect(workerThreads(undefined, [large], {}, 2)).toBe(2);
    expect(workerThreads(undefined, [large], {}, 5)).toBe(5);
  });

  it('adds the work of every claim of the run, and raised bounds count', () => {
    // 20 copies of the small family together exceed the threshold.
    expect(workerThreads(undefined, Array.from({ length: 20 }, () => small), {}, 2)).toBe(2);
    expect(workerThreads(undefined, [small], { a: 9, b: 9 }, 2)).toBe(2);
  });
});
