import * as z from 'zod';
import { EXPRESSION_PATTERN } from './affine.js';

const EXPRESSION_ERROR = "Expression: expected an integer, a variable name or a sum such as 'a+b', 'n-1' or '2*a+1'";

/** An affine expression in the family's variables, as written in a claim. */
export const expressionSchema = z
  .union([z.number().int(), z.string().regex(EXPRESSION_PATTERN, EXPRESSION_ERROR)], { error: EXPRESSION_ERROR })
  .describe("An integer, a variable name, or a sum/difference of integer multiples of variables: 3, 'n', 'a+b', '2*a+1', 'n-1'.");

const SIDE_ERROR = 'Side number: expected an integer from 1 to 6';

/** A side number 1..6. */
export const sideSchema = z
  .number({ error: SIDE_ERROR })
  .int(SIDE_ERROR)
  .min(1, SIDE_ERROR)
  .max(6, SIDE_ERROR)
  .describe('A side of the region, 1..6 clockwise: 1 up-right, 2 right, 3 down-right, 4 down-left, 5 left, 6 up-left.');

/** `'all'` or a list of side numbers. */
export const sideListSchema = z.union([z.literal('all'), z.array(sideSchema).min(1, 'Sides: expected at least one side')], {
  error: "Sides: expected 'all' or a list of side numbers 1..6",
});

/** The variables an expression mentions (for metadata; malformed input mentions none). */
export function expressionVariables(e: number | string): string[] {
  return typeof e === 'number' ? [] : [...new Set(e.match(/[A-Za-z][A-Za-z0-9_]*/g) ?? [])];
}

interface RegistryEntry {
  readonly type: string;
  readonly schema: z.core.$ZodTypeDiscriminable;
}

type Schemas<T extends readonly RegistryEntry[]> = { -readonly [K in keyof T]: T[K]['schema'] };

/** A discriminated union of registry entries' schemas, whose error lists every type the registry knows. */
export function registryUnion<const T extends readonly [RegistryEntry, ...RegistryEntry[]]>(defs: T, what: string): z.ZodDiscriminatedUnion<Schemas<T>, 'type'> {
  return z.discriminatedUnion('type', defs.map((d) => d.schema) as unknown as Schemas<T> & [z.core.$ZodTypeDiscriminable], {
    error: `${what} type: expected one of ${registryTypes(defs)}`,
  });
}

/** `'a' | 'b' | …`: the types of a registry, for "expected one of" messages. */
export function registryTypes(defs: readonly RegistryEntry[]): string {
  return defs.map((d) => `'${d.type}'`).join(' | ');
}
