/** What a claim's HTML report shows; built from the store (store-report-data.ts) or from fixtures in tests. */
export interface ReportData {
  readonly claim: ReportClaim;
  /** Swept side-length classes in any order; the report sorts them by size, then side lengths. */
  readonly classes: readonly ReportClass[];
  /** Confirmed counterexamples in any order; the report shows the smallest first. */
  readonly counterexamples: readonly ReportCounterexample[];
  /** ISO time the data was read, printed in the footer. */
  readonly generatedAt?: string;
}

export interface ReportClaim {
  readonly id: string;
  readonly statement: string;
  /** The claim as the user wrote it (the canonical JSON for stores that did not keep it). */
  readonly json: unknown;
  /** The relation as a formula in L (left value) and R (right value), e.g. `L = σ(R), σ = rev[1..a]`. */
  readonly relation?: string;
  /** How a failing instance reads, e.g. `L ≠ σ(R)`. */
  readonly failure?: string;
  /** Theory names, e.g. `cohomology` or `cohomology → k-theory` when the two sides differ. */
  readonly theory: string;
  /** The family in words, e.g. `sides n,0,n,0,n,0 with 1 ≤ n ≤ 4`. */
  readonly family: string;
  readonly fingerprint?: string;
}

export interface ReportClass {
  readonly key: string;
  readonly lengths: readonly number[];
  /** Instances of the class and, of those, how many were checked so far. */
  readonly instances: bigint;
  readonly checked: bigint;
  /** Boundaries that hold; of those, with some compared value nonzero (null: not counted by an older store). */
  readonly holds: bigint;
  readonly nonzero?: bigint | null;
  /** Boundaries skipped because their value is 0 (`nonzeroOnly`). */
  readonly skipped?: bigint;
  readonly counterexamples: number;
  /** Summed sweep time of the class, in seconds (null when the store has none). */
  readonly seconds: number | null;
  /** `verified`: complete without counterexample; `refuted`: has one; `partial`: not fully swept. */
  readonly status: 'verified' | 'refuted' | 'partial';
  readonly method?: 'exact' | 'modular';
  /** "Up to some permutation" claims: permutations serving every instance checked, in block/cycle notation. */
  readonly permutations?: { readonly common: readonly string[]; readonly truncated: boolean; readonly incomplete: boolean };
}

/** One side of a comparison: a boundary in a theory and its value as canonical text. */
export interface ReportBoundary {
  readonly theory: string;
  readonly lengths: readonly number[];
  readonly sides: readonly string[];
  readonly value: string;
}

export interface ReportCounterexample {
  readonly classKey: string;
  readonly index: bigint;
  /** Total boundary length (the sweep's size order). */
  readonly size: number;
  readonly left: ReportBoundary;
  /** T(b) with its own value (what `count` prints). */
  readonly right: ReportBoundary;
  /** Substitution relations: σ(right value), the value compared, and σ written out. */
  readonly substituted?: { readonly value: string; readonly sigma: string | null };
  /** Found through its pair: the index of the representative whose comparison decided it. */
  readonly partnerOf?: bigint;
  readonly permutation?: readonly number[];
}

function compareLengths(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

/** Smallest first: by size, then the left boundary's side lengths, then class and index. */
export function compareCounterexamples(a: ReportCounterexample, b: ReportCounterexample): number {
  return a.size - b.size || compareLengths(a.left.lengths, b.left.lengths) || a.classKey.localeCompare(b.classKey) || (a.index < b.index ? -1 : a.index > b.index ? 1 : 0);
}

/** Sweep order of classes: by total side length, then side lengths. */
export function compareClasses(a: ReportClass, b: ReportClass): number {
  const size = (c: ReportClass) => c.lengths.reduce((s, x) => s + x, 0);
  return size(a) - size(b) || compareLengths(a.lengths, b.lengths) || a.key.localeCompare(b.key);
}
