import { describe, expect, it } from 'vitest';
import { compileClaimProgram, parseClaim, planClaim, type SizeClass } from '../../../src/claims/index.js';
import { rankString, unrankString, multinomial } from '../../../src/claims/multiset-rank.js';

function claim(family: object, theory: unknown = 'cohomology') {
  return parseClaim({ id: 'plan-test', statement: 's', theory, family, transform: [], compare: { measure: { type: 'value' }, relation: { type: 'equal' } } });
}

// Brute force, independent of the plan: every string over the alphabet for each side, then a filter.
function allBoundaries(lengths: readonly number[], alphabet: readonly string[]): string[][] {
  let out: string[][] = [[]];
  for (const n of lengths) {
    let strings = [''];
    for (let k = 0; k < n; k++) strings = strings.flatMap((s) => alphabet.map((a) => s + a));
    out = out.flatMap((b) => strings.map((s) => [...b, s]));
  }
  return out;
}
const count = (s: string, l: string) => [...s].filter((c) => c === l).length;
const content = (s: string, alphabet: readonly string[]) => alphabet.map((l) => count(s, l)).join(',');

function checkBijection(plan: ReturnType<typeof planClaim>, cls: SizeClass, accept: (b: string[]) => boolean, alphabet = ['0', '1']) {
  const n = plan.instanceCount(cls);
  const expected = allBoundaries(cls.lengths, alphabet).filter(accept);
  expect(n).toBe(BigInt(expected.length));
  const seen = new Set<string>();
  for (let i = 0n; i < n; i++) {
    const inst = plan.instanceAt(cls, i);
    expect(accept([...inst.sides])).toBe(true);
    expect(plan.indexOf(cls, inst.sides)).toBe(i);
    seen.add(inst.sides.join('|'));
  }
  expect(seen.size).toBe(expected.length);
  for (const b of expected) expect(plan.indexOf(cls, b)).toBeDefined();
  // the incremental walk over a range yields exactly the instances instanceAt names
  const from = n / 3n;
  const walked = [...plan.instancesFrom(cls, from, n)];
  expect(walked.map((x) => x.index)).toEqual(Array.from({ length: Number(n - from) }, (_, k) => from + BigInt(k)));
  for (const x of walked) expect(x.sides).toEqual(plan.instanceAt(cls, x.index).sides);
  // a boundary outside the class has no index and no position
  const outside = allBoundaries(cls.lengths, alphabet).find((b) => !accept(b));
  if (outside) {
    expect(plan.indexOf(cls, outside)).toBeUndefined();
    expect(plan.compareIndex(cls, plan.instanceAt(cls, 0n).sides, outside)).toBeUndefined();
  }
  // comparing two instances' positions without ranking them agrees with their indices
  const step = n > 40n ? n / 40n : 1n;
  for (let i = 0n; i < n; i += step)
    for (let j = 0n; j < n; j += step) {
      const sign = i < j ? -1 : i > j ? 1 : 0;
      expect(plan.compareIndex(cls, plan.instanceAt(cls, i).sides, plan.instanceAt(cls, j).sides)).toBe(sign);
    }
}

describe('multiset ranking', () => {
  it('ranks the strings of each content in lexicographic order', () => {
    // Lexicographic order of all 0/1/2 strings with content (2,1,1), listed by brute force (common practice, no source).
    const all = allBoundaries([4], ['0', '1', '2']).map((b) => b[0]!).filter((s) => content(s, ['0', '1', '2']) === '2,1,1').sort();
    expect(multinomial([2, 1, 1])).toBe(12n); // 4!/(2!·1!·1!) = 12
    all.forEach((s, i) => {
      const labels = [...s].map(Number);
      expect(rankString(labels, [2, 1, 1])).toBe(BigInt(i));
      expect(unrankString(BigInt(i), [2, 1, 1]).join('')).toBe(s);
    });
  });
});

describe('planClaim', () => {
  it('orders classes by total length, then by the side-length tuple', () => {
    const plan = planClaim(compileClaimProgram(claim({ sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 4 }, { name: 'b', min: 1, max: 4 }] })));
    const classes = plan.classes();
    expect(classes.length).toBe(16);
    for (let k = 1; k < classes.length; k++) {
      const [p, q] = [classes[k - 1]!, classes[k]!];
      expect(p.size < q.size || (p.size === q.size && p.lengths.join(',') < q.lengths.join(','))).toBe(true);
    }
    expect(classes[0]!.key).toBe('a=1,b=1');
    expect(plan.classes({ a: 2, b: 2 }).map((c) => c.key)).toEqual(['a=1,b=1', 'a=1,b=2', 'a=2,b=1', 'a=2,b=2']);
    expect(plan.classes({ a: 5 }).length).toBe(20);
  });

  it('is a bijection onto all boundaries without conditions', () => {
    const plan = planClaim(compileClaimProgram(claim({ sides: ['a', 'b', 0, 'a', 'b', 0], variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }] })));
    for (const cls of plan.classes()) checkBijection(plan, cls, () => true);
  });

  it('applies content conditions while generating', () => {
    const plan = planClaim(compileClaimProgram(
      claim({
        sides: ['a', 'b', 'c', 'a+b-c', 'c', 'b'],
        variables: [{ name: 'a', min: 1, max: 2 }, { name: 'b', min: 1, max: 2 }, { name: 'c', min: 1, max: 1 }],
        conditions: [{ type: 'sameContent', sides: [2, 6] }, { type: 'labelCount', side: 1, count: 1 }, { type: 'sameContent', sides: [3, 5] }],
      }),
    ));
    for (const cls of plan.classes()) {
      checkBijection(plan, cls, (b) => content(b[1]!, ['0', '1']) === content(b[5]!, ['0', '1']) && content(b[2]!, ['0', '1']) === content(b[4]!, ['0', '1']) && count(b[0]!, '1') === 1);
    }
  });

  it('handles a triple of equal-content sides, a count on side 5 and a three-letter alphabet', () => {
    const theory = {
      name: 'three',
      boundaryLabels: ['0', '1', '2'],
      pieces: [{ edges: { horizontal: '0', rising: '0', falling: '0' }, orientations: ['up', 'down'] }, { edges: { horizontal: '1', rising: '1', falling: '1' }, orientations: ['up', 'down'] }, { edges: { horizontal: '2', rising: '2', falling: '2' }, orientations: ['up', 'down'] }],
    };
    const plan = planClaim(compileClaimProgram(claim({ sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 2, max: 3 }], conditions: [{ type: 'sameContent', sides: [1, 3, 5] }, { type: 'labelCount', side: 5, count: 1, label: '2' }] }, theory)));
    const abc = ['0', '1', '2'];
    for (const cls of plan.classes()) checkBijection(plan, cls, (b) => content(b[0]!, abc) === content(b[2]!, abc) && content(b[2]!, abc) === content(b[4]!, abc) && count(b[4]!, '2') === 1, abc);
  });

  it('varies side 5 fastest: runs of consecutive indices share sides 1-4 and 6', () => {
    const plan = planClaim(compileClaimProgram(claim({ sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 3, max: 3 }] })));
    const cls = plan.classes()[0]!;
    const rest = (i: bigint) => plan.instanceAt(cls, i).sides.filter((_, k) => k !== 4).join('|');
    let changes = 0;
    for (let i = 1n; i < plan.instanceCount(cls); i++) if (rest(i) !== rest(i - 1n)) changes++;
    // 2^3 strings on side 5 per run: 64 runs over 512 boundaries, so 63 changes (arithmetic).
    expect(changes).toBe(63);
  });

  it('drops empty classes and rejects out-of-range indices', () => {
    const plan = planClaim(compileClaimProgram(claim({ sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 1, max: 3 }, { name: 'k', min: 0, max: 3 }], conditions: [{ type: 'labelCount', side: 1, count: 'k' }] })));
    // k ≤ n: (1,0),(1,1),(2,0..2),(3,0..3) = 9 classes.
    expect(plan.classes().length).toBe(9);
    const cls = plan.classes()[0]!;
    expect(() => plan.instanceAt(cls, plan.instanceCount(cls))).toThrow(/Instance index/);
    expect(plan.classForKey(cls.key)).toEqual(cls);
    expect(plan.indexOf(cls, ['1', '', '0', '', '0', ''])).toBeUndefined();
  });
});

describe('size classes', () => {
  it('keeps classes that differ only in a variable of the substitution', () => {
    // p changes the substitution y_p..y_n reversed, so n=3,p=1 and n=3,p=2 are different checks [definition]
    const c = parseClaim({
      id: 'substitution-variable',
      statement: 's',
      theory: 'equivariant',
      family: { sides: ['n', 0, 'n', 0, 'n', 0], variables: [{ name: 'n', min: 3, max: 3 }, { name: 'p', min: 1, max: 2 }] },
      transform: [],
      compare: { measure: { type: 'value' }, relation: { type: 'equalAfterSubstitution', substitution: [{ type: 'reverseBlock', from: 'p', to: 'n' }] } },
    });
    expect(planClaim(compileClaimProgram(c)).classes().map((k) => k.key)).toEqual(['n=3,p=1', 'n=3,p=2']);
  });
});
