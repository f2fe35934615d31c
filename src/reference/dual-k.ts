import { bruhatLeq, checkGrassmannian, checkString, grassmannianStrings, stringToPartition } from './grassmannian-strings.js';
import { grothendieckTable } from './grothendieck.js';

/**
 * The Möbius function μ(λ, ν) of Bruhat order on Gr(k, n) strings, i.e. of Young's lattice of partitions:
 * (−1)^{|ν/λ|} when ν/λ is a set of boxes no two in one row or column, 0 otherwise (this lattice is
 * distributive, so μ is nonzero exactly on intervals that are Boolean [Stanley, Enumerative
 * Combinatorics I, 1986, Ex. 3.9.6]). It is NOT (−1)^{inv ν − inv λ} in general: for Gr(1,3), μ(001, 100) = 0.
 */
export function bruhatMobius(lambda: string, nu: string): bigint {
  checkString(lambda);
  checkString(nu, [...lambda].filter((c) => c === '1').length, lambda.length);
  if (!bruhatLeq(lambda, nu)) return 0n;
  const lp = stringToPartition(lambda);
  const np = stringToPartition(nu);
  const columns = new Set<number>();
  let boxes = 0;
  for (let i = 0; i < lp.length; i++) {
    const grow = np[i]! - lp[i]!;
    if (grow > 1) return 0n;
    if (grow === 1) {
      if (columns.has(np[i]!)) return 0n;
      columns.add(np[i]!);
      boxes++;
    }
  }
  return boxes % 2 === 0 ? 1n : -1n;
}

/**
 * Converts a K-theory table in the structure-sheaf basis O_λ into the ideal-sheaf basis I_λ of Gr(k, n):
 * O_λ = Σ_{ν≥λ} I_ν (the boundary of X_λ is the union of the X_ν, ν > λ), so by Möbius inversion
 * I_λ = Σ_{ν≥λ} μ(λ,ν) O_ν and d_{λμ}^ν = Σ_{α≥λ, β≥μ, γ≤ν} μ(λ,α)·μ(μ,β)·c_{αβ}^γ.
 * Keys `${λ},${μ},${ν}`, zero values omitted.
 */
export function dualKFromStructureSheaves(k: number, n: number, table: ReadonlyMap<string, bigint>): Map<string, bigint> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const m = strings.length;
  const leq: boolean[][] = strings.map((a) => strings.map((b) => bruhatLeq(a, b)));
  const mob: bigint[][] = strings.map((a) => strings.map((b) => bruhatMobius(a, b)));
  // mob[l][a] = μ(l, a); sign(a, l) below is μ(l, a).
  const sign = (a: number, l: number): bigint => mob[l]![a]!;
  const c = (a: number, b: number, g: number): bigint =>
    table.get(`${strings[a]},${strings[b]},${strings[g]}`) ?? 0n;
  const out = new Map<string, bigint>();
  // The triple sum separates: first sum γ ≤ ν, then α ≥ λ, then β ≥ μ, one index at a time.
  for (let nu = 0; nu < m; nu++) {
    const below: bigint[][] = [];
    for (let a = 0; a < m; a++) {
      const row: bigint[] = [];
      for (let b = 0; b < m; b++) {
        let s = 0n;
        for (let g = 0; g < m; g++) if (leq[g]![nu]) s += c(a, b, g);
        row.push(s);
      }
      below.push(row);
    }
    const overAlpha: bigint[][] = [];
    for (let l = 0; l < m; l++) {
      const row: bigint[] = [];
      for (let b = 0; b < m; b++) {
        let s = 0n;
        for (let a = 0; a < m; a++) if (leq[l]![a]) s += sign(a, l) * below[a]![b]!;
        row.push(s);
      }
      overAlpha.push(row);
    }
    for (let l = 0; l < m; l++) {
      for (let u = 0; u < m; u++) {
        let s = 0n;
        for (let b = 0; b < m; b++) if (leq[u]![b]) s += sign(b, u) * overAlpha[l]![b]!;
        if (s !== 0n) out.set(`${strings[l]},${strings[u]},${strings[nu]}`, s);
      }
    }
  }
  return out;
}

/** Dual K-theory structure constants of Gr(k, n): I_λ·I_μ = Σ d_{λμ}^ν I_ν for the ideal sheaves of Schubert boundaries. */
export function dualKTable(k: number, n: number): Map<string, bigint> {
  return dualKFromStructureSheaves(k, n, grothendieckTable(k, n));
}
