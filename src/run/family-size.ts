import type { ClaimProgram } from '../claims/index.js';
import type { ClaimPlan } from '../claims/claim-api.js';
import { CodedError } from '../errors/index.js';

/** Classes (variable assignments) a run may have; beyond this the class list alone is too big to plan. */
export const MAX_CLASSES = 100_000;
/** Side of the completed triangle of the largest region a run or replay builds (N² unit triangles). */
export const MAX_TRIANGLE_SIDE = 1_000;
/** Instances a run may request: 10^12 at a million per second is about eleven days on one core. */
export const MAX_INSTANCES = 10n ** 12n;

const fmt = (n: number | bigint) => (BigInt(n) < 10n ** 7n ? BigInt(n).toLocaleString('en-US') : `about ${Number(n).toExponential(1)}`);

function evalLength(program: ClaimProgram, side: number, values: Readonly<Record<string, number>>): number {
  const a = program.lengths[side]!;
  let s = a.constant;
  for (const [v, c] of Object.entries(a.coefficients)) s += c * (values[v] ?? 0);
  return s;
}

/** The completed triangle's side N = s6 + s1 + s2 of a class. */
export function triangleSide(program: ClaimProgram, values: Readonly<Record<string, number>>): number {
  return evalLength(program, 5, values) + evalLength(program, 0, values) + evalLength(program, 1, values);
}

/**
 * Refuses a family whose bounds (with `--max`) are absurd before anything is planned or written: too many
 * classes, a region too large to build, or too many instances. Cheap: the class count is a product of
 * ranges and the largest region is found at a corner of the box (side lengths are affine).
 */
export function checkFamilyBounds(program: ClaimProgram, max: Readonly<Record<string, number>>): void {
  const names = program.variables.map((v) => v.name);
  for (const name of Object.keys(max)) {
    if (!names.includes(name)) {
      throw new CodedError('invalid_argument', { what: 'Variable bound', expected: `one of ${names.map((n) => `'${n}'`).join(' | ') || 'no variables'}`, received: `'${name}'` }, {
        path: '--max',
        hint: names.length ? `the claim's variables are ${names.join(', ')}` : 'this claim has no variables to raise',
      });
    }
  }
  const ranges = program.variables.map((v) => ({ name: v.name, min: v.min, max: max[v.name] ?? v.max }));
  const bad = ranges.find((r) => r.max < r.min);
  if (bad) throw new CodedError('invalid_argument', { what: 'Variable bound', expected: `${bad.name} ≥ ${bad.min} (its minimum)`, received: `${bad.max}` }, { path: '--max' });
  const classes = ranges.reduce((acc, r) => acc * (r.max - r.min + 1), 1);
  const where = ranges.filter((r) => max[r.name] !== undefined).length ? '--max' : 'family.variables';
  if (classes > MAX_CLASSES) {
    throw new CodedError('family_too_large', { what: 'Family size', expected: `at most ${fmt(MAX_CLASSES)} classes`, received: `${fmt(classes)} (${ranges.map((r) => `${r.name} from ${r.min} to ${r.max}`).join(', ')})` }, {
      path: where,
      hint: 'lower the bound (e.g. --max with a smaller value); a sweep grows by a factor of 4 to 16 per size step',
    });
  }
  // N is affine in the variables, so its largest value is at a corner of the box.
  const corner: Record<string, number> = {};
  const n = program.lengths[5]!, a = program.lengths[0]!, b = program.lengths[1]!;
  for (const r of ranges) {
    const coefficient = (n.coefficients[r.name] ?? 0) + (a.coefficients[r.name] ?? 0) + (b.coefficients[r.name] ?? 0);
    corner[r.name] = coefficient >= 0 ? r.max : r.min;
  }
  const side = triangleSide(program, corner);
  if (side > MAX_TRIANGLE_SIDE) {
    throw new CodedError('family_too_large', { what: 'Region size', expected: `a completed triangle of side at most ${fmt(MAX_TRIANGLE_SIDE)}`, received: `${fmt(side)} (at ${ranges.map((r) => `${r.name}=${corner[r.name]}`).join(', ')})` }, {
      path: where,
      hint: 'lower the bound; every boundary of such a region has far too many labelings to sweep',
    });
  }
}

/** Refuses a planned run whose total instance count is absurd, with the count. */
export function checkInstanceCount(plan: ClaimPlan, max: Readonly<Record<string, number>>): bigint {
  let total = 0n;
  for (const cls of plan.classes(max)) total += plan.instanceCount(cls);
  if (total > MAX_INSTANCES) {
    throw new CodedError('family_too_large', { what: 'Family size', expected: `at most ${fmt(MAX_INSTANCES)} instances`, received: `${fmt(total)}` }, {
      path: Object.keys(max).length ? '--max' : 'family.variables',
      hint: 'lower a bound; run smaller bounds first, then raise them with --max (finished classes are kept)',
    });
  }
  return total;
}

/** Refuses to build the class of a replayed instance when its region is absurdly large. */
export function checkClassKey(program: ClaimProgram, key: string): void {
  const values: Record<string, number> = {};
  for (const part of key.split(',')) {
    const [name, value] = part.split('=');
    if (name && value !== undefined && /^-?\d+$/.test(value)) values[name] = Number(value);
  }
  const side = triangleSide(program, values);
  if (side > MAX_TRIANGLE_SIDE) {
    throw new CodedError('family_too_large', { what: 'Region size', expected: `a completed triangle of side at most ${fmt(MAX_TRIANGLE_SIDE)}`, received: `${fmt(side)} (class ${key})` }, {
      path: '--instance',
      hint: 'copy a class key that a run printed',
    });
  }
}
