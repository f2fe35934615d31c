import { addTermInPlace, polyTerms, polyText, type Polynomial } from '../engine/index.js';

/** How an equivariant value is written: in the roots z_m = y_{m+1} − y_m, expanded in y, or with its root factors pulled out. */
export const VALUE_FORMS = ['roots', 'expanded', 'factored'] as const;
export type ValueForm = (typeof VALUE_FORMS)[number];

// In the root basis variable 0 is y_1 and variable m (1 ≤ m < N) is z_m; named variables keep their index.
// A value is shown and written as JSON in the roots, each asking for the rewrite: done once per value.
const rewritten = new WeakMap<Polynomial, Map<number, Polynomial>>();

/** Rewrites a polynomial in y_1..y_N via y_m = y_1 + z_1 + … + z_{m−1}. */
export function toRootBasis(p: Polynomial, size: number): Polynomial {
  let bySize = rewritten.get(p);
  if (!bySize) rewritten.set(p, (bySize = new Map()));
  let r = bySize.get(size);
  if (!r) bySize.set(size, (r = rewrite(p, size)));
  return r;
}

// y_m = y_{m−1} + z_{m−1}: substituting x_j ↦ x_{j−1} + x_j for j = N−1 down to 1 (the new x_j is z_j)
// leaves y_1 + z_1 + … + z_{m−1} in place of every y_m, one binomial expansion per variable; expanding
// each term's product of powers of sums instead costs far more on values with many terms.
function rewrite(p: Polynomial, size: number): Polynomial {
  let cur = p;
  for (let j = size - 1; j >= 1; j--) cur = shiftVariable(cur, j);
  return cur;
}

function shiftVariable(p: Polynomial, j: number): Polynomial {
  const out: Polynomial = new Map();
  for (const t of polyTerms(p, 0)) {
    const x = [...t.exponents];
    while (x.length <= j) x.push(0);
    const e = x[j]!;
    const below = x[j - 1]!;
    let binomial = 1n; // C(e, a)
    for (let a = 0; a <= e; a++) {
      x[j - 1] = below + a;
      x[j] = e - a;
      addTermInPlace(out, x, t.coefficient * binomial);
      binomial = (binomial * BigInt(e - a)) / BigInt(a + 1);
    }
  }
  return out;
}

/** True when every coefficient in the root basis is ≥ 0 and y_1 does not occur (Graham positivity). */
export function isRootPositive(p: Polynomial, size: number): boolean {
  const r = toRootBasis(p, size);
  return polyTerms(r, 0).every((t) => t.coefficient > 0n && (t.exponents[0] ?? 0) === 0);
}

/** Name of variable k in the root basis. */
export function rootVariableName(k: number, size: number, names: readonly string[]): string {
  if (k === 0) return 'y1';
  return k < size ? `z${k}` : (names[k - size] ?? `v${k}`);
}

// f = (y_j − y_i)·q + f|_{y_j = y_i}; q collects (y_j^e − y_i^e)/(y_j − y_i) = Σ_{a+b=e−1} y_j^a y_i^b.
function divideByRoot(f: Polynomial, i: number, j: number): Polynomial | undefined {
  const rest: Polynomial = new Map();
  const q: Polynomial = new Map();
  for (const t of polyTerms(f, Math.max(i, j) + 1)) {
    const e = t.exponents;
    const ej = e[j]!;
    const ei = e[i]!;
    e[i] = ei + ej;
    e[j] = 0;
    addTermInPlace(rest, e, t.coefficient);
    for (let a = 0; a < ej; a++) {
      e[i] = ei + (ej - 1 - a);
      e[j] = a;
      addTermInPlace(q, e, t.coefficient);
    }
  }
  return rest.size === 0 ? q : undefined;
}

/** The factors y_j − y_i (i < j, with multiplicity) that divide p, and the cofactor left. */
export function rootFactors(p: Polynomial, size: number): { factors: [number, number][]; cofactor: Polynomial } {
  const factors: [number, number][] = [];
  let cofactor = p;
  if (cofactor.size === 0) return { factors, cofactor };
  for (let i = 0; i < size; i++) {
    for (let j = i + 1; j < size; j++) {
      for (;;) {
        const q = divideByRoot(cofactor, i, j);
        if (!q) break;
        factors.push([i + 1, j + 1]);
        cofactor = q;
      }
    }
  }
  return { factors, cofactor };
}

/** The value's text in a form; `roots` falls back to `expanded` when the value is not positive in the roots. */
export function formText(p: Polynomial, size: number, names: readonly string[], form: ValueForm): { form: ValueForm; text: string } {
  const yName = (k: number) => (k < size ? `y${k + 1}` : (names[k - size] ?? `v${k}`));
  if (form === 'expanded' || p.size === 0) return { form: 'expanded', text: polyText(p, yName) };
  if (form === 'roots') {
    if (!isRootPositive(p, size)) return { form: 'expanded', text: polyText(p, yName) };
    return { form, text: polyText(toRootBasis(p, size), (k) => rootVariableName(k, size, names)) };
  }
  const { factors, cofactor } = rootFactors(p, size);
  const parts = factors.map(([i, j]) => `(y${j} - y${i})`);
  const c = polyTerms(cofactor, 0);
  const constant = c.length === 1 && c[0]!.exponents.every((e) => e === 0) ? c[0]!.coefficient : undefined;
  const rest = isRootPositive(cofactor, size) ? polyText(toRootBasis(cofactor, size), (k) => rootVariableName(k, size, names)) : polyText(cofactor, yName);
  if (constant === 1n && parts.length === 1) return { form, text: parts[0]!.slice(1, -1) };
  if (constant === 1n && parts.length) return { form, text: parts.join('*') };
  if (constant === -1n && parts.length) return { form, text: `-${parts.join('*')}` };
  const cof = c.length > 1 && parts.length ? `(${rest})` : rest;
  return { form, text: [...(constant !== undefined && parts.length ? [String(constant)] : [cof]), ...parts].join('*') };
}

