import { divideFraction, fractionOf, type Fraction, type Polynomial, type StripLetter } from '../engine/index.js';
import { CodedError } from '../errors/index.js';
import type { Product } from '../products/expand-product.js';
import type { Grassmannian } from '../products/partition-strings.js';
import type { TableEntry } from '../products/structure-table.js';
import { kLocalizationTable } from '../reference/k-localization.js';
import type { RefFraction } from '../reference/ref-fraction.js';
import type { RefLaurent } from '../reference/ref-laurent.js';
import { schwartzMacPhersonTable } from '../reference/ssm-localization.js';

import type { LocalizationTheory } from './localization-theories.js';

export { LOCALIZATION_THEORIES, isLocalizationOnly, isLocalizationTheory, type LocalizationTheory } from './localization-theories.js';

/** The letter of a theory's variables: t_m = e^{y_m} for equivariant K-theory, y_m otherwise. */
export function localizationLetter(theory: LocalizationTheory): StripLetter {
  return theory === 'equivariant-k-theory' ? 't' : 'y';
}

function poly(terms: ReadonlyArray<{ coeff: bigint; exps: readonly number[] }>, shift: (i: number) => number = () => 0): Polynomial {
  const m = new Map<string, bigint>();
  for (const t of terms) {
    const len = Math.max(t.exps.length, 16);
    const e = Array.from({ length: len }, (_, i) => (t.exps[i] ?? 0) + shift(i));
    while (e.length > 0 && e[e.length - 1] === 0) e.pop();
    const key = String.fromCharCode(...e);
    m.set(key, (m.get(key) ?? 0n) + t.coeff);
  }
  return m;
}

function fromLaurent(v: RefLaurent): Fraction {
  // t^shift·poly = (poly·t^{max(shift,0)}) / t^{max(−shift,0)}
  const num = fractionOf(poly(v.poly.rawTerms(), (i) => Math.max(v.shift[i] ?? 0, 0)));
  const den = fractionOf(poly([{ coeff: 1n, exps: v.shift.map((e) => Math.max(-e, 0)) }]));
  return divideFraction(num, den);
}

function fromChernFraction(v: RefFraction): Fraction {
  let acc = fractionOf(poly(v.numerator.rawTerms()));
  for (const [key, e] of v.denominator) {
    const [j, i] = key.split(',').map(Number) as [number, number];
    const exps = (m: number) => Array.from({ length: m }, (_, q) => (q === m - 1 ? 1 : 0));
    const factor = poly([{ coeff: 1n, exps: [] }, { coeff: 1n, exps: exps(j) }, { coeff: -1n, exps: exps(i) }]);
    for (let m = 0; m < e; m++) acc = divideFraction(acc, fractionOf(factor));
  }
  return acc;
}

/**
 * Structure constants of Gr(k, n) by localization, as exact fractions keyed `${λ},${μ},${ν}` (zero values
 * omitted): equivariant K-theory (Laurent in t), s_SM and c_SM (quotients in y). With `only`, one pair.
 */
export function localizationValues(theory: LocalizationTheory, k: number, n: number, only?: readonly [string, string]): Map<string, Fraction> {
  const out = new Map<string, Fraction>();
  if (theory === 'equivariant-k-theory') {
    for (const [key, v] of kLocalizationTable(k, n, only)) out.set(key, fromLaurent(v));
  } else {
    for (const [key, v] of schwartzMacPhersonTable(theory === 'ssm' ? 'ssm' : 'csm', k, n, only)) out.set(key, fromChernFraction(v));
  }
  return out;
}

/** One structure constant c_{λμ}^ν by localization; throws `invalid_argument` unless λ, μ, ν share a Grassmannian. */
export function localizationValue(theory: LocalizationTheory, lambda: string, mu: string, nu: string): Fraction {
  const ones = (s: string) => [...s].filter((c) => c === '1').length;
  const n = lambda.length;
  if (mu.length !== n || nu.length !== n || ones(mu) !== ones(lambda) || ones(nu) !== ones(lambda) || !/^[01]+$/.test(lambda + mu + nu)) {
    throw new CodedError('invalid_argument', { what: '--triangle', expected: 'three 0/1 strings of one Gr(k, n)', received: `${lambda},${mu},${nu}` }, { path: '--triangle' });
  }
  return localizationValues(theory, ones(lambda), n, [lambda, mu]).get(`${lambda},${mu},${nu}`) ?? fractionOf(new Map());
}

/** The whole product σ_λ·σ_μ by localization, in the form `expand` prints (ν in lexicographic order). */
export function localizationProduct(theory: LocalizationTheory, lambda: string, mu: string): Product {
  const ones = (s: string) => [...s].filter((c) => c === '1').length;
  const n = lambda.length;
  if (mu.length !== n || ones(mu) !== ones(lambda) || !/^[01]+$/.test(lambda + mu)) {
    throw new CodedError('invalid_argument', { what: '--triangle', expected: 'two 0/1 strings of one Gr(k, n)', received: `${lambda},${mu}` }, { path: '--triangle' });
  }
  const prefix = `${lambda},${mu},`;
  const letter = localizationLetter(theory);
  const products = [...localizationValues(theory, ones(lambda), n, [lambda, mu])]
    .filter(([key]) => key.startsWith(prefix))
    .map(([key, value]) => ({ nu: key.slice(prefix.length), value: { type: 'fraction' as const, value, size: n, letter, variableNames: [] as string[] } }))
    .sort((a, b) => (a.nu < b.nu ? -1 : a.nu > b.nu ? 1 : 0));
  return { theory, lambda, mu, products };
}

/** Every nonzero structure constant of Gr(k, n) by localization, as `table` lists them (sorted by λ, μ, ν). */
export function localizationTableRows(theory: LocalizationTheory, g: Grassmannian): TableEntry[] {
  const letter = localizationLetter(theory);
  const rows = [...localizationValues(theory, g.k, g.n)].map(([key, value]) => {
    const [lambda, mu, nu] = key.split(',') as [string, string, string];
    return { lambda, mu, nu, value: { type: 'fraction' as const, value, size: g.n, letter, variableNames: [] as string[] } };
  });
  const order = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  return rows.sort((a, b) => order(a.lambda, b.lambda) || order(a.mu, b.mu) || order(a.nu, b.nu));
}
