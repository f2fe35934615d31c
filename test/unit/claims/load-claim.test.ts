import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { claimJsonSchema, loadClaim, parseClaim } from '../../../src/claims/index.js';
import { CodedError, formatError } from '../../../src/errors/index.js';

const fixtures = fileURLToPath(new URL('../../fixtures/claims/', import.meta.url));
const files = (dir: string) => readdirSync(join(fixtures, dir)).filter((f) => f.endsWith('.json'));

function failure(file: string): CodedError {
  try {
    loadClaim(join(fixtures, 'invalid', file));
  } catch (e) {
    if (e instanceof CodedError) return e;
    throw e;
  }
  throw new Error(`${file} was accepted`);
}

describe('loadClaim', () => {
  it.each(files('valid'))('accepts valid/%s', (f) => {
    const claim = loadClaim(join(fixtures, 'valid', f));
    expect(claim.id).toBe(f.replace(/\.json$/, ''));
  });

  // Expected message parts written by hand from the fixture's defect (common practice, no source).
  const expected: Record<string, { code: string; path: string; message: RegExp }> = {
    'missing-id.json': { code: 'invalid_claim', path: 'id', message: /^Claim id: expected string, received nothing$/ },
    'id-not-kebab.json': { code: 'invalid_claim', path: 'id', message: /kebab-case.*received "Mirror_Claim"/ },
    'unknown-key.json': { code: 'invalid_claim', path: '(top level)', message: /received 'extra'/ },
    'unknown-theory.json': { code: 'invalid_claim', path: 'theory', message: /'cohomology' \| 'equivariant' \| 'k-theory' \| 'dual-k-theory'.*received "quantum"/ },
    'bad-custom-piece-set.json': { code: 'invalid_claim', path: 'theory.pieces[0].edges.falling', message: /^Falling edge label: expected string, received nothing/ },
    'bad-weight-formula.json': { code: 'invalid_claim', path: 'theory.pieces[2].weight.formula', message: /^Weight formula: expected '\)', received the end/ },
    'bad-step-type.json': { code: 'invalid_claim', path: 'transform[0].type', message: /'rotate' \| 'mirror'.*received "spin"/ },
    'rotate-not-multiple.json': { code: 'invalid_claim', path: 'transform[0].degrees', message: /multiple of 60.*received 45/ },
    'bad-expression.json': { code: 'invalid_claim', path: 'family.sides[0]', message: /^Expression: expected .*received "n\*n"/ },
    'unknown-variable.json': { code: 'invalid_claim', path: 'family.sides[0]', message: /expected one of 'n', received 'm'/ },
    'sides-do-not-close.json': { code: 'invalid_claim', path: 'family.sides', message: /do not close.*received 1,0,1,0,3,0 at a=1,b=3/ },
    'negative-length.json': { code: 'invalid_claim', path: 'family.sides[0]', message: /received -1 at n=1/ },
    'range-min-above-max.json': { code: 'invalid_claim', path: 'family.variables[0]', message: /min ≤ max, received n from 4 to 3/ },
    'exchange-unequal.json': { code: 'invalid_claim', path: 'transform[0].sides', message: /equal lengths, received side 1 of length 1 and side 2 of length 3 at a=1,b=3/ },
    'same-content-unequal.json': { code: 'invalid_claim', path: 'family.conditions[0].sides', message: /equal lengths/ },
    'substitution-out-of-range.json': { code: 'invalid_claim', path: 'compare.relation.substitution[0]', message: /to = 2, N = 1 at n=1/ },
    'unknown-statistic-kind.json': { code: 'invalid_claim', path: 'compare.measure.kind', message: /'0-triangle' \| '1-triangle' \| '10-triangle'.*received 'k-piece'/ },
    'order-on-polynomial.json': { code: 'invalid_claim', path: 'compare.relation', message: /integer measure.*received a polynomial value/ },
    'complement-needs-map.json': { code: 'invalid_claim', path: 'transform[1]', message: /labelMap, received labels a b/ },
    'too-many-permuted-variables.json': { code: 'invalid_claim', path: 'compare.relation.searchSpace', message: /at most 8 variables, received 9 at n=9/ },
    'bad-relation-type.json': { code: 'invalid_claim', path: 'compare.relation.type', message: /'equal' \|.*received "approximately"/ },
    // The fixture breaks off after its one line, so the error points at the start of line 2 (the file's end).
    'not-json.json': { code: 'invalid_json', path: 'line 2, column 1', message: /^Claim file: expected valid JSON/ },
  };

  it('has an expectation for every invalid fixture', () => {
    expect(files('invalid').sort()).toEqual(Object.keys(expected).sort());
  });

  it.each(Object.entries(expected))('rejects invalid/%s with a coded message', (f, want) => {
    const e = failure(f);
    expect(e.code).toBe(want.code);
    expect(e.message).toMatch(want.message);
    expect(e.message).toMatch(/^[^:]+: expected .*, received /);
    if (want.path) expect(e.path).toBe(want.path);
    expect(e.file).toContain(f);
  });

  it('pins the full terminal form of a few errors', () => {
    const strip = (e: CodedError) => formatError(e).replace(/\(.*fixtures\/claims\//, '(');
    expect(strip(failure('sides-do-not-close.json'))).toMatchInlineSnapshot(`
      "✖ Side lengths do not close: expected s1+s2 = s4+s5 and s2+s3 = s5+s6 for all values, received 1,0,1,0,3,0 at a=1,b=3
        → at family.sides (invalid/sides-do-not-close.json)
        Hint: e.g. triangle ["n",0,"n",0,"n",0], parallelogram ["a","b",0,"a","b",0], hexagon ["a","b","c","a+b-c"...] must close identically
        [invalid_claim]"
    `);
    expect(strip(failure('exchange-unequal.json'))).toMatchInlineSnapshot(`
      "✖ Exchanged sides: expected equal lengths, received side 1 of length 1 and side 2 of length 3 at a=1,b=3
        → at transform[0].sides (invalid/exchange-unequal.json)
        Hint: side numbers refer to the region as left by the previous steps
        [invalid_claim]"
    `);
    expect(strip(failure('bad-step-type.json'))).toMatchInlineSnapshot(`
      "✖ Transform step type: expected one of 'rotate' | 'mirror' | 'complement' | 'exchange' | 'reverse' | 'completeToTriangle', received "spin"
        → at transform[0].type (invalid/bad-step-type.json)
        [invalid_claim]"
    `);
  });

  it('fills defaults and keeps the parsed claim plain JSON', () => {
    const claim = parseClaim({
      id: 'a-b',
      statement: 'x',
      theory: 'cohomology',
      family: { sides: [1, 0, 1, 0, 1, 0] },
      transform: [{ type: 'complement' }],
      compare: { measure: { type: 'value' }, relation: { type: 'equal' } },
    });
    expect(claim.family.variables).toEqual([]);
    expect(claim.family.nonzeroOnly).toBe(false);
    expect(claim.transform[0]).toEqual({ type: 'complement', sides: 'all' });
    expect(JSON.parse(JSON.stringify(claim))).toEqual(claim);
  });
});

describe('claimJsonSchema', () => {
  it('describes the claim keys and enumerates step types', () => {
    const schema = claimJsonSchema() as { properties: Record<string, unknown>; required: string[] };
    expect(Object.keys(schema.properties).sort()).toEqual(['$schema', 'compare', 'family', 'id', 'statement', 'theory', 'transform']);
    expect(schema.required).toEqual(expect.arrayContaining(['id', 'statement', 'theory', 'family', 'transform', 'compare']));
    const text = JSON.stringify(schema);
    for (const t of ['rotate', 'mirror', 'complement', 'exchange', 'reverse', 'completeToTriangle', 'equalUpToPermutation', 'blockReversals']) expect(text).toContain(`"${t}"`);
    expect(text).toContain('aligned by index');
  });
});
