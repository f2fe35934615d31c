/**
 * puzzlesweep as a library: count one boundary, expand a product, tabulate Gr(k, n), enumerate puzzles,
 * load and run a claim, without a process per coefficient. Results are the objects the CLI prints with
 * `--json` (same fields, same `formatVersion`), so notebooks and scripts can switch freely.
 */
import { loadClaim as loadClaimFile, type Claim } from './claims/index.js';
import { countRegion } from './claims/count-region.js';
import { resolveTheory } from './claims/resolve-theory.js';
import { enumeratePuzzles as enumerateEngine, structureConstantSides, type PieceSet, type Puzzle } from './engine/index.js';
import { CodedError } from './errors/index.js';
import { expandProduct } from './products/expand-product.js';
import { structureTable } from './products/parallel-table.js';
import { parseGrassmannian, parsePartition, partitionOfString, partitionText, stringOfPartition, type Grassmannian } from './products/partition-strings.js';
import { productJson, tableJson } from './products/table-formats.js';
import type { ValueForm } from './report/root-form.js';
import type { CountJson, ProductJson, TableJson } from './products/json-types.js';
import { countJson, JSON_FORMAT_VERSION } from './report/value-json.js';
import { loadSweepClaim } from './run/load-sweep-claim.js';
import { isLocalizationOnly, localizationProduct, localizationTableRows } from './run/localization-values.js';
import { parseRunOptions, type RunOptionsInput } from './run/run-options.js';
import { runSweep } from './run/run-sweep.js';
import type { SweepSummary } from './run/sweep-summary.js';
import { regionOfSides } from './claims/count-region.js';

export { CodedError, JSON_FORMAT_VERSION, partitionOfString, partitionText, parsePartition, stringOfPartition };
export { ERROR_CATALOGUE, errorJson, exitCodeFor, formatError, type ErrorCode, type ErrorParams, type ErrorParts } from './errors/index.js';
export type { Claim, Grassmannian, PieceSet, Puzzle, SweepSummary, ValueForm };
export type { CountJson, JsonInteger, PartitionsJson, ProductJson, TableJson, TermJson, ValueJson } from './products/json-types.js';

/** A theory name (`cohomology`, `equivariant`, `k-theory`, `dual-k-theory`, `ssm-nonequivariant`, `ssm`; for `expand` and `table` also `equivariant-k-theory`, `ssm-chern`), a piece-set JSON path, or a piece set. */
export type TheoryInput = string | PieceSet;

/** A Schubert class: a 0/1 string such as `0101001`, or a partition such as `[2, 1]` (then `grassmannian` is needed). */
export type ClassInput = string | readonly number[];

export interface ClassesOptions {
  readonly theory: TheoryInput;
  /** Gr(k, n) as `[k, n]`; required when a class is given as a partition. */
  readonly grassmannian?: readonly [number, number];
  /** How polynomial values are written (default `roots`: z_m = y_{m+1} − y_m when positive there). */
  readonly form?: ValueForm;
}

const theoryOf = (t: TheoryInput): PieceSet => (typeof t === 'string' ? resolveTheory(t) : t);

function classString(c: ClassInput, g: readonly [number, number] | undefined, name: string): string {
  if (typeof c === 'string') return c;
  if (!g) throw new CodedError('invalid_argument', { what: `${name}`, expected: 'a grassmannian [k, n] with a partition', received: 'none' }, { path: 'grassmannian' });
  return stringOfPartition(c, { k: g[0], n: g[1] }, name);
}

/** The value of c_{λμ}^ν (the `count --json` object) for classes given as strings or partitions. */
export function count(options: ClassesOptions & { readonly lambda: ClassInput; readonly mu: ClassInput; readonly nu: ClassInput }): CountJson {
  const g = options.grassmannian;
  const [l, m, n] = [classString(options.lambda, g, 'lambda'), classString(options.mu, g, 'mu'), classString(options.nu, g, 'nu')];
  return countJson(countRegion(theoryOf(options.theory), structureConstantSides(l, m, n)), options.form, { lambda: l, mu: m, nu: n }) as CountJson;
}

/** The value of any region given by its six clockwise side strings (the `count --sides … --json` object). */
export function countSides(options: { readonly theory: TheoryInput; readonly sides: readonly string[]; readonly completed?: boolean; readonly form?: ValueForm }): CountJson {
  return countJson(countRegion(theoryOf(options.theory), options.sides, { completed: options.completed ?? false }), options.form) as CountJson;
}

/** The whole product σ_λ·σ_μ (the `expand --json` object): every ν with a nonzero structure constant. */
export function expand(options: ClassesOptions & { readonly lambda: ClassInput; readonly mu: ClassInput }): ProductJson {
  const g = options.grassmannian;
  const l = classString(options.lambda, g, 'lambda');
  const m = classString(options.mu, g, 'mu');
  const grassmannian = /^[01]*$/.test(l) ? { k: [...l].filter((c) => c === '1').length, n: l.length } : undefined;
  // Theories without a built-in puzzle rule (equivariant-k-theory, ssm-chern) by localization, as the CLI does.
  const product = typeof options.theory === 'string' && isLocalizationOnly(options.theory) ? localizationProduct(options.theory, l, m) : expandProduct(theoryOf(options.theory), l, m);
  return productJson(product, options.form ?? 'roots', grassmannian) as ProductJson;
}

/** Every nonzero structure constant of Gr(k, n) (the `table --format json` object). */
export async function table(options: { readonly theory: TheoryInput; readonly grassmannian: readonly [number, number]; readonly form?: ValueForm; readonly workers?: number }): Promise<TableJson> {
  const g: Grassmannian = { k: options.grassmannian[0], n: options.grassmannian[1] };
  if (typeof options.theory === 'string' && isLocalizationOnly(options.theory)) {
    return tableJson(options.theory, g, localizationTableRows(options.theory, parseGrassmannian(`${g.k},${g.n}`, 'grassmannian')), options.form ?? 'roots') as TableJson;
  }
  const pieces = theoryOf(options.theory);
  const rows = await structureTable(pieces, g, { workers: options.workers ?? 1 });
  return tableJson(pieces.name, g, rows, options.form ?? 'roots') as TableJson;
}

/** Every puzzle of a boundary, lazily: six clockwise side strings, or `triangle: [λ, μ, ν]` (ν read left to right). */
export function* enumeratePuzzles(options: { readonly theory: TheoryInput; readonly sides?: readonly string[]; readonly triangle?: readonly [string, string, string] }): Generator<Puzzle> {
  const sides = options.triangle ? structureConstantSides(...options.triangle) : options.sides;
  if (!sides) throw new CodedError('invalid_argument', { what: 'Boundary', expected: 'sides or triangle', received: 'neither' }, { path: 'sides' });
  yield* enumerateEngine(regionOfSides(sides), sides, theoryOf(options.theory));
}

/** Reads and validates a claim file; throws a `CodedError` with the JSON path of the first mistake. */
export function loadClaim(file: string): Claim {
  return loadClaimFile(file);
}

/** Sweeps claim files into a store, as `puzzlesweep run` does (resumable); returns the summary, prints nothing. */
export async function runClaims(files: readonly string[], options: Omit<RunOptionsInput, 'json'> = {}): Promise<SweepSummary> {
  const claims = files.map((f) => loadSweepClaim(f));
  return runSweep({ claims, options: parseRunOptions({ ...options, json: true }) });
}
