import type { z } from 'zod';
import { AppError } from '../errors.js';
import { issuePath } from './zod-issue.js';

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

function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  const s = JSON.stringify(value);
  return s === undefined ? String(value) : s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

function at(input: unknown, path: readonly PropertyKey[]): unknown {
  let v = input;
  for (const p of path) v = v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[p] : undefined;
  return v;
}

// A union of a name and an object: when the input is an object, the object branch says what is wrong.
function innermost(issue: Issue, input: unknown): { issue: Issue; path: PropertyKey[] } {
  if (issue.code === 'invalid_union' && issue.errors.length > 0 && !('note' in issue && issue.note)) {
    const received = at(input, issue.path);
    const branch = issue.errors.find((errs) => errs.length > 0 && !(errs[0]!.code === 'invalid_type' && errs[0]!.path.length === 0) && !(errs[0]!.code === 'invalid_value' && errs[0]!.path.length === 0));
    if (branch && received !== null && typeof received === 'object') {
      const inner = innermost({ ...branch[0]!, path: [...issue.path, ...branch[0]!.path] } as Issue, input);
      return inner;
    }
  }
  return { issue, path: [...issue.path] };
}

function ours(message: string): boolean {
  return /^[^:]+: expected /.test(message) && !/^(Invalid|Too small|Too big)\b/.test(message);
}

/** Turns the first zod issue of a claim into an `invalid_claim` error in our grammar, with a hint when one helps. */
export function claimZodError(error: z.ZodError, input: unknown, file?: string): AppError {
  const { issue, path } = innermost(error.issues[0]!, input);
  const received = at(input, path);
  const label = what(path);
  let message: string;
  let hint: string | undefined;
  switch (issue.code) {
    case 'unrecognized_keys':
      message = `Unknown key: expected only the documented keys, received ${issue.keys.map((k) => `'${k}'`).join(', ')}`;
      hint = "check the spelling; 'puzzlesweep schema' writes the JSON Schema that lists every key";
      break;
    case 'invalid_type':
      message = ours(issue.message) ? `${issue.message.replace(/, received .*$/, '')}, received ${describe(received)}` : `${label}: expected ${issue.expected}, received ${received === undefined ? 'nothing' : describe(received)}`;
      if (received === undefined) hint = `add the required key '${String(path[path.length - 1] ?? '')}'`;
      break;
    case 'invalid_value':
      message = ours(issue.message)
        ? `${issue.message}, received ${describe(received)}`
        : `${label}: expected ${issue.values.length === 1 ? describe(issue.values[0]) : `one of ${issue.values.map((v) => describe(v).replace(/^"|"$/g, "'")).join(' | ')}`}, received ${describe(received)}`;
      break;
    default:
      message = ours(issue.message) ? issue.message : `${label}: expected ${issue.message.replace(/^(Invalid input|Too small|Too big): expected /i, '')}`;
      message = /received/.test(message) ? message : `${message}, received ${describe(received)}`;
  }
  if (path[path.length - 1] === 'id' && issue.code !== 'invalid_type') hint = 'lower-case letters and digits joined by single hyphens';
  return new AppError('invalid_claim', message, { path: issuePath(path), ...(file ? { file } : {}), ...(hint ? { hint } : {}) });
}
