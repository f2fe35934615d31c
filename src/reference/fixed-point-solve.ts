/**
 * The triangular solve shared by every localization reference: at each torus-fixed point w, in the order
 * given (increasing codimension), [X_λ]|_w·[X_μ]|_w = Σ_{ν ≤ w} c_{λμ}^ν·[X_ν]|_w determines c_{λμ}^w once the
 * constants of the points below w are known. Only the value ring and the last division differ per theory.
 */
export interface FixedPointSolve<R, V> {
  /** Fixed points (Grassmannian strings) in an order where every ν ≤ w comes before w. */
  readonly strings: readonly string[];
  /** Restriction of the class of λ to the point w; undefined when it vanishes. */
  readonly at: (lam: string, w: string) => R | undefined;
  /** The left side at w: the product of the two restrictions, in the value ring. */
  readonly product: (lw: R, mw: R, w: string) => V;
  /** rem − c·[X_ν]|_w. */
  readonly subtract: (rem: V, c: V, nw: R) => V;
  readonly isZero: (v: V) => boolean;
  /** c^w from what is left at w (divides by the class of w restricted to w). */
  readonly solve: (rem: V, w: string) => V;
}

/**
 * Structure constants keyed `${λ},${μ},${ν}` (zero values omitted). With `only`, just the products of that
 * one pair (λ, μ). Commutativity fills the (μ, λ) keys from the (λ, μ) solve.
 */
export function solveAtFixedPoints<R, V>(s: FixedPointSolve<R, V>, only?: readonly [string, string]): Map<string, V> {
  const table = new Map<string, V>();
  const strings = s.strings;
  strings.forEach((lam, li) => {
    for (let mi = li; mi < strings.length; mi++) {
      const mu = strings[mi]!;
      if (only && !((only[0] === lam && only[1] === mu) || (only[0] === mu && only[1] === lam))) continue;
      const found: Array<[string, V]> = [];
      for (const w of strings) {
        // [X_λ]|_w = 0 unless λ ≤ w; then every ν ≤ w with c^ν ≠ 0 would satisfy λ ≤ ν ≤ w, so c^w = 0 too.
        const lw = s.at(lam, w);
        const mw = s.at(mu, w);
        if (lw === undefined || mw === undefined) continue;
        let rem = s.product(lw, mw, w);
        for (const [nu, c] of found) {
          const nw = s.at(nu, w);
          if (nw !== undefined) rem = s.subtract(rem, c, nw);
        }
        if (s.isZero(rem)) continue;
        found.push([w, s.solve(rem, w)]);
      }
      for (const [nu, c] of found) {
        table.set(`${lam},${mu},${nu}`, c);
        table.set(`${mu},${lam},${nu}`, c);
      }
    }
  });
  return table;
}

/** A value ring whose classes restrict into the ring itself and whose last step is an exact division. */
interface ExactRing<V> {
  mul(other: V): V;
  sub(other: V): V;
  isZero(): boolean;
  divExact(other: V): V;
}

/** The solve when c^w = (what is left at w) / [X_w]|_w exactly, as in cohomology and K-theory. */
export function solveByExactDivision<V extends ExactRing<V>>(strings: readonly string[], at: (lam: string, w: string) => V | undefined, only?: readonly [string, string]): Map<string, V> {
  return solveAtFixedPoints<V, V>(
    {
      strings,
      at,
      product: (lw, mw) => lw.mul(mw),
      subtract: (rem, c, nw) => rem.sub(c.mul(nw)),
      isZero: (v) => v.isZero(),
      solve: (rem, w) => rem.divExact(at(w, w)!),
    },
    only,
  );
}
