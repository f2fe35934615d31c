import { countFamily, DEFAULT_PRIMES, modularErrorBound, modularSemiring, residueNormSemiring, type PieceSet, type Region, type ResidueNormSemiring } from '../engine/index.js';
import type { FamilyValues } from './family-cells.js';
import type { Permutation } from './substitution.js';
import type { ClaimProgram } from './compile-claim-program.js';
import { MAX_MODULAR_ERROR } from './compare-values.js';
import { Meter, MODULAR_SEED } from './measure.js';

// The bulk scan's value tables for a modular comparison (polynomial or Laurent values, not --exact).
//
// Each entry of a table is one float64 *code* of a boundary's value: its residues modulo the first two
// primes at the sweep's random point, packed exactly as r₁ + p₁·r₂ (< 2^52), when the 1-norm bound of the
// value (the bound lane of `residueNormSemiring`, from the same sweep) is at most NORM_LIMIT; otherwise
// NaN, which equals nothing, so that boundary goes to the per-instance path. Two codes are equal exactly
// when both residues are, and both norms are then small enough that the Schwartz–Zippel bound of two
// primes holds for the pair (`classBounds`). The codes are the same in every worker (same seed, same
// point), so they can live in the shared tables like integer values.

/** The primes of the table codes: the per-instance path's first two, at the same point. */
export const SCAN_PRIMES: readonly number[] = DEFAULT_PRIMES.slice(0, 2);
const [P1, P2] = SCAN_PRIMES as [number, number];
// ‖L‖₁ + ‖R‖₁ + 1 ≤ 2·NORM_LIMIT + 1 stays below the smallest prime: each prime then sees a nonzero difference.
const NORM_LIMIT = Math.floor((Math.min(P1, P2) - 2) / 2);

/** Whether a claim's modular comparisons can be decided from residue tables: values compared for equality through a side map. */
export function residueScannable(program: ClaimProgram): boolean {
  if (program.claim.compare.measure.type !== 'value' || !program.polynomial) return false;
  // equal, or equal after a fixed substitution σ per class (T(b)'s table is then swept at the σ-moved point)
  if (program.formula || !program.sideMap || program.relation.searchSpace) return false;
  if (program.claim.compare.relation.type !== 'equal' && program.claim.compare.relation.type !== 'equalAfterSubstitution') return false;
  return program.left.boundaryLabels.every((a) => a.length === 1);
}

/** Chance of a false "holds" per boundary the scan decides: a comparison of b with T(b), or a zero left value. */
export interface ClassBounds {
  readonly holds: number;
  readonly zero: number;
}

export function residueTables(program: ClaimProgram) {
  // One semiring per substitution: σ moves the point (y_m is read at y_σ(m)), as in the per-instance path.
  const semirings = new Map<string, ResidueNormSemiring>();
  const semiringOf = (sigma: Permutation | undefined) => {
    const key = sigma ? sigma.join(',') : '';
    let r = semirings.get(key);
    if (!r) semirings.set(key, (r = residueNormSemiring(modularSemiring(MODULAR_SEED, SCAN_PRIMES, sigma ? (i) => sigma[i - 1] ?? i : undefined))));
    return r;
  };
  const measure = program.claim.compare.measure;
  const left = new Meter(program.left, measure, program.names, 1);
  const right = new Meter(program.right, measure, program.names, 1);

  /** Codes of every boundary of a product family (countFamily's order), or null when they cannot be had; with σ, of σ(value). */
  const tableFor =
    (sigma?: Permutation): FamilyValues =>
    (region, candidates, pieces) =>
      codes(region, candidates, pieces, semiringOf(sigma));

  function codes(region: Region, candidates: readonly (readonly string[])[], pieces: PieceSet, semiring: ResidueNormSemiring): Float64Array | null {
    const t = countFamily(region, candidates, pieces, { semiring });
    const lanes = t.residues;
    if (!lanes || t.lanes !== 3) return null;
    const codes = new Float64Array(t.size);
    for (let i = 0; i < t.size; i++) codes[i] = lanes[3 * i + 2]! <= NORM_LIMIT ? lanes[3 * i]! + P1 * lanes[3 * i + 1]! : NaN;
    return codes;
  }

  /**
   * The bounds of a class whose boundaries have these lengths (b) and image lengths (T(b)), as the
   * per-instance path takes degrees (`errorBoundOf`) but with the two primes of the codes; undefined when
   * a modular "holds" says too little there (unbounded quotients, or above MAX_MODULAR_ERROR).
   */
  function classBounds(lengths: readonly number[], imageLengths: readonly number[]): ClassBounds | undefined {
    const l = left.modularDegree(lengths);
    const r = right.modularDegree(imageLengths);
    if (!l || !r) return undefined;
    const coefficients = BigInt(2 * NORM_LIMIT + 1);
    const degree = (a: typeof l, b: typeof l) => (a.laurent || b.laurent ? a.degree + b.degree : Math.max(a.degree, b.degree, 1));
    const holds = modularErrorBound(degree(l, r), coefficients, SCAN_PRIMES);
    const zero = modularErrorBound(degree(l, l), coefficients, SCAN_PRIMES);
    return holds <= MAX_MODULAR_ERROR && zero <= MAX_MODULAR_ERROR ? { holds, zero } : undefined;
  }

  return { table: tableFor(), tableFor, classBounds };
}
