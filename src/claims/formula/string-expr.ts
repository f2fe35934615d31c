import type { ErrorParts } from '../../errors/index.js';
import { evalAffine, isParseError, parseAffine, type Affine } from '../affine.js';
import type { StringExpr } from './formula-schema.js';

/** Where a string is built: b's six sides and the summation strings bound so far. */
export interface StringEnv {
  readonly sides: readonly string[];
  readonly bound: ReadonlyMap<string, string>;
}

/** Lengths only, for checking a formula on every class before anything is counted. */
export interface LengthEnv {
  readonly variables: Readonly<Record<string, number>>;
  readonly sides: readonly number[];
  readonly bound: ReadonlyMap<string, number>;
}

/** A compiled string expression: its length from lengths alone, and its value. */
export interface CompiledString {
  /** The length, or a message saying why the expression is invalid for these lengths. */
  readonly length: (env: LengthEnv) => number | ErrorParts;
  readonly build: (env: StringEnv, variables: Readonly<Record<string, number>>) => string;
  /** Summation names the expression reads. */
  readonly refs: ReadonlySet<string>;
  /** The expression is a summation name, or its reverse. */
  readonly bare?: { readonly name: string; readonly reversed: boolean };
}

export type StringFail = (parts: ErrorParts, path: string) => never;

const SIDE = /^s([1-6])$/;
const NONE: ReadonlySet<string> = new Set();

/** Compiles a string expression; names must be sides s1..s6 or summation names in `scope`. */
export function compileString(expr: StringExpr, scope: ReadonlySet<string>, path: string, fail: StringFail, affine: (e: number | string, path: string) => Affine): CompiledString {
  if (typeof expr === 'string') {
    if (expr === '-') return { length: () => 0, build: () => '', refs: NONE };
    const side = SIDE.exec(expr);
    if (side) {
      const i = Number(side[1]) - 1;
      return { length: (env) => env.sides[i]!, build: (env) => env.sides[i]!, refs: NONE };
    }
    if (!scope.has(expr)) fail({ what: 'String name', expected: `'s1'..'s6' or a summation name bound before (${[...scope].map((s) => `'${s}'`).join(', ') || 'none'})`, received: `'${expr}'` }, path);
    return { length: (env) => env.bound.get(expr)!, build: (env) => env.bound.get(expr)!, refs: new Set([expr]), bare: { name: expr, reversed: false } };
  }
  if ('concat' in expr) {
    const parts = expr.concat.map((e, k) => compileString(e, scope, `${path}.concat[${k}]`, fail, affine));
    return {
      length: (env) => {
        let n = 0;
        for (const p of parts) {
          const l = p.length(env);
          if (typeof l !== 'number') return l;
          n += l;
        }
        return n;
      },
      build: (env, v) => parts.map((p) => p.build(env, v)).join(''),
      refs: new Set(parts.flatMap((p) => [...p.refs])),
    };
  }
  if ('reverse' in expr) {
    const inner = compileString(expr.reverse, scope, `${path}.reverse`, fail, affine);
    return {
      length: inner.length,
      build: (env, v) => [...inner.build(env, v)].reverse().join(''),
      refs: inner.refs,
      ...(inner.bare ? { bare: { name: inner.bare.name, reversed: !inner.bare.reversed } } : {}),
    };
  }
  if ('sort' in expr) {
    const inner = compileString(expr.sort, scope, `${path}.sort`, fail, affine);
    return { length: inner.length, build: (env, v) => [...inner.build(env, v)].sort().join(''), refs: inner.refs };
  }
  if ('complement' in expr) {
    const inner = compileString(expr.complement, scope, `${path}.complement`, fail, affine);
    return { length: inner.length, build: (env, v) => [...inner.build(env, v)].map((c) => (c === '0' ? '1' : c === '1' ? '0' : c)).join(''), refs: inner.refs };
  }
  if ('repeat' in expr) {
    const times = affine(expr.times, `${path}.times`);
    const label = expr.repeat;
    return {
      length: (env) => {
        const n = evalAffine(times, env.variables);
        return n >= 0 ? n : { what: 'Repeat count', expected: '≥ 0', received: `${n}` };
      },
      build: (_env, v) => label.repeat(evalAffine(times, v)),
      refs: NONE,
    };
  }
  const inner = compileString(expr.part, scope, `${path}.part`, fail, affine);
  const from = affine(expr.from, `${path}.from`);
  const length = affine(expr.length, `${path}.length`);
  return {
    length: (env) => {
      const whole = inner.length(env);
      if (typeof whole !== 'number') return whole;
      const [f, l] = [evalAffine(from, env.variables), evalAffine(length, env.variables)];
      if (f < 1 || l < 0 || f + l - 1 > whole) return { what: 'Part', expected: `1 ≤ from and from+length−1 ≤ ${whole}`, received: `from = ${f}, length = ${l}` };
      return l;
    },
    build: (env, v) => {
      const f = evalAffine(from, v);
      return inner.build(env, v).slice(f - 1, f - 1 + evalAffine(length, v));
    },
    refs: inner.refs,
  };
}

/** Parses an affine expression or reports the parse error through `fail`. */
export function affineOrFail(fail: StringFail, variables: ReadonlySet<string>) {
  return (e: number | string, path: string): Affine => {
    const a = parseAffine(e);
    if (isParseError(a)) return fail(a.error, path);
    for (const name of Object.keys(a.coefficients)) if (!variables.has(name)) fail({ what: 'Variable', expected: `one of ${[...variables].map((v) => `'${v}'`).join(' | ') || 'none declared'}`, received: `'${name}'` }, path);
    return a;
  };
}
