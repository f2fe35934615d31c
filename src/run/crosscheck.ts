import {
  countCompletions,
  fractionEquals,
  fractionOf,
  fractionSemiring,
  fractionText,
  valueRing,
  type Fraction,
  integerSemiring,
  polynomialSemiring,
  polyTerms,
  isBuiltinTheory,
  theoryPieceSet,
  triangleRegion,
  type PieceSet,
  type Term,
} from '../engine/index.js';
import { CodedError } from '../errors/index.js';
import { grassmannianStrings } from '../reference/grassmannian-strings.js';
import { isLocalizationTheory, localizationLetter, localizationValues, type LocalizationTheory } from './localization-values.js';
import { referenceTable, type ReferenceTheory } from '../reference/crosscheck-tables.js';
import { pointComparison, pointErrorBound, randomPoints } from './crosscheck-points.js';

export interface CrosscheckOptions {
  readonly theory: ReferenceTheory | LocalizationTheory;
  readonly maxN: number;
  /** Checks this piece set against the theory's reference instead of the built-in one (e.g. a custom set). */
  readonly pieces?: PieceSet;
  /**
   * ssm and ssm-chern: compare exact values at this many random integer points instead of as rational
   * functions (an identity test with `errorBound`; exact rational functions are out of reach at n = 6).
   */
  readonly points?: number;
  /** Seed of the random points (default 1). */
  readonly seed?: number;
  /** Called after each (λ, μ) pair with the pairs done and the pairs in all. */
  readonly onProgress?: (done: number, total: number) => void;
}

export interface CrosscheckRow {
  readonly n: number;
  readonly k: number;
  readonly triples: number;
  readonly agreements: number;
}

export interface Disagreement {
  readonly lambda: string;
  readonly mu: string;
  readonly nu: string;
  readonly engine: string;
  readonly reference: string;
}

export interface CrosscheckSummary {
  readonly theory: ReferenceTheory | LocalizationTheory;
  readonly maxN: number;
  readonly rows: readonly CrosscheckRow[];
  readonly triples: number;
  readonly agreements: number;
  readonly firstDisagreement: Disagreement | undefined;
  readonly seconds: number;
  /** With `points`: how many, their seed, and the probability bound of a false agreement anywhere. */
  readonly points?: { readonly count: number; readonly seed: number; readonly errorBound: number };
}

type Terms = readonly { readonly coefficient: bigint; readonly exponents: readonly number[] }[];

// A canonical text for comparing term lists from the two sides: sorted, zero exponents kept.
function canonical(terms: Terms): string {
  return terms
    .map((t) => `${t.coefficient}*[${t.exponents.join(',')}]`)
    .sort()
    .join(' + ') || '0';
}

function engineProducts(theory: ReferenceTheory, pieces: PieceSet, lambda: string, mu: string): Map<string, Terms> {
  const n = lambda.length;
  const sides = [lambda, '', mu, '', null, ''];
  const out = new Map<string, Terms>();
  if (theory === 'equivariant') {
    for (const [side5, v] of countCompletions(triangleRegion(n), sides, pieces, { semiring: polynomialSemiring(n) })) {
      out.set([...side5].reverse().join(''), polyTerms(v, n) as Term[]);
    }
  } else {
    for (const [side5, v] of countCompletions(triangleRegion(n), sides, pieces, { semiring: integerSemiring })) {
      out.set([...side5].reverse().join(''), [{ coefficient: BigInt(v), exponents: new Array<number>(n).fill(0) }]);
    }
  }
  return out;
}

// A theory known by localization only: the given piece set's exact fractions against the localization values.
function fractionProducts(pieces: PieceSet, lambda: string, mu: string): Map<string, Fraction> {
  const n = lambda.length;
  const out = new Map<string, Fraction>();
  const ring = fractionSemiring(n, valueRing(pieces).letter);
  for (const [side5, v] of countCompletions(triangleRegion(n), [lambda, '', mu, '', null, ''], pieces, { semiring: ring })) {
    out.set([...side5].reverse().join(''), v);
  }
  return out;
}

/** Compares the engine with the independent reference on every triple of every Gr(k, n), n ≤ maxN. */
export function crosscheck(options: CrosscheckOptions): CrosscheckSummary {
  const started = performance.now();
  const theory = options.theory;
  if (isLocalizationTheory(theory)) {
    const pieces = options.pieces ?? (isBuiltinTheory(theory) ? theoryPieceSet(theory) : undefined);
    if (!pieces) {
      throw new CodedError('invalid_argument', { what: '--pieces', expected: `a piece-set file to check against ${theory}`, received: 'none' }, {
        path: '--pieces',
        hint: `no puzzle rule for ${theory} is built in; the reference is localization`,
      });
    }
    if (options.points !== undefined) return crosscheckAtPoints(theory, pieces, options, started);
    return crosscheckFractions(theory, pieces, options, started);
  }
  const pieces = options.pieces ?? theoryPieceSet(theory);
  return compareTriples(theory, options, started, (k, n) => {
    const reference = referenceTable(theory, k, n);
    return (lambda, mu) => {
      const engine = engineProducts(theory, pieces, lambda, mu);
      return (nu) => {
        const e = canonical(engine.get(nu) ?? []);
        const r = canonical(reference.get(`${lambda},${mu},${nu}`)?.terms ?? []);
        return e === r ? undefined : { engine: e, reference: r };
      };
    };
  });
}

function crosscheckFractions(theory: LocalizationTheory, pieces: PieceSet, options: CrosscheckOptions, started: number): CrosscheckSummary {
  const letter = localizationLetter(theory);
  const names = (k: number) => `${letter}${k + 1}`;
  return compareTriples(theory, options, started, (k, n) => {
    const reference = localizationValues(theory, k, n);
    return (lambda, mu) => {
      const engine = fractionProducts(pieces, lambda, mu);
      return (nu) => {
        const e = engine.get(nu) ?? fractionOf(new Map());
        const r = reference.get(`${lambda},${mu},${nu}`) ?? fractionOf(new Map());
        return fractionEquals(e, r) ? undefined : { engine: fractionText(e, names), reference: fractionText(r, names) };
      };
    };
  });
}

function crosscheckAtPoints(theory: LocalizationTheory, pieces: PieceSet, options: CrosscheckOptions, started: number): CrosscheckSummary {
  const count = options.points!;
  const seed = options.seed ?? 1;
  if (theory === 'equivariant-k-theory' || !Number.isInteger(count) || count < 1) {
    throw new CodedError('invalid_argument', { what: '--points', expected: 'a positive integer, with --theory ssm or ssm-chern', received: `${count} with ${theory}` }, { path: '--points', hint: 'equivariant K-theory is checked exactly' });
  }
  const kind = theory === 'ssm' ? 'ssm' : 'csm';
  const summary = compareTriples(theory, options, started, (k, n) => pointComparison(kind, pieces, k, n, randomPoints(count, n, seed)));
  return { ...summary, points: { count, seed, errorBound: pointErrorBound(options.maxN, count) } };
}

// What one triple's comparison says: nothing when engine and reference agree, both texts otherwise.
type TripleCheck = (nu: string) => { engine: string; reference: string } | undefined;

// Every triple of every Gr(k, n) with n ≤ maxN, one engine sweep per (λ, μ), tallied per Grassmannian.
function compareTriples(
  theory: CrosscheckSummary['theory'],
  options: CrosscheckOptions,
  started: number,
  grassmannian: (k: number, n: number) => (lambda: string, mu: string) => TripleCheck,
): CrosscheckSummary {
  const grassmannians: [number, number, string[]][] = [];
  for (let n = 1; n <= options.maxN; n++) for (let k = 0; k <= n; k++) grassmannians.push([n, k, grassmannianStrings(k, n)]);
  const total = grassmannians.reduce((s, [, , strings]) => s + strings.length ** 2, 0);
  let done = 0;
  let firstDisagreement: Disagreement | undefined;
  const rows: CrosscheckRow[] = [];
  for (const [n, k, strings] of grassmannians) {
    const product = grassmannian(k, n);
    let triples = 0;
    let agreements = 0;
    for (const lambda of strings) {
      for (const mu of strings) {
        const check = product(lambda, mu);
        for (const nu of strings) {
          triples++;
          const d = check(nu);
          if (!d) agreements++;
          else firstDisagreement ??= { lambda, mu, nu, ...d };
        }
        options.onProgress?.(++done, total);
      }
    }
    rows.push({ n, k, triples, agreements });
  }
  return {
    theory,
    maxN: options.maxN,
    rows,
    triples: rows.reduce((s, r) => s + r.triples, 0),
    agreements: rows.reduce((s, r) => s + r.agreements, 0),
    firstDisagreement,
    seconds: (performance.now() - started) / 1000,
  };
}
