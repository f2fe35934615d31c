import { CodedError } from '../errors/index.js';

/** A strip variable: y or t of the piece's rising strip (i) or falling strip (j). */
export type StripLetter = 'y' | 't';

/** A parsed weight formula: a typed tree, never evaluated as code. */
export type FormulaNode =
  | { readonly kind: 'integer'; readonly value: number }
  | { readonly kind: 'parameter'; readonly name: string }
  | { readonly kind: 'strip'; readonly letter: StripLetter; readonly which: 'i' | 'j' }
  | { readonly kind: 'negate'; readonly operand: FormulaNode }
  | { readonly kind: 'power'; readonly base: FormulaNode; readonly exponent: number }
  | { readonly kind: 'sum' | 'difference' | 'product' | 'quotient'; readonly left: FormulaNode; readonly right: FormulaNode };

type Token = { kind: 'number' | 'name' | 'op'; text: string; at: number };

const MAX_EXPONENT = 64;

function fail(text: string, at: number, what: string, hint?: string): never {
  throw new CodedError('invalid_weight_formula', { what: 'Weight formula', expected: `${what}`, received: `${at >= text.length ? 'the end' : `'${text.slice(at, at + 8)}'`} at character ${at + 1} of '${text}'` }, { path: 'weight.formula', hint: hint });
}

function tokenize(text: string): Token[] {
  const out: Token[] = [];
  let p = 0;
  while (p < text.length) {
    const c = text[p]!;
    if (c === ' ') p++;
    else if (/[0-9]/.test(c)) {
      const m = /^[0-9]+/.exec(text.slice(p))![0];
      out.push({ kind: 'number', text: m, at: p });
      p += m.length;
    } else if (/[A-Za-z]/.test(c)) {
      const m = /^[A-Za-z][A-Za-z0-9_]*/.exec(text.slice(p))![0];
      out.push({ kind: 'name', text: m, at: p });
      p += m.length;
    } else if ('+-*/^()'.includes(c)) out.push({ kind: 'op', text: c, at: p++ });
    else fail(text, p, "a number, a name, '+', '-', '*', '/', '^' or a parenthesis");
  }
  return out;
}

/**
 * Parses a weight formula: integers, named parameters, the strip variables y_i, y_j, t_i, t_j, sums,
 * differences, products, quotients, unary minus and integer powers (`^` binds tightest, then `*` `/`, then
 * `+` `-`, all left-associative). Throws `invalid_weight_formula` naming the offending character.
 */
export function parseWeightFormula(text: string): FormulaNode {
  if (typeof text !== 'string' || text.trim() === '') fail(String(text), 0, 'a nonempty formula');
  const tokens = tokenize(text);
  let k = 0;
  const peek = (): Token | undefined => tokens[k];
  const at = (): number => peek()?.at ?? text.length;
  const isOp = (op: string): boolean => peek()?.kind === 'op' && peek()!.text === op;

  const atom = (): FormulaNode => {
    const t = peek();
    if (t === undefined) fail(text, text.length, 'a number, a name or a parenthesis');
    if (t.kind === 'number') {
      k++;
      const value = Number(t.text);
      if (!Number.isSafeInteger(value)) fail(text, t.at, 'an integer below 2^53');
      return { kind: 'integer', value };
    }
    if (t.kind === 'name') {
      k++;
      const strip = /^([yt])_?([ij])$/.exec(t.text);
      if (strip) return { kind: 'strip', letter: strip[1] as StripLetter, which: strip[2] as 'i' | 'j' };
      if (/^[yt]_?[0-9]+$/.test(t.text)) fail(text, t.at, 'y_i, y_j, t_i or t_j (a piece knows only its own two strips)');
      return { kind: 'parameter', name: t.text };
    }
    if (t.text === '(') {
      k++;
      const inner = sum();
      if (!isOp(')')) fail(text, at(), "')'");
      k++;
      return inner;
    }
    return fail(text, t.at, 'a number, a name or a parenthesis');
  };
  const power = (): FormulaNode => {
    const base = atom();
    if (!isOp('^')) return base;
    k++;
    let sign = 1;
    if (isOp('-')) {
      sign = -1;
      k++;
    }
    const t = peek();
    if (t?.kind !== 'number') fail(text, at(), 'an integer exponent');
    k++;
    const exponent = sign * Number(t.text);
    if (Math.abs(exponent) > MAX_EXPONENT) fail(text, t.at, `an exponent of absolute value at most ${MAX_EXPONENT}`);
    return { kind: 'power', base, exponent };
  };
  const unary = (): FormulaNode => {
    if (isOp('-')) {
      k++;
      return { kind: 'negate', operand: unary() };
    }
    return power();
  };
  const product = (): FormulaNode => {
    let left = unary();
    while (isOp('*') || isOp('/')) {
      const kind = peek()!.text === '*' ? 'product' : 'quotient';
      k++;
      left = { kind, left, right: unary() };
    }
    return left;
  };
  const sum = (): FormulaNode => {
    let left = product();
    while (isOp('+') || isOp('-')) {
      const kind = peek()!.text === '+' ? 'sum' : 'difference';
      k++;
      left = { kind, left, right: product() };
    }
    return left;
  };
  const tree = sum();
  if (k < tokens.length) fail(text, at(), "an operator or the end of the formula");
  return tree;
}

/** What a formula uses: strip letters, named parameters, and whether it divides (quotients or negative powers). */
export function formulaUses(node: FormulaNode): { letters: Set<StripLetter>; parameters: Set<string>; divides: boolean } {
  const letters = new Set<StripLetter>();
  const parameters = new Set<string>();
  let divides = false;
  const walk = (n: FormulaNode): void => {
    switch (n.kind) {
      case 'integer':
        return;
      case 'parameter':
        parameters.add(n.name);
        return;
      case 'strip':
        letters.add(n.letter);
        return;
      case 'negate':
        return walk(n.operand);
      case 'power':
        if (n.exponent < 0) divides = true;
        return walk(n.base);
      default:
        if (n.kind === 'quotient') divides = true;
        walk(n.left);
        walk(n.right);
    }
  };
  walk(node);
  return { letters, parameters, divides };
}

/** Total degree of a quotient-free formula in its strips and parameters: bounds a piece's weight degree. */
export function formulaDegree(node: FormulaNode): number {
  switch (node.kind) {
    case 'integer':
      return 0;
    case 'parameter':
    case 'strip':
      return 1;
    case 'negate':
      return formulaDegree(node.operand);
    case 'power':
      return formulaDegree(node.base) * Math.max(node.exponent, 0);
    case 'product':
      return formulaDegree(node.left) + formulaDegree(node.right);
    default:
      return Math.max(formulaDegree(node.left), formulaDegree(node.right));
  }
}

/** The operations a formula needs from a value ring. */
export interface FormulaRing<T> {
  readonly one: T;
  add(a: T, b: T): T;
  mul(a: T, b: T): T;
  fromInteger(n: number): T;
  variable(name: string): T;
  /** The strip variable y_m or t_m (1-based m). */
  strip(letter: StripLetter, index: number): T;
  /** Exact quotient; may throw when the ring cannot divide. */
  divide(a: T, b: T): T;
}

/** Evaluates a formula for a piece whose strips are i (rising) and j (falling). */
export function evaluateFormula<T>(node: FormulaNode, ring: FormulaRing<T>, strips: { i: number; j: number }): T {
  const go = (n: FormulaNode): T => {
    switch (n.kind) {
      case 'integer':
        return ring.fromInteger(n.value);
      case 'parameter':
        return ring.variable(n.name);
      case 'strip':
        return ring.strip(n.letter, n.which === 'i' ? strips.i : strips.j);
      case 'negate':
        return ring.mul(ring.fromInteger(-1), go(n.operand));
      case 'power': {
        const b = go(n.base);
        let acc = ring.one;
        for (let e = 0; e < Math.abs(n.exponent); e++) acc = ring.mul(acc, b);
        return n.exponent < 0 ? ring.divide(ring.one, acc) : acc;
      }
      case 'sum':
        return ring.add(go(n.left), go(n.right));
      case 'difference':
        return ring.add(go(n.left), ring.mul(ring.fromInteger(-1), go(n.right)));
      case 'product':
        return ring.mul(go(n.left), go(n.right));
      case 'quotient':
        return ring.divide(go(n.left), go(n.right));
    }
  };
  return go(node);
}
