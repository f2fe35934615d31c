import type { SubstitutionStep } from './substitutions/substitution-registry.js';
import { substitutionFor, isIdentity, type Permutation } from './substitution.js';

/** What one class says: its variable values and the permutations serving all its instances. */
export interface ClassPermutations {
  readonly variables: Readonly<Record<string, number>>;
  readonly common: readonly Permutation[];
}

/** A rule serving every class: the relation to paste into the claim, and how it reads. */
export interface PermutationRule {
  readonly relation: { readonly type: 'equal' } | { readonly type: 'equalAfterSubstitution'; readonly substitution: readonly SubstitutionStep[] };
  readonly text: string;
}

interface Expr {
  readonly coefficients: readonly number[];
  readonly constant: number;
  readonly cost: number;
}

// Small affine expressions in the family's variables, simplest first: coefficients −1..2, constants −2..3.
function expressions(names: readonly string[]): Expr[] {
  let vectors: number[][] = [[]];
  for (let k = 0; k < names.length; k++) vectors = vectors.flatMap((v) => (k < 3 ? [-1, 0, 1, 2] : [0]).map((c) => [...v, c]));
  const out: Expr[] = [];
  for (const coefficients of vectors) {
    for (let constant = -2; constant <= 3; constant++) out.push({ coefficients, constant, cost: coefficients.reduce((s, c) => s + Math.abs(c), 0) + Math.abs(constant) * 0.5 });
  }
  return out.sort((a, b) => a.cost - b.cost);
}

function exprText(e: Expr, names: readonly string[]): string | number {
  let s = '';
  names.forEach((n, k) => {
    const c = e.coefficients[k]!;
    if (c !== 0) s += `${c < 0 ? '-' : s ? '+' : ''}${Math.abs(c) === 1 ? '' : `${Math.abs(c)}*`}${n}`;
  });
  if (!s) return e.constant;
  if (e.constant !== 0) s += `${e.constant < 0 ? '-' : '+'}${Math.abs(e.constant)}`;
  return s;
}

const key = (p: Permutation) => p.join(',');

/**
 * Fits one rule to every class: the identity, else one block reversal y_from..y_to, else one cyclic shift
 * of y_from..y_to by `by`, with from, to and by small affine expressions in the family's variables. A
 * class where the block is one variable (from = to) must be served by the identity. Undefined when none fits.
 */
export function inferPermutationRule(names: readonly string[], classes: readonly ClassPermutations[]): PermutationRule | undefined {
  if (classes.length === 0 || classes.some((c) => c.common.length === 0)) return undefined;
  const sets = classes.map((c) => new Set(c.common.map(key)));
  if (classes.every((c) => c.common.some(isIdentity))) return { relation: { type: 'equal' }, text: 'the identity serves every class' };
  const exprs = expressions(names);
  const values = exprs.map((e) => classes.map((c) => names.reduce((s, n, k) => s + e.coefficients[k]! * (c.variables[n] ?? 0), e.constant)));
  // Does σ (the steps at each class's values) serve every class?
  const serves = (steps: SubstitutionStep[], blockAt: (k: number) => [number, number]) =>
    classes.every((c, k) => {
      const m = c.common[0]!.length;
      const [from, to] = blockAt(k);
      // A pasted rule must pass the claim's own check 1 ≤ from ≤ to ≤ N in every class.
      if (from < 1 || from > to || to > m) return false;
      if (from === to) return c.common.some(isIdentity);
      return sets[k]!.has(key(substitutionFor(steps, c.variables, m)));
    });
  const text = (steps: SubstitutionStep[]) => `${steps.map((s) => (s.type === 'reverseBlock' ? `rev[${s.from}..${s.to}]` : s.type === 'shiftBlock' ? `shift[${s.from}..${s.to}] by ${s.by}` : '')).join(' then ')} in every class`;
  const nontrivial = (f: number, t: number) => classes.some((_, k) => values[f]![k]! < values[t]![k]!);
  for (let f = 0; f < exprs.length; f++) {
    for (let t = 0; t < exprs.length; t++) {
      if (!nontrivial(f, t)) continue;
      const steps: SubstitutionStep[] = [{ type: 'reverseBlock', from: exprText(exprs[f]!, names), to: exprText(exprs[t]!, names) }];
      if (serves(steps, (k) => [values[f]![k]!, values[t]![k]!])) return { relation: { type: 'equalAfterSubstitution', substitution: steps }, text: text(steps) };
    }
  }
  const shifts = exprs.slice(0, 64);
  for (let f = 0; f < exprs.length; f++) {
    for (let t = 0; t < exprs.length; t++) {
      if (!nontrivial(f, t)) continue;
      for (const by of shifts) {
        const steps: SubstitutionStep[] = [{ type: 'shiftBlock', from: exprText(exprs[f]!, names), to: exprText(exprs[t]!, names), by: exprText(by, names) }];
        if (serves(steps, (k) => [values[f]![k]!, values[t]![k]!])) return { relation: { type: 'equalAfterSubstitution', substitution: steps }, text: text(steps) };
      }
    }
  }
  return undefined;
}
