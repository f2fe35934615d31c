import { grassmannianStrings } from './grassmannian-strings.js';

import type { RefPolynomial } from './ref-polynomial.js';
import { cellFactors, csmRestrictionTable, tangentFactors, type SchwartzMacPherson } from './ssm-localization.js';
import { CodedError } from '../errors/index.js';

// A power series in one variable s, truncated: coefficients of s^0 … s^{P−1}.
type Series = bigint[];

function mulSeries(a: Series, b: Series, P: number): Series {
  const out = new Array<bigint>(P).fill(0n);
  for (let i = 0; i < P; i++) if (a[i]) for (let j = 0; i + j < P; j++) if (b[j]) out[i + j]! += a[i]! * b[j]!;
  return out;
}

function subSeries(a: Series, b: Series): Series {
  return a.map((x, i) => x - (b[i] ?? 0n));
}

// 1 / (1 + c·s) = Σ (−c s)^m.
function inverseLinear(c: bigint, P: number): Series {
  const out: Series = [];
  let p = 1n;
  for (let m = 0; m < P; m++, p *= -c) out.push(p);
  return out;
}

// The restriction along the line y_p = p·s, as a series.
function onLine(p: RefPolynomial, P: number): Series {
  const out = new Array<bigint>(P).fill(0n);
  for (const t of p.rawTerms()) {
    const degree = t.exps.reduce((a, e) => a + e, 0);
    if (degree >= P) continue;
    let c = t.coeff;
    t.exps.forEach((e, i) => (c *= BigInt(i + 1) ** BigInt(e)));
    out[degree]! += c;
  }
  return out;
}

function chernSeries(factors: ReadonlyMap<string, number>, P: number, inverse: boolean): Series {
  let acc: Series = [1n, ...new Array<bigint>(P - 1).fill(0n)];
  for (const [key, e] of factors) {
    const [j, i] = key.split(',').map(Number) as [number, number];
    const c = BigInt(j - i); // 1 + y_j − y_i on the line
    const f: Series = inverse ? inverseLinear(c, P) : [1n, c, ...new Array<bigint>(P - 2).fill(0n)];
    for (let m = 0; m < e; m++) acc = mulSeries(acc, f, P);
  }
  return acc;
}

/**
 * The structure constants of s_SM (or c_SM) at y = 0, keyed `${λ},${μ},${ν}` (zero values omitted).
 *
 * Method: the exact c_SM restrictions (Aluffi–Mihalcea operator) restricted to the line y_p = p·s, where the
 * normal weights y_j − y_i = (j − i)s stay nonzero; the same triangular solve in ℤ[[s]] truncated at
 * s^{dim+1} (dividing by c_SM(X_w°)|_w = K·s^{inv w}·Π(1 + a s) loses inv w orders, which the products with
 * later restrictions, of order ≥ inv ν, give back). The constants are rational functions without pole at 0,
 * so their value at y = 0 is the constant term. Much faster than the multivariate solve.
 */
export function schwartzMacPhersonAtZero(kind: SchwartzMacPherson, k: number, n: number): Map<string, bigint> {
  const strings = grassmannianStrings(k, n);
  const P = k * (n - k) + 2;
  const res = csmRestrictionTable(k, n);
  const at = new Map<string, Series>();
  for (const [lam, row] of res) for (const [w, v] of row) at.set(`${lam}|${w}`, onLine(v, P));
  const divisor = new Map<string, { shift: number; scale: bigint; cell: Series; tangent: Series }>();
  for (const w of strings) {
    let scale = 1n;
    let shift = 0;
    for (let i = 1; i <= n; i++) for (let j = i + 1; j <= n; j++) if (w[i - 1] === '1' && w[j - 1] === '0') {
      scale *= BigInt(j - i);
      shift++;
    }
    divisor.set(w, { shift, scale, cell: chernSeries(cellFactors(w), P, true), tangent: chernSeries(tangentFactors(w), P, true) });
  }
  const table = new Map<string, bigint>();
  strings.forEach((lam, li) => {
    for (let mi = li; mi < strings.length; mi++) {
      const mu = strings[mi]!;
      const found: Array<[string, Series]> = [];
      for (const w of strings) {
        const lw = at.get(`${lam}|${w}`);
        const mw = at.get(`${mu}|${w}`);
        if (lw === undefined || mw === undefined) continue;
        const d = divisor.get(w)!;
        let rem = mulSeries(lw, mw, P);
        if (kind === 'ssm') rem = mulSeries(rem, d.tangent, P);
        for (const [nu, c] of found) {
          const nw = at.get(`${nu}|${w}`);
          if (nw !== undefined) rem = subSeries(rem, mulSeries(c, nw, P));
        }
        // Exact division by K·s^shift: the lower coefficients must vanish and the rest be multiples of K.
        for (let m = 0; m < d.shift; m++) {
          if (rem[m] !== 0n) throw new CodedError('inexact_division', { what: `Series division at ${w}`, expected: `a multiple of s^${d.shift}`, received: `a term s^${m}` });
        }
        const shifted = rem.slice(d.shift).map((x) => {
          if (x % d.scale !== 0n) throw new CodedError('inexact_division', { what: `Series division at ${w}`, expected: `multiples of ${d.scale}`, received: `${x}` });
          return x / d.scale;
        });
        while (shifted.length < P) shifted.push(0n); // beyond the precision: never read (see above)
        const e = mulSeries(shifted, d.cell, P);
        if (e.every((x) => x === 0n)) continue;
        found.push([w, e]);
      }
      for (const [nu, c] of found) {
        if (c[0] === 0n) continue;
        table.set(`${lam},${mu},${nu}`, c[0]!);
        table.set(`${mu},${lam},${nu}`, c[0]!);
      }
    }
  });
  return table;
}
