import { boxPoints, type Ranges } from '../affine.js';
import type { Claim } from '../claim-schema.js';
import type { CheckContext } from '../compile-context.js';
import { hasIntegerWeights } from '../resolve-theory.js';
import { compileFormula, type CompiledFormula } from './compile-formula.js';

// The right side may be compared after a permutation of the strip variables, as for a transform.
const RELATIONS = ['equal', 'lessOrEqual', 'greaterOrEqual', 'equalAfterSubstitution', 'equalUpToPermutation'];

/** The meaning checks of `compare.formula`, then its compiled form; undefined when the claim has none. */
export function checkFormula(claim: Claim, ctx: CheckContext, ranges: Ranges): CompiledFormula | undefined {
  const formula = claim.compare.formula;
  if (formula === undefined) return undefined;
  const fail = ctx.fail;
  if (claim.transform.length > 0) fail({ what: 'Transform', expected: 'no steps next to a formula (the formula builds its boundaries from b)', received: `${claim.transform.length}` }, 'transform', 'write T(b) into the formula\'s boundaries instead');
  if (claim.compare.rightTheory !== undefined) fail({ what: 'Right-hand theory', expected: 'none next to a formula', received: 'one' }, 'compare.rightTheory', 'give a boundary its own "theory" inside the formula');
  if (claim.compare.measure.type !== 'value' && claim.compare.measure.type !== 'puzzles') {
    fail({ what: 'Measure', expected: `'value' or 'puzzles' with a formula`, received: `'${claim.compare.measure.type}'` }, 'compare.measure');
  }
  if (!RELATIONS.includes(claim.compare.relation.type)) {
    fail({ what: 'Relation', expected: `${RELATIONS.map((r) => `'${r}'`).join(' | ')} with a formula`, received: `'${claim.compare.relation.type}'` }, 'compare.relation');
  }
  const compiled = compileFormula(formula, {
    theory: ctx.left,
    variables: Object.keys(ranges),
    points: () => boxPoints(ranges),
    lengths: ctx.lengths,
    path: 'compare.formula',
    fail: (message, path) => fail(message, path),
  });
  // Integer and polynomial values do not mix in one comparison.
  const integer = claim.compare.measure.type === 'puzzles' || hasIntegerWeights(ctx.left);
  for (const [name, pieces] of compiled.theories) {
    if (claim.compare.measure.type === 'value' && hasIntegerWeights(pieces) !== integer) {
      fail({ what: 'Formula theory', expected: `${integer ? 'integer' : 'polynomial'} values like the claim theory's`, received: `'${name}'` }, 'compare.formula');
    }
  }
  return compiled;
}
