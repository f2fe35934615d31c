import * as z from 'zod';
import { BUILTIN_THEORIES } from '../engine/index.js';
import { formulaSchema } from './formula/formula-schema.js';
import { measureSchema } from './measures/measure-registry.js';
import { relationSchema } from './relations/relation-registry.js';
import { expressionSchema, sideSchema } from './schema-parts.js';
import { transformStepSchema } from './steps/step-registry.js';
import { pieceSetSchema } from './piece-set-schema.js';

/** Where `puzzlesweep schema` writes the JSON Schema, relative to the repository root. */
export const CLAIM_SCHEMA_FILE = 'conjectures/schema/claim.schema.json';

const expression = expressionSchema;
const side = sideSchema;

const theory = z
  .union([z.enum(BUILTIN_THEORIES), pieceSetSchema], {
    error: `Theory: expected one of ${BUILTIN_THEORIES.map((t) => `'${t}'`).join(' | ')} or an inline piece set`,
  })
  .describe('A built-in theory name, or an inline custom piece set (same format as a piece-set file).');

const variable = z
  .object({
    name: z.string().regex(/^[A-Za-z][A-Za-z0-9_]*$/, 'Variable name: expected a letter followed by letters, digits or _'),
    min: z.number({ error: 'Variable bound: expected an integer' }).int('Variable bound: expected an integer'),
    max: z.number({ error: 'Variable bound: expected an integer' }).int('Variable bound: expected an integer'),
  })
  .strict()
  .describe('A family variable and its inclusive range; `puzzlesweep run --max name=value` changes the upper bound.');

const condition = z.discriminatedUnion(
  'type',
  [
    z
      .object({ type: z.literal('sameContent'), sides: z.array(side).min(2, 'Same-content sides: expected 2 or 3 sides').max(3, 'Same-content sides: expected 2 or 3 sides') })
      .strict()
      .describe('These sides (of equal length) carry the same number of each label: the same number of 0s and of 1s.'),
    z
      .object({ type: z.literal('labelCount'), side, count: expression, label: z.string().length(1, 'Label: expected one character').default('1') })
      .strict()
      .describe('Side `side` carries exactly `count` copies of `label` (default "1").'),
  ],
  { error: "Condition type: expected one of 'sameContent' | 'labelCount'" },
);

const family = z
  .object({
    sides: z
      .array(expression, { error: 'Side lengths: expected an array of 6 expressions' })
      .length(6, 'Side lengths: expected 6 expressions (s1..s6 clockwise)')
      .describe('Side lengths s1..s6 clockwise; they must close (s1+s2 = s4+s5, s2+s3 = s5+s6) for every value of the variables.'),
    variables: z.array(variable).default([]),
    conditions: z.array(condition).default([]),
    nonzeroOnly: z.boolean().default(false).describe('Only check boundaries whose left value is nonzero.'),
  })
  .strict();

const measure = measureSchema;
const relation = relationSchema;

const compare = z
  .object({
    measure,
    relation,
    rightTheory: theory.optional().describe('Theory of the right-hand side (default: the claim theory).'),
    formula: formulaSchema.optional(),
  })
  .strict()
  .describe(
    'Left = measure of the boundary b in `theory`; right = measure of T(b) in `rightTheory`. Equivariant values are polynomials in ' +
      'y_1..y_N, N = s6+s1+s2 of each side’s own completed triangle; the two sides are aligned by index (y_k on the left is y_k on the right), ' +
      'so values with different N compare as polynomials in y_1..y_max(N).',
  );

/** A claim file: one symmetry claim about puzzles over a family of boundaries. */
export const claimSchema = z
  .object({
    $schema: z.string().optional(),
    id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "Claim id: expected kebab-case such as 'mirror-complement-cohomology'"),
    statement: z.string().min(1, 'Statement: expected a nonempty sentence'),
    theory,
    family,
    transform: z.array(transformStepSchema, { error: 'Transform: expected a list of steps' }).describe('Steps applied to b in order, giving T(b).'),
    compare,
  })
  .strict()
  .describe('A puzzlesweep claim: for every boundary b of the family, compare(measure(b), measure(T(b))).');

export type Claim = z.infer<typeof claimSchema>;
export type ClaimInput = z.input<typeof claimSchema>;
export type TheoryInput = z.infer<typeof theory>;
export type TransformStep = Claim['transform'][number];
export type ContentCondition = Claim['family']['conditions'][number];
export type { SubstitutionStep } from './substitutions/substitution-registry.js';
export type Measure = Claim['compare']['measure'];
export type Relation = Claim['compare']['relation'];

/** The JSON Schema of claim files (draft 2020-12), generated from the zod definition. */
export function claimJsonSchema(): object {
  return z.toJSONSchema(claimSchema, { io: 'input', target: 'draft-2020-12' });
}
