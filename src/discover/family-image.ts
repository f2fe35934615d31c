import type { SizeClass } from '../claims/index.js';
import type { CompiledClaim } from '../claims/compile-claim.js';
import type { SideMap } from '../claims/boundary-transform.js';
import { evalAffine } from '../claims/affine.js';

/**
 * The constraints a class puts on its boundaries, as text: side lengths, groups of sides sharing their
 * content, and fixed label counts (for {0,1}, always as the number of 1s). Two classes with the same
 * description have the same boundaries.
 */
function describe(lengths: readonly number[], groups: readonly (readonly number[])[], counts: readonly (readonly [number, string, number])[]): string {
  const g = groups
    .map((group) => group.filter((s) => lengths[s]! > 0).sort((a, b) => a - b))
    .filter((group) => group.length > 1)
    .map((group) => group.join('+'))
    .sort();
  const c = counts.filter(([s]) => lengths[s]! > 0).map(([s, l, n]) => `${s}:${l}=${n}`).sort();
  return `${lengths.join(',')}|${g.join(' ')}|${[...new Set(c)].join(' ')}`;
}

function classCounts(compiled: CompiledClaim, cls: SizeClass): [number, string, number][] {
  const binary = [...compiled.left.boundaryLabels].sort().join('') === '01';
  return compiled.counts.map((k) => {
    const n = evalAffine(k.count, cls.variables);
    // A count of 0s is a count of 1s in disguise; one spelling keeps descriptions comparable.
    return binary && k.label === '0' ? [k.side, '1', cls.lengths[k.side]! - n] : [k.side, k.label, n];
  });
}

/**
 * Whether a side map sends every class of the family onto a class of the family (possibly another one,
 * e.g. with two variables exchanged): then the family, as a set of boundaries, is mapped to itself.
 */
export function mapsFamilyToItself(map: SideMap, compiled: CompiledClaim, classes: readonly SizeClass[]): boolean {
  const known = new Set(classes.map((cls) => describe(cls.lengths, compiled.sameContent, classCounts(compiled, cls))));
  const complemented = (i: number) => Object.keys(map[i]!.labelMap).length > 0;
  for (const cls of classes) {
    const lengths = map.map((s) => cls.lengths[s.from]!);
    const groups: number[][] = [];
    for (const group of compiled.sameContent) {
      const image = map.flatMap((s, i) => (group.includes(s.from) ? [i] : []));
      const live = image.filter((i) => lengths[i]! > 0);
      // A group complemented on some of its sides only is no longer a same-content condition.
      if (live.some(complemented) && !live.every(complemented)) return false;
      groups.push(image);
    }
    const counts = classCounts(compiled, cls).flatMap(([side, label, n]): [number, string, number][] =>
      map.flatMap((s, i): [number, string, number][] => {
        if (s.from !== side) return [];
        if (!complemented(i)) return [[i, label, n]];
        const to = s.labelMap[label] ?? label;
        return label === '1' && to === '0' ? [[i, '1', lengths[i]! - n]] : [[i, to, n]];
      }),
    );
    if (!known.has(describe(lengths, groups, counts))) return false;
  }
  return true;
}
