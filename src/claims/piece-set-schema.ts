import { z } from 'zod';

const label = z.string().min(1, 'Label: expected a nonempty string');

export const weightSchema = z.union([
  z.number().int(),
  z.literal('position'),
  z.object({ variable: z.string().regex(/^[A-Za-z][A-Za-z0-9_]*$/, 'Variable name: expected a letter followed by letters, digits or _') }).strict(),
]);

export const pieceSchema = z
  .object({
    name: z.string().optional(),
    kind: z.string().optional(),
    labels: z.tuple([label, label, label]),
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
    pieces: z.array(pieceSchema).min(1),
  })
  .strict();

export type PieceSetInput = z.infer<typeof pieceSetSchema>;
