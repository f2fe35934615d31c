/** Theories whose structure constants come from localization only (no puzzle rule is built in). */
export const LOCALIZATION_THEORIES = ['equivariant-k-theory', 'ssm', 'ssm-chern'] as const;
export type LocalizationTheory = (typeof LOCALIZATION_THEORIES)[number];

// Apart from localization-values.ts so that a command can test a name without loading the references.
export function isLocalizationTheory(name: string): name is LocalizationTheory {
  return (LOCALIZATION_THEORIES as readonly string[]).includes(name);
}
