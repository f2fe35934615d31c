import { z } from 'zod';
import { BUILTIN_THEORIES } from '../engine/index.js';
import { EXPRESSION_PATTERN } from './affine.js';
import { pieceSetSchema } from './piece-set-schema.js';

/** Where `puzzlesweep schema` writes the JSON Schema, relative to the repository root. */
export const CLAIM_SCHEMA_FILE = 'conjectures/schema/claim.schema.json';

const expression = z
  .union([z.number().int(), z.string().regex(EXPRESSION_PATTERN, "Expression: expected an integer, a variable name or a sum such as 'a+b', 'n-1' or '2*a+1'")], {
    error: "Expression: expected an integer, a variable name or a sum such as 'a+b', 'n-1' or '2*a+1'",
  })
  .describe("An integer, a variable name, or a sum/difference of integer multiples of variables: 3, 'n', 'a+b', '2*a+1', 'n-1'.");

const side = z
  .number({ error: 'Side number: expected an integer from 1 to 6' })
  .int('Side number: expected an integer from 1 to 6')
  .min(1, 'Side number: expected an integer from 1 to 6')
  .max(6, 'Side number: expected an integer from 1 to 6')
  .describe('A side of the region, 1..6 clockwise: 1 up-right, 2 right, 3 down-right, 4 down-left, 5 left, 6 up-left.');

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

const sideList = z.union([z.literal('all'), z.array(side).min(1, 'Sides: expected at least one side')], {
  error: "Sides: expected 'all' or a list of side numbers 1..6",
});

const step = z.discriminatedUnion(
  'type',
  [
    z
      .object({ type: z.literal('rotate'), degrees: z.number().int().multipleOf(60, 'Rotation: expected a multiple of 60 degrees') })
      .strict()
      .describe('Rotate the region clockwise by `degrees` (a multiple of 60; negative turns counterclockwise). 60°: sides [σ6, σ1, …, σ5].'),
    z.object({ type: z.literal('mirror') }).strict().describe('Mirror left-right: sides [rev σ3, rev σ2, rev σ1, rev σ6, rev σ5, rev σ4].'),
    z
      .object({
        type: z.literal('complement'),
        sides: sideList.default('all'),
        labelMap: z.record(z.string(), z.string()).optional().describe('For alphabets other than {0,1}: the label permutation to apply.'),
      })
      .strict()
      .describe('Exchange labels 0 ↔ 1 on the chosen sides (or all).'),
    z
      .object({ type: z.literal('exchange'), sides: z.tuple([side, side], { error: 'Exchanged sides: expected two side numbers' }) })
      .strict()
      .describe('Exchange the strings of two sides of equal length.'),
    z.object({ type: z.literal('reverse'), sides: sideList }).strict().describe('Reverse the strings of the chosen sides.'),
    z.object({ type: z.literal('completeToTriangle') }).strict().describe('Glue the cut-off corners back: the completed triangle of side s6+s1+s2.'),
  ],
  { error: "Transform step type: expected one of 'rotate' | 'mirror' | 'complement' | 'exchange' | 'reverse' | 'completeToTriangle'" },
);

const substitutionStep = z.discriminatedUnion(
  'type',
  [
    z.object({ type: z.literal('reverseBlock'), from: expression, to: expression }).strict().describe('y_m ↦ y_(from+to−m) for from ≤ m ≤ to.'),
    z
      .object({ type: z.literal('shiftBlock'), from: expression, to: expression, by: expression })
      .strict()
      .describe('y_m ↦ y_(from + (m−from+by) mod (to−from+1)) for from ≤ m ≤ to.'),
    z
      .object({ type: z.literal('explicit'), images: z.array(z.number().int().min(1, 'Image: expected an index ≥ 1')).min(1) })
      .strict()
      .describe('y_m ↦ y_(images[m−1]) for m ≤ images.length (a permutation of 1..length); later variables stay.'),
  ],
  { error: "Substitution step type: expected one of 'reverseBlock' | 'shiftBlock' | 'explicit'" },
);

const measure = z.discriminatedUnion(
  'type',
  [
    z.object({ type: z.literal('value') }).strict().describe("The theory's weighted sum over puzzles (an integer or a polynomial)."),
    z.object({ type: z.literal('puzzles') }).strict().describe('The number of puzzles.'),
    z
      .object({ type: z.literal('statistic'), kind: z.string().min(1) })
      .strict()
      .describe('The distribution Σ_k (number of puzzles with k pieces of this kind)·t^k.'),
  ],
  { error: "Measure type: expected one of 'value' | 'puzzles' | 'statistic'" },
);

const relation = z.discriminatedUnion(
  'type',
  [
    z.object({ type: z.literal('equal') }).strict(),
    z
      .object({ type: z.literal('equalAfterSubstitution'), substitution: z.array(substitutionStep).min(1, 'Substitution: expected at least one step') })
      .strict()
      .describe('left = right with y_m ↦ y_σ(m) applied to the right value; σ is the steps composed in order.'),
    z
      .object({ type: z.literal('equalUpToPermutation'), searchSpace: z.enum(['blockReversals', 'allPermutations'], { error: "Search space: expected one of 'blockReversals' | 'allPermutations'" }) })
      .strict()
      .describe('left = right with SOME y-permutation applied to the right value: blockReversals = reverse one block y_p..y_q (or none); allPermutations = all of y_1..y_N, N ≤ 8.'),
    z.object({ type: z.literal('lessOrEqual') }).strict().describe('left ≤ right (integer measures only).'),
    z.object({ type: z.literal('greaterOrEqual') }).strict().describe('left ≥ right (integer measures only).'),
  ],
  { error: "Relation type: expected one of 'equal' | 'equalAfterSubstitution' | 'equalUpToPermutation' | 'lessOrEqual' | 'greaterOrEqual'" },
);

const compare = z
  .object({ measure, relation, rightTheory: theory.optional().describe('Theory of the right-hand side (default: the claim theory).') })
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
    transform: z.array(step, { error: 'Transform: expected a list of steps' }).describe('Steps applied to b in order, giving T(b).'),
    compare,
  })
  .strict()
  .describe('A puzzlesweep claim: for every boundary b of the family, compare(measure(b), measure(T(b))).');

export type Claim = z.infer<typeof claimSchema>;
export type ClaimInput = z.input<typeof claimSchema>;
export type TheoryInput = z.infer<typeof theory>;
export type TransformStep = Claim['transform'][number];
export type ContentCondition = Claim['family']['conditions'][number];
export type SubstitutionStep = Extract<Claim['compare']['relation'], { type: 'equalAfterSubstitution' }>['substitution'][number];
export type Measure = Claim['compare']['measure'];
export type Relation = Claim['compare']['relation'];

/** The JSON Schema of claim files (draft 2020-12), generated from the zod definition. */
export function claimJsonSchema(): object {
  return z.toJSONSchema(claimSchema, { io: 'input', target: 'draft-2020-12' });
}
