/**
 * The contract between the claims layer (what a claim means) and the sweep runner (how it is swept).
 * The runner only ever sees these types; everything mathematical stays behind `planClaim`.
 */

/** One side-length class of a family: the family's variables fixed to values. */
export interface SizeClass {
  /** Stable name, e.g. `a=2,b=1` (variables in the order the claim declares them). */
  readonly key: string;
  readonly variables: Readonly<Record<string, number>>;
  readonly lengths: readonly [number, number, number, number, number, number];
  /** Total boundary length s1+…+s6 (classes are swept in increasing size, then lengths). */
  readonly size: number;
}

/** One boundary of a class, named by its index inside the class (0 ≤ index < instanceCount). */
export interface Instance {
  readonly classKey: string;
  readonly index: bigint;
  /** Six clockwise side strings. */
  readonly sides: readonly string[];
}

/** A measured value in printable and stable-JSON form. */
export interface Measured {
  readonly theory: string;
  readonly lengths: readonly number[];
  readonly sides: readonly string[];
  /** Canonical text: a decimal, a polynomial such as `y3 - y2`, a distribution `1 + 2*t`, or residues. */
  readonly text: string;
  readonly json: unknown;
}

export interface InstanceResult {
  readonly classKey: string;
  readonly index: bigint;
  /** `paired`: the transform is an involution and this boundary's partner (lower index) stands for it. */
  readonly status: 'holds' | 'fails' | 'skipped_zero' | 'paired';
  readonly left: Measured;
  /** T(b) measured in its own right: exactly what `count` prints for that boundary. */
  readonly right: Measured;
  /** For substitution relations: σ(right), the value compared with `left`, and σ written out. */
  readonly substituted?: Measured;
  readonly substitution?: string;
  /** `holds` with both compared values zero: true but vacuous evidence. */
  readonly vacuous?: boolean;
  /** For "equal up to some permutation": the permutation found (1-based images of y_1..y_N). */
  readonly permutation?: readonly number[];
  /**
   * For "equal up to some permutation": every permutation of the search space that works here (the first
   * is `permutation`), so the runner can intersect them over a class to tell whether one serves all.
   * `permutationsTruncated`: the list stopped at its cap (720), so an intersection is only a lower bound.
   */
  readonly permutations?: readonly (readonly number[])[];
  readonly permutationsTruncated?: boolean;
  /**
   * For `paired`: the index of the partner T(b) inside the same class, which was checked instead. For
   * the representative of a pair (T(b) ≠ b, T(b) later in the class): T(b)'s index, decided by this result too.
   */
  readonly partnerIndex?: bigint;
  /** For the representative of a pair: the partner's status, decided by this same comparison. */
  readonly partnerStatus?: 'holds' | 'fails' | 'skipped_zero';
  /** `modular`: values compared by evaluation modulo primes; `errorBound` is the chance of a false "holds". */
  readonly method: 'exact' | 'modular';
  readonly errorBound?: number;
}

/** Options that change what a sweep checks (they are part of the fingerprint when they change results). */
export interface EvaluateOptions {
  /** Exact polynomials instead of modular identity tests. */
  readonly exact: boolean;
}

export interface ClaimPlan {
  /** Side-length classes in sweep order, with variable upper bounds optionally raised or lowered. */
  classes(maxOverride?: Readonly<Record<string, number>>): SizeClass[];
  instanceCount(cls: SizeClass): bigint;
  /** The index ↔ instance bijection inside a class; consecutive indices share sides 1–4 and 6 where possible. */
  instanceAt(cls: SizeClass, index: bigint): Instance;
  indexOf(cls: SizeClass, sides: readonly string[]): bigint | undefined;
  /** Optional: shared memory for the class's value tables, when the claim is swept from tables and they fit. */
  sharedTables?(cls: SizeClass): SharedTables | undefined;
  /** Optional: the instances start ≤ index < end in order, cheaper than one `instanceAt` each. */
  instancesFrom?(cls: SizeClass, start: bigint, end: bigint): Iterable<Instance>;
}

/** Tallies a bulk scan adds to (the runner's chunk counters, counted as the per-instance path counts them). */
export interface ScanTally {
  checked: number;
  holds: number;
  skippedZero: number;
  paired: number;
  vacuous: number;
  nonzero: number;
  /** Modular decisions: the sum of their error bounds, and exact = false once there is one. */
  errorBound?: number;
  exact?: boolean;
}

/** Memory shared by the workers sweeping one class: its value tables, each cell computed once (`family-scan.ts`). */
export interface SharedTables {
  /** Names this allocation, so a worker tells one run's tables from another's. */
  readonly id: string;
  readonly values: SharedArrayBuffer;
  /** Per cell and part: 0 free, 1 being computed, 2 done, 3 not computable (Int32). */
  readonly state: SharedArrayBuffer;
}

export interface Evaluator {
  /**
   * Optional bulk path: decides instances [start, end) of a class from value tables, adding to `tally`,
   * and hands every instance it does not decide (failures among them) to `fallback`, in index order.
   * False when it does not scan this class (nothing tallied).
   */
  scan?(cls: SizeClass, start: bigint, end: bigint, tally: ScanTally, fallback: (index: bigint) => void, tables?: SharedTables): boolean;
  /** Checks one instance; may use a cache of one-pass-for-all-completions sweeps keyed by partial boundary. */
  evaluate(instance: Instance): InstanceResult;
  /** Recomputes one instance with exact arithmetic only (used to confirm every counterexample). */
  confirm(instance: Instance): InstanceResult;
}
