import type { z } from 'zod';
import { registryUnion } from '../schema-parts.js';
import type { MeasureDef } from './measure-def.js';
import { puzzlesMeasure } from './puzzles-measure.js';
import { statisticMeasure } from './statistic-measure.js';
import { valueMeasure } from './value-measure.js';

/** Every measure type; adding one is a module plus a line here. */
export const MEASURES = [valueMeasure, puzzlesMeasure, statisticMeasure] as const;

export const measureSchema = registryUnion(MEASURES, 'Measure');

export type Measure = z.infer<typeof measureSchema>;

const BY_TYPE = new Map<string, unknown>(MEASURES.map((d) => [d.type, d]));

export function measureDef<M extends Measure>(measure: M): MeasureDef<M> {
  return BY_TYPE.get(measure.type) as MeasureDef<M>;
}
