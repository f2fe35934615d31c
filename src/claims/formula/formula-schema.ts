import * as z from 'zod';
import { EXPRESSION_PATTERN } from '../affine.js';

const expression = z
  .union([z.number().int(), z.string().regex(EXPRESSION_PATTERN, "Expression: expected an integer, a variable name or a sum such as 'a+b', 'n-1' or '2*a+1'")], {
    error: "Expression: expected an integer, a variable name or a sum such as 'a+b', 'n-1' or '2*a+1'",
  })
  .describe("An integer, or an affine expression in the family's variables: 3, 'n', 'a+b', 'n-1'.");

/** A string built from b's sides and the summation strings; never evaluated as code. */
export type StringExpr =
  | string
  | { readonly concat: readonly StringExpr[] }
  | { readonly reverse: StringExpr }
  | { readonly sort: StringExpr }
  | { readonly complement: StringExpr }
  | { readonly part: StringExpr; readonly from: number | string; readonly length: number | string }
  | { readonly repeat: string; readonly times: number | string };

const STRING_ERROR = "String: expected 's1'..'s6' (a side of b), a summation name, '-' (empty), or one of { concat }, { reverse }, { sort }, { complement }, { part, from, length }, { repeat, times }";

export const stringExprSchema: z.ZodType<StringExpr> = z.lazy(() =>
  z.union(
    [
      z.string().regex(/^(-|[A-Za-z][A-Za-z0-9_]*)$/, STRING_ERROR),
      z.object({ concat: z.array(stringExprSchema).min(1) }).strict(),
      z.object({ reverse: stringExprSchema }).strict(),
      z.object({ sort: stringExprSchema }).strict(),
      z.object({ complement: stringExprSchema }).strict(),
      z.object({ part: stringExprSchema, from: expression, length: expression }).strict().describe('Characters from..from+length−1 (1-based) of a string.'),
      z.object({ repeat: z.string().length(1, 'Repeated label: expected one character'), times: expression }).strict().describe('One label repeated `times` times.'),
    ],
    { error: STRING_ERROR },
  ),
);

const theoryName = z.string().min(1).describe('A built-in theory name (default: the claim theory).');

const boundary = z.union(
  [
    z.object({ sides: z.array(stringExprSchema).length(6, 'Sides: expected 6 strings, clockwise from the up-right side'), theory: theoryName.optional() }).strict(),
    z
      .object({ triangle: z.array(stringExprSchema).length(3, 'Triangle: expected [λ, μ, ν]'), theory: theoryName.optional() })
      .strict()
      .describe('c_{λμ}^ν on the upright triangle: sides [λ, -, μ, -, reverse ν, -].'),
  ],
  { error: 'Boundary: expected { sides: [6 strings] } or { triangle: [λ, μ, ν] }' },
);

const binder = z.union(
  [
    z
      .object({ name: z.string().regex(/^[A-Za-z][A-Za-z0-9_]*$/), length: expression, ones: expression.optional() })
      .strict()
      .describe('Every string of this length (with exactly `ones` 1s when given).'),
    z.object({ name: z.string().regex(/^[A-Za-z][A-Za-z0-9_]*$/), sameContentAs: stringExprSchema }).strict().describe('Every rearrangement of a string: the labelings with its content.'),
  ],
  { error: 'Summation: expected { name, length, ones? } or { name, sameContentAs }' },
);

const term = z
  .object({
    coefficient: z.number().int().default(1),
    sum: z.array(binder).default([]).describe('Summation strings, bound in order (a later one may use an earlier one).'),
    product: z.array(boundary).min(1, 'Product: expected at least one boundary'),
  })
  .strict();

/** `compare.formula`: each side a sum of terms Σ_η coefficient·Π value(boundary built from b and η). */
export const formulaSchema = z
  .object({
    left: z.array(term).min(1).optional().describe('Default: the measure of b itself.'),
    right: z.array(term).min(1),
  })
  .strict()
  .describe('Sum-of-products sides over values of boundaries built from b; replaces measure(b) (left, when given) and measure(T(b)) (right).');

export type Formula = z.output<typeof formulaSchema>;
export type FormulaTerm = Formula['right'][number];
export type FormulaBoundary = FormulaTerm['product'][number];
export type FormulaBinder = FormulaTerm['sum'][number];
