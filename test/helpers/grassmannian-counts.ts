/** Counts that tests derive by closed formulas, independently of the code under test. */

/** Σ_{n ≤ N} Σ_k C(n,k)^3, the number of triples (λ, μ, ν) of all Gr(k, n) [common practice, no source]. */
export function tripleCount(maxN: number): number {
  let total = 0;
  for (let n = 1; n <= maxN; n++) {
    let c = 1;
    for (let k = 0; k <= n; k++) {
      total += c ** 3;
      c = (c * (n - k)) / (k + 1);
    }
  }
  return total;
}
