import { checkGrassmannian } from './grassmannian-strings.js';
import { dualKTable } from './dual-k.js';
import { grothendieckTable } from './grothendieck.js';
import { localizationTable } from './localization.js';
import { lrTable } from './lr-rule.js';
import { schwartzMacPhersonAtZero } from './ssm-at-zero.js';
import { toTerms, type PolynomialTerm } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

/** The four theories the reference tables cover. */
export type ReferenceTheory = 'cohomology' | 'equivariant' | 'k-theory' | 'dual-k-theory' | 'ssm-nonequivariant';

/** One reference value: its terms in y_1..y_n (exponent vectors of length n), canonically sorted. */
export interface ReferenceValue {
  terms: PolynomialTerm[];
}

const THEORIES: readonly ReferenceTheory[] = ['cohomology', 'equivariant', 'k-theory', 'dual-k-theory', 'ssm-nonequivariant'];

function integerValue(c: bigint, n: number): ReferenceValue {
  return { terms: c === 0n ? [] : [{ coefficient: c, exponents: new Array<number>(n).fill(0) }] };
}

/**
 * All structure constants of Gr(k, n) in a theory, keyed `${λ},${μ},${ν}`. Only nonzero values are listed:
 * a missing key means the structure constant is 0. Integer theories give one term with all-zero exponents.
 */
export function referenceTable(theory: ReferenceTheory, k: number, n: number): Map<string, ReferenceValue> {
  if (!THEORIES.includes(theory)) {
    throw new CodedError('invalid_argument', { what: 'Theory', expected: `one of ${THEORIES.join(', ')}`, received: `${String(theory)}` });
  }
  checkGrassmannian(k, n);
  const out = new Map<string, ReferenceValue>();
  if (theory === 'equivariant') {
    for (const [key, p] of localizationTable(k, n)) out.set(key, { terms: toTerms(p, n) });
    return out;
  }
  const table =
    theory === 'cohomology'
      ? lrTable(k, n)
      : theory === 'k-theory'
        ? grothendieckTable(k, n)
        : theory === 'ssm-nonequivariant'
          ? schwartzMacPhersonAtZero('ssm', k, n)
          : dualKTable(k, n);
  for (const [key, c] of table) if (c !== 0n) out.set(key, integerValue(c, n));
  return out;
}
