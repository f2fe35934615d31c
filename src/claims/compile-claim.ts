import { isBuiltinTheory, makeRegion, theoryPieceSet, type PieceSet } from '../engine/index.js';
import { AppError, toAppError } from '../errors.js';
import { addAffine, boxCorners, boxPoints, constantAffine, evalAffine, isParseError, parseAffine, valuesText, type Affine, type ExpressionInput, type Ranges } from './affine.js';
import { stepSideMap } from './boundary-transform.js';
import type { Claim, TheoryInput } from './claim-schema.js';
import { hasIntegerWeights, pieceSetFromJson } from './resolve-theory.js';

/** A compiled label-count condition (0-based side). */
export interface CountCondition {
  readonly side: number;
  readonly label: string;
  readonly count: Affine;
}

/** A claim with theories resolved and expressions parsed; everything planning and evaluation need. */
export interface CompiledClaim {
  readonly claim: Claim;
  readonly left: PieceSet;
  readonly right: PieceSet;
  readonly variables: readonly { readonly name: string; readonly min: number; readonly max: number }[];
  readonly ranges: Ranges;
  readonly lengths: readonly Affine[];
  readonly transformedLengths: readonly Affine[];
  /** Groups of 0-based sides that share their content (from `sameContent`, merged transitively). */
  readonly sameContent: readonly (readonly number[])[];
  readonly counts: readonly CountCondition[];
  /** The measure is a polynomial (value of a theory with position or variable weights). */
  readonly polynomial: boolean;
}

type Fail = (message: string, path: string, hint?: string) => never;

function failer(file?: string): Fail {
  return (message, path, hint) => {
    throw new AppError('invalid_claim', message, { path, ...(file ? { file } : {}), ...(hint ? { hint } : {}) });
  };
}

function resolve(t: TheoryInput, path: string, file: string | undefined, fail: Fail): PieceSet {
  if (typeof t === 'string') {
    if (!isBuiltinTheory(t)) fail(`Theory: expected a built-in theory, received '${t}'`, path);
    return theoryPieceSet(t);
  }
  try {
    return pieceSetFromJson(t, file, path);
  } catch (e) {
    const err = e as AppError;
    return fail(err.message, err.path ?? path, err.hint);
  }
}

/** Parses and checks the claim's meaning; `rangeOverride` replaces upper bounds (from `--max`). */
export function compileClaim(claim: Claim, file?: string, rangeOverride?: Readonly<Record<string, number>>): CompiledClaim {
  const fail = failer(file);
  const left = resolve(claim.theory, 'theory', file, fail);
  const right = claim.compare.rightTheory === undefined ? left : resolve(claim.compare.rightTheory, 'compare.rightTheory', file, fail);
  const alphabet = [...left.boundaryLabels].sort().join(' ');
  if ([...right.boundaryLabels].sort().join(' ') !== alphabet) {
    fail(`Right-hand theory labels: expected the boundary labels of the claim theory (${alphabet}), received ${[...right.boundaryLabels].join(' ')}`, 'compare.rightTheory');
  }

  const variables = claim.family.variables.map((v, i) => {
    const max = rangeOverride?.[v.name] ?? v.max;
    if (claim.family.variables.findIndex((w) => w.name === v.name) !== i) fail(`Variable name: expected distinct names, received '${v.name}' twice`, `family.variables[${i}].name`);
    if (v.min > max) fail(`Variable range: expected min ≤ max, received ${v.name} from ${v.min} to ${max}`, `family.variables[${i}]`, rangeOverride?.[v.name] !== undefined ? 'the --max bound is below the declared minimum' : undefined);
    return { name: v.name, min: v.min, max };
  });
  if (rangeOverride) {
    for (const name of Object.keys(rangeOverride)) {
      if (!variables.some((v) => v.name === name)) {
        throw new AppError('invalid_argument', `Variable bound: expected one of ${variables.map((v) => `'${v.name}'`).join(' | ') || 'no variables'}, received '${name}'`, { path: '--max' });
      }
    }
  }
  const ranges: Ranges = Object.fromEntries(variables.map((v) => [v.name, { min: v.min, max: v.max }]));
  const corners = boxCorners(ranges);
  const declared = variables.map((v) => `'${v.name}'`).join(' | ') || 'none declared';
  const expr = (input: ExpressionInput, path: string): Affine => {
    const a = parseAffine(input);
    if (isParseError(a)) return fail(`Expression: expected ${a.error}`, path);
    for (const name of Object.keys(a.coefficients)) {
      if (!(name in ranges)) fail(`Variable: expected one of ${declared}, received '${name}'`, path, `declare it in family.variables, e.g. { "name": "${name}", "min": 1, "max": 3 }`);
    }
    return a;
  };
  // An affine condition holds on the whole box iff it holds at every corner.
  const cornerWhere = (pred: (v: Record<string, number>) => boolean) => corners.find((c) => !pred(c));
  // Conditions involving N = max(N_left, N_right) are not convex, so those are checked at every point.
  const pointWhere: CornerWhere = (pred) => {
    for (const v of boxPoints(ranges)) if (!pred(v)) return v;
    return undefined;
  };

  const lengths = claim.family.sides.map((s, i) => expr(s, `family.sides[${i}]`));
  lengths.forEach((l, i) => {
    const bad = cornerWhere((v) => evalAffine(l, v) >= 0);
    if (bad) fail(`Side length: expected a nonnegative length, received ${evalAffine(l, bad)} at ${valuesText(bad)}`, `family.sides[${i}]`, 'narrow the variable ranges');
  });
  const gap1 = addAffine(addAffine(lengths[0]!, lengths[1]!), addAffine(lengths[3]!, lengths[4]!), -1);
  const gap2 = addAffine(addAffine(lengths[1]!, lengths[2]!), addAffine(lengths[4]!, lengths[5]!), -1);
  const open = cornerWhere((v) => evalAffine(gap1, v) === 0 && evalAffine(gap2, v) === 0);
  if (open) {
    const at = lengths.map((l) => evalAffine(l, open));
    fail(
      `Side lengths do not close: expected s1+s2 = s4+s5 and s2+s3 = s5+s6 for all values, received ${at.join(',')} at ${valuesText(open)}`,
      'family.sides',
      'e.g. triangle ["n",0,"n",0,"n",0], parallelogram ["a","b",0,"a","b",0], hexagon ["a","b","c","a+b-c"...] must close identically',
    );
  }

  checkRegions(variables, lengths, fail);
  const { sameContent, counts } = compileConditions(claim, lengths, left, expr, cornerWhere, fail);
  const transformedLengths = checkTransform(claim, lengths, left, cornerWhere, fail);
  const polynomial = claim.compare.measure.type === 'value' && !(hasIntegerWeights(left) && hasIntegerWeights(right));
  checkCompare(claim, { left, right, polynomial, lengths, transformedLengths, expr, cornerWhere, pointWhere, fail });
  return { claim, left, right, variables, ranges, lengths, transformedLengths, sameContent, counts, polynomial };
}

// Area is not affine, so regions are built for every assignment (boxes are small in practice; capped).
function checkRegions(variables: readonly { name: string; min: number; max: number }[], lengths: Affine[], fail: Fail): void {
  let budget = 200_000;
  const values: Record<string, number> = {};
  const go = (k: number): void => {
    if (budget-- <= 0) return;
    if (k === variables.length) {
      try {
        makeRegion(lengths.map((l) => evalAffine(l, values)));
      } catch (e) {
        const err = toAppError(e);
        fail(`${err.message} at ${valuesText(values)}`, 'family.sides', err.hint);
      }
      return;
    }
    const v = variables[k]!;
    for (let x = v.min; x <= v.max; x++) {
      values[v.name] = x;
      go(k + 1);
    }
  };
  go(0);
}

type CornerWhere = (pred: (v: Record<string, number>) => boolean) => Record<string, number> | undefined;

function compileConditions(claim: Claim, lengths: Affine[], pieces: PieceSet, expr: (i: ExpressionInput, p: string) => Affine, cornerWhere: CornerWhere, fail: Fail) {
  const parent = [0, 1, 2, 3, 4, 5];
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const counts: CountCondition[] = [];
  claim.family.conditions.forEach((c, k) => {
    const path = `family.conditions[${k}]`;
    if (c.type === 'sameContent') {
      if (new Set(c.sides).size !== c.sides.length) fail(`Same-content sides: expected distinct sides, received ${c.sides.join(',')}`, `${path}.sides`);
      const [first, ...rest] = c.sides.map((s) => s - 1);
      for (const s of rest) {
        const bad = cornerWhere((v) => evalAffine(lengths[first!]!, v) === evalAffine(lengths[s]!, v));
        if (bad) {
          fail(
            `Same-content sides: expected equal lengths, received side ${first! + 1} of length ${evalAffine(lengths[first!]!, bad)} and side ${s + 1} of length ${evalAffine(lengths[s]!, bad)} at ${valuesText(bad)}`,
            `${path}.sides`,
            'sides with the same number of 0s and of 1s have the same length',
          );
        }
        parent[find(s)] = find(first!);
      }
    } else {
      if (!pieces.boundaryLabels.includes(c.label)) {
        fail(`Label: expected one of ${pieces.boundaryLabels.map((l) => `'${l}'`).join(' | ')}, received '${c.label}'`, `${path}.label`);
      }
      counts.push({ side: c.side - 1, label: c.label, count: expr(c.count, `${path}.count`) });
    }
  });
  const groups = new Map<number, number[]>();
  for (let i = 0; i < 6; i++) groups.set(find(i), [...(groups.get(find(i)) ?? []), i]);
  return { sameContent: [...groups.values()].filter((g) => g.length > 1), counts };
}

function checkTransform(claim: Claim, lengths: Affine[], pieces: PieceSet, cornerWhere: CornerWhere, fail: Fail): Affine[] {
  let cur = [...lengths];
  const binary = [...pieces.boundaryLabels].sort().join('') === '01';
  claim.transform.forEach((step, k) => {
    const path = `transform[${k}]`;
    if (step.type === 'exchange') {
      const [i, j] = [step.sides[0] - 1, step.sides[1] - 1];
      if (i === j) fail(`Exchanged sides: expected two different sides, received ${i + 1} twice`, `${path}.sides`);
      const bad = cornerWhere((v) => evalAffine(cur[i]!, v) === evalAffine(cur[j]!, v));
      if (bad) {
        fail(
          `Exchanged sides: expected equal lengths, received side ${i + 1} of length ${evalAffine(cur[i]!, bad)} and side ${j + 1} of length ${evalAffine(cur[j]!, bad)} at ${valuesText(bad)}`,
          `${path}.sides`,
          'side numbers refer to the region as left by the previous steps',
        );
      }
    }
    if (step.type === 'complement') {
      if (step.labelMap === undefined && !binary) {
        fail(`Complement: expected the alphabet {0,1} or an explicit labelMap, received labels ${pieces.boundaryLabels.join(' ')}`, path, 'add "labelMap": { "a": "b", "b": "a" } naming the exchange');
      }
      if (step.labelMap) {
        const keys = Object.keys(step.labelMap).sort().join(' ');
        const values = Object.values(step.labelMap).sort().join(' ');
        const known = Object.keys(step.labelMap).concat(Object.values(step.labelMap)).find((l) => !pieces.boundaryLabels.includes(l));
        if (known !== undefined) fail(`Label map: expected boundary labels ${pieces.boundaryLabels.map((l) => `'${l}'`).join(' | ')}, received '${known}'`, `${path}.labelMap`);
        if (keys !== values) fail(`Label map: expected a permutation of the labels it names, received ${JSON.stringify(step.labelMap)}`, `${path}.labelMap`);
      }
    }
    const m = stepSideMap(step);
    if (m) cur = m.map((s) => cur[s.from]!);
    else {
      const n = addAffine(addAffine(cur[5]!, cur[0]!), cur[1]!);
      cur = [n, constantAffine(0), n, constantAffine(0), n, constantAffine(0)];
    }
  });
  return cur;
}

interface CompareContext {
  left: PieceSet;
  right: PieceSet;
  polynomial: boolean;
  lengths: Affine[];
  transformedLengths: Affine[];
  expr: (i: ExpressionInput, p: string) => Affine;
  cornerWhere: CornerWhere;
  pointWhere: CornerWhere;
  fail: Fail;
}

/** Number of y variables of a region of these lengths: N = s6+s1+s2. */
export function sizeOf(lengths: readonly Affine[]): Affine {
  return addAffine(addAffine(lengths[5]!, lengths[0]!), lengths[1]!);
}

function checkCompare(claim: Claim, c: CompareContext): void {
  const { measure, relation } = claim.compare;
  if (measure.type === 'statistic') {
    for (const [set, path] of [[c.left, 'theory'], [c.right, 'compare.rightTheory']] as const) {
      const kinds = [...new Set(set.pieces.map((p) => p.kind))];
      if (!kinds.includes(measure.kind)) {
        c.fail(`Statistic kind: expected a piece kind of ${set.name} (${kinds.map((k) => `'${k}'`).join(' | ')}), received '${measure.kind}'`, 'compare.measure.kind', path === 'theory' ? undefined : 'the right-hand theory lacks this kind');
      }
    }
  }
  const integer = measure.type === 'puzzles' || (measure.type === 'value' && !c.polynomial);
  if ((relation.type === 'lessOrEqual' || relation.type === 'greaterOrEqual') && !integer) {
    c.fail(
      `Relation ${relation.type}: expected an integer measure ('puzzles', or 'value' of a theory with integer weights), received ${measure.type === 'statistic' ? 'a statistic distribution' : 'a polynomial value'}`,
      'compare.relation',
      "compare with 'equal', or measure 'puzzles'",
    );
  }
  if ((relation.type === 'equalAfterSubstitution' || relation.type === 'equalUpToPermutation') && !c.polynomial) {
    c.fail(`Relation ${relation.type}: expected a polynomial measure ('value' of a theory with y variables), received ${measure.type === 'value' ? 'an integer value' : `measure '${measure.type}'`}`, 'compare.relation', "use 'equal' for values without y variables");
  }
  const nRight = sizeOf(c.transformedLengths);
  const nLeft = sizeOf(c.lengths);
  const n = (v: Record<string, number>) => Math.max(evalAffine(nRight, v), evalAffine(nLeft, v));
  if (relation.type === 'equalUpToPermutation' && relation.searchSpace === 'allPermutations') {
    const bad = c.cornerWhere((v) => n(v) <= 8);
    if (bad) c.fail(`Permutation search: expected at most 8 variables, received ${n(bad)} at ${valuesText(bad)}`, 'compare.relation.searchSpace', "lower the variable bounds or search 'blockReversals'");
  }
  if (relation.type === 'equalAfterSubstitution') {
    relation.substitution.forEach((s, k) => {
      const path = `compare.relation.substitution[${k}]`;
      if (s.type === 'explicit') {
        const sorted = [...s.images].sort((a, b) => a - b);
        if (sorted.some((x, i) => x !== i + 1)) c.fail(`Images: expected a permutation of 1..${s.images.length}, received [${s.images.join(',')}]`, `${path}.images`);
        const bad = c.pointWhere((v) => s.images.length <= n(v));
        if (bad) c.fail(`Images: expected at most N = ${n(bad)} entries, received ${s.images.length} at ${valuesText(bad)}`, `${path}.images`, 'N = s6+s1+s2 of the larger completed triangle');
        return;
      }
      const from = c.expr(s.from, `${path}.from`);
      const to = c.expr(s.to, `${path}.to`);
      if (s.type === 'shiftBlock') c.expr(s.by, `${path}.by`);
      const bad = c.pointWhere((v) => 1 <= evalAffine(from, v) && evalAffine(from, v) <= evalAffine(to, v) && evalAffine(to, v) <= n(v));
      if (bad) {
        c.fail(
          `Substitution block: expected 1 ≤ from ≤ to ≤ N, received from = ${evalAffine(from, bad)}, to = ${evalAffine(to, bad)}, N = ${n(bad)} at ${valuesText(bad)}`,
          path,
          'indices are those of y_1..y_N, N = s6+s1+s2 of the completed triangle',
        );
      }
    });
  }
}
