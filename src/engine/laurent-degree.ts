import type { FormulaNode } from './weight-formula.js';

/**
 * Degree bounds of a weight formula that is a Laurent polynomial with integer coefficients: every term has
 * total degree ≤ `high` and the sum of its negative exponents is ≤ `negative`. Undefined when the formula
 * divides by anything but ± a monomial (then its values are general quotients, with no such bound).
 */
export interface LaurentSpan {
  readonly high: number;
  readonly negative: number;
}

// Degree of ± a monomial in strips and parameters; undefined for anything else (sums, integers ≠ ±1).
function monomialDegree(n: FormulaNode): number | undefined {
  switch (n.kind) {
    case 'integer':
      return n.value === 1 || n.value === -1 ? 0 : undefined;
    case 'parameter':
    case 'strip':
      return 1;
    case 'negate':
      return monomialDegree(n.operand);
    case 'power': {
      const d = monomialDegree(n.base);
      return d === undefined ? undefined : d * Math.abs(n.exponent);
    }
    case 'product': {
      const [l, r] = [monomialDegree(n.left), monomialDegree(n.right)];
      return l === undefined || r === undefined ? undefined : l + r;
    }
    default:
      return undefined;
  }
}

export function laurentSpan(n: FormulaNode): LaurentSpan | undefined {
  switch (n.kind) {
    case 'integer':
      return { high: 0, negative: 0 };
    case 'parameter':
    case 'strip':
      return { high: 1, negative: 0 };
    case 'negate':
      return laurentSpan(n.operand);
    case 'power': {
      if (n.exponent >= 0) {
        const b = laurentSpan(n.base);
        return b && { high: b.high * n.exponent, negative: b.negative * n.exponent };
      }
      const d = monomialDegree(n.base);
      return d === undefined ? undefined : { high: 0, negative: d * -n.exponent };
    }
    case 'quotient': {
      const [l, d] = [laurentSpan(n.left), monomialDegree(n.right)];
      return l === undefined || d === undefined ? undefined : { high: l.high, negative: l.negative + d };
    }
    case 'product': {
      const [l, r] = [laurentSpan(n.left), laurentSpan(n.right)];
      return l && r && { high: l.high + r.high, negative: l.negative + r.negative };
    }
    default: {
      const [l, r] = [laurentSpan(n.left), laurentSpan(n.right)];
      return l && r && { high: Math.max(l.high, r.high), negative: Math.max(l.negative, r.negative) };
    }
  }
}
