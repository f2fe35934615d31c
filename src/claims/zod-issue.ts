import type { z } from 'zod';
import { CodedError, type ErrorParts, type FreeCode } from '../errors/index.js';

type Issue = z.core.$ZodIssue;

// Schemas write their own messages as `What: expected X` (optionally `, received Y`). An issue without one
// gets this marker from the parse call, so an issue is told apart by the marker, never by zod's wording.
const NO_SCHEMA_MESSAGE = '\u0000no schema message';

/** Parses with the marker above in place of zod's default messages. */
export function parseMarked<S extends z.ZodType>(schema: S, data: unknown): z.ZodSafeParseResult<z.output<S>> {
  return schema.safeParse(data, { error: () => NO_SCHEMA_MESSAGE });
}

export function hasSchemaMessage(issue: Issue): boolean {
  return issue.message !== NO_SCHEMA_MESSAGE;
}

/** JSON path of a zod issue, e.g. `family.lengths[2]`. */
export function issuePath(path: readonly PropertyKey[], prefix = ''): string {
  let out = prefix;
  for (const p of path) out += typeof p === 'number' ? `[${p}]` : out ? `.${String(p)}` : String(p);
  return out || '(top level)';
}

/** A value as the `received` part: JSON, cut at 60 characters. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  const s = JSON.stringify(value);
  return s === undefined ? String(value) : s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

export function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let v = input;
  for (const p of path) v = v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[p] : undefined;
  return v;
}

const bound = (inclusive: boolean | undefined, low: boolean) => (low ? (inclusive ? '≥' : '>') : inclusive ? '≤' : '<');

/** What an issue without a schema message expected, from its structure. */
export function issueExpected(issue: Issue): string {
  switch (issue.code) {
    case 'invalid_type':
      return issue.expected === 'int' ? 'integer' : issue.expected;
    case 'invalid_value':
      return issue.values.length === 1 ? describeValue(issue.values[0]) : `one of ${issue.values.map((v) => describeValue(v).replace(/^"|"$/g, "'")).join(' | ')}`;
    case 'too_small':
      return issue.origin === 'array' || issue.origin === 'set' ? `at least ${issue.minimum} entries` : issue.origin === 'string' ? `at least ${issue.minimum} characters` : `a number ${bound(issue.inclusive, true)} ${issue.minimum}`;
    case 'too_big':
      return issue.origin === 'array' || issue.origin === 'set' ? `at most ${issue.maximum} entries` : issue.origin === 'string' ? `at most ${issue.maximum} characters` : `a number ${bound(issue.inclusive, false)} ${issue.maximum}`;
    case 'invalid_format':
      return issue.format === 'regex' && 'pattern' in issue ? `a string matching ${String(issue.pattern)}` : `a ${issue.format} string`;
    case 'not_multiple_of':
      return `a multiple of ${issue.divisor}`;
    case 'unrecognized_keys':
      return 'only the documented keys';
    case 'invalid_union':
      return 'one of the documented forms';
    default:
      return 'a valid value';
  }
}

/** The parts of a schema's own message `What: expected X[, received Y]`; `received` fills a missing Y. */
export function schemaMessageParts(message: string, received: string): ErrorParts {
  const e = message.indexOf(': expected ');
  if (e < 0) return { what: message, expected: 'a valid value', received };
  const rest = message.slice(e + ': expected '.length);
  const r = rest.indexOf(', received ');
  return r < 0 ? { what: message.slice(0, e), expected: rest, received } : { what: message.slice(0, e), expected: rest.slice(0, r), received: rest.slice(r + ', received '.length) };
}

/** Turns the first zod issue of a `parseMarked` result into a coded error in our grammar. */
export function fromZodError(error: z.ZodError, code: FreeCode, input: unknown, file?: string, prefix = '', label = 'Value'): CodedError {
  const issue = error.issues[0]!;
  const received = valueAt(input, issue.path);
  let parts: ErrorParts;
  if (issue.code === 'unrecognized_keys') {
    parts = { what: 'Unrecognized key', expected: `none of ${issue.keys.map((k) => `'${k}'`).join(', ')}`, received: issue.keys.length === 1 ? 'it' : 'them' };
  } else if (hasSchemaMessage(issue)) {
    parts = schemaMessageParts(issue.message, describeValue(received));
    // Type and value issues describe the value actually found, whatever the schema's message said.
    if (issue.code === 'invalid_union' || issue.code === 'invalid_type' || issue.code === 'invalid_value') parts = { ...parts, received: describeValue(received) };
  } else {
    const last = [...issue.path].reverse().find((p) => typeof p === 'string');
    parts = { what: typeof last === 'string' ? last.charAt(0).toUpperCase() + last.slice(1) : label, expected: issueExpected(issue), received: describeValue(received) };
  }
  return new CodedError(code, parts, { path: issuePath(issue.path, prefix), ...(file ? { file } : {}) });
}
