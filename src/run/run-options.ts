import * as z from 'zod';
import { CodedError } from '../errors/index.js';
import { hasSchemaMessage, issueExpected, parseMarked, schemaMessageParts } from '../claims/zod-issue.js';
import { DEFAULT_STORE_PATH } from '../store/index.js';
import { parseShard, type ShardSpec } from './shard-partition.js';

const maxEntry = z
  .string()
  .regex(/^[A-Za-z_][A-Za-z0-9_]*=\d+$/, { message: "Bound: expected 'variable=value' with a nonnegative integer value" });

/** Options of `puzzlesweep run`; each field is one command-line flag (camelCase of the flag's name). */
export const RunOptions = z.object({
  /** `--max var=value`: raise (or lower) a variable's upper bound for this run. */
  max: z
    .array(maxEntry)
    .default([])
    .transform((entries) => Object.fromEntries(entries.map((e) => [e.slice(0, e.indexOf('=')), Number(e.slice(e.indexOf('=') + 1))])) as Record<string, number>),
  /** `--workers`: worker threads; 0 sweeps in the main thread; absent: chosen by the family's size (run-sweep.ts). */
  workers: z.number().int().min(0).max(256).optional(),
  db: z.string().min(1).default(DEFAULT_STORE_PATH),
  stopAtFirst: z.boolean().default(false),
  maxCounterexamples: z.number().int().min(1).optional(),
  timeLimit: z.number().positive().optional(),
  exact: z.boolean().default(false),
  /** `--keep-permutations`: store each instance's permutation too (class-wide intersections are always kept). */
  keepPermutations: z.boolean().default(false),
  json: z.boolean().default(false),
  /** Instances per chunk: the unit of work, resume and lease (sized by measured work when absent). */
  chunkSize: z.number().int().min(1).max(1_000_000).optional(),
  /** `--shard i/N`: sweep only shard i of a deterministic N-way partition of the work (see shard-partition.ts). */
  shard: z.string().optional(),
});

export type RunOptions = Omit<z.output<typeof RunOptions>, 'shard'> & { readonly shard?: ShardSpec | undefined };
export type RunOptionsInput = z.input<typeof RunOptions>;

const kebab = (s: string) => s.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

/** Validates run options; the error names the flag, e.g. `→ at --max-counterexamples`. */
export function parseRunOptions(input: RunOptionsInput): RunOptions {
  const parsed = parseMarked(RunOptions, input);
  if (parsed.success) {
    const { shard, ...rest } = parsed.data;
    return shard === undefined ? rest : { ...rest, shard: parseShard(shard) };
  }
  const issue = parsed.error.issues[0]!;
  const flag = `--${kebab(String(issue.path[0] ?? 'options'))}`;
  let received: unknown = input;
  for (const p of issue.path) received = received && typeof received === 'object' ? (received as Record<PropertyKey, unknown>)[p as PropertyKey] : undefined;
  const expected = hasSchemaMessage(issue) ? schemaMessageParts(issue.message, '').expected : issueExpected(issue);
  throw new CodedError('invalid_argument', { what: flag, expected, received: JSON.stringify(received) ?? 'nothing' }, {
    path: flag,
    hint: 'see puzzlesweep run --help',
  });
}
