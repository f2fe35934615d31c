import type { ErrorParts } from '../errors/index.js';
/**
 * Affine integer expressions in the family's variables, such as `a+b`, `2*a+1` or `n-1`.
 * They are parsed by a small grammar of our own; user input is never evaluated as code.
 */

/** `constant + Σ coefficients[v]·v`. */
export interface Affine {
  readonly constant: number;
  readonly coefficients: Readonly<Record<string, number>>;
}

/** A written expression: an integer, or a string of `±term` with term = integer, name, or integer*name. */
export type ExpressionInput = number | string;

export const EXPRESSION_PATTERN = /^\s*[+-]?\s*(\d+|[A-Za-z][A-Za-z0-9_]*|\d+\s*\*\s*[A-Za-z][A-Za-z0-9_]*)(\s*[+-]\s*(\d+|[A-Za-z][A-Za-z0-9_]*|\d+\s*\*\s*[A-Za-z][A-Za-z0-9_]*))*\s*$/;

/** Error parts with the variable values where they occur appended to what was received. */
export function atValues(parts: ErrorParts, values: Readonly<Record<string, number>>): ErrorParts {
  return { ...parts, received: `${parts.received} at ${valuesText(values)}` };
}

/** Why an expression is malformed: the message parts of an `Expression` error. */
export interface ExpressionParseError {
  readonly error: ErrorParts;
}

/** Parses an expression, or returns a reason it is malformed. */
export function parseAffine(input: ExpressionInput): Affine | ExpressionParseError {
  if (typeof input === 'number') {
    return Number.isSafeInteger(input) ? { constant: input, coefficients: {} } : { error: { what: 'Expression', expected: 'an integer', received: `${input}` } };
  }
  if (!EXPRESSION_PATTERN.test(input)) return { error: { what: 'Expression', expected: "an integer, a variable name or a sum such as 'a+b' or '2*a+1'", received: `'${input}'` } };
  const coefficients: Record<string, number> = {};
  let constant = 0;
  const terms = input.replace(/\s+/g, '').match(/[+-]?[^+-]+/g) ?? [];
  for (const t of terms) {
    const sign = t.startsWith('-') ? -1 : 1;
    const body = t.replace(/^[+-]/, '');
    const m = /^(?:(\d+)\*)?([A-Za-z][A-Za-z0-9_]*)$/.exec(body);
    if (m) {
      const c = sign * (m[1] === undefined ? 1 : Number(m[1]));
      coefficients[m[2]!] = (coefficients[m[2]!] ?? 0) + c;
    } else constant += sign * Number(body);
  }
  for (const k of Object.keys(coefficients)) if (coefficients[k] === 0) delete coefficients[k];
  return { constant, coefficients };
}

export function isParseError(a: Affine | ExpressionParseError): a is ExpressionParseError {
  return 'error' in a;
}

export function evalAffine(a: Affine, values: Readonly<Record<string, number>>): number {
  let s = a.constant;
  for (const [v, c] of Object.entries(a.coefficients)) s += c * (values[v] ?? 0);
  return s;
}

export function addAffine(a: Affine, b: Affine, scale = 1): Affine {
  const coefficients: Record<string, number> = { ...a.coefficients };
  for (const [v, c] of Object.entries(b.coefficients)) coefficients[v] = (coefficients[v] ?? 0) + scale * c;
  for (const k of Object.keys(coefficients)) if (coefficients[k] === 0) delete coefficients[k];
  return { constant: a.constant + scale * b.constant, coefficients };
}

export function constantAffine(c: number): Affine {
  return { constant: c, coefficients: {} };
}

export function affineText(a: Affine): string {
  const parts: string[] = [];
  for (const [v, c] of Object.entries(a.coefficients)) parts.push(`${c < 0 ? '-' : '+'}${Math.abs(c) === 1 ? '' : `${Math.abs(c)}*`}${v}`);
  if (a.constant !== 0 || parts.length === 0) parts.push(`${a.constant < 0 ? '-' : '+'}${Math.abs(a.constant)}`);
  return parts.join('').replace(/^\+/, '');
}

/** Variable ranges, inclusive. */
export type Ranges = Readonly<Record<string, { readonly min: number; readonly max: number }>>;

/**
 * The corners of the box of variable values. An affine function attains its minimum and maximum over the
 * box at corners, so a linear (in)equality holds on the whole box iff it holds at every corner.
 */
export function boxCorners(ranges: Ranges): Record<string, number>[] {
  let out: Record<string, number>[] = [{}];
  for (const [v, r] of Object.entries(ranges)) {
    const vals = r.min === r.max ? [r.min] : [r.min, r.max];
    out = out.flatMap((c) => vals.map((x) => ({ ...c, [v]: x })));
  }
  return out;
}

/** `a=2,b=1` for variable values, in declaration order. */
export function valuesText(values: Readonly<Record<string, number>>): string {
  const s = Object.entries(values).map(([k, v]) => `${k}=${v}`).join(',');
  return s || '(no variables)';
}

/** Every integer point of the box, in order, up to `limit` points (a claim's boxes are small in practice). */
export function* boxPoints(ranges: Ranges, limit = 200_000): Generator<Record<string, number>> {
  const entries = Object.entries(ranges);
  let produced = 0;
  function* go(k: number, acc: Record<string, number>): Generator<Record<string, number>> {
    if (produced >= limit) return;
    if (k === entries.length) {
      produced++;
      yield { ...acc };
      return;
    }
    const [name, r] = entries[k]!;
    for (let x = r.min; x <= r.max; x++) yield* go(k + 1, { ...acc, [name]: x });
  }
  yield* go(0, {});
}
