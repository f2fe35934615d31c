import { AppError } from '../errors.js';
import { evalAffine } from './affine.js';
import { applySideMap, applyTransform, composeSideMaps, isIdentityMap, transformSideMap } from './boundary-transform.js';
import type { EvaluateOptions, Evaluator, Instance, InstanceResult, Measured, SizeClass } from './claim-api.js';
import type { Claim } from './claim-schema.js';
import { errorBoundOf, findPermutations, isZeroValue, MAX_MODULAR_ERROR, measured, relationHolds } from './compare-values.js';
import { sizeOf } from './compile-claim.js';
import { Meter, type Mode, type Value } from './measure.js';
import { planClaim } from './plan-claim.js';
import { isInvolution, substitutionFor, type Permutation } from './substitution.js';

/** Extra knobs for tests and benchmarks. */
export interface EvaluatorTuning {
  /** Entries per LRU cache of open-side-5 sweeps (default 256). */
  readonly cacheSize?: number;
  /** Check each unordered pair {b, T(b)} once when the transform is an involution (default true). */
  readonly pairing?: boolean;
}

function unmeasured(theory: string, lengths: readonly number[], sides: readonly string[], why: string): Measured {
  return { theory, lengths: [...lengths], sides: [...sides], text: why, json: null };
}

/** Checks instances of a claim: left = measure of b in the claim theory, right = measure of T(b) in the right theory. */
export function createEvaluator(claim: Claim, options: EvaluateOptions, tuning: EvaluatorTuning = {}): Evaluator {
  const plan = planClaim(claim);
  const { compiled } = plan;
  const { measure, relation } = claim.compare;
  const names = [...new Set([compiled.left, compiled.right].flatMap((p) => p.pieces.flatMap((q) => (q.weight.type === 'variable' ? [q.weight.name] : []))))].sort();
  const leftMeter = new Meter(compiled.left, measure, names, tuning.cacheSize);
  const rightMeter = new Meter(compiled.right, measure, names, tuning.cacheSize);
  const sideMap = transformSideMap(claim.transform);
  const sameTheory = claim.compare.rightTheory === undefined || JSON.stringify(claim.compare.rightTheory) === JSON.stringify(claim.theory);
  // {b, T(b)} is checked once when T is an involution and the comparison is symmetric.
  const involutive =
    (tuning.pairing ?? true) &&
    sideMap !== undefined &&
    isIdentityMap(composeSideMaps(sideMap, sideMap)) &&
    sameTheory &&
    (relation.type === 'equal' || relation.type === 'equalAfterSubstitution');
  // Boundary labels of one UTF-16 unit (all but exotic ones) let a side's length be its string length.
  const singleUnitLabels = compiled.left.boundaryLabels.every((l) => l.length === 1);
  const classes = new Map<string, { cls: SizeClass; sigma: Permutation | undefined; m: number }>();
  const classOf = (key: string) => {
    let c = classes.get(key);
    if (!c) {
      const cls = plan.classForKey(key);
      const m = Math.max(evalAffine(sizeOf(compiled.lengths), cls.variables), evalAffine(sizeOf(compiled.transformedLengths), cls.variables));
      const sigma = relation.type === 'equalAfterSubstitution' ? substitutionFor(relation.substitution, cls.variables, m) : undefined;
      c = { cls, sigma, m };
      classes.set(key, c);
    }
    return c;
  };

  // `confirming`: an exact recomputation from scratch (no pairing, no cached sweeps), for counterexamples.
  const run = (instance: Instance, exactOnly: boolean, confirming: boolean): InstanceResult => {
    const pairing = !confirming;
    const { cls, sigma, m } = classOf(instance.classKey);
    const sides = [...instance.sides];
    const lengths = sides.map((s) => (singleUnitLabels ? s.length : [...s].length));
    if (lengths.some((l, i) => l !== cls.lengths[i])) {
      throw new AppError('invalid_argument', `Instance sides: expected lengths ${cls.lengths.join(',')} of class ${cls.key}, received ${lengths.join(',')}`, { path: '--instance' });
    }
    // The steps compose to one side map unless one completes to a triangle.
    const t = sideMap ? applySideMap(sideMap, lengths, sides) : applyTransform(claim.transform, lengths, sides, compiled.left);
    const base = { classKey: instance.classKey, index: instance.index };
    let pairable = false;
    // `pairable` is decided the same way with and without pairing, so that confirm() answers the question
    // evaluate() asked: a zero left value that stands for its nonzero partner is still compared.
    if (involutive && (sigma === undefined || isInvolution(sigma)) && t.lengths.every((l, i) => l === lengths[i])) {
      // sign of index(T(b)) − index(b); the partner's own index is ranked only if someone reads it
      const order = plan.compareIndex(cls, t.sides, sides);
      if (pairing && order !== undefined && order < 0) {
        return {
          ...base,
          status: 'paired',
          get partnerIndex() {
            return plan.indexOf(cls, t.sides);
          },
          left: unmeasured(compiled.left.name, lengths, sides, '(paired)'),
          right: unmeasured(compiled.right.name, t.lengths, t.sides, '(paired)'),
          method: 'exact',
        };
      }
      pairable = order !== undefined && order > 0;
    }
    const permutationSearch = relation.type === 'equalUpToPermutation';
    let mode: Mode = exactOnly || !compiled.polynomial || permutationSearch ? 'exact' : 'modular';
    // Sweeps reuse cached one-pass sweeps in exact mode too; only a confirmation recomputes everything.
    const cache = !confirming;
    const measureBoth = (mode: Mode): [Value, Value | undefined] => {
      const left = leftMeter.value(lengths, sides, mode, undefined, cache);
      // A zero left value is skipped, unless it stands for its partner too, whose value is the right one here.
      if (claim.family.nonzeroOnly && isZeroValue(left) && !pairable) return [left, undefined];
      return [left, rightMeter.value(t.lengths, t.sides, mode, sigma, cache)];
    };
    let [left, right] = measureBoth(mode);
    const show = (v: Value, theory: string, ls: readonly number[], ss: readonly string[]) => measured(theory, ls, ss, v, names, confirming);
    if (right === undefined || (claim.family.nonzeroOnly && isZeroValue(left) && isZeroValue(right))) {
      return {
        ...base,
        status: 'skipped_zero',
        left: show(left, compiled.left.name, lengths, sides),
        right: right ? show(right, compiled.right.name, t.lengths, t.sides) : unmeasured(compiled.right.name, t.lengths, t.sides, '(not computed)'),
        method: mode,
        // "is zero" was itself a modular identity test, with the same kind of error bound
        ...(mode === 'modular' ? { errorBound: errorBoundOf(left, right ?? left) } : {}),
      };
    }
    if (permutationSearch && left.kind === 'poly' && right.kind === 'poly') {
      const { found, truncated } = findPermutations(relation.searchSpace, m, left.v, right.v);
      return {
        ...base,
        status: found.length ? 'holds' : 'fails',
        left: show(left, compiled.left.name, lengths, sides),
        right: show(right, compiled.right.name, t.lengths, t.sides),
        ...(found.length ? { permutation: found[0]!, permutations: found } : {}),
        ...(truncated ? { permutationsTruncated: true } : {}),
        method: 'exact',
      };
    }
    let holds = relationHolds(relation, left, right);
    let errorBound = mode === 'modular' ? errorBoundOf(left, right) : 0;
    if (holds && mode === 'modular' && errorBound > MAX_MODULAR_ERROR) {
      // The modular test would say too little here: decide exactly instead.
      mode = 'exact';
      [left, right] = measureBoth(mode) as [Value, Value];
      holds = relationHolds(relation, left, right);
      errorBound = 0;
    }
    return {
      ...base,
      status: holds ? 'holds' : 'fails',
      left: show(left, compiled.left.name, lengths, sides),
      right: show(right, compiled.right.name, t.lengths, t.sides),
      method: mode,
      ...(mode === 'modular' ? { errorBound } : {}),
    };
  };

  return {
    evaluate: (instance) => run(instance, options.exact, false),
    confirm: (instance) => run(instance, true, true),
  };
}

