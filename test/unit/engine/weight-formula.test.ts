import { describe, expect, it } from 'vitest';
import { formulaUses, parseWeightFormula, type FormulaNode } from '../../../src/engine/index.js';
import { CodedError } from '../../../src/errors/index.js';

// Precedence and associativity as in ordinary algebra [common practice, no source].
function show(n: FormulaNode): string {
  switch (n.kind) {
    case 'integer':
      return String(n.value);
    case 'parameter':
      return n.name;
    case 'strip':
      return `${n.letter}_${n.which}`;
    case 'negate':
      return `(-${show(n.operand)})`;
    case 'power':
      return `(${show(n.base)}^${n.exponent})`;
    default: {
      const op = { sum: '+', difference: '-', product: '*', quotient: '/' }[n.kind];
      return `(${show(n.left)}${op}${show(n.right)})`;
    }
  }
}

describe('weight formulas', () => {
  it.each([
    ['1 - t_i/t_j', '(1-(t_i/t_j))'],
    ['(y_j - y_i)/(1 + y_j - y_i)', '((y_j-y_i)/((1+y_j)-y_i))'],
    ['-q^2*y_i', '((-(q^2))*y_i)'], // −q², not (−q)²
    ['a-b-c', '((a-b)-c)'],
    ['t_j^-1', '(t_j^-1)'],
    ['yi - tj', '(y_i-t_j)'],
  ])('%s parses as %s', (text, tree) => {
    expect(show(parseWeightFormula(text))).toBe(tree);
  });

  it.each(['', '1 +', '(y_i', 'y_3', 'y_i $ 2', '2^x', 'y_i^99', '1 2'])('rejects %j with a coded error naming the field', (text) => {
    try {
      parseWeightFormula(text);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(CodedError);
      expect((e as CodedError).code).toBe('invalid_weight_formula');
      expect((e as CodedError).path).toBe('weight.formula');
      expect((e as CodedError).message).toMatch(/^Weight formula: expected .*, received /);
    }
  });

  it('reports letters, parameters and quotients', () => {
    const u = formulaUses(parseWeightFormula('(1 - t_i/t_j)*q'));
    expect([...u.letters]).toEqual(['t']);
    expect([...u.parameters]).toEqual(['q']);
    expect(u.divides).toBe(true);
    expect(formulaUses(parseWeightFormula('y_j - y_i')).divides).toBe(false);
    expect(formulaUses(parseWeightFormula('y_i^-2')).divides).toBe(true);
  });
});
