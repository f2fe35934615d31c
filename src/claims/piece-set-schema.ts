import * as z from 'zod';
import { migrateLegacyPieces } from './legacy-pieces.js';

const label = z.string().min(1, 'Label: expected a nonempty string');

export const weightSchema = z.union([
  z.number().int(),
  z.literal('position'),
  z.object({ variable: z.string().regex(/^[A-Za-z][A-Za-z0-9_]*$/, 'Variable name: expected a letter followed by letters, digits or _') }).strict(),
  z
    .object({ formula: z.string().min(1, 'Weight formula: expected a nonempty formula') })
    .strict()
    .describe('A formula in y_i, y_j (or t_i, t_j) of the piece strips, integers and named parameters: + - * / ^ and parentheses.'),
]);

/** A triangle's three edge labels, named by the direction of the edge: horizontal, rising (/), falling (\). */
export const edgesSchema = z
  .object({ horizontal: label, rising: label, falling: label })
  .strict()
  .describe('Edge labels by edge direction: horizontal, rising (/) and falling (\\).');

export const pieceSchema = z
  .object({
    name: z.string().optional(),
    kind: z.string().optional(),
    edges: edgesSchema,
    orientations: z.array(z.enum(['up', 'down'])).min(1),
    rotations: z.boolean().optional(),
    weight: weightSchema.optional(),
  })
  .strict();

/** A custom piece set as data: boundary labels (one character each) and unit-triangle pieces. */
export const pieceSetSchema = z
  .object({
    $schema: z.string().optional(),
    name: z.string().min(1),
    boundaryLabels: z.array(z.string()).min(1),
    // Files in the old positional form ("labels": [a, b, c]) are rewritten with a deprecation warning.
    pieces: z.preprocess(migrateLegacyPieces, z.array(pieceSchema).min(1)),
  })
  .strict();

export type PieceSetInput = z.infer<typeof pieceSetSchema>;
