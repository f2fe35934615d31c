import type { z } from 'zod';
import { registryUnion } from '../schema-parts.js';
import { completeToTriangleStep } from './complete-to-triangle-step.js';
import { complementStep } from './complement-step.js';
import { exchangeStep } from './exchange-step.js';
import { mirrorStep } from './mirror-step.js';
import { reverseStep } from './reverse-step.js';
import { rotateStep } from './rotate-step.js';
import type { TransformStepDef } from './transform-step-def.js';

/** Every transform step type; adding one is a module plus a line here. */
export const TRANSFORM_STEPS = [rotateStep, mirrorStep, complementStep, exchangeStep, reverseStep, completeToTriangleStep] as const;

export const transformStepSchema = registryUnion(TRANSFORM_STEPS, 'Transform step');

/** A transform step as parsed. */
export type TransformStep = z.infer<typeof transformStepSchema>;

const BY_TYPE = new Map<string, unknown>(TRANSFORM_STEPS.map((d) => [d.type, d]));

/** The registry entry of a parsed step (the schema guarantees one exists). */
export function stepDef<S extends TransformStep>(step: S): TransformStepDef<S> {
  return BY_TYPE.get(step.type) as unknown as TransformStepDef<S>;
}
