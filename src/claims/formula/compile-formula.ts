import { isBuiltinTheory, makeRegion, theoryPieceSet, type PieceSet } from '../../engine/index.js';
import { atValues, evalAffine, valuesText, type Affine } from '../affine.js';
import { toCodedError, type ErrorParts } from '../../errors/index.js';
import type { Formula, FormulaTerm } from './formula-schema.js';
import { affineOrFail, compileString, type CompiledString, type LengthEnv, type StringFail } from './string-expr.js';

export interface CompiledBoundary {
  readonly theory: string;
  readonly sides: readonly CompiledString[];
}

export type CompiledBinder =
  | { readonly name: string; readonly kind: 'length'; readonly length: Affine; readonly ones: Affine | undefined }
  | { readonly name: string; readonly kind: 'content'; readonly of: CompiledString };

export interface CompiledTerm {
  readonly coefficient: number;
  readonly binders: readonly CompiledBinder[];
  readonly product: readonly CompiledBoundary[];
  /**
   * Per summation: a boundary of the product whose side 5 is that string (or its reverse) and whose other
   * sides read only earlier names. One open-side-5 sweep of it then yields the strings with a nonzero
   * factor, so the sum skips the rest.
   */
  readonly drivers: readonly ({ readonly product: number; readonly reversed: boolean } | undefined)[];
}

/** A formula ready to evaluate: both sides as compiled terms, and every theory it counts in. */
export interface CompiledFormula {
  readonly left: readonly CompiledTerm[] | undefined;
  readonly right: readonly CompiledTerm[];
  readonly theories: ReadonlyMap<string, PieceSet>;
}

export interface FormulaContext {
  /** The claim theory: boundaries without `theory` are counted in it. */
  readonly theory: PieceSet;
  readonly variables: readonly string[];
  /** Every assignment of the family's variables (the formula is checked at each). */
  readonly points: () => Iterable<Readonly<Record<string, number>>>;
  /** b's side lengths. */
  readonly lengths: readonly Affine[];
  readonly path: string;
  readonly fail: StringFail;
}

const closes = (l: readonly number[]) => l[0]! + l[1]! === l[3]! + l[4]! && l[1]! + l[2]! === l[4]! + l[5]!;

function compileTerms(terms: readonly FormulaTerm[], path: string, ctx: FormulaContext, theories: Map<string, PieceSet>): CompiledTerm[] {
  const affine = affineOrFail(ctx.fail, new Set(ctx.variables));
  return terms.map((term, t) => {
    const tp = `${path}[${t}]`;
    const scope = new Set<string>();
    const binders: CompiledBinder[] = term.sum.map((b, k) => {
      const bp = `${tp}.sum[${k}]`;
      if (/^s[1-6]$/.test(b.name) || scope.has(b.name)) ctx.fail({ what: 'Summation name', expected: 'a new name other than s1..s6', received: `'${b.name}'` }, `${bp}.name`);
      const binder: CompiledBinder =
        'sameContentAs' in b
          ? { name: b.name, kind: 'content', of: compileString(b.sameContentAs, scope, `${bp}.sameContentAs`, ctx.fail, affine) }
          : { name: b.name, kind: 'length', length: affine(b.length, `${bp}.length`), ones: b.ones === undefined ? undefined : affine(b.ones, `${bp}.ones`) };
      scope.add(b.name);
      return binder;
    });
    const product = term.product.map((p, k) => {
      const pp = `${tp}.product[${k}]`;
      const name = p.theory ?? ctx.theory.name;
      if (p.theory !== undefined) {
        if (!isBuiltinTheory(p.theory)) ctx.fail({ what: 'Theory', expected: 'a built-in theory', received: `'${p.theory}'` }, `${pp}.theory`);
        const pieces = theoryPieceSet(p.theory);
        if ([...pieces.boundaryLabels].sort().join(' ') !== [...ctx.theory.boundaryLabels].sort().join(' ')) ctx.fail({ what: 'Theory labels', expected: 'those of the claim theory', received: `${pieces.boundaryLabels.join(' ')}` }, `${pp}.theory`);
        theories.set(name, pieces);
      } else theories.set(name, ctx.theory);
      const strings = 'sides' in p ? p.sides.map((s, i) => compileString(s, scope, `${pp}.sides[${i}]`, ctx.fail, affine)) : triangleSides(p.triangle.map((s, i) => compileString(s, scope, `${pp}.triangle[${i}]`, ctx.fail, affine)));
      return { theory: name, sides: strings };
    });
    const drivers = binders.map((b, k) => {
      const earlier = new Set(binders.slice(0, k).map((x) => x.name));
      const p = product.findIndex((q) => q.sides[4]!.bare?.name === b.name && q.sides.every((side, i) => i === 4 || [...side.refs].every((r) => earlier.has(r))));
      return p < 0 ? undefined : { product: p, reversed: product[p]!.sides[4]!.bare!.reversed };
    });
    return { coefficient: term.coefficient, binders, product, drivers };
  });
}

// c_{λμ}^ν: λ up the NW side, μ down the NE side, ν along the bottom left to right (README).
function triangleSides([l, m, n]: CompiledString[]): CompiledString[] {
  const empty: CompiledString = { length: () => 0, build: () => '', refs: new Set() };
  const reversed: CompiledString = {
    length: n!.length,
    build: (env, v) => [...n!.build(env, v)].reverse().join(''),
    refs: n!.refs,
    ...(n!.bare ? { bare: { name: n!.bare.name, reversed: !n!.bare.reversed } } : {}),
  };
  return [l!, empty, m!, empty, reversed, empty];
}

// Every boundary of every term must be a closed region for every class: checked before any counting.
function checkLengths(terms: readonly CompiledTerm[], path: string, ctx: FormulaContext): void {
  let budget = 20_000;
  for (const variables of ctx.points()) {
    if (budget-- <= 0) return;
    const sides = ctx.lengths.map((l) => evalAffine(l, variables));
    terms.forEach((term, t) => {
      const bound = new Map<string, number>();
      const env: LengthEnv = { variables, sides, bound };
      term.binders.forEach((b, k) => {
        const at = `${path}[${t}].sum[${k}]`;
        let n: number | ErrorParts;
        if (b.kind === 'content') n = b.of.length(env);
        else {
          n = evalAffine(b.length, variables);
          const ones = b.ones === undefined ? 0 : evalAffine(b.ones, variables);
          if (n < 0) n = { what: 'Summation length', expected: '≥ 0', received: `${n}` };
          else if (ones < 0 || ones > n) n = { what: 'Number of 1s', expected: `0..${n}`, received: `${ones}` };
        }
        if (typeof n !== 'number') ctx.fail(atValues(n, variables), at);
        bound.set(b.name, n);
      });
      term.product.forEach((p, k) => {
        const at = `${path}[${t}].product[${k}]`;
        const lengths = p.sides.map((s) => s.length(env));
        const bad = lengths.find((l) => typeof l !== 'number');
        if (bad !== undefined) ctx.fail(atValues(bad, variables), at);
        const ls = lengths as number[];
        if (!closes(ls)) ctx.fail({ what: 'Boundary lengths', expected: 's1+s2 = s4+s5 and s2+s3 = s5+s6', received: `${ls.join(',')} at ${valuesText(variables)}` }, at);
        try {
          makeRegion(ls);
        } catch (e) {
          ctx.fail(atValues(toCodedError(e).parts, variables), at);
        }
      });
    });
  }
}

/** Validates a formula against the claim's family and theory; never evaluates user text as code. */
export function compileFormula(formula: Formula, ctx: FormulaContext): CompiledFormula {
  const theories = new Map<string, PieceSet>();
  const left = formula.left ? compileTerms(formula.left, `${ctx.path}.left`, ctx, theories) : undefined;
  const right = compileTerms(formula.right, `${ctx.path}.right`, ctx, theories);
  if (left) checkLengths(left, `${ctx.path}.left`, ctx);
  checkLengths(right, `${ctx.path}.right`, ctx);
  return { left, right, theories };
}
