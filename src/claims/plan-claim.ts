import { makeRegion } from '../engine/index.js';
import { CodedError, toCodedError } from '../errors/index.js';
import { evalAffine } from './affine.js';
import type { ClaimPlan, Instance, SharedTables, SizeClass } from './claim-api.js';
import { scannable } from './family-scan.js';
import { allocateSharedTables, tableShape } from './shared-tables.js';
import type { Claim } from './claim-schema.js';
import { asProgram, type ClaimProgram } from './compile-claim-program.js';
import type { CompiledClaim } from './compile-claim.js';
import { contentVectors, multinomial, nextString, rankString, unrankString } from './multiset-rank.js';

/** One group of sides sharing a content vector; `sides` in radix order (side 5 last, least significant). */
export interface Content {
  readonly counts: readonly number[];
  readonly strings: bigint;
  readonly offset: bigint;
  readonly size: bigint;
}

export interface Group {
  readonly sides: readonly number[];
  readonly contents: readonly Content[];
  readonly size: bigint;
  /** Contents keyed by their counts joined with commas. */
  readonly byContent: ReadonlyMap<number, Content>;
}

export interface Layout {
  readonly cls: SizeClass;
  /** Most significant first; the group holding side 5 comes last. */
  readonly groups: readonly Group[];
  readonly count: bigint;
}

/** A plan with a few extras beyond the runner contract. */
export interface ClaimPlanExt extends ClaimPlan {
  readonly compiled: ClaimProgram;
  instancesFrom(cls: SizeClass, start: bigint, end: bigint): Iterable<Instance>;
  /** The sign of index(a) − index(b) without ranking either, or undefined when one is not an instance of `cls`. */
  compareIndex(cls: SizeClass, a: readonly string[], b: readonly string[]): number | undefined;
  /** The class of given variable values (whatever the bounds), e.g. to resolve an `Instance.classKey`. */
  classForKey(key: string): SizeClass;
  /** How a class's index is built: groups of sides sharing a content, most significant first. */
  layoutOf(cls: SizeClass): Layout;
  sharedTables(cls: SizeClass): SharedTables | undefined;
}

const NO_VARIABLES = 'all';

function classKey(values: Readonly<Record<string, number>>): string {
  const s = Object.entries(values).map(([k, v]) => `${k}=${v}`).join(',');
  return s || NO_VARIABLES;
}

function layoutOf(compiled: CompiledClaim, cls: SizeClass): Layout {
  const alphabet = compiled.left.boundaryLabels;
  const groupOf = new Map<number, number[]>();
  for (const g of compiled.sameContent) for (const s of g) groupOf.set(s, [...g]);
  const fixedBySide = new Map<number, Map<number, number>>();
  let impossible = false;
  for (const c of compiled.counts) {
    const n = evalAffine(c.count, cls.variables);
    const label = alphabet.indexOf(c.label);
    const m = fixedBySide.get(c.side) ?? new Map<number, number>();
    if (m.has(label) && m.get(label) !== n) impossible = true;
    m.set(label, n);
    fixedBySide.set(c.side, m);
  }
  const seen = new Set<number>();
  const groups: Group[] = [];
  for (const start of [0, 1, 2, 3, 5, 4]) {
    if (seen.has(start)) continue;
    const members = (groupOf.get(start) ?? [start]).slice().sort((a, b) => (a === 4 ? 1 : b === 4 ? -1 : a - b));
    members.forEach((s) => seen.add(s));
    const fixed = new Map<number, number>();
    for (const s of members) {
      for (const [l, n] of fixedBySide.get(s) ?? []) {
        if (fixed.has(l) && fixed.get(l) !== n) impossible = true;
        fixed.set(l, n);
      }
    }
    const length = cls.lengths[members[0]!]!;
    let offset = 0n;
    const contents = (impossible ? [] : contentVectors(length, alphabet.length, fixed)).map((counts) => {
      const strings = multinomial(counts);
      const size = strings ** BigInt(members.length);
      const entry = { counts, strings, offset, size };
      offset += size;
      return entry;
    });
    groups.push({ sides: members, contents, size: offset, byContent: new Map(contents.map((c) => [packCounts(c.counts, length), c])) });
  }
  // The group holding side 5 is least significant, so runs of consecutive indices vary side 5 only.
  const five = groups.findIndex((g) => g.sides.includes(4));
  const ordered = [...groups.slice(0, five), ...groups.slice(five + 1), groups[five]!];
  return { cls, groups: ordered, count: ordered.reduce((p, g) => p * g.size, 1n) };
}

function compareLabels(a: readonly number[], b: readonly number[]): number {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return a[k]! < b[k]! ? -1 : 1;
  return 0;
}

/** The packed content key of counts for strings of one length (see `contentKey` in planClaim). */
function packCounts(counts: readonly number[], length: number): number {
  return counts.reduce((key, c, a) => key + c * (length + 1) ** a, 0);
}

function sizeClassFor(compiled: CompiledClaim, values: Readonly<Record<string, number>>): SizeClass {
  const lengths = compiled.lengths.map((l) => evalAffine(l, values)) as unknown as SizeClass['lengths'];
  return { key: classKey(values), variables: values, lengths, size: lengths.reduce((s, x) => s + x, 0) };
}

function compareClasses(a: SizeClass, b: SizeClass): number {
  if (a.size !== b.size) return a.size - b.size;
  for (let i = 0; i < 6; i++) if (a.lengths[i] !== b.lengths[i]) return a.lengths[i]! - b.lengths[i]!;
  return 0;
}

/** Every assignment of the variables in the box, in declaration order, last variable fastest. */
function assignments(compiled: CompiledClaim): Record<string, number>[] {
  let out: Record<string, number>[] = [{}];
  for (const v of compiled.variables) {
    const next: Record<string, number>[] = [];
    for (const a of out) for (let x = v.min; x <= v.max; x++) next.push({ ...a, [v.name]: x });
    out = next;
  }
  return out;
}

/** The sweep plan of a claim: ordered size classes and the index ↔ instance bijection inside each. */
export function planClaim(claim: Claim | ClaimProgram): ClaimPlanExt {
  const program = asProgram(claim);
  const compiled = program;
  const alphabet = compiled.left.boundaryLabels;
  // Boundary labels are single characters, so a side is read one char per edge.
  const labelIndex = new Map(alphabet.map((a, i) => [a, i]));
  // A side's content packed in one number (label a counts (length+1)^a), compared without allocating.
  const contentKey = (labels: readonly number[]) => {
    let key = 0;
    for (const a of labels) key += (labels.length + 1) ** a;
    return key;
  };
  const singleUnit = alphabet.every((a) => a.length === 1);
  // Label indices of the six sides, or undefined when they do not have the class's lengths and alphabet.
  const labelsOf = (cls: SizeClass, sides: readonly string[]): number[][] | undefined => {
    if (sides.length !== 6) return undefined;
    const out: number[][] = [];
    for (let i = 0; i < 6; i++) {
      const side = singleUnit ? sides[i]! : [...sides[i]!];
      if (side.length !== cls.lengths[i]) return undefined;
      const idx = new Array<number>(side.length);
      for (let k = 0; k < side.length; k++) {
        const a = labelIndex.get(side[k]!);
        if (a === undefined) return undefined;
        idx[k] = a;
      }
      out.push(idx);
    }
    return out;
  };
  const layouts = new Map<string, Layout>();
  const layout = (cls: SizeClass) => {
    let l = layouts.get(cls.key);
    if (!l) {
      l = layoutOf(compiled, cls);
      layouts.set(cls.key, l);
    }
    return l;
  };
  const outOfRange = (cls: SizeClass, index: bigint) =>
    new CodedError('invalid_argument', { what: 'Instance index', expected: `0 ≤ index < ${layout(cls).count} in class ${cls.key}`, received: `${index}` }, { path: 'instance' });

  const { relationVariables } = program;
  return {
    compiled,
    classes(maxOverride) {
      const c = maxOverride && Object.keys(maxOverride).length ? program.withBounds(maxOverride) : compiled;
      const seen = new Set<string>();
      const out: SizeClass[] = [];
      for (const values of assignments(c)) {
        const cls = sizeClassFor(compiled, values);
        const l = layout(cls);
        // Values giving the same lengths, the same fixed counts and the same substitution name the same
        // checks: keep the first. (A variable used only in a substitution still makes classes differ.)
        const identity = `${cls.lengths.join(',')}|${compiled.counts.map((k) => evalAffine(k.count, values)).join(',')}|${relationVariables.map((v) => values[v]).join(',')}`;
        if (l.count === 0n || seen.has(identity)) continue;
        seen.add(identity);
        out.push(cls);
      }
      return out.sort(compareClasses);
    },
    instanceCount: (cls) => layout(cls).count,
    layoutOf: layout,
    sharedTables(cls) {
      if (!scannable(program)) return undefined;
      const shape = tableShape(layout(cls));
      return shape ? allocateSharedTables(`${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`, shape) : undefined;
    },
    instanceAt(cls, index) {
      const l = layout(cls);
      if (index < 0n || index >= l.count) throw outOfRange(cls, index);
      const sides: string[] = ['', '', '', '', '', ''];
      let rest = index;
      for (let g = l.groups.length - 1; g >= 0; g--) {
        const group = l.groups[g]!;
        let r = rest % group.size;
        rest /= group.size;
        const content = group.contents.find((c) => r < c.offset + c.size)!;
        r -= content.offset;
        for (let k = group.sides.length - 1; k >= 0; k--) {
          const s = unrankString(r % content.strings, content.counts);
          r /= content.strings;
          sides[group.sides[k]!] = s.map((a) => alphabet[a]!).join('');
        }
      }
      return { classKey: cls.key, index, sides };
    },
    // Side 5 is the least significant digit, ranked in lexicographic order within its content, so
    // index + 1 is the next string of side 5 until it wraps; only then is a full unranking needed.
    *instancesFrom(cls, start, end) {
      let labels: number[] = [];
      let previous: Instance | undefined;
      for (let index = start; index < end; index++) {
        if (previous && nextString(labels)) {
          const sides = [...previous.sides];
          sides[4] = labels.map((a) => alphabet[a]!).join('');
          previous = { classKey: cls.key, index, sides };
        } else {
          previous = this.instanceAt(cls, index);
          labels = [...previous.sides[4]!].map((c) => alphabet.indexOf(c));
        }
        yield previous;
      }
    },
    compareIndex(cls, a, b) {
      const l = layout(cls);
      const la = labelsOf(cls, a);
      const lb = labelsOf(cls, b);
      if (!la || !lb) return undefined;
      // index = mixed radix over groups (most significant first) of (content offset, ranks of its sides),
      // and ranks within a content follow lexicographic order: compare digit by digit, no ranking needed.
      let verdict = 0;
      for (const group of l.groups) {
        const ka = contentKey(la[group.sides[0]!]!);
        const kb = contentKey(lb[group.sides[0]!]!);
        const ca = group.byContent.get(ka);
        const cb = group.byContent.get(kb);
        if (!ca || !cb || group.sides.some((s) => contentKey(la[s]!) !== ka || contentKey(lb[s]!) !== kb)) return undefined;
        if (verdict !== 0) continue;
        if (ca !== cb) verdict = ca.offset < cb.offset ? -1 : 1;
        else for (const s of group.sides) if ((verdict = compareLabels(la[s]!, lb[s]!)) !== 0) break;
      }
      return verdict;
    },
    indexOf(cls, sides) {
      const l = layout(cls);
      const labelIdx = labelsOf(cls, sides);
      if (!labelIdx) return undefined;
      let index = 0n;
      for (const group of l.groups) {
        const key = contentKey(labelIdx[group.sides[0]!]!);
        const content = group.byContent.get(key);
        if (!content) return undefined;
        let r = 0n;
        for (const s of group.sides) {
          if (contentKey(labelIdx[s]!) !== key) return undefined;
          r = r * content.strings + rankString(labelIdx[s]!, content.counts);
        }
        index = index * group.size + content.offset + r;
      }
      return index;
    },
    classForKey(key) {
      const values: Record<string, number> = {};
      if (key !== NO_VARIABLES) {
        for (const part of key.split(',')) {
          const [name, value] = part.split('=');
          values[name!] = Number(value);
        }
      }
      const names = compiled.variables.map((v) => v.name);
      if (Object.keys(values).join(',') !== names.join(',') || Object.values(values).some((v) => !Number.isInteger(v))) {
        throw new CodedError('invalid_argument', { what: 'Class key', expected: `values of ${names.join(', ') || 'no variables'} such as '${classKey(Object.fromEntries(names.map((n) => [n, 1])))}'`, received: `'${key}'` }, { path: 'instance' });
      }
      const cls = sizeClassFor(compiled, values);
      try {
        makeRegion(cls.lengths);
      } catch (e) {
        throw toCodedError(e, 'instance');
      }
      return cls;
    },
  };
}
