import { naiveCount } from '../../src/reference/naive-count.js';
import { cohomologyPieces } from '../unit/reference/puzzle-pieces.js';

/**
 * The claim of issue 7's example: exchanging and reversing sides 1 and 4 of an (a,b,0,a,b,0) parallelogram,
 * sides 1 and 4 of equal content, keeps its cohomology value.
 */
export function exchangeReverseClaim(maxA: number, maxB: number) {
  return {
    id: 'exchange-reverse-parallelogram',
    statement: 'Exchanging and reversing the two sides of length a keeps the cohomology value.',
    theory: 'cohomology',
    family: {
      sides: ['a', 'b', 0, 'a', 'b', 0],
      variables: [{ name: 'a', min: 1, max: maxA }, { name: 'b', min: 1, max: maxB }],
      conditions: [{ type: 'sameContent', sides: [1, 4] }],
    },
    transform: [{ type: 'exchange', sides: [1, 4] }, { type: 'reverse', sides: [1, 4] }],
    compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
  };
}

const words = (n: number) => Array.from({ length: 2 ** n }, (_, i) => i.toString(2).padStart(n, '0'));
const ones = (w: string) => [...w].filter((c) => c === '1').length;
const rev = (w: string) => [...w].reverse().join('');

/**
 * Independent brute force for one class (a, b): every boundary with sides 1 and 4 of equal content, counted by
 * plain backtracking (src/reference/naive-count.ts), its image written out by hand from README's step
 * definitions. Returns the failing boundaries (as `s1|s2|s4|s5`) and the number of boundaries.
 */
export function exchangeReverseFailures(a: number, b: number): { failing: string[]; instances: number } {
  const lengths = [a, b, 0, a, b, 0];
  const memo = new Map<string, string>();
  const value = (s: string[]) => {
    const key = s.join('|');
    let v = memo.get(key);
    if (v === undefined) memo.set(key, (v = naiveCount(lengths, s, cohomologyPieces()).value.toString()));
    return v;
  };
  const failing: string[] = [];
  let instances = 0;
  for (const s1 of words(a)) {
    for (const s4 of words(a)) {
      if (ones(s1) !== ones(s4)) continue;
      for (const s2 of words(b)) {
        for (const s5 of words(b)) {
          instances++;
          const here = [s1, s2, '', s4, s5, ''];
          const image = [rev(s4), s2, '', rev(s1), s5, ''];
          if (value(here) !== value(image)) failing.push([s1, s2, s4, s5].join('|'));
        }
      }
    }
  }
  return { failing, instances };
}

/**
 * The failing boundaries a scan handed on, as `s1|s2|s4|s5`: each handed boundary b and its image
 * T(b) = (rev s4, s2, rev s1, s5), written out by hand from README's step definitions (the pair fails together).
 */
export function handedFailingPairs(handed: readonly bigint[], sidesAt: (index: bigint) => readonly string[]): string[] {
  return handed.flatMap((i) => {
    const [s1, s2, , s4, s5] = sidesAt(i);
    return [[s1, s2, s4, s5], [rev(s4!), s2, rev(s1!), s5]].map((x) => x.join('|'));
  });
}
