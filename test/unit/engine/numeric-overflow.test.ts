import { describe, expect, it } from 'vitest';
import { buildPieceSet, countBoundary, countCompletions, integerSemiring, modularSemiring, triangleRegion } from '../../../src/engine/index.js';
import { kernelPlan, stepLabels } from '../../../src/engine/kernel-plan.js';
import { countFixed, NumericOverflow } from '../../../src/engine/numeric-kernel.js';
import { numericLanes } from '../../../src/engine/count-kernel.js';
import { declaredWeigher } from '../../../src/engine/weigher.js';

// One label, every triangle weighs w: the triangle of side n has n² unit triangles and one filling,
// so its value is w^(n²) [common practice, no source].
const single = (w: number) => buildPieceSet({ name: `weight-${w}`, boundaryLabels: ['0'], pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'], weight: { type: 'integer', value: w } }] });
const sides = (n: number) => ['0'.repeat(n), '', '0'.repeat(n), '', '0'.repeat(n), ''];

describe('integer lanes: exact, promoted to bigint on overflow', () => {
  it('stays a number up to 2^49 and becomes an exact bigint beyond 2^53', () => {
    expect(countBoundary(triangleRegion(7), sides(7), single(2), { semiring: integerSemiring })).toBe(2 ** 49);
    for (const strategy of ['forward', 'backward', 'meet'] as const) {
      expect(countBoundary(triangleRegion(8), sides(8), single(2), { semiring: integerSemiring, strategy })).toBe(2n ** 64n);
      expect(countBoundary(triangleRegion(8), sides(8), single(-3), { semiring: integerSemiring, strategy })).toBe((-3n) ** 64n);
    }
    const open = countCompletions(triangleRegion(8), [...sides(8).slice(0, 4), null, ''], single(2), { semiring: integerSemiring });
    expect(open.get('00000000')).toBe(2n ** 64n);
  });

  it('the kernel signals overflow instead of rounding', () => {
    const pieces = single(2);
    const region = triangleRegion(8);
    const plan = kernelPlan(region, pieces);
    const { label, initial, target } = stepLabels(plan, sides(8) as never);
    const lanes = numericLanes(plan, [{ semiring: integerSemiring as never, weigher: declaredWeigher(integerSemiring) as never, cacheable: false }])!;
    expect(() => countFixed(plan, label, initial, target, lanes, 'forward')).toThrow(NumericOverflow);
  });

  it('modular lanes stay residues: 2^64 mod p [common practice, no source]', () => {
    const ring = modularSemiring(1);
    const v = countBoundary(triangleRegion(8), sides(8), single(2), { semiring: ring });
    expect(v).toEqual(ring.primes.map((p) => Number(2n ** 64n % BigInt(p))));
  });
});
