/**
 * Exact sparse multivariate polynomials over ℤ. A monomial is keyed by a string whose k-th char code is
 * the exponent of variable k (trailing zeros trimmed), so keys compare and hash cheaply.
 */
export type Polynomial = ReadonlyMap<string, bigint>;

export interface Term {
  readonly coefficient: bigint;
  readonly exponents: number[];
}

export const ZERO_POLY: Polynomial = new Map();
export const ONE_POLY: Polynomial = new Map([['', 1n]]);

export function constantPoly(c: bigint): Polynomial {
  return c === 0n ? ZERO_POLY : new Map([['', c]]);
}

function monomialKey(exponents: readonly number[]): string {
  let end = exponents.length;
  while (end > 0 && exponents[end - 1] === 0) end--;
  return String.fromCharCode(...exponents.slice(0, end));
}

/** The polynomial c·x_k. */
export function variablePoly(k: number, c = 1n): Polynomial {
  const e = new Array<number>(k + 1).fill(0);
  e[k] = 1;
  return new Map([[monomialKey(e), c]]);
}

function addInto(acc: Map<string, bigint>, key: string, c: bigint): void {
  const s = (acc.get(key) ?? 0n) + c;
  if (s === 0n) acc.delete(key);
  else acc.set(key, s);
}

export function addPoly(a: Polynomial, b: Polynomial): Polynomial {
  if (a.size === 0) return b;
  if (b.size === 0) return a;
  const acc = new Map(a);
  for (const [k, c] of b) addInto(acc, k, c);
  return acc;
}

/** `acc += b`, mutating `acc` (which must not be shared); returns `acc`. */
export function addPolyInPlace(acc: Polynomial, b: Polynomial): Polynomial {
  const m = acc as Map<string, bigint>;
  for (const [k, c] of b) addInto(m, k, c);
  return m;
}

/** `acc += c·x^exponents`, mutating `acc` (which must not be shared); returns `acc`. */
export function addTermInPlace(acc: Polynomial, exponents: readonly number[], c: bigint): Polynomial {
  if (exponents.some((e) => !Number.isInteger(e) || e < 0 || e > 0xffff)) throw new RangeError(`exponents ${exponents.join(',')} outside 0..65535`);
  if (c !== 0n) addInto(acc as Map<string, bigint>, monomialKey(exponents), c);
  return acc;
}

export function subPoly(a: Polynomial, b: Polynomial): Polynomial {
  return addPoly(a, scalePoly(b, -1n));
}

export function scalePoly(a: Polynomial, c: bigint): Polynomial {
  if (c === 0n) return ZERO_POLY;
  const acc = new Map<string, bigint>();
  for (const [k, v] of a) acc.set(k, v * c);
  return acc;
}

function mulKeys(a: string, b: string): string {
  if (a.length < b.length) [a, b] = [b, a];
  if (b.length === 0) return a;
  const codes = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) codes[i] = a.charCodeAt(i) + (i < b.length ? b.charCodeAt(i) : 0);
  return String.fromCharCode(...codes);
}

export function mulPoly(a: Polynomial, b: Polynomial): Polynomial {
  if (a.size === 0 || b.size === 0) return ZERO_POLY;
  const acc = new Map<string, bigint>();
  for (const [ka, ca] of a) for (const [kb, cb] of b) addInto(acc, mulKeys(ka, kb), ca * cb);
  return acc;
}

export function polyEquals(a: Polynomial, b: Polynomial): boolean {
  if (a.size !== b.size) return false;
  for (const [k, c] of a) if (b.get(k) !== c) return false;
  return true;
}

/** Terms with exponent vectors padded to `nvars`, sorted by exponent vector (lexicographic, descending). */
export function polyTerms(a: Polynomial, nvars: number): Term[] {
  const terms = [...a].map(([k, coefficient]) => {
    const exponents = new Array<number>(Math.max(nvars, k.length)).fill(0);
    for (let i = 0; i < k.length; i++) exponents[i] = k.charCodeAt(i);
    return { coefficient, exponents };
  });
  return terms.sort((s, t) => compareExponents(t.exponents, s.exponents));
}

function compareExponents(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

export function polyDegree(a: Polynomial): number {
  let d = 0;
  for (const k of a.keys()) {
    let s = 0;
    for (let i = 0; i < k.length; i++) s += k.charCodeAt(i);
    d = Math.max(d, s);
  }
  return d;
}

/** Readable text such as `-y1 + y2` or `2*y1*y3^2 - q`; `names[k]` names variable k. */
export function polyText(a: Polynomial, names: (k: number) => string): string {
  if (a.size === 0) return '0';
  // Highest degree first; within a degree positive terms first, each group in lex order (y1 before y2).
  const positive = (t: Term) => (t.coefficient > 0n ? 0 : 1);
  const terms = polyTerms(a, 0).sort(
    (s, t) => degreeOf(t.exponents) - degreeOf(s.exponents) || positive(s) - positive(t) || compareExponents(t.exponents, s.exponents),
  );
  return terms
    .map((t, idx) => {
      const vars = t.exponents.flatMap((e, k) => (e === 0 ? [] : [e === 1 ? names(k) : `${names(k)}^${e}`]));
      const abs = t.coefficient < 0n ? -t.coefficient : t.coefficient;
      const body = vars.length === 0 ? abs.toString() : abs === 1n ? vars.join('*') : `${abs}*${vars.join('*')}`;
      const sign = t.coefficient < 0n ? (idx === 0 ? '-' : ' - ') : idx === 0 ? '' : ' + ';
      return sign + body;
    })
    .join('');
}

function degreeOf(e: readonly number[]): number {
  return e.reduce((s, x) => s + x, 0);
}

/** Renames variables: variable k becomes variable `rename(k)` (e.g. a substitution y_m ↦ y_σ(m)). */
export function substitutePoly(a: Polynomial, rename: (k: number) => number): Polynomial {
  const acc = new Map<string, bigint>();
  for (const [key, c] of a) {
    const e: number[] = [];
    for (let k = 0; k < key.length; k++) {
      const to = rename(k);
      while (e.length <= to) e.push(0);
      e[to]! += key.charCodeAt(k);
    }
    addInto(acc, monomialKey(e), c);
  }
  return acc;
}
