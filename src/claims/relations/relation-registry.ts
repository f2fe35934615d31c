import type { z } from 'zod';
import { registryUnion } from '../schema-parts.js';
import { equalAfterSubstitutionRelation } from './equal-after-substitution-relation.js';
import { equalRelation } from './equal-relation.js';
import { equalUpToPermutationRelation } from './equal-up-to-permutation-relation.js';
import { greaterOrEqualRelation } from './greater-or-equal-relation.js';
import { lessOrEqualRelation } from './less-or-equal-relation.js';
import type { RelationDef } from './relation-def.js';

/** Every relation type; adding one is a module plus a line here. */
export const RELATIONS = [equalRelation, equalAfterSubstitutionRelation, equalUpToPermutationRelation, lessOrEqualRelation, greaterOrEqualRelation] as const;

export const relationSchema = registryUnion(RELATIONS, 'Relation');

export type Relation = z.infer<typeof relationSchema>;

const BY_TYPE = new Map<string, unknown>(RELATIONS.map((d) => [d.type, d]));

export function relationDef<R extends Relation>(relation: R): RelationDef<R> {
  return BY_TYPE.get(relation.type) as RelationDef<R>;
}
