import { polyTerms, polyText } from '../engine/index.js';
import type { CountResult, RegionValue } from '../claims/count-region.js';

/** Stable JSON of a value: a decimal string, or `{text, terms:[{coefficient, exponents}]}` for polynomials. */
export function valueJson(v: RegionValue): unknown {
  if (v.type === 'integer') return v.value.toString();
  const name = (k: number) => (k < v.size ? `y${k + 1}` : (v.variableNames[k - v.size] ?? `v${k}`));
  const nvars = v.size + v.variableNames.length;
  return {
    text: polyText(v.value, name),
    terms: polyTerms(v.value, nvars).map((t) => ({ coefficient: t.coefficient.toString(), exponents: t.exponents })),
    ...(v.variableNames.length ? { variables: [...Array.from({ length: v.size }, (_, k) => `y${k + 1}`), ...v.variableNames] } : {}),
  };
}

export function valueText(v: RegionValue): string {
  const json = valueJson(v);
  return typeof json === 'string' ? json : (json as { text: string }).text;
}

/** The `count --json` object; field names are a stable interface for other programs. */
export function countJson(r: CountResult): object {
  return {
    theory: r.theory,
    lengths: [...r.region.lengths],
    sides: [...r.sides],
    region: r.completion ? 'completed' : 'own',
    ...(r.completion ? { completion: { lengths: [...r.completion.region.lengths], sides: [...r.completion.sides] } } : {}),
    puzzles: r.puzzles.toString(),
    value: valueJson(r.value),
    ...(r.distribution ? { distribution: { kind: r.distribution.kind, counts: r.distribution.counts.map(String) } } : {}),
  };
}
