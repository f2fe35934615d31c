import { countCompletions, pointFraction, pointSemiring, triangleRegion, type PieceSet } from '../engine/index.js';
import { grassmannianStrings } from '../reference/grassmannian-strings.js';
import { pointDegreeBound, schwartzMacPhersonAtPoint, type PointRational } from '../reference/ssm-at-point.js';

// Identity test at random integer points for theories whose exact values are too large to expand
// (equivariant SSM at n = 6): engine and reference are both evaluated exactly, in rationals, at the point.

/** Coordinates are drawn uniformly from [0, 2^64). */
export const POINT_BOX_BITS = 64;

// splitmix64: a fixed, well-mixed sequence from the seed, so a run can be repeated exactly.
function generator(seed: number): () => bigint {
  const mask = (1n << 64n) - 1n;
  let s = BigInt(seed) & mask;
  return () => {
    s = (s + 0x9e3779b97f4a7c15n) & mask;
    let z = s;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & mask;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & mask;
    return z ^ (z >> 31n);
  };
}

/** `count` random points of n coordinates for Gr(·, n), from the seed. */
export function randomPoints(count: number, n: number, seed: number): bigint[][] {
  const next = generator(seed * 1009 + n);
  return Array.from({ length: count }, () => Array.from({ length: n }, () => next()));
}

const text = (v: PointRational) => (v.den === 1n ? `${v.num}` : `${v.num}/${v.den}`);

/**
 * For Gr(k, n): a comparison of the piece set's values with localization (s_SM or c_SM) at each point;
 * a triple agrees when its values are equal at every point.
 */
export function pointComparison(kind: 'ssm' | 'csm', pieces: PieceSet, k: number, n: number, points: readonly (readonly bigint[])[]) {
  const references = points.map((y) => schwartzMacPhersonAtPoint(kind, k, n, y));
  return (lambda: string, mu: string) => {
    const engines = points.map((y) => {
      const out = new Map<string, PointRational>();
      for (const [side5, v] of countCompletions(triangleRegion(n), [lambda, '', mu, '', null, ''], pieces, { semiring: pointSemiring(y) })) out.set([...side5].reverse().join(''), pointFraction(v));
      return out;
    });
    return (nu: string): { engine: string; reference: string } | undefined => {
      for (let q = 0; q < points.length; q++) {
        const e = engines[q]!.get(nu) ?? { num: 0n, den: 1n };
        const r = references[q]!.get(`${lambda},${mu},${nu}`) ?? { num: 0n, den: 1n };
        if (e.num !== r.num || e.den !== r.den) return { engine: `${text(e)} at point ${q + 1}`, reference: `${text(r)} at point ${q + 1}` };
      }
      return undefined;
    };
  };
}

/**
 * Probability that some triple of some Gr(k, n), n ≤ maxN, agrees at every point although its two values
 * differ as rational functions: Σ over triples of (d/2^64)^points, d = `pointDegreeBound` (Schwartz–Zippel).
 */
export function pointErrorBound(maxN: number, points: number): number {
  let total = 0;
  for (let n = 1; n <= maxN; n++) {
    for (let k = 0; k <= n; k++) total += grassmannianStrings(k, n).length ** 3 * (pointDegreeBound(k, n) / 2 ** POINT_BOX_BITS) ** points;
  }
  return total;
}
