import { fractionDenominator, fractionTerms, fractionText, polyTerms, polyText, type SafeInt } from '../engine/index.js';
import type { CountResult, RegionValue } from '../claims/count-region.js';
import { formText, isRootPositive, toRootBasis, type ValueForm } from './root-form.js';

/** Version of every JSON document the CLI and the library print; bumped when a field changes meaning or type. */
export const JSON_FORMAT_VERSION = 2;

/** An exact integer for JSON: a number while it is a safe integer (|x| < 2^53), a decimal string beyond. */
export function jsonInteger(x: SafeInt): number | string {
  if (typeof x === 'number') return x;
  return x <= BigInt(Number.MAX_SAFE_INTEGER) && x >= -BigInt(Number.MAX_SAFE_INTEGER) ? Number(x) : x.toString();
}

/**
 * Stable JSON of a value: an integer (see `jsonInteger`), or for polynomials
 * `{ text, form, terms: [{coefficient, exponents}] }` with exponents of y_1..y_N (then named variables),
 * plus `rootTerms` (exponents of z_1..z_{N−1}, z_m = y_{m+1} − y_m) when the value is positive in the roots.
 */
export function valueJson(v: RegionValue, form: ValueForm = 'roots'): unknown {
  if (v.type === 'integer') return jsonInteger(v.value);
  if (v.type === 'fraction') return fractionJson(v);
  const nvars = v.size + v.variableNames.length;
  const shown = formText(v.value, v.size, v.variableNames, form);
  const roots = v.value.size > 0 && isRootPositive(v.value, v.size);
  return {
    text: shown.text,
    form: shown.form,
    terms: polyTerms(v.value, nvars).map((t) => ({ coefficient: jsonInteger(t.coefficient), exponents: t.exponents })),
    ...(roots ? { rootTerms: polyTerms(toRootBasis(v.value, v.size), nvars).map((t) => ({ coefficient: jsonInteger(t.coefficient), exponents: t.exponents.slice(1, v.size) })) } : {}),
    ...(v.variableNames.length ? { variables: [...Array.from({ length: v.size }, (_, k) => `y${k + 1}`), ...v.variableNames] } : {}),
  };
}

/** A value as text in the chosen form (integers as decimals). */
export function valueText(v: RegionValue, form: ValueForm = 'roots'): string {
  if (v.type === 'integer') return v.value.toString();
  if (v.type === 'fraction') return fractionText(v.value, fractionNames(v));
  return formText(v.value, v.size, v.variableNames, form).text;
}

/** The value expanded in y, whatever the form (for machine-readable columns). */
export function expandedText(v: RegionValue): string {
  if (v.type === 'integer') return v.value.toString();
  if (v.type === 'fraction') return fractionText(v.value, fractionNames(v));
  return polyText(v.value, (k) => (k < v.size ? `y${k + 1}` : (v.variableNames[k - v.size] ?? `v${k}`)));
}

/** The `count --json` object; field names are a stable interface for other programs. */
export function countJson(r: CountResult, form: ValueForm = 'roots', extra: object = {}): object {
  return {
    formatVersion: JSON_FORMAT_VERSION,
    theory: r.theory,
    ...extra,
    lengths: [...r.region.lengths],
    sides: [...r.sides],
    region: r.completion ? 'completed' : 'own',
    ...(r.completion ? { completion: { lengths: [...r.completion.region.lengths], sides: [...r.completion.sides] } } : {}),
    puzzles: jsonInteger(r.puzzles),
    value: valueJson(r.value, form),
    ...(r.distribution ? { distribution: { kind: r.distribution.kind, counts: r.distribution.counts.map(jsonInteger) } } : {}),
  };
}

type FractionValue = Extract<RegionValue, { type: 'fraction' }>;

function fractionNames(v: FractionValue): (k: number) => string {
  return (k) => (k < v.size ? `${v.letter}${k + 1}` : (v.variableNames[k - v.size] ?? `v${k}`));
}

/**
 * JSON of a fraction value: `terms` with exponents of t_1..t_N or y_1..y_N (negative exponents for Laurent
 * polynomials) when the denominator is a monomial; otherwise `numerator` and `denominator` term lists.
 */
function fractionJson(v: FractionValue): object {
  const nvars = v.size + v.variableNames.length;
  const json = (ts: readonly { coefficient: bigint; exponents: number[] }[]) => ts.map((t) => ({ coefficient: jsonInteger(t.coefficient), exponents: t.exponents }));
  const laurent = fractionTerms(v.value, nvars);
  const variables = { variables: [...Array.from({ length: v.size }, (_, k) => `${v.letter}${k + 1}`), ...v.variableNames] };
  if (laurent) return { text: fractionText(v.value, fractionNames(v)), terms: json(laurent), ...variables };
  return {
    text: fractionText(v.value, fractionNames(v)),
    numerator: json(polyTerms(v.value.num, nvars)),
    denominator: json(polyTerms(fractionDenominator(v.value), nvars)),
    ...variables,
  };
}
