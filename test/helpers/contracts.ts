/**
 * Contract checks shared by tests: an enumeration is deterministic, a recorded result replays to itself,
 * and every count a summary prints can be re-derived by another computation.
 */
import { expect } from 'vitest';

const defaultKey = (x: unknown): string => JSON.stringify(x, (_k, v: unknown) => (typeof v === 'bigint' ? `${v}n` : v));

/**
 * Runs `enumerate` twice and expects the same sequence both times with no item repeated; returns the keys
 * in order, so the caller can compare them with an independent list.
 */
export function expectDeterministicEnumeration<T>(enumerate: () => Iterable<T>, key: (item: T) => string = defaultKey): string[] {
  const first = [...enumerate()].map(key);
  const second = [...enumerate()].map(key);
  expect(second, 'a second enumeration gives the same sequence').toEqual(first);
  const seen = new Set<string>();
  const repeated = first.filter((k) => (seen.has(k) ? true : (seen.add(k), false)));
  expect(repeated, 'no item is enumerated twice').toEqual([]);
  return first;
}

/** Expects two lists to hold the same members, ignoring order (both are reported sorted on failure). */
export function expectSameMembers(actual: Iterable<string>, expected: Iterable<string>): void {
  expect([...actual].sort()).toEqual([...expected].sort());
}

/**
 * Replays every record and expects the replay to reproduce what was recorded. `records` must not be empty:
 * a replay contract checked on nothing would pass vacuously.
 */
export function expectReplayReproduces<R, V>(records: readonly R[], replay: (record: R) => V, recorded: (record: R) => V, name: (record: R) => string = defaultKey): void {
  expect(records.length, 'records to replay').toBeGreaterThan(0);
  for (const r of records) expect(replay(r), `replay of ${name(r)}`).toEqual(recorded(r));
}

/** Every leaf of a printed object that is a count (number, bigint or decimal-integer string), by path. */
export function countLeaves(printed: unknown, path = ''): Map<string, string> {
  const out = new Map<string, string>();
  const walk = (v: unknown, p: string): void => {
    if (typeof v === 'number' || typeof v === 'bigint') out.set(p, String(v));
    else if (typeof v === 'string' && /^-?\d+$/.test(v)) out.set(p, v);
    else if (Array.isArray(v)) v.forEach((x, i) => walk(x, `${p}[${i}]`));
    else if (v !== null && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, p ? `${p}.${k}` : k);
  };
  walk(printed, path);
  return out;
}

/**
 * Every count in `printed` (e.g. a `--json` summary) must equal the value `derived` gives for its path,
 * computed another way (brute force, a closed formula, a reference), unless its path matches one of
 * `notCounts` (times, ids, sizes that are inputs, bounds): each of those is listed by the caller with a reason.
 * A new count field therefore fails the test until someone says how to re-derive it.
 */
export function expectCountsRederivable(
  printed: unknown,
  derived: Readonly<Record<string, number | bigint | string>>,
  notCounts: readonly { readonly path: RegExp; readonly why: string }[] = [],
): void {
  const leaves = countLeaves(printed);
  const unexplained: string[] = [];
  const wrong: string[] = [];
  for (const [path, value] of leaves) {
    if (path in derived) {
      if (String(derived[path]) !== value) wrong.push(`${path}: printed ${value}, derived ${String(derived[path])}`);
    } else if (!notCounts.some((n) => n.path.test(path))) unexplained.push(`${path} = ${value}`);
  }
  const missing = Object.keys(derived).filter((p) => !leaves.has(p));
  expect(wrong, 'printed counts that differ from their derivation').toEqual([]);
  expect(unexplained, 'printed counts with no derivation').toEqual([]);
  expect(missing, 'derived counts the summary does not print').toEqual([]);
}

/** The words of a printed shell command (single quotes as `replayCommand` writes them), ready to run. */
export function commandWords(command: string): string[] {
  const words: string[] = [];
  const re = /'((?:[^']|'\\'')*)'|([^\s']+)/g;
  let current = '';
  let last = 0;
  for (let m = re.exec(command); m; m = re.exec(command)) {
    const glued = m.index === last && current !== '';
    const word = m[1] !== undefined ? m[1].replace(/'\\''/g, "'") : m[2]!;
    if (glued) current += word;
    else {
      if (current !== '') words.push(current);
      current = word;
    }
    last = m.index + m[0].length;
  }
  if (current !== '') words.push(current);
  return words;
}
