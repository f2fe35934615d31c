import { describe, expect, it } from 'vitest';
import { applyTransform } from '../../../src/claims/index.js';
import { applySideMap, transformSideMap } from '../../../src/claims/boundary-transform.js';
import type { TransformStep } from '../../../src/claims/index.js';
import { countBoundary, integerSemiring, makeRegion, theoryPieceSet } from '../../../src/engine/index.js';

const cohomology = theoryPieceSet('cohomology');

function allTriangleBoundaries(n: number): string[][] {
  let strings = [''];
  for (let k = 0; k < n; k++) strings = strings.flatMap((s) => [s + '0', s + '1']);
  return strings.flatMap((a) => strings.flatMap((b) => strings.map((c) => [a, '', b, '', c, ''])));
}

const lengthsOf = (sides: readonly string[]) => sides.map((s) => s.length);
const value = (theory: string, sides: readonly string[]) => countBoundary(makeRegion(lengthsOf(sides)), sides, theoryPieceSet(theory), { semiring: integerSemiring });

describe('transforms on boundaries', () => {
  const b = ['01', '1', '10', '0', '11', '0'];

  it('rotates 60° clockwise as [σ6, σ1, …, σ5], and six rotations are the identity', () => {
    expect(applyTransform([{ type: 'rotate', degrees: 60 }], lengthsOf(b), b, cohomology).sides).toEqual(['0', '01', '1', '10', '0', '11']);
    expect(applyTransform(Array(6).fill({ type: 'rotate', degrees: 60 }), lengthsOf(b), b, cohomology).sides).toEqual(b);
    expect(applyTransform([{ type: 'rotate', degrees: -60 }, { type: 'rotate', degrees: 60 }], lengthsOf(b), b, cohomology).sides).toEqual(b);
    expect(applyTransform([{ type: 'rotate', degrees: 360 }], lengthsOf(b), b, cohomology).sides).toEqual(b);
  });

  it('mirrors as [rev σ3, rev σ2, rev σ1, rev σ6, rev σ5, rev σ4], an involution', () => {
    const m = applyTransform([{ type: 'mirror' }], lengthsOf(b), b, cohomology);
    // b = [01, 1, 10, 0, 11, 0] → [rev 10, rev 1, rev 01, rev 0, rev 11, rev 0], written out by hand.
    expect(m.sides).toEqual(['01', '1', '10', '0', '11', '0']);
    const c = ['011', '1', '00', '10', '', '0'];
    expect(applyTransform([{ type: 'mirror' }], lengthsOf(c), c, cohomology).sides).toEqual(['00', '1', '110', '0', '', '01']);
    expect(applyTransform([{ type: 'mirror' }], lengthsOf(c), c, cohomology).lengths).toEqual([2, 1, 3, 1, 0, 2]);
    expect(applyTransform([{ type: 'mirror' }, { type: 'mirror' }], lengthsOf(b), b, cohomology).sides).toEqual(b);
  });

  it('complements, reverses and exchanges chosen sides', () => {
    expect(applyTransform([{ type: 'complement', sides: [1, 3] }], lengthsOf(b), b, cohomology).sides).toEqual(['10', '1', '01', '0', '11', '0']);
    expect(applyTransform([{ type: 'reverse', sides: 'all' }], lengthsOf(b), b, cohomology).sides).toEqual(['10', '1', '01', '0', '11', '0']);
    expect(applyTransform([{ type: 'exchange', sides: [1, 3] }], lengthsOf(b), b, cohomology).sides).toEqual(['10', '1', '01', '0', '11', '0']);
  });

  it('completes a hexagon to its triangle as DEVELOPERS.md states', () => {
    // NW = sort(σ6)+σ1+σ2, NE = sort(σ2)+σ3+σ4, bottom = sort(σ4)+σ5+σ6 (DEVELOPERS.md, "Completion to a triangle").
    const hex = ['1', '10', '0', '01', '1', '01'];
    const t = applyTransform([{ type: 'completeToTriangle' }], lengthsOf(hex), hex, cohomology);
    expect(t.lengths).toEqual([5, 0, 5, 0, 5, 0]);
    expect(t.sides).toEqual(['01' + '1' + '10', '', '01' + '0' + '01', '', '01' + '1' + '01', '']);
  });

  it('mirror ∘ complement keeps every cohomology value of triangles n ≤ 3 (c_{λμ}^ν = c_{μλ}^ν with conjugation; Fulton, Young Tableaux, 1997)', () => {
    let nonzero = 0;
    for (let n = 1; n <= 3; n++) {
      for (const sides of allTriangleBoundaries(n)) {
        const t = applyTransform([{ type: 'mirror' }, { type: 'complement', sides: 'all' }], lengthsOf(sides), sides, cohomology);
        const v = value('cohomology', sides);
        expect(value('cohomology', t.sides)).toEqual(v);
        if (v !== 0) nonzero++;
      }
    }
    expect(nonzero).toBeGreaterThan(10);
  });

  it('rotation keeps cohomology values; K-theory of b is dual K-theory of b rotated by 60° (the up K-piece turns into the down one)', () => {
    for (let n = 1; n <= 3; n++) {
      for (const sides of allTriangleBoundaries(n)) {
        const r120 = applyTransform([{ type: 'rotate', degrees: 120 }], lengthsOf(sides), sides, cohomology).sides;
        const r60 = applyTransform([{ type: 'rotate', degrees: 60 }], lengthsOf(sides), sides, cohomology).sides;
        expect(value('cohomology', r120)).toEqual(value('cohomology', sides));
        expect(value('cohomology', r60)).toEqual(value('cohomology', sides));
        expect(value('dual-k-theory', r60)).toEqual(value('k-theory', sides));
      }
    }
  });
});

describe('composed side maps', () => {
  // The evaluator applies the steps' composed side map in one pass; it must equal applying the steps in
  // order [composition of maps, common practice].
  it('equal the steps applied one by one', () => {
    const b = ['01', '1', '10', '0', '11', '0'];
    const programs: TransformStep[][] = [
      [{ type: 'rotate', degrees: 60 }, { type: 'mirror' }],
      [{ type: 'mirror' }, { type: 'complement', sides: [1, 3] }, { type: 'rotate', degrees: 120 }],
      [{ type: 'reverse', sides: [2, 5] }, { type: 'rotate', degrees: 240 }, { type: 'complement', sides: 'all' }, { type: 'mirror' }],
    ] as TransformStep[][];
    for (const steps of programs) {
      const map = transformSideMap(steps)!;
      expect(applySideMap(map, lengthsOf(b), b)).toEqual(applyTransform(steps, lengthsOf(b), b, cohomology));
    }
  });
});
