import { isBuiltinTheory } from '../engine/theories.js';

/** Theories whose structure constants localization computes independently of puzzles (crosscheck's reference). */
export const LOCALIZATION_THEORIES = ['equivariant-k-theory', 'ssm', 'ssm-chern'] as const;
export type LocalizationTheory = (typeof LOCALIZATION_THEORIES)[number];

// Apart from localization-values.ts so that a command can test a name without loading the references.
export function isLocalizationTheory(name: string): name is LocalizationTheory {
  return (LOCALIZATION_THEORIES as readonly string[]).includes(name);
}

/** A localization theory with no built-in piece set: `count`, `expand` and `table` compute it by localization. */
export function isLocalizationOnly(name: string): name is LocalizationTheory {
  return isLocalizationTheory(name) && !isBuiltinTheory(name);
}
