import { CodedError } from '../errors/index.js';
import { substitutionStepDef, type SubstitutionStep } from './substitutions/substitution-registry.js';

/** A permutation of y_1..y_M as 1-based images: y_m ↦ y_images[m−1]. */
export type Permutation = readonly number[];

/** σ for one class: the steps composed in order (σ = s_last ∘ … ∘ s_1), on y_1..y_m. */
export function substitutionFor(steps: readonly SubstitutionStep[], values: Readonly<Record<string, number>>, m: number): Permutation {
  let sigma = Array.from({ length: m }, (_, k) => k + 1);
  steps.forEach((s, k) => {
    const def = substitutionStepDef(s);
    const bad = def.rangeError(s, values, m);
    if (bad) throw new CodedError('invalid_claim', bad.parts, { path: `compare.relation.substitution[${k}]${bad.field ? `.${bad.field}` : ''}` });
    const step = def.images(s, values, m);
    sigma = sigma.map((x) => step[x - 1]!);
  });
  return sigma;
}

export function isInvolution(p: Permutation): boolean {
  return p.every((x, i) => p[x - 1] === i + 1);
}

export function permutationKey(p: Permutation): string {
  return p.join(',');
}

/** The search space of `equalUpToPermutation`: the identity, then every reversal of one block y_p..y_q. */
export function* blockReversals(m: number): Generator<Permutation> {
  yield Array.from({ length: m }, (_, k) => k + 1);
  for (let p = 1; p <= m; p++) {
    for (let q = p + 1; q <= m; q++) yield Array.from({ length: m }, (_, k) => (k + 1 >= p && k + 1 <= q ? p + q - k - 1 : k + 1));
  }
}

/** All permutations of 1..m in lexicographic order. */
export function* allPermutations(m: number): Generator<Permutation> {
  const a = Array.from({ length: m }, (_, k) => k + 1);
  for (;;) {
    yield [...a];
    let i = m - 2;
    while (i >= 0 && a[i]! > a[i + 1]!) i--;
    if (i < 0) return;
    let j = m - 1;
    while (a[j]! < a[i]!) j--;
    [a[i], a[j]] = [a[j]!, a[i]!];
    a.splice(i + 1, m - i - 1, ...a.slice(i + 1).reverse());
  }
}

export function isIdentity(p: Permutation): boolean {
  return p.every((x, i) => x === i + 1);
}
