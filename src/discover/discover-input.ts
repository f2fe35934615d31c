import { basename } from 'node:path';
import * as z from 'zod';
import { parseClaim, type Claim, type TheoryInput } from '../claims/index.js';
import { readJsonFile } from '../claims/resolve-theory.js';
import { fromZodError, parseMarked } from '../claims/zod-issue.js';
import { isBuiltinTheory } from '../engine/index.js';
import { CodedError } from '../errors/index.js';

const side = z.number().int().min(1, 'Side number: expected an integer from 1 to 6').max(6, 'Side number: expected an integer from 1 to 6');

/** What the candidate space may contain; every field narrows the default (everything). */
export const spaceSchema = z
  .object({
    symmetries: z.boolean().default(true).describe('Compose with the hexagon symmetries that map the family to itself (false: the identity only).'),
    complement: z
      .array(z.union([z.literal('none'), z.literal('all'), z.array(side).min(1)]), { error: "Complement choices: expected a list of 'none', 'all' or side lists such as [1, 4]" })
      .min(1)
      .default(['none', 'all'])
      .describe("Complements to compose with: 'none', 'all', or chosen sides."),
    exchange: z
      .union([z.boolean(), z.array(z.tuple([side, side]))], { error: 'Exchanges: expected true, false or a list of side pairs such as [[1, 4]]' })
      .default(true)
      .describe('Exchanges of two sides of equal length (true: every such pair; a list: only these pairs).'),
    reverseExchanged: z.boolean().default(true).describe('Also try each exchange with both exchanged sides reversed.'),
    rightTheory: z.enum(['same', 'any'], { error: "Right theory: expected 'same' or 'any'" }).default('any').describe("'any': also compare against every other given theory."),
    permutations: z
      .enum(['blockReversals', 'allPermutations'], { error: "Permutations: expected 'blockReversals' or 'allPermutations'" })
      .default('blockReversals')
      .describe('For polynomial theories: the y-permutations a candidate may use.'),
  })
  .strict();

export type DiscoverSpace = z.output<typeof spaceSchema>;

const fileSchema = z
  .object({
    $schema: z.string().optional(),
    id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "Family id: expected kebab-case such as 'parallelogram'").optional(),
    family: z.unknown(),
    space: z.unknown().optional(),
  })
  .strict();

/** A validated `discover` input: the family (as in a claim), the space, the theories and an id prefix. */
export interface DiscoverInput {
  readonly prefix: string;
  readonly family: Claim['family'];
  readonly space: DiscoverSpace;
  /** Theories as a claim's `theory` field takes them: a built-in name or an inline piece set. */
  readonly theories: readonly TheoryInput[];
  readonly file?: string | undefined;
}

/** A theory argument: a built-in name, or a piece-set file whose JSON is inlined in the claims. */
export function theoryInput(arg: string): TheoryInput {
  if (isBuiltinTheory(arg)) return arg;
  if (!/[./\\]/.test(arg)) {
    throw new CodedError('unknown_theory', { received: arg, choices: ['cohomology', 'equivariant', 'k-theory', 'dual-k-theory'], orFile: true }, { path: '--theory' });
  }
  return readJsonFile(arg, 'Piece-set file') as TheoryInput;
}

/** Validates a discover file's data; the family is checked exactly as a claim's (paths `family.…`). */
export function parseDiscoverInput(data: unknown, theories: readonly TheoryInput[], file?: string): DiscoverInput {
  const parsed = parseMarked(fileSchema, data);
  if (!parsed.success) throw fromZodError(parsed.error, 'invalid_claim', data, file);
  if (parsed.data.family === undefined) throw new CodedError('invalid_claim', { what: 'Family', expected: 'an object with sides and variables', received: 'nothing' }, { path: 'family', ...(file ? { file } : {}) });
  const space = parseMarked(spaceSchema, parsed.data.space ?? {});
  if (!space.success) throw fromZodError(space.error, 'invalid_claim', parsed.data.space, file, 'space');
  if (theories.length === 0) throw new CodedError('invalid_argument', { what: 'Theories', expected: 'at least one --theory', received: 'none' }, { path: '--theory' });
  let family: Claim['family'] | undefined;
  for (const theory of theories) {
    // The family is validated inside a claim so that its errors read exactly as a claim's do.
    const claim = parseClaim({ id: 'discover', statement: 'discover', theory, family: parsed.data.family, transform: [], compare: { measure: { type: 'value' }, relation: { type: 'equal' } } }, file);
    family ??= claim.family;
  }
  const fallback = file ? basename(file).replace(/\.json$/i, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '') : '';
  return { prefix: parsed.data.id ?? (fallback || 'family'), family: family!, space: space.data, theories, file };
}

/** Reads and validates a discover file. */
export function loadDiscoverInput(file: string, theories: readonly TheoryInput[]): DiscoverInput {
  return parseDiscoverInput(readJsonFile(file, 'Family file'), theories, file);
}
