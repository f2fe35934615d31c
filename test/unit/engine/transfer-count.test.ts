import { describe, expect, it } from 'vitest';
import {
  buildPieceSet,
  countBoundary,
  countCompletions,
  fillingCountSemiring,
  generatingSemiring,
  integerSemiring,
  polynomialSemiring,
  statisticWeigher,
  structureConstantSides,
  theoryPieceSet,
  triangleRegion,
  makeRegion,
  checkBoundary,
  sweep,
} from '../../../src/engine/index.js';
import { compilePlan } from '../../../src/engine/transfer-plan.js';
import { binaryStrings, stringOfPartition } from '../../helpers/boundaries.js';

const count = (theory: string, l: string, m: string, n: string) =>
  countBoundary(triangleRegion(l.length), structureConstantSides(l, m, n), theoryPieceSet(theory), { semiring: integerSemiring });

describe('cohomology structure constants', () => {
  it('σ1² = σ2 + σ11 in Gr(2,4) [Pieri’s rule; Fulton, Young Tableaux, 1997]', () => {
    const s1 = stringOfPartition([1, 0], 4);
    const all = countCompletions(triangleRegion(4), [s1, '', s1, '', null, ''], theoryPieceSet('cohomology'), { semiring: integerSemiring });
    // keys are side-5 strings read clockwise, i.e. ν reversed
    const product = new Map([...all].map(([side5, v]) => [[...side5].reverse().join(''), v]));
    expect(product).toEqual(new Map([[stringOfPartition([2, 0], 4), 1], [stringOfPartition([1, 1], 4), 1]]));
  });

  it('c_{21,21}^{321} = 2 in Gr(3,6) [value from memory]', () => {
    expect(count('cohomology', stringOfPartition([2, 1, 0], 6), stringOfPartition([2, 1, 0], 6), stringOfPartition([3, 2, 1], 6))).toBe(2);
  });

  it('the identity class is a unit: c_{id,μ}^ν = δ_{μν} [common practice, no source]', () => {
    const id = '000111';
    for (const mu of ['010101', '101010', '111000']) {
      expect(count('cohomology', id, mu, mu)).toBe(1);
      expect(count('cohomology', id, mu, '011001')).toBe(0);
    }
  });
});

describe('other theories', () => {
  it('equivariant: c_{10,10}^{10} = y2 − y1 on Gr(1,2) [localization: the tangent weight at the point; Knutson–Tao, Duke 2003]', () => {
    const ring = polynomialSemiring(2);
    const v = countBoundary(triangleRegion(2), structureConstantSides('10', '10', '10'), theoryPieceSet('equivariant'), { semiring: ring });
    expect(ring.equals(v, ring.position(1, 2))).toBe(true);
  });

  it('K-theory: G1·G1 = G2 + G11 − G21 [Buch, Acta Math. 2002]', () => {
    const s1 = stringOfPartition([1, 0], 4);
    expect(count('k-theory', s1, s1, stringOfPartition([2, 0], 4))).toBe(1);
    expect(count('k-theory', s1, s1, stringOfPartition([1, 1], 4))).toBe(1);
    expect(count('k-theory', s1, s1, stringOfPartition([2, 1], 4))).toBe(-1);
  });

  it('dual K-theory on P^1: I_id² = I_id − I_pt, since I_id = O(−1) and O_pt² = 0 [hand computation, common practice]', () => {
    expect(count('dual-k-theory', '01', '01', '01')).toBe(1);
    expect(count('dual-k-theory', '01', '01', '10')).toBe(-1);
  });

  it('counts K-pieces with a generating polynomial: c_{1,1}^{21} has one puzzle with one K-piece [Buch 2002]', () => {
    const s1 = stringOfPartition([1, 0], 4);
    const v = countBoundary(triangleRegion(4), structureConstantSides(s1, s1, stringOfPartition([2, 1], 4)), theoryPieceSet('k-theory'), {
      semiring: generatingSemiring,
      weigher: statisticWeigher(new Set(['k-piece'])),
    });
    expect(v).toEqual([0, 1]);
  });
});

describe('countCompletions', () => {
  // One sweep with side 5 open must equal one count per labeling of side 5, and must list only
  // labelings by boundary labels (internal labels such as 10 never sit on the boundary) [definition].
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory'])('equals one count per side-5 labeling in %s', (theory) => {
    const pieces = theoryPieceSet(theory);
    for (const lengths of [[4, 0, 4, 0, 4, 0], [2, 1, 2, 2, 1, 2], [0, 3, 0, 3, 0, 3]]) {
      const region = makeRegion(lengths);
      const ring = polynomialSemiring(region.size);
      const strings = binaryStrings;
      for (const s1 of strings(lengths[0]!).slice(0, 6))
        for (const s3 of strings(lengths[2]!).slice(0, 6)) {
          const sides = [s1, '1'.repeat(lengths[1]!), s3, '0'.repeat(lengths[3]!), null, '01'.repeat(3).slice(0, lengths[5]!)];
          const all = countCompletions(region, sides, pieces, { semiring: ring });
          for (const key of all.keys()) expect(key).toMatch(/^[01]*$/);
          for (const s5 of strings(lengths[4]!)) {
            const one = countBoundary(region, [...sides.slice(0, 4), s5, sides[5]] as string[], pieces, { semiring: ring });
            expect(ring.equals(all.get(s5) ?? ring.zero, one), `${sides} ${s5}`).toBe(true);
          }
        }
    }
  });
});

describe('exactness', () => {
  it('never overflows: 64 triangles of weight 2 give 2^64 [common practice, no source]', () => {
    const set = buildPieceSet({ name: 'doubling', boundaryLabels: ['0'], pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'], weight: { type: 'integer', value: 2 } }] });
    const v = countBoundary(triangleRegion(8), ['00000000', '', '00000000', '', '00000000', ''], set, { semiring: integerSemiring });
    expect(v).toBe(2n ** 64n);
    expect(countBoundary(triangleRegion(8), ['00000000', '', '00000000', '', '00000000', ''], set, { semiring: fillingCountSemiring })).toBe(1);
  });

  it('counts hexagons and parallelograms, not just triangles', () => {
    // The all-0 labeling of any region has exactly one filling, by 0-triangles [common practice, no source].
    for (const lengths of [[2, 1, 0, 2, 1, 0], [1, 2, 3, 1, 2, 3], [0, 2, 0, 2, 0, 2]]) {
      const region = makeRegion(lengths);
      const sides = lengths.map((s) => '0'.repeat(s));
      expect(countBoundary(region, sides, theoryPieceSet('cohomology'), { semiring: fillingCountSemiring })).toBe(1);
    }
  });
});

describe('profile encodings', () => {
  // The packed-integer sweep and the string sweep are two encodings of one recursion: they must agree
  // on every final profile [common practice, no source].
  it.each(['cohomology', 'equivariant', 'k-theory', 'dual-k-theory'])('packed and string profiles agree in %s', (theory) => {
    const pieces = theoryPieceSet(theory);
    for (const lengths of [[5, 0, 5, 0, 5, 0], [2, 2, 2, 2, 2, 2], [3, 2, 0, 3, 2, 0]]) {
      const region = makeRegion(lengths);
      const sides = lengths.map((n, i) => (i === 4 ? null : '01'.repeat(n).slice(0, n)));
      const plan = compilePlan(region, checkBoundary(region, sides, pieces), pieces);
      const ring = polynomialSemiring(region.size);
      const packed = sweep(plan, { semiring: ring });
      const strings = sweep(plan, { semiring: ring }, 'strings');
      expect(packed.size, `${lengths}`).toBeGreaterThan(0);
      expect([...packed.keys()].sort()).toEqual([...strings.keys()].sort());
      for (const [k, v] of packed) expect(ring.equals(v, strings.get(k)!)).toBe(true);
    }
  });
});
