import type { z } from 'zod';
import { CodedError, type ErrorParts } from '../errors/index.js';
import { describeValue, hasSchemaMessage, issueExpected, issuePath, schemaMessageParts, valueAt } from './zod-issue.js';

type Issue = z.core.$ZodIssue;

const LABELS: Record<string, string> = {
  $schema: 'Schema reference',
  id: 'Claim id',
  statement: 'Statement',
  theory: 'Theory',
  rightTheory: 'Right-hand theory',
  family: 'Family',
  variables: 'Variables',
  name: 'Name',
  min: 'Variable lower bound',
  max: 'Variable upper bound',
  conditions: 'Conditions',
  nonzeroOnly: 'nonzeroOnly',
  transform: 'Transform',
  degrees: 'Rotation',
  labelMap: 'Label map',
  compare: 'Comparison',
  measure: 'Measure',
  relation: 'Relation',
  kind: 'Statistic kind',
  substitution: 'Substitution',
  from: 'Block start',
  to: 'Block end',
  by: 'Shift',
  images: 'Images',
  count: 'Label count',
  label: 'Label',
  side: 'Side number',
  searchSpace: 'Search space',
  type: 'Type',
  boundaryLabels: 'Boundary labels',
  pieces: 'Pieces',
  edges: 'Piece edges',
  horizontal: 'Horizontal edge label',
  rising: 'Rising edge label',
  falling: 'Falling edge label',
  orientations: 'Orientations',
};

function what(path: readonly PropertyKey[]): string {
  const keys = path.filter((p) => typeof p === 'string') as string[];
  const last = keys[keys.length - 1];
  if (last === 'sides') return keys[0] === 'family' ? 'Side lengths' : 'Sides';
  if (last === undefined) return 'Claim';
  return LABELS[last] ?? last.charAt(0).toUpperCase() + last.slice(1);
}

// A union of a name and an object: when the input is an object, the object branch says what is wrong.
function innermost(issue: Issue, input: unknown): { issue: Issue; path: PropertyKey[] } {
  if (issue.code === 'invalid_union' && issue.errors.length > 0 && !('note' in issue && issue.note)) {
    const received = valueAt(input, issue.path);
    const branch = issue.errors.find((errs) => errs.length > 0 && !(errs[0]!.code === 'invalid_type' && errs[0]!.path.length === 0) && !(errs[0]!.code === 'invalid_value' && errs[0]!.path.length === 0));
    if (branch && received !== null && typeof received === 'object') {
      const inner = innermost({ ...branch[0]!, path: [...issue.path, ...branch[0]!.path] } as Issue, input);
      return inner;
    }
  }
  return { issue, path: [...issue.path] };
}

/** Turns the first zod issue of a claim (parsed with `parseMarked`) into an `invalid_claim` error, with a hint when one helps. */
export function claimZodError(error: z.ZodError, input: unknown, file?: string): CodedError {
  const { issue, path } = innermost(error.issues[0]!, input);
  const value = valueAt(input, path);
  const received = describeValue(value);
  const ours = hasSchemaMessage(issue);
  let parts: ErrorParts;
  let hint: string | undefined;
  switch (issue.code) {
    case 'unrecognized_keys':
      parts = { what: 'Unknown key', expected: 'only the documented keys', received: issue.keys.map((k) => `'${k}'`).join(', ') };
      hint = "check the spelling; 'puzzlesweep schema' writes the JSON Schema that lists every key";
      break;
    case 'invalid_type':
    case 'invalid_value':
      // The value found, whatever the message says it should be.
      parts = ours ? { ...schemaMessageParts(issue.message, received), received } : { what: what(path), expected: issueExpected(issue), received };
      if (issue.code === 'invalid_type' && value === undefined) hint = `add the required key '${String(path[path.length - 1] ?? '')}'`;
      break;
    default:
      parts = ours ? schemaMessageParts(issue.message, received) : { what: what(path), expected: issueExpected(issue), received };
  }
  if (path[path.length - 1] === 'id' && issue.code !== 'invalid_type') hint = 'lower-case letters and digits joined by single hyphens';
  return new CodedError('invalid_claim', parts, { path: issuePath(path), ...(file ? { file } : {}), ...(hint ? { hint } : {}) });
}
