import { isBuiltinTheory, makeRegion, theoryPieceSet, type PieceSet } from '../engine/index.js';
import { CodedError, toCodedError } from '../errors/index.js';
import { addAffine, atValues, boxCorners, boxPoints, evalAffine, isParseError, parseAffine, valuesText, type Affine, type ExpressionInput, type Ranges } from './affine.js';
import type { CheckContext, Fail, Where } from './compile-context.js';
import { measureDef } from './measures/measure-registry.js';
import { relationDef } from './relations/relation-registry.js';
import { stepDef } from './steps/step-registry.js';
import type { Claim, TheoryInput } from './claim-schema.js';
import { checkFormula } from './formula/check-formula.js';
import type { CompiledFormula } from './formula/compile-formula.js';
import { pieceSetFromJson } from './resolve-theory.js';

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
  /** `compare.formula`, compiled: sides as sums of products of values of boundaries built from b. */
  readonly formula: CompiledFormula | undefined;
}

function failer(file?: string): Fail {
  return (parts, path, hint) => {
    throw new CodedError('invalid_claim', parts, { path, ...(file ? { file } : {}), ...(hint ? { hint } : {}) });
  };
}

function resolve(t: TheoryInput, path: string, file: string | undefined, fail: Fail): PieceSet {
  if (typeof t === 'string') {
    if (!isBuiltinTheory(t)) fail({ what: 'Theory', expected: 'a built-in theory', received: `'${t}'` }, path);
    return theoryPieceSet(t);
  }
  try {
    return pieceSetFromJson(t, file, path);
  } catch (e) {
    const err = toCodedError(e);
    return fail(err.parts, err.path ?? path, err.hint);
  }
}

/** Parses and checks the claim's meaning; `rangeOverride` replaces upper bounds (from `--max`). */
export function compileClaim(claim: Claim, file?: string, rangeOverride?: Readonly<Record<string, number>>): CompiledClaim {
  const fail = failer(file);
  const left = resolve(claim.theory, 'theory', file, fail);
  const right = claim.compare.rightTheory === undefined ? left : resolve(claim.compare.rightTheory, 'compare.rightTheory', file, fail);
  const alphabet = [...left.boundaryLabels].sort().join(' ');
  if ([...right.boundaryLabels].sort().join(' ') !== alphabet) {
    fail({ what: 'Right-hand theory labels', expected: `the boundary labels of the claim theory (${alphabet})`, received: `${[...right.boundaryLabels].join(' ')}` }, 'compare.rightTheory');
  }

  const variables = claim.family.variables.map((v, i) => {
    const max = rangeOverride?.[v.name] ?? v.max;
    if (claim.family.variables.findIndex((w) => w.name === v.name) !== i) fail({ what: 'Variable name', expected: 'distinct names', received: `'${v.name}' twice` }, `family.variables[${i}].name`);
    if (v.min > max) fail({ what: 'Variable range', expected: 'min ≤ max', received: `${v.name} from ${v.min} to ${max}` }, `family.variables[${i}]`, rangeOverride?.[v.name] !== undefined ? 'the raised upper bound (max) is below the declared minimum' : undefined);
    return { name: v.name, min: v.min, max };
  });
  if (rangeOverride) {
    for (const name of Object.keys(rangeOverride)) {
      if (!variables.some((v) => v.name === name)) {
        throw new CodedError('invalid_argument', { what: 'Variable bound', expected: `one of ${variables.map((v) => `'${v.name}'`).join(' | ') || 'no variables'}`, received: `'${name}'` }, { path: 'max' });
      }
    }
  }
  const ranges: Ranges = Object.fromEntries(variables.map((v) => [v.name, { min: v.min, max: v.max }]));
  const corners = boxCorners(ranges);
  const declared = variables.map((v) => `'${v.name}'`).join(' | ') || 'none declared';
  const expr = (input: ExpressionInput, path: string): Affine => {
    const a = parseAffine(input);
    if (isParseError(a)) return fail(a.error, path);
    for (const name of Object.keys(a.coefficients)) {
      if (!(name in ranges)) fail({ what: 'Variable', expected: `one of ${declared}`, received: `'${name}'` }, path, `declare it in family.variables, e.g. { "name": "${name}", "min": 1, "max": 3 }`);
    }
    return a;
  };
  // An affine condition holds on the whole box iff it holds at every corner.
  const cornerWhere = (pred: (v: Record<string, number>) => boolean) => corners.find((c) => !pred(c));
  // Conditions involving N = max(N_left, N_right) are not convex, so those are checked at every point.
  const pointWhere: Where = (pred) => {
    for (const v of boxPoints(ranges)) if (!pred(v)) return v;
    return undefined;
  };

  const lengths = claim.family.sides.map((s, i) => expr(s, `family.sides[${i}]`));
  lengths.forEach((l, i) => {
    const bad = cornerWhere((v) => evalAffine(l, v) >= 0);
    if (bad) fail({ what: 'Side length', expected: 'a nonnegative length', received: `${evalAffine(l, bad)} at ${valuesText(bad)}` }, `family.sides[${i}]`, 'narrow the variable ranges');
  });
  const gap1 = addAffine(addAffine(lengths[0]!, lengths[1]!), addAffine(lengths[3]!, lengths[4]!), -1);
  const gap2 = addAffine(addAffine(lengths[1]!, lengths[2]!), addAffine(lengths[4]!, lengths[5]!), -1);
  const open = cornerWhere((v) => evalAffine(gap1, v) === 0 && evalAffine(gap2, v) === 0);
  if (open) {
    const at = lengths.map((l) => evalAffine(l, open));
    fail(
      { what: 'Side lengths do not close', expected: 's1+s2 = s4+s5 and s2+s3 = s5+s6 for all values', received: `${at.join(',')} at ${valuesText(open)}` },
      'family.sides',
      'e.g. triangle ["n",0,"n",0,"n",0], parallelogram ["a","b",0,"a","b",0], hexagon ["a","b","c","a+b-c"...] must close identically',
    );
  }

  checkRegions(variables, lengths, fail);
  const { sameContent, counts } = compileConditions(claim, lengths, left, expr, cornerWhere, fail);
  const integer = measureDef(claim.compare.measure).integer(claim.compare.measure, left) && measureDef(claim.compare.measure).integer(claim.compare.measure, right);
  const polynomial = claim.compare.measure.type === 'value' && !integer;
  const ctx: CheckContext = { left, right, lengths, transformedLengths: lengths, integer, polynomial, measureType: claim.compare.measure.type, cornerWhere, pointWhere, expr, fail, path: '' };
  const transformedLengths = checkTransform(claim, ctx);
  const full = { ...ctx, transformedLengths };
  measureDef(claim.compare.measure).check(claim.compare.measure, { ...full, path: 'compare.measure' });
  relationDef(claim.compare.relation).check(claim.compare.relation, { ...full, path: 'compare.relation' });
  const formula = checkFormula(claim, full, ranges);
  return { claim, left, right, variables, ranges, lengths, transformedLengths, sameContent, counts, polynomial, formula };
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
        const err = toCodedError(e);
        fail(atValues(err.parts, values), 'family.sides', err.hint);
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

function compileConditions(claim: Claim, lengths: Affine[], pieces: PieceSet, expr: (i: ExpressionInput, p: string) => Affine, cornerWhere: Where, fail: Fail) {
  const parent = [0, 1, 2, 3, 4, 5];
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const counts: CountCondition[] = [];
  claim.family.conditions.forEach((c, k) => {
    const path = `family.conditions[${k}]`;
    if (c.type === 'sameContent') {
      if (new Set(c.sides).size !== c.sides.length) fail({ what: 'Same-content sides', expected: 'distinct sides', received: `${c.sides.join(',')}` }, `${path}.sides`);
      const [first, ...rest] = c.sides.map((s) => s - 1);
      for (const s of rest) {
        const bad = cornerWhere((v) => evalAffine(lengths[first!]!, v) === evalAffine(lengths[s]!, v));
        if (bad) {
          fail(
            { what: 'Same-content sides', expected: 'equal lengths', received: `side ${first! + 1} of length ${evalAffine(lengths[first!]!, bad)} and side ${s + 1} of length ${evalAffine(lengths[s]!, bad)} at ${valuesText(bad)}` },
            `${path}.sides`,
            'sides with the same number of 0s and of 1s have the same length',
          );
        }
        parent[find(s)] = find(first!);
      }
    } else {
      if (!pieces.boundaryLabels.includes(c.label)) {
        fail({ what: 'Label', expected: `one of ${pieces.boundaryLabels.map((l) => `'${l}'`).join(' | ')}`, received: `'${c.label}'` }, `${path}.label`);
      }
      counts.push({ side: c.side - 1, label: c.label, count: expr(c.count, `${path}.count`) });
    }
  });
  const groups = new Map<number, number[]>();
  for (let i = 0; i < 6; i++) groups.set(find(i), [...(groups.get(find(i)) ?? []), i]);
  return { sameContent: [...groups.values()].filter((g) => g.length > 1), counts };
}

function checkTransform(claim: Claim, ctx: CheckContext): Affine[] {
  let cur = [...ctx.lengths];
  claim.transform.forEach((step, k) => {
    const def = stepDef(step);
    def.check(step, { ...ctx, lengths: cur, transformedLengths: cur, path: `transform[${k}]` });
    cur = def.lengths(step, cur);
  });
  return cur;
}

/** Number of y variables of a region of these lengths: N = s6+s1+s2. */
export function sizeOf(lengths: readonly Affine[]): Affine {
  return addAffine(addAffine(lengths[5]!, lengths[0]!), lengths[1]!);
}
