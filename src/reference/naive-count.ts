import { evaluateFormulaText, rational, rationalAdd, rationalMul, type RefRational } from './naive-formula.js';
import { RefPolynomial } from './ref-polynomial.js';
import { CodedError } from '../errors/index.js';

// Named parameters of a formula: every name that is not a strip variable.
function formulaParameters(text: string): string[] {
  return (text.match(/[A-Za-z][A-Za-z0-9_]*/g) ?? []).filter((n) => !/^[yt]_?[ij]$/.test(n));
}

/** Weight of a piece: an integer, a named variable, or the position weight y_j − y_i of its place. */
export type NaivePieceWeight =
  | { type: 'integer'; value: number }
  | { type: 'variable'; name: string }
  | { type: 'position' }
  | { type: 'formula'; text: string };

/** A unit-triangle piece, labels clockwise: up = (left, right, bottom), down = (top, right, left). */
export interface NaivePiece {
  orientation: 'up' | 'down';
  labels: [string, string, string];
  weight: NaivePieceWeight;
}

/** Result of a naive count: the number of fillings and Σ over fillings of the product of piece weights. */
export interface NaiveCountResult {
  fillings: bigint;
  /** The value when it is a polynomial; reading it throws when the formulas' quotients leave a denominator. */
  value: RefPolynomial;
  /** The value as a quotient of polynomials (always present). */
  quotient: RefRational;
  /** Names of the named-weight variables, in order; name i is polynomial variable N + i (N = completed side). */
  variableNames: string[];
}

// Edges in completed-triangle coordinates: 'h' (x,y)–(x+1,y), 'r' (x,y)–(x,y+1), 'l' (x+1,y)–(x,y+1).
const edge = (dir: 'h' | 'r' | 'l', x: number, y: number): string => `${dir}${x},${y}`;

function triangleEdgeKeys(up: boolean, x: number, y: number): [string, string, string] {
  return up
    ? [edge('r', x, y), edge('l', x, y), edge('h', x, y)]
    : [edge('h', x, y + 1), edge('r', x + 1, y), edge('l', x, y)];
}

function checkInput(sides: readonly number[], boundary: readonly string[]): void {
  if (sides.length !== 6 || sides.some((s) => !Number.isInteger(s) || s < 0)) {
    throw new CodedError('invalid_region', { what: 'Side lengths', expected: 'six non-negative integers', received: `[${sides.join(', ')}]` });
  }
  const [s1, s2, s3, s4, s5, s6] = sides as [number, number, number, number, number, number];
  if (s1 + s2 !== s4 + s5 || s2 + s3 !== s5 + s6) {
    throw new CodedError('invalid_region', { what: 'Hexagon closure', expected: 's1+s2 = s4+s5 and s2+s3 = s5+s6', received: `[${sides.join(', ')}]` });
  }
  if (boundary.length !== 6) {
    throw new CodedError('invalid_boundary', { what: 'Boundary', expected: 'six strings', received: `${boundary.length}` });
  }
  boundary.forEach((b, i) => {
    if (b.length !== sides[i]) {
      throw new CodedError('invalid_boundary', { what: `Boundary side ${i + 1} length`, expected: `${sides[i]}`, received: `${b.length}` });
    }
  });
}

/** The boundary edges of the region, side by side, each side in clockwise order (geometry of DEVELOPERS.md). */
function boundaryEdges(sides: readonly number[]): string[][] {
  const [s1, s2, s3, s4, s5, s6] = sides as [number, number, number, number, number, number];
  const N = s6 + s1 + s2;
  const range = (len: number): number[] => Array.from({ length: len }, (_, i) => i);
  return [
    range(s1).map((i) => edge('r', 0, s6 + i)), // NW side, going up
    range(s2).map((i) => edge('h', i, N - s2)), // top, going right
    range(s3).map((i) => edge('l', s2 + i, N - s2 - i - 1)), // NE side, going down-right
    range(s4).map((i) => edge('r', N - s4, s4 - i - 1)), // right cut, going down
    range(s5).map((i) => edge('h', N - s4 - i - 1, 0)), // bottom, going left
    range(s6).map((i) => edge('l', s6 - i - 1, i)), // bottom-left cut, going up-left
  ];
}

function checkPieces(pieces: readonly NaivePiece[]): void {
  pieces.forEach((p, i) => {
    if (p.orientation !== 'up' && p.orientation !== 'down') {
      throw new CodedError('invalid_piece', { what: `Piece ${i} orientation`, expected: `'up' or 'down'`, received: `${String(p.orientation)}` });
    }
    if (!Array.isArray(p.labels) || p.labels.length !== 3 || p.labels.some((l) => typeof l !== 'string' || l === '')) {
      throw new CodedError('invalid_piece', { what: `Piece ${i} labels`, expected: 'three nonempty strings', received: `${JSON.stringify(p.labels)}` });
    }
    const w = p.weight;
    const ok =
      (w.type === 'integer' && Number.isInteger(w.value)) ||
      (w.type === 'variable' && typeof w.name === 'string' && w.name !== '') ||
      (w.type === 'formula' && typeof w.text === 'string') ||
      w.type === 'position';
    if (!ok) throw new CodedError('invalid_piece', { what: `Piece ${i} weight`, expected: 'integer, variable or position', received: `${JSON.stringify(w)}` });
  });
}

// Formula weights by place: reading the text again for every boundary of a sweep dominated its time.
const formulaCache = new Map<string, RefRational>();

/** How the backtracking sums weights: the exact quotient of polynomials, or a value at a point. */
export interface NaiveWeightAlgebra<W> {
  one: W;
  zero: W;
  add(a: W, b: W): W;
  mul(a: W, b: W): W;
  /** A piece's weight at its place, given as a quotient of polynomials (variables as in `naiveCount`). */
  lift(w: RefRational): W;
}

/**
 * The backtracking behind `naiveCount`, generic in how weights are summed: Σ over fillings of the product
 * of piece weights in the algebra `makeAlgebra` builds for the region's layout, with the number of fillings and the named variables (sorted).
 */
export function naiveSum<W>(
  sides: readonly number[],
  boundary: readonly string[],
  pieces: readonly NaivePiece[],
  makeAlgebra: (layout: { N: number; variableNames: readonly string[] }) => NaiveWeightAlgebra<W>,
): { fillings: bigint; value: W; variableNames: string[] } {
  checkInput(sides, boundary);
  checkPieces(pieces);
  const [s1, s2, , s4, , s6] = sides as [number, number, number, number, number, number];
  const N = s6 + s1 + s2;
  const inside = (x: number, y: number): boolean =>
    x >= 0 && y >= 0 && x + y <= N && x + y >= s6 && y <= N - s2 && x <= N - s4;

  const labels = new Map<string, string>();
  boundaryEdges(sides).forEach((side, i) =>
    side.forEach((e, j) => labels.set(e, boundary[i]![j]!)),
  );

  const triangles: Array<{ up: boolean; x: number; y: number; edges: [string, string, string] }> = [];
  for (let y = 0; y < N; y++) {
    for (let x = 0; x < N; x++) {
      if (inside(x, y) && inside(x + 1, y) && inside(x, y + 1)) triangles.push({ up: true, x, y, edges: triangleEdgeKeys(true, x, y) });
      if (inside(x + 1, y) && inside(x, y + 1) && inside(x + 1, y + 1)) triangles.push({ up: false, x, y, edges: triangleEdgeKeys(false, x, y) });
    }
  }

  const names = [...new Set(pieces.flatMap((p) => (p.weight.type === 'variable' ? [p.weight.name] : p.weight.type === 'formula' ? formulaParameters(p.weight.text) : [])))].sort();
  const weightOf = (p: NaivePiece, t: { up: boolean; x: number; y: number }): RefRational | null => {
    const w = p.weight;
    if (w.type === 'integer') return w.value === 1 ? null : rational(RefPolynomial.constant(BigInt(w.value)));
    if (w.type === 'variable') return rational(RefPolynomial.variable(N + names.indexOf(w.name)));
    // The least x+y is at (x,y) for an up triangle and at (x+1,y) or (x,y+1) for a down one.
    const i = t.x + 1;
    const j = t.x + t.y + (t.up ? 0 : 1) + 1;
    if (w.type === 'formula') {
      const key = `${N}|${names.join(',')}|${i},${j}|${w.text}`;
      let v = formulaCache.get(key);
      if (v === undefined) formulaCache.set(key, (v = evaluateFormulaText(w.text, { i, j }, (name) => RefPolynomial.variable(N + names.indexOf(name)))));
      return v;
    }
    return rational(RefPolynomial.difference(j - 1, i - 1));
  };
  const algebra = makeAlgebra({ N, variableNames: names });
  const byOrientation = { up: pieces.filter((p) => p.orientation === 'up'), down: pieces.filter((p) => p.orientation === 'down') };
  // A piece's weight depends only on its place: lift it once per (triangle, piece).
  const lifted = triangles.map(() => new Map<NaivePiece, W | null>());
  const liftedWeight = (index: number, p: NaivePiece): W | null => {
    const cache = lifted[index]!;
    if (!cache.has(p)) {
      const w = weightOf(p, triangles[index]!);
      cache.set(p, w === null ? null : algebra.lift(w));
    }
    return cache.get(p)!;
  };

  let fillings = 0n;
  let value = algebra.zero;
  const place = (index: number, weight: W): void => {
    if (index === triangles.length) {
      fillings++;
      value = algebra.add(value, weight);
      return;
    }
    const t = triangles[index]!;
    for (const p of t.up ? byOrientation.up : byOrientation.down) {
      const fresh: string[] = [];
      let fits = true;
      for (let s = 0; s < 3 && fits; s++) {
        const e = t.edges[s]!;
        const have = labels.get(e);
        if (have === undefined) {
          labels.set(e, p.labels[s]!);
          fresh.push(e);
        } else if (have !== p.labels[s]!) fits = false;
      }
      if (fits) {
        const w = liftedWeight(index, p);
        place(index + 1, w === null ? weight : algebra.mul(weight, w));
      }
      for (const e of fresh) labels.delete(e);
    }
  };
  place(0, algebra.one);
  return { fillings, value, variableNames: names };
}

const quotientAlgebra: NaiveWeightAlgebra<RefRational> = {
  one: rational(RefPolynomial.constant(1n)),
  zero: rational(RefPolynomial.zero()),
  add: rationalAdd,
  mul: rationalMul,
  lift: (w) => w,
};

/**
 * Counts puzzles on a hexagonal region by plain backtracking over its unit triangles (bottom row first,
 * left to right), matching labels on shared edges. Position weights are y_j − y_i with i = x+1 and
 * j = 1 + the least x+y over the triangle's vertices (y_t is polynomial variable t−1, t = 1..N with N the
 * completed side); named variables, sorted by name, are the variables N, N+1, … after them.
 */
export function naiveCount(
  sides: readonly number[],
  boundary: readonly string[],
  pieces: readonly NaivePiece[],
): NaiveCountResult {
  const { fillings, value: quotient, variableNames } = naiveSum(sides, boundary, pieces, () => quotientAlgebra);
  return {
    fillings,
    quotient,
    get value(): RefPolynomial {
      return quotient.num.divExact(quotient.den);
    },
    variableNames,
  };
}
