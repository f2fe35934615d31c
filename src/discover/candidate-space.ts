import { addAffine, type Affine } from '../claims/affine.js';
import { transformSideMap, type SideMap } from '../claims/boundary-transform.js';
import type { CompiledClaim } from '../claims/compile-claim.js';
import type { SizeClass, TheoryInput, TransformStep } from '../claims/index.js';
import { hasIntegerWeights } from '../claims/resolve-theory.js';
import type { PieceSet } from '../engine/index.js';
import type { DiscoverSpace } from './discover-input.js';
import { mapsFamilyToItself } from './family-image.js';
import { HEXAGON_SYMMETRIES } from './hexagon-symmetries.js';

/** A theory of the search with its pieces and name. */
export interface SearchTheory {
  readonly input: TheoryInput;
  readonly name: string;
  readonly pieces: PieceSet;
}

/** One candidate claim: b ↦ T(b) by `steps`, value in `left` against value of T(b) in `right`. */
export interface Candidate {
  /** Canonical form: theories and what T does to each side that is ever nonempty. */
  readonly key: string;
  /** Kebab-case name of the transform (and theory change), part of the claim id. */
  readonly name: string;
  readonly description: string;
  readonly steps: readonly TransformStep[];
  readonly map: SideMap;
  /** Key of the side map alone (shared by candidates that differ only in theories). */
  readonly mapKey: string;
  readonly left: SearchTheory;
  readonly right: SearchTheory;
  /** Values are polynomials: the candidate holds up to a permutation of the y variables. */
  readonly polynomial: boolean;
  /** T maps the family onto itself (as a set of boundaries). */
  readonly mapsFamily: boolean;
  /** T maps the family onto itself and left = right theory: a symmetry usable to group others. */
  readonly selfSymmetry: boolean;
  readonly complexity: number;
}

const isZero = (a: Affine) => a.constant === 0 && Object.keys(a.coefficients).length === 0;
const sameAffine = (a: Affine, b: Affine) => isZero(addAffine(a, b, -1));
const atMostOne = (a: Affine) => Object.keys(a.coefficients).length === 0 && a.constant <= 1;

/** The canonical key of a side map on a family: sides that are always empty carry nothing. */
export function sideMapKey(map: SideMap, lengths: readonly Affine[]): string {
  return map
    .map((s, i) => {
      if (isZero(lengths[i]!)) return '-';
      const reversed = s.reversed && !atMostOne(lengths[i]!);
      const relabel = Object.entries(s.labelMap).filter(([k, v]) => k !== v).sort().map(([k, v]) => `${k}${v}`).join('');
      return `${s.from + 1}${reversed ? 'r' : ''}${relabel ? `c${relabel}` : ''}`;
    })
    .join(' ');
}

function complementChoices(space: DiscoverSpace, binary: boolean): { steps: TransformStep[]; name: string; text: string; cost: number }[] {
  const out: { steps: TransformStep[]; name: string; text: string; cost: number }[] = [];
  for (const c of space.complement) {
    if (c === 'none') out.push({ steps: [], name: '', text: '', cost: 0 });
    else if (!binary) continue;
    else if (c === 'all') out.push({ steps: [{ type: 'complement', sides: 'all' }], name: 'complement-all', text: 'complement every side', cost: 1 });
    else {
      const sides = [...new Set(c)].sort((a, b) => a - b);
      out.push({ steps: [{ type: 'complement', sides }], name: `complement-${sides.join('-')}`, text: `complement side${sides.length > 1 ? 's' : ''} ${sides.join(', ')}`, cost: 1.5 });
    }
  }
  return out;
}

function exchangeChoices(space: DiscoverSpace, lengths: readonly Affine[]): { steps: TransformStep[]; name: string; text: string; cost: number }[] {
  const out: { steps: TransformStep[]; name: string; text: string; cost: number }[] = [{ steps: [], name: '', text: '', cost: 0 }];
  if (space.exchange === false) return out;
  const pairs: [number, number][] = [];
  if (space.exchange === true) {
    for (let i = 1; i <= 6; i++) for (let j = i + 1; j <= 6; j++) if (!isZero(lengths[i - 1]!) && sameAffine(lengths[i - 1]!, lengths[j - 1]!)) pairs.push([i, j]);
  } else {
    // Listed pairs are taken where their lengths agree on the (possibly rotated) region.
    for (const [a, b] of space.exchange) {
      const [i, j] = a < b ? [a, b] : [b, a];
      if (i !== j && sameAffine(lengths[i - 1]!, lengths[j - 1]!) && !pairs.some(([x, y]) => x === i && y === j)) pairs.push([i, j]);
    }
  }
  for (const [i, j] of pairs) {
    out.push({ steps: [{ type: 'exchange', sides: [i, j] }], name: `exchange-${i}-${j}`, text: `exchange sides ${i} and ${j}`, cost: 1 });
    if (space.reverseExchanged && !atMostOne(lengths[i - 1]!)) {
      out.push({
        steps: [{ type: 'exchange', sides: [i, j] }, { type: 'reverse', sides: [i, j] }],
        name: `exchange-reverse-${i}-${j}`,
        text: `exchange sides ${i} and ${j}, reversing both`,
        cost: 1.25,
      });
    }
  }
  return out;
}

function symmetryText(name: string): string {
  return name
    .split('-')
    .map((p) => (p === 'mirror' ? 'mirror left-right' : p.startsWith('rotate') ? `rotate ${p.slice(6)}° clockwise` : p))
    .join(', then ');
}

/**
 * The candidate space: family symmetries of the hexagon, then a complement, then an exchange of two
 * sides of equal length, against each admissible right theory. Candidates that act identically on the
 * family are merged, keeping the simplest description; the identity against its own theory is left out.
 */
export function candidateSpace(compiled: CompiledClaim, classes: readonly SizeClass[], theories: readonly SearchTheory[], space: DiscoverSpace): Candidate[] {
  const lengths = compiled.lengths;
  const binary = [...compiled.left.boundaryLabels].sort().join('') === '01';
  const symmetries = space.symmetries ? HEXAGON_SYMMETRIES.filter((s) => mapsFamilyToItself(transformSideMap(s.steps)!, compiled, classes)) : [HEXAGON_SYMMETRIES[0]!];
  const labels = (t: SearchTheory) => [...t.pieces.boundaryLabels].sort().join(' ');
  const pairs = theories.flatMap((l) =>
    theories
      .filter((r) => (space.rightTheory === 'same' ? r === l : labels(r) === labels(l) && hasIntegerWeights(r.pieces) === hasIntegerWeights(l.pieces)))
      .map((r) => [l, r] as const),
  );
  const all: Candidate[] = [];
  for (const sym of symmetries) {
    const symMap = transformSideMap(sym.steps)!;
    const image = symMap.map((s) => lengths[s.from]!);
    for (const comp of complementChoices(space, binary)) {
      for (const ex of exchangeChoices(space, image)) {
        const steps = [...sym.steps, ...comp.steps, ...ex.steps];
        const map = transformSideMap(steps)!;
        const mapKey = sideMapKey(map, lengths);
        const identity = mapKey === sideMapKey(transformSideMap([])!, lengths);
        const selfMap = mapsFamilyToItself(map, compiled, classes);
        const parts = [sym.name === 'identity' ? '' : sym.name, comp.name, ex.name].filter(Boolean);
        const texts = [sym.name === 'identity' ? '' : symmetryText(sym.name), comp.text, ex.text].filter(Boolean);
        for (const [l, r] of pairs) {
          if (identity && l === r) continue;
          const theoryPart = l === r ? '' : `${l.name}-vs-${r.name}`;
          all.push({
            key: `${l.name}|${r.name}|${mapKey}`,
            name: [...parts, theoryPart].filter(Boolean).join('-') || 'identity',
            description: [texts.join(', then ') || 'the identity', l === r ? '' : `(${l.name} against ${r.name})`].filter(Boolean).join(' '),
            steps,
            map,
            mapKey,
            left: l,
            right: r,
            polynomial: !hasIntegerWeights(l.pieces),
            mapsFamily: selfMap,
            selfSymmetry: selfMap && l === r,
            complexity: sym.steps.length + comp.cost + ex.cost + (l === r ? 0 : 0.5),
          });
        }
      }
    }
  }
  // Stable sort: equal complexity keeps generation order (rotations before mirrors).
  all.sort((a, b) => a.complexity - b.complexity);
  const seen = new Set<string>();
  return all.filter((c) => !seen.has(c.key) && (seen.add(c.key), true));
}
