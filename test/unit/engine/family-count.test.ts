import { describe, expect, it } from 'vitest';
import {
  countBoundary,
  countFamily,
  generatingSemiring,
  integerSemiring,
  makeRegion,
  modularSemiring,
  polynomialSemiring,
  polyEquals,
  statisticWeigher,
  theoryPieceSet,
  FAMILY_SIDE_ORDER,
} from '../../../src/engine/index.js';
import { binaryStrings } from '../../helpers/boundaries.js';

// Walks every index of a family table and the boundary it stands for (side 5 least significant).
function* entries(candidates: readonly (readonly string[])[]): Generator<{ index: number; sides: string[] }> {
  const counts = candidates.map((c) => c.length);
  const size = counts.reduce((x, y) => x * y, 1);
  for (let index = 0; index < size; index++) {
    const sides = new Array<string>(6);
    let rest = index;
    for (const k of [...FAMILY_SIDE_ORDER].reverse()) {
      sides[k] = candidates[k]![rest % counts[k]!]!;
      rest = Math.floor(rest / counts[k]!);
    }
    yield { index, sides };
  }
}

// The bulk family walk must give, entry by entry, the value of one count per boundary [definition:
// the family table is the table of single values; countBoundary is checked against naive backtracking].
describe('countFamily = one countBoundary per boundary', () => {
  const cases: [string, number[]][] = [
    ['cohomology', [2, 2, 0, 2, 2, 0]],
    ['k-theory', [2, 1, 2, 2, 1, 2]],
    ['dual-k-theory', [3, 0, 3, 0, 3, 0]],
    ['equivariant', [1, 2, 1, 1, 2, 1]],
  ];
  it.each(cases)('%s on %j', (theory, lengths) => {
    const pieces = theoryPieceSet(theory);
    const region = makeRegion(lengths);
    // Candidate lists in a scrambled order with a repeat, to exercise the trie's sorting and duplicates.
    const candidates = lengths.map((len, k) => {
      const all = binaryStrings(len);
      const list = k % 2 === 0 ? [...all].reverse() : all;
      return len > 0 && k === 0 ? [...list, list[0]!] : list;
    });
    const rings = theory === 'equivariant' ? [polynomialSemiring(region.size), modularSemiring(5)] : [integerSemiring, modularSemiring(5)];
    for (const ring of rings) {
      const table = countFamily(region, candidates, pieces, { semiring: ring as never });
      expect(table.size).toBe(candidates.reduce((x, c) => x * c.length, 1));
      const wrong: string[] = [];
      for (const { index, sides } of entries(candidates)) {
        const one = countBoundary(region, sides, pieces, { semiring: ring as never });
        const got = table.value(index);
        const same = ring === integerSemiring ? got === one : ring.name === 'polynomial' ? polyEquals(got as never, one as never) : JSON.stringify(got) === JSON.stringify(one);
        if (!same && wrong.length < 3) wrong.push(`${sides}: ${String(got)} vs ${String(one)}`);
        // indexOf finds the first entry of a repeated candidate, which holds the same boundary.
        if (JSON.stringify(table.value(table.indexOf(sides))) !== JSON.stringify(got) && wrong.length < 3) wrong.push(`indexOf ${sides}`);
      }
      expect(wrong).toEqual([]);
      expect(table.indexOf(['2', ...candidates.slice(1).map((c) => c[0]!)])).toBe(-1);
      if (ring === integerSemiring) expect(table.numbers).toBeInstanceOf(Float64Array);
    }
  });

  // Numeric walks reuse the tables of earlier walks (family-count.ts, spareTables): a walk after a larger one,
  // in another theory, must still give one count per boundary [definition, as above].
  it('a walk on tables a larger walk left behind still gives one count per boundary', () => {
    const large = makeRegion([3, 3, 0, 3, 3, 0]);
    countFamily(large, [binaryStrings(3), binaryStrings(3), [''], binaryStrings(3), binaryStrings(3), ['']], theoryPieceSet('cohomology'), { semiring: integerSemiring });
    const pieces = theoryPieceSet('k-theory');
    const region = makeRegion([1, 2, 1, 1, 2, 1]);
    const candidates = [1, 2, 1, 1, 2, 1].map((len) => binaryStrings(len));
    for (let round = 0; round < 2; round++) {
      const table = countFamily(region, candidates, pieces, { semiring: integerSemiring });
      for (const { index, sides } of entries(candidates)) expect(table.value(index)).toBe(countBoundary(region, sides, pieces, { semiring: integerSemiring }));
    }
  });

  it('generic semirings (a statistic) fill the table too', () => {
    const pieces = theoryPieceSet('k-theory');
    const region = makeRegion([2, 0, 2, 0, 2, 0]);
    const candidates = [binaryStrings(2), [''], binaryStrings(2), [''], binaryStrings(2), ['']];
    const weigher = statisticWeigher(new Set(['k-piece']));
    const table = countFamily(region, candidates, pieces, { semiring: generatingSemiring, weigher });
    for (const { index, sides } of entries(candidates)) {
      expect(table.value(index)).toEqual(countBoundary(region, sides, pieces, { semiring: generatingSemiring, weigher }));
    }
  });
});
