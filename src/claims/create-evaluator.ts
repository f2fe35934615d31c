import { CodedError } from '../errors/index.js';
import { evalAffine } from './affine.js';
import { applySideMap, applyTransform } from './boundary-transform.js';
import type { EvaluateOptions, Evaluator, Instance, InstanceResult, Measured, SizeClass } from './claim-api.js';
import type { Claim } from './claim-schema.js';
import { asProgram, type ClaimProgram } from './compile-claim-program.js';
import { errorBoundOf, findFractionPermutations, findPermutations, isZeroValue, MAX_MODULAR_ERROR, measured } from './compare-values.js';
import { sizeOf } from './compile-claim.js';
import { isZeroDenominator, Meter, substituteValue, type Mode, type Value } from './measure.js';
import { permutationText } from './permutation-text.js';
import { familyScanner } from './family-scan.js';
import { FORMULA_THEORY, FormulaMeter } from './formula/formula-meter.js';
import { planClaim } from './plan-claim.js';
import { isIdentity, isInvolution, type Permutation } from './substitution.js';

/** Extra knobs for tests and benchmarks. */
export interface EvaluatorTuning {
  /** Entries per LRU cache of open-side-5 sweeps (default 256). */
  readonly cacheSize?: number;
  /** Check each unordered pair {b, T(b)} once when the transform is an involution (default true). */
  readonly pairing?: boolean;
  /** Decide whole chunks from class value tables where the claim allows it (default true; `scan`). */
  readonly bulk?: boolean;
}

function unmeasured(theory: string, lengths: readonly number[], sides: readonly string[], why: string): Measured {
  return { theory, lengths: [...lengths], sides: [...sides], text: why, json: null };
}

/** Checks instances of a claim: left = measure of b in the claim theory, right = measure of T(b) in the right theory. */
export function createEvaluator(claimOrProgram: Claim | ClaimProgram, options: EvaluateOptions, tuning: EvaluatorTuning = {}): Evaluator {
  const program = asProgram(claimOrProgram);
  const plan = planClaim(program);
  const compiled = program;
  const { claim, names, sideMap } = program;
  const { measure, relation } = claim.compare;
  const leftMeter = new Meter(compiled.left, measure, names, tuning.cacheSize);
  const rightMeter = new Meter(compiled.right, measure, names, tuning.cacheSize);
  // A formula claim builds both sides from b itself (exactly; no transform, no pairing).
  const formula = compiled.formula ? new FormulaMeter(compiled.formula, measure, names, compiled.left.boundaryLabels, compiled.polynomial) : undefined;
  const sameTheory = claim.compare.rightTheory === undefined || JSON.stringify(claim.compare.rightTheory) === JSON.stringify(claim.theory);
  // {b, T(b)} is checked once when T is an involution and the comparison is symmetric.
  const involutive = (tuning.pairing ?? true) && !formula && program.involutive && sameTheory && program.relation.symmetric;
  const searchSpace = program.relation.searchSpace?.(relation);
  // Boundary labels of one UTF-16 unit (all but exotic ones) let a side's length be its string length.
  const singleUnitLabels = compiled.left.boundaryLabels.every((l) => l.length === 1);
  const classes = new Map<string, { cls: SizeClass; sigma: Permutation | undefined; m: number }>();
  const classOf = (key: string) => {
    let c = classes.get(key);
    if (!c) {
      const cls = plan.classForKey(key);
      const m = Math.max(evalAffine(sizeOf(compiled.lengths), cls.variables), evalAffine(sizeOf(compiled.transformedLengths), cls.variables));
      const s = program.relation.substitution?.(relation, cls.variables, m);
      // The identity substitutes nothing: both sides are then compared as they are.
      const sigma = s && !isIdentity(s) ? s : undefined;
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
      throw new CodedError('invalid_argument', { what: 'Instance sides', expected: `lengths ${cls.lengths.join(',')} of class ${cls.key}`, received: `${lengths.join(',')}` }, { path: 'instance' });
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
    // A representative also decides its partner T(b), whose index is ranked only if someone reads it.
    const partner = pairable ? { get partnerIndex() { return plan.indexOf(cls, t.sides); } } : {};
    let mode: Mode = exactOnly || !compiled.polynomial || searchSpace || formula ? 'exact' : 'modular';
    // Sweeps reuse cached one-pass sweeps in exact mode too; only a confirmation recomputes everything.
    const cache = !confirming;
    // right: T(b)'s own value; compared: σ(right) for a substitution. A modular sweep measures only σ(right)
    // (σ moves the evaluation point); exact mode measures the own value and substitutes it.
    const measureOnce = (mode: Mode, attempt: number): { left: Value; right?: Value; compared?: Value } => {
      if (formula) {
        const left = formula.left ? formula.side(formula.left, sides, cls.variables, cache) : leftMeter.value(lengths, sides, 'exact', undefined, cache);
        if (claim.family.nonzeroOnly && isZeroValue(left)) return { left };
        const right = formula.side(formula.right, sides, cls.variables, cache);
        return { left, right, compared: sigma ? substituteValue(right, sigma) : right };
      }
      const left = leftMeter.value(lengths, sides, mode, undefined, cache, attempt);
      // A zero left value is skipped, unless it stands for its partner too, whose value is the right one here.
      if (claim.family.nonzeroOnly && isZeroValue(left) && !pairable) return { left };
      if (!sigma) {
        const right = rightMeter.value(t.lengths, t.sides, mode, undefined, cache, attempt);
        return { left, right, compared: right };
      }
      if (mode === 'modular') return { left, compared: rightMeter.value(t.lengths, t.sides, mode, sigma, cache, attempt) };
      const right = rightMeter.value(t.lengths, t.sides, mode, undefined, cache);
      return { left, right, compared: substituteValue(right, sigma) };
    };
    // A quotient weight whose denominator vanishes at the random point: both sides are redrawn at a new
    // point (seed + attempt); after three such points the instance is decided exactly.
    const measureAll = (m: Mode): { left: Value; right?: Value; compared?: Value } => {
      if (m === 'modular') {
        for (let attempt = 0; attempt < 3; attempt++) {
          try {
            return measureOnce(m, attempt);
          } catch (e) {
            if (!isZeroDenominator(e)) throw e;
          }
        }
        mode = 'exact';
      }
      return measureOnce(mode, 0);
    };
    let values = measureAll(mode);
    const show = (v: Value, theory: string, ls: readonly number[], ss: readonly string[]) => measured(theory, ls, ss, v, names, confirming);
    // A formula side is named `formula`, so that no one draws b's own puzzles as its puzzles.
    const leftName = formula?.left ? FORMULA_THEORY : compiled.left.name;
    const rightName = formula ? FORMULA_THEORY : compiled.right.name;
    const shown = () => ({
      left: show(values.left, leftName, lengths, sides),
      right: values.right ? show(values.right, rightName, t.lengths, t.sides) : unmeasured(compiled.right.name, t.lengths, t.sides, values.compared ? '(only σ(R) computed)' : '(not computed)'),
      ...(sigma && values.compared ? { substituted: show(values.compared, compiled.right.name, t.lengths, t.sides), substitution: permutationText(sigma) } : {}),
    });
    const bothZero = () => isZeroValue(values.left) && values.compared !== undefined && isZeroValue(values.compared);
    if (values.compared === undefined || (claim.family.nonzeroOnly && bothZero())) {
      return {
        ...base,
        status: 'skipped_zero',
        ...shown(),
        method: mode,
        ...partner,
        ...(pairable ? { partnerStatus: 'skipped_zero' as const } : {}),
        // "is zero" was itself a modular identity test, with the same kind of error bound
        ...(mode === 'modular' ? { errorBound: errorBoundOf(values.left, values.compared ?? values.left) } : {}),
      };
    }
    // The permutation search compares exactly (after a filter at a random point); quotients alike.
    const permutationResult = ({ found, truncated }: { found: Permutation[]; truncated: boolean }): InstanceResult => ({
      ...base,
      status: found.length ? 'holds' : 'fails',
      ...shown(),
      vacuous: bothZero(),
      ...(found.length ? { permutation: found[0]!, permutations: found } : {}),
      ...(truncated ? { permutationsTruncated: true } : {}),
      method: 'exact',
    });
    if (searchSpace && values.left.kind === 'poly' && values.compared.kind === 'poly') return permutationResult(findPermutations(searchSpace, m, values.left.v, values.compared.v));
    if (searchSpace && values.left.kind === 'frac' && values.compared.kind === 'frac') return permutationResult(findFractionPermutations(searchSpace, m, values.left.v, values.compared.v));
    let holds = program.relation.holds(values.left, values.compared);
    // Unequal residues prove unequal values (all denominators were invertible at the point): only a "holds" has a bound.
    let errorBound = mode === 'modular' && holds ? errorBoundOf(values.left, values.compared) : 0;
    if (holds && mode === 'modular' && errorBound > MAX_MODULAR_ERROR) {
      // The modular test would say too little here: decide exactly instead.
      mode = 'exact';
      values = measureAll(mode);
      holds = program.relation.holds(values.left, values.compared!);
      errorBound = 0;
    }
    // The comparison decides b and, for a representative, T(b) too (the relation is symmetric and σ an
    // involution). Under nonzeroOnly each of the two is skipped when its own left value is zero.
    const outcome = holds ? ('holds' as const) : ('fails' as const);
    const zeroOnly = claim.family.nonzeroOnly;
    const selfStatus = zeroOnly && isZeroValue(values.left) ? 'skipped_zero' : outcome;
    const partnerStatus = zeroOnly && isZeroValue(values.compared!) ? 'skipped_zero' : outcome;
    return {
      ...base,
      status: selfStatus,
      ...shown(),
      vacuous: bothZero(),
      ...partner,
      ...(pairable ? { partnerStatus } : {}),
      method: mode,
      ...(mode === 'modular' ? { errorBound } : {}),
    };
  };

  const scanner = (tuning.bulk ?? true) ? familyScanner({ program, plan, involutive, sameTheory, exact: options.exact, substitutionOf: (cls) => classOf(cls.key).sigma }) : undefined;
  return {
    evaluate: (instance) => run(instance, options.exact, false),
    confirm: (instance) => run(instance, true, true),
    ...(scanner ? { scan: scanner.scan } : {}),
  };
}

