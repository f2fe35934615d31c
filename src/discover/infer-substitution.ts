/** A rule for the permutation of y_1..y_N that a polynomial candidate needs, valid in every class. */
export type PermutationRule = { readonly type: 'identity' } | { readonly type: 'reverseBlock'; readonly from: string; readonly to: string };

/** What one verified class says: its variables, N, and the permutations serving all its instances. */
export interface ClassPermutations {
  readonly variables: Readonly<Record<string, number>>;
  readonly n: number;
  readonly common: readonly (readonly number[])[];
}

interface Expr {
  readonly coefficients: readonly number[];
  readonly constant: number;
  readonly cost: number;
}

/** The block [p, q] that a permutation reverses, or undefined when it reverses no single block (identity: undefined too). */
function reversedBlock(perm: readonly number[]): [number, number] | undefined {
  let p = 0;
  while (p < perm.length && perm[p] === p + 1) p++;
  if (p === perm.length) return undefined;
  let q = perm.length - 1;
  while (perm[q] === q + 1) q--;
  for (let i = p; i <= q; i++) if (perm[i] !== p + q + 2 - (i + 1)) return undefined;
  return [p + 1, q + 1];
}

const isIdentity = (perm: readonly number[]) => perm.every((x, i) => x === i + 1);

// Small affine expressions: coefficients in {-1, 0, 1} (2 only with one variable), constants -2..3.
function expressions(names: readonly string[]): Expr[] {
  let vectors: number[][] = [[]];
  const range = names.length === 1 ? [-1, 0, 1, 2] : [-1, 0, 1];
  for (let k = 0; k < Math.min(names.length, 4); k++) vectors = vectors.flatMap((v) => range.map((c) => [...v, c]));
  if (names.length > 4) vectors = vectors.map((v) => [...v, ...new Array<number>(names.length - 4).fill(0)]);
  const out: Expr[] = [];
  for (const coefficients of vectors) {
    for (let constant = -2; constant <= 3; constant++) {
      out.push({ coefficients, constant, cost: coefficients.reduce((s, c) => s + Math.abs(c), 0) + Math.abs(constant) * 0.5 });
    }
  }
  return out.sort((a, b) => a.cost - b.cost);
}

function evaluate(e: Expr, names: readonly string[], values: Readonly<Record<string, number>>): number {
  return names.reduce((s, n, k) => s + e.coefficients[k]! * (values[n] ?? 0), e.constant);
}

/** An expression as a claim writes it, e.g. `b+1`, `a+b`, `n-1`, `2`. */
export function expressionText(e: Expr, names: readonly string[]): string {
  let s = '';
  names.forEach((n, k) => {
    const c = e.coefficients[k]!;
    if (c === 0) return;
    s += `${c < 0 ? '-' : s ? '+' : ''}${Math.abs(c) === 1 ? '' : `${Math.abs(c)}*`}${n}`;
  });
  if (e.constant !== 0 || !s) s += `${e.constant < 0 ? '-' : s ? '+' : ''}${Math.abs(e.constant)}`;
  return s;
}

/**
 * The simplest rule serving every class: the identity if it does, else the reversal of one block
 * y_from..y_to with `from` and `to` small affine expressions in the family's variables; undefined when
 * no such rule fits (some class has no common permutation, or the blocks follow no affine pattern).
 */
export function inferPermutationRule(names: readonly string[], classes: readonly ClassPermutations[]): PermutationRule | undefined {
  if (classes.length === 0 || classes.some((c) => c.common.length === 0)) return undefined;
  if (classes.every((c) => c.common.some(isIdentity))) return { type: 'identity' };
  const blocks = classes.map((c) => ({
    identity: c.common.some(isIdentity),
    set: new Set(c.common.map(reversedBlock).filter((b): b is [number, number] => b !== undefined).map(([p, q]) => `${p},${q}`)),
  }));
  const exprs = expressions(names);
  const values = exprs.map((e) => classes.map((c) => evaluate(e, names, c.variables)));
  let best: { from: number; to: number; cost: number } | undefined;
  for (let f = 0; f < exprs.length; f++) {
    for (let t = 0; t < exprs.length; t++) {
      const cost = exprs[f]!.cost + exprs[t]!.cost;
      if (best && cost >= best.cost) continue;
      const fits = classes.every((c, k) => {
        const from = values[f]![k]!;
        const to = values[t]![k]!;
        if (from < 1 || from > to || to > c.n) return false;
        return from === to ? blocks[k]!.identity : blocks[k]!.set.has(`${from},${to}`);
      });
      // A rule that is the identity in every class would have been found above.
      if (fits && classes.some((_, k) => values[f]![k]! < values[t]![k]!)) best = { from: f, to: t, cost };
    }
  }
  if (!best) return undefined;
  return { type: 'reverseBlock', from: expressionText(exprs[best.from]!, names), to: expressionText(exprs[best.to]!, names) };
}
