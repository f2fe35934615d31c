import type { PieceSet } from '../engine/index.js';
import type { RegionValue } from '../claims/count-region.js';
import { expandProduct } from './expand-product.js';
import type { Grassmannian } from './partition-strings.js';

/** One nonzero structure constant c_{λμ}^ν. */
export interface TableEntry {
  readonly lambda: string;
  readonly mu: string;
  readonly nu: string;
  readonly value: RegionValue;
}

/** Every Schubert class of Gr(k, n) as a 0/1 string, in lexicographic order. */
export function schubertStrings(g: Grassmannian): string[] {
  const out: string[] = [];
  const walk = (prefix: string, ones: number): void => {
    if (prefix.length === g.n) {
      if (ones === g.k) out.push(prefix);
      return;
    }
    if (g.n - prefix.length > g.k - ones) walk(`${prefix}0`, ones);
    if (ones < g.k) walk(`${prefix}1`, ones + 1);
  };
  walk('', 0);
  return out;
}

/** The products σ_λ·σ_μ for the given λ and every μ of Gr(k, n), flattened to entries. */
export function tableRows(pieces: PieceSet, g: Grassmannian, lambdas: readonly string[], onPair?: () => void): TableEntry[] {
  const all = schubertStrings(g);
  const out: TableEntry[] = [];
  for (const lambda of lambdas) {
    for (const mu of all) {
      for (const t of expandProduct(pieces, lambda, mu).products) out.push({ lambda, mu, nu: t.nu, value: t.value });
      onPair?.();
    }
  }
  return out;
}
