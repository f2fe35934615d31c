import { checkGrassmannian, grassmannianStrings, partitionToString, stringToPartition } from './grassmannian-strings.js';
import { CodedError } from '../errors/index.js';

/** Throws unless p is a weakly decreasing list of non-negative integers. */
export function checkPartition(p: readonly number[], what = 'Partition'): void {
  p.forEach((v, i) => {
    const prev = i === 0 ? Infinity : p[i - 1]!;
    if (!Number.isInteger(v) || v < 0 || v > prev) {
      throw new CodedError('invalid_argument', { what: `${what} part ${i + 1}`, expected: `an integer in [0, ${prev}]`, received: `${v}` });
    }
  });
}

/**
 * Tallies the LR tableaux of skew shape ν/λ by content: semistandard fillings whose reverse reading word
 * (rows right to left, top to bottom) is a lattice word [Fulton, Young Tableaux, 1997, §5]. Keys are the
 * contents with trailing zeros dropped, joined by ','; `bound` optionally caps the content (for one μ).
 */
export function lrFillingsByContent(
  lambda: readonly number[],
  nu: readonly number[],
  bound?: readonly number[],
): Map<string, bigint> {
  checkPartition(lambda, 'Partition λ');
  checkPartition(nu, 'Partition ν');
  const rows = nu.length;
  const lam = (r: number): number => lambda[r] ?? 0;
  const tally = new Map<string, bigint>();
  if (lambda.length > rows && lambda.slice(rows).some((v) => v > 0)) return tally;
  for (let r = 0; r < rows; r++) if (lam(r) > nu[r]!) return tally;

  // grid[r][c] holds the entry of a skew cell; cells of λ are never read because of the column test below.
  const grid: number[][] = nu.map((len) => new Array<number>(len).fill(0));
  const counts = new Array<number>(rows + 2).fill(0);

  const place = (r: number, c: number): void => {
    if (r === rows) {
      let end = counts.length;
      while (end > 1 && counts[end - 1] === 0) end--;
      const key = counts.slice(1, end).join(',');
      tally.set(key, (tally.get(key) ?? 0n) + 1n);
      return;
    }
    const rowLen = nu[r]!;
    if (c < lam(r)) {
      // Row finished (filled right to left), move to the row below, starting at its right end.
      place(r + 1, (nu[r + 1] ?? 0) - 1);
      return;
    }
    // Weakly increasing rows: at most the entry to the right. An entry in row r (0-based) is at most r+1
    // in an LR tableau, because a column-strict lattice filling can only put r+1 letters above row r+1.
    let hi = r + 1;
    if (c + 1 < rowLen) hi = Math.min(hi, grid[r]![c + 1]!);
    // Strictly increasing columns: above the entry of the cell above, when that cell is a skew cell.
    const lo = r > 0 && c >= lam(r - 1) ? grid[r - 1]![c]! + 1 : 1;
    for (let v = lo; v <= hi; v++) {
      if (v > 1 && counts[v]! + 1 > counts[v - 1]!) continue; // lattice condition
      if (bound !== undefined && counts[v]! + 1 > (bound[v - 1] ?? 0)) continue;
      counts[v]!++;
      grid[r]![c] = v;
      place(r, c - 1);
      counts[v]!--;
    }
  };
  place(0, (nu[0] ?? 0) - 1);
  return tally;
}

/** The Littlewood–Richardson coefficient c_{λμ}^ν for arbitrary partitions. */
export function lrCoefficient(lambda: readonly number[], mu: readonly number[], nu: readonly number[]): bigint {
  checkPartition(mu, 'Partition μ');
  const size = (p: readonly number[]): number => p.reduce((s, v) => s + v, 0);
  if (size(lambda) + size(mu) !== size(nu)) return 0n;
  const key = trimZeros(mu).join(',');
  return lrFillingsByContent(lambda, nu, mu).get(key) ?? 0n;
}

function trimZeros(p: readonly number[]): number[] {
  let end = p.length;
  while (end > 0 && p[end - 1] === 0) end--;
  return p.slice(0, end);
}

/**
 * All nonzero cohomology structure constants of Gr(k, n): σ_λ·σ_μ = Σ c_{λμ}^ν σ_ν, keyed `${λ},${μ},${ν}`
 * by strings. Each skew shape ν/λ is enumerated once and its fillings are tallied by content μ.
 */
export function lrTable(k: number, n: number): Map<string, bigint> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const parts = new Map(strings.map((s) => [s, stringToPartition(s)]));
  const table = new Map<string, bigint>();
  for (const lam of strings) {
    const lp = parts.get(lam)!;
    for (const nu of strings) {
      const np = parts.get(nu)!;
      if (!lp.every((v, i) => v <= np[i]!)) continue;
      for (const [content, count] of lrFillingsByContent(lp, np)) {
        const mu = content === '' ? [] : content.split(',').map(Number);
        // Contents have at most k parts and fit under ν, so they always index a class of Gr(k, n).
        table.set(`${lam},${partitionToString(mu, k, n)},${nu}`, count);
      }
    }
  }
  return table;
}
