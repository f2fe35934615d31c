import { canonicalClaimJson, claimFingerprint, ENGINE_VERSION, parseClaim, planClaim, type Claim } from '../claims/index.js';
import { measured } from '../claims/compare-values.js';
import { openStore, recordRecheck, type CounterexampleRecord } from '../store/index.js';
import { buildDiscoverResult, type DiscoverResult } from './build-discover-result.js';
import { candidateClaim } from './candidate-claim.js';
import { candidateSpace, type Candidate, type SearchTheory } from './candidate-space.js';
import type { DiscoverInput } from './discover-input.js';
import { DiscoverStore, type CandidateClassResult } from './discover-store.js';
import { compareOne, eliminateCandidates, type EliminationProgress, type FoundCounterexample } from './eliminate-candidates.js';
import { ValueTable } from './value-table.js';

export interface DiscoverOptions {
  /** Upper bounds of variables for this run (`--max`). */
  readonly max: Readonly<Record<string, number>>;
  readonly db: string;
  /** Folder for the survivors' claim files; none written when absent. */
  readonly out?: string | undefined;
  readonly signal?: AbortSignal | undefined;
  readonly onProgress?: ((p: EliminationProgress) => void) | undefined;
}

function familyClaim(input: DiscoverInput, theory: Claim['theory']): Claim {
  return parseClaim({ id: 'discover', statement: 'discover', theory, family: input.family, transform: [], compare: { measure: { type: 'value' }, relation: { type: 'equal' } } }, input.file);
}

/** Runs a symmetry search on a family: builds the candidate space, eliminates, ranks; returns data. */
export function runDiscover(input: DiscoverInput, options: DiscoverOptions): DiscoverResult {
  const began = Date.now();
  const theories: SearchTheory[] = input.theories.map((t) => {
    const compiled = planClaim(familyClaim(input, t)).compiled;
    return { input: t, name: compiled.left.name, pieces: compiled.left };
  });
  const plan = planClaim(familyClaim(input, input.theories[0]!));
  const classes = plan.classes(options.max);
  const candidates = candidateSpace(plan.compiled, classes, theories, input.space);
  const claims = candidates.map((c) => parseClaim(candidateClaim(c, input)));
  const fingerprints = claims.map((claim) => claimFingerprint(claim));
  const table = new ValueTable(new Map(theories.map((t) => [t.name, t.pieces])));
  const db = openStore(options.db);
  let interrupted = false;
  try {
    const store = new DiscoverStore(
      db,
      claims.map((claim, i) => ({ id: claim.id, fingerprint: fingerprints[i]!, canonicalJson: canonicalClaimJson(claim), engineVersion: ENGINE_VERSION })),
      { max: options.max, file: input.file ?? null },
    );
    const show = (c: Candidate, f: FoundCounterexample): CounterexampleRecord => {
      const cls = plan.classForKey(f.instance.classKey);
      return {
        classKey: cls.key,
        index: f.instance.index,
        size: cls.size,
        lengths: cls.lengths,
        left: measured(c.left.name, cls.lengths, f.instance.sides, f.left, table.names),
        right: measured(c.right.name, f.rightLengths, f.rightSides, f.right, table.names),
      };
    };
    const progress = candidates.map((_, i) => store.progress(i));
    const counterexamples = new Map<number, CounterexampleRecord>();
    const dropped = new Set<number>();
    // A stored counterexample stands only if it still fails when recomputed.
    progress.forEach((p, i) => {
      const stored = p.counterexamples[0];
      if (!stored) return;
      const cls = plan.classForKey(stored.classKey);
      const instance = plan.instanceAt(cls, stored.index);
      const r = compareOne(candidates[i]!, table, cls.lengths, instance.sides, undefined, input.space.permutations, false);
      const fails = r !== 'skipped' && !r.holds;
      if (fails) {
        dropped.add(i);
        counterexamples.set(i, stored);
      } else recordRecheck(db, fingerprints[i]!, stored.classKey, stored.index, store.runOf(i), 'holds');
    });
    const finished = eliminateCandidates(plan, classes, candidates, table, {
      isDone: (i, cls) => progress[i]!.verified.has(cls.key),
      dropped,
      nonzeroOnly: input.family.nonzeroOnly,
      permutations: input.space.permutations,
      signal: options.signal,
      onProgress: options.onProgress,
      onClass: (cls, outcomes) => {
        const results: CandidateClassResult[] = outcomes.map((o) => {
          const counterexample = o.failure ? show(candidates[o.candidate]!, o.failure) : undefined;
          if (counterexample) {
            dropped.add(o.candidate);
            counterexamples.set(o.candidate, counterexample);
          }
          return { candidate: o.candidate, checked: o.checked, nonzero: o.nonzero, skippedZero: o.skippedZero, durationMs: o.durationMs, counterexample, common: o.common };
        });
        store.saveClass(cls, plan.instanceCount(cls), results);
      },
    });
    interrupted = !finished;
    store.finish(interrupted);
    return buildDiscoverResult({ input, out: options.out, plan, classes, candidates, progress: candidates.map((_, i) => store.progress(i)), counterexamples, valuesComputed: table.computed, interrupted, began });
  } finally {
    db.close();
  }
}
