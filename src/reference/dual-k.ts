import { bruhatLeq, checkGrassmannian, grassmannianStrings, inv } from './grassmannian-strings.js';
import { grothendieckTable } from './grothendieck.js';

/**
 * Converts a K-theory table in the structure-sheaf basis O_λ into the ideal-sheaf basis I_λ of Gr(k, n):
 * with O_λ = Σ_{ν≥λ} I_ν and I_λ = Σ_{ν≥λ} (−1)^{inv ν − inv λ} O_ν (Möbius inversion on Bruhat order),
 * d_{λμ}^ν = Σ_{α≥λ, β≥μ, γ≤ν} (−1)^{inv α − inv λ + inv β − inv μ} c_{αβ}^γ. Keys `${λ},${μ},${ν}`, zeros omitted.
 */
export function dualKFromStructureSheaves(k: number, n: number, table: ReadonlyMap<string, bigint>): Map<string, bigint> {
  checkGrassmannian(k, n);
  const strings = grassmannianStrings(k, n);
  const m = strings.length;
  const leq: boolean[][] = strings.map((a) => strings.map((b) => bruhatLeq(a, b)));
  const sign = (a: number, b: number): bigint => ((inv(strings[a]!) - inv(strings[b]!)) % 2 === 0 ? 1n : -1n);
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
