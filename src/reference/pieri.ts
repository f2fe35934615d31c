import { checkGrassmannian, checkString, partitionToString, stringToPartition } from './grassmannian-strings.js';
import { CodedError } from '../errors/index.js';

/** The string of the one-row class σ_(p) in Gr(k, n). */
export function rowClass(p: number, k: number, n: number): string {
  return partitionToString(p === 0 ? [] : [p], k, n);
}

/** The string of the one-column class σ_(1^p) in Gr(k, n). */
export function columnClass(p: number, k: number, n: number): string {
  return partitionToString(new Array<number>(p).fill(1), k, n);
}

function checkStripSize(p: number, max: number, what: string): void {
  if (!Number.isInteger(p) || p < 0 || p > max) {
    throw new CodedError('invalid_argument', { what: `${what}`, expected: `an integer in [0, ${max}]`, received: `${p}` });
  }
}

/**
 * Pieri's rule σ_λ·σ_(p) = Σ σ_ν over ν ⊇ λ in the k×(n−k) box with ν/λ a horizontal p-strip
 * [Fulton, Young Tableaux, 1997, §2.2]; λ is a string of Gr(k, n) with n = λ.length.
 */
export function pieriRow(lambda: string, p: number): Map<string, bigint> {
  checkString(lambda);
  const n = lambda.length;
  const lam = stringToPartition(lambda);
  const k = lam.length;
  checkGrassmannian(k, n);
  checkStripSize(p, n - k, 'Pieri row length');
  const out = new Map<string, bigint>();
  // Horizontal strip: λ_i ≤ ν_i ≤ λ_{i−1} (with λ_0 = n−k, the box width), total growth p.
  const build = (i: number, left: number, nu: number[]): void => {
    if (i === k) {
      if (left === 0) out.set(partitionToString(nu, k, n), 1n);
      return;
    }
    const cap = i === 0 ? n - k : lam[i - 1]!;
    for (let v = lam[i]!; v <= cap && v - lam[i]! <= left; v++) build(i + 1, left - (v - lam[i]!), [...nu, v]);
  };
  build(0, p, []);
  return out;
}

/**
 * Pieri's rule σ_λ·σ_(1^p) = Σ σ_ν over ν ⊇ λ in the k×(n−k) box with ν/λ a vertical p-strip
 * [Fulton, Young Tableaux, 1997, §2.2].
 */
export function pieriColumn(lambda: string, p: number): Map<string, bigint> {
  checkString(lambda);
  const n = lambda.length;
  const lam = stringToPartition(lambda);
  const k = lam.length;
  checkGrassmannian(k, n);
  checkStripSize(p, k, 'Pieri column length');
  const out = new Map<string, bigint>();
  // Vertical strip: each row grows by 0 or 1 and the result stays a partition inside the box.
  const build = (i: number, left: number, nu: number[]): void => {
    if (i === k) {
      if (left === 0) out.set(partitionToString(nu, k, n), 1n);
      return;
    }
    for (const d of [0, 1]) {
      const v = lam[i]! + d;
      if (d > left || v > n - k || (i > 0 && v > nu[i - 1]!)) continue;
      build(i + 1, left - d, [...nu, v]);
    }
  };
  build(0, p, []);
  return out;
}
