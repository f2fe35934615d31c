import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compileClaimProgram, createEvaluator, parseClaim, planClaim, type Measured } from '../../../src/claims/index.js';
import { fractionTerms } from '../../../src/engine/index.js';
import { localizationValue } from '../../../src/run/localization-values.js';

const rhombi = JSON.parse(readFileSync(new URL('../../../conjectures/pieces/equivariant-k-theory-rhombi.json', import.meta.url), 'utf8')) as object;

type TermsJson = { terms: { coefficient: string; exponents: number[] }[] } | null;
const canonical = (terms: readonly { coefficient: string | bigint; exponents: readonly number[] }[]) =>
  terms
    .map((t) => `${t.coefficient}*[${t.exponents.join(',')}]`)
    .sort()
    .join(' + ');

// A triangle's value is c_{λμ}^ν with λ = side 1, μ = side 3, ν = side 5 reversed (the crosscheck convention).
function localization(m: Measured): string {
  const [lambda, mu, side5] = [m.sides[0]!, m.sides[2]!, m.sides[4]!];
  const f = localizationValue('equivariant-k-theory', lambda, mu, [...side5].reverse().join(''));
  return canonical(fractionTerms(f, lambda.length)!.filter((t) => t.coefficient !== 0n));
}

describe('a false claim over Laurent values', () => {
  it('rotating a triangle by 120° changes equivariant K values: each counterexample is confirmed exactly and both values equal localization [isobaric divided differences; Kostant–Kumar 1990]', () => {
    const program = compileClaimProgram(
      parseClaim({
        id: 'eqk-rotation',
        statement: 's',
        theory: rhombi,
        family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }] },
        transform: [{ type: 'rotate', degrees: 120 }],
        compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
      }),
    );
    const plan = planClaim(program);
    const ev = createEvaluator(program, { exact: false });
    let confirmed = 0;
    for (const cls of plan.classes()) {
      for (let i = 0n; i < plan.instanceCount(cls); i++) {
        const instance = plan.instanceAt(cls, i);
        if (ev.evaluate(instance).status !== 'fails') continue;
        const c = ev.confirm(instance);
        expect(c.status).toBe('fails');
        expect(c.method).toBe('exact');
        for (const side of [c.left, c.right]) {
          const json = side.json as TermsJson;
          expect(json === null ? '' : canonical(json.terms.length ? json.terms : [])).toBe(localization(side));
        }
        confirmed++;
      }
    }
    expect(confirmed).toBeGreaterThan(0);
  });
});
