import type { z } from 'zod';
import { registryUnion } from '../schema-parts.js';
import { explicitImages } from './explicit-images.js';
import { reverseBlock } from './reverse-block.js';
import { shiftBlock } from './shift-block.js';
import type { SubstitutionStepDef } from './substitution-step-def.js';

/** Every y-substitution step type; adding one is a module plus a line here. */
export const SUBSTITUTION_STEPS = [reverseBlock, shiftBlock, explicitImages] as const;

export const substitutionStepSchema = registryUnion(SUBSTITUTION_STEPS, 'Substitution step');

export type SubstitutionStep = z.infer<typeof substitutionStepSchema>;

const BY_TYPE = new Map<string, unknown>(SUBSTITUTION_STEPS.map((d) => [d.type, d]));

export function substitutionStepDef<S extends SubstitutionStep>(step: S): SubstitutionStepDef<S> {
  return BY_TYPE.get(step.type) as SubstitutionStepDef<S>;
}
