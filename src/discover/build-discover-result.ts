import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { inferPermutationRule, parseClaim, type ClaimInput, type PermutationRule, type SizeClass } from '../claims/index.js';
import type { ClaimPlanExt } from '../claims/plan-claim.js';
import type { CounterexampleRecord } from '../store/index.js';
import { candidateClaim, survivorClaim } from './candidate-claim.js';
import type { Candidate } from './candidate-space.js';
import type { DiscoverInput } from './discover-input.js';
import type { CandidateProgress } from './discover-store.js';
import { groupSurvivors } from './group-survivors.js';

/** The evidence behind a survivor. */
export interface SurvivorEvidence {
  /** Instances compared, over every class the candidate passed (this run and stored ones). */
  readonly instances: number;
  /** Of those, instances where the left or the right value is nonzero. */
  readonly nonzeroInstances: number;
  readonly classesVerified: number;
  readonly largestClass: { readonly key: string; readonly lengths: readonly number[]; readonly instances: number } | null;
  /** Survivors with the same group imply each other through a surviving symmetry of the family. */
  readonly group: number;
  /** The best-ranked member of the group, when that is another survivor. */
  readonly equivalentTo: string | null;
  readonly description: string;
  /** Polynomial theories: the permutation rule serving every class, if one was found. */
  readonly permutationRule: PermutationRule | null;
  /** The candidate's claim id as tested and stored (the written claim may sharpen it). */
  readonly testedAs: string;
  readonly file: string | null;
}

export interface DroppedCandidate {
  readonly claim: ClaimInput;
  readonly counterexample: {
    readonly classKey: string;
    readonly index: string;
    readonly left: { readonly theory: string; readonly sides: readonly string[]; readonly value: string };
    readonly right: { readonly theory: string; readonly sides: readonly string[]; readonly value: string };
  };
}

export interface DiscoverResult {
  readonly survivors: readonly { readonly claim: ClaimInput; readonly evidence: SurvivorEvidence }[];
  readonly dropped: readonly DroppedCandidate[];
  /** Size of the candidate space after merging candidates that act identically. */
  readonly candidates: number;
  /** Candidates neither dropped nor verified on any class (an interrupted run). */
  readonly untested: number;
  readonly classes: readonly string[];
  readonly valuesComputed: number;
  readonly interrupted: boolean;
  readonly elapsedMs: number;
}

export interface ResultInput {
  readonly input: DiscoverInput;
  readonly out?: string | undefined;
  readonly plan: ClaimPlanExt;
  readonly classes: readonly SizeClass[];
  readonly candidates: readonly Candidate[];
  readonly progress: readonly CandidateProgress[];
  readonly counterexamples: ReadonlyMap<number, CounterexampleRecord>;
  readonly valuesComputed: number;
  readonly interrupted: boolean;
  readonly began: number;
}

const sizeOf = (l: readonly number[]) => l[5]! + l[0]! + l[1]!;

function compareClasses(a: SizeClass, b: SizeClass): number {
  if (a.size !== b.size) return a.size - b.size;
  for (let i = 0; i < 6; i++) if (a.lengths[i] !== b.lengths[i]) return a.lengths[i]! - b.lengths[i]!;
  return 0;
}

function ruleOf(c: Candidate, p: CandidateProgress, plan: ClaimPlanExt): PermutationRule | undefined {
  if (!c.polynomial) return undefined;
  const rows = p.evidence.map((e) => ({ variables: plan.classForKey(e.classKey).variables, common: e.commonPermutations ?? [] }));
  return inferPermutationRule(plan.compiled.variables.map((v) => v.name), rows);
}

/** Ranks the survivors by evidence, groups equivalent ones, writes their claim files; returns the report. */
export function buildDiscoverResult(r: ResultInput): DiscoverResult {
  const { input, plan, candidates, progress } = r;
  const dropped: DroppedCandidate[] = [];
  const alive: { c: Candidate; i: number; instances: number; nonzero: number; largest: SizeClass | undefined; largestInstances: number; verified: number }[] = [];
  let untested = 0;
  candidates.forEach((c, i) => {
    const ce = r.counterexamples.get(i);
    if (ce) {
      dropped.push({
        claim: candidateClaim(c, input),
        counterexample: {
          classKey: ce.classKey,
          index: ce.index.toString(),
          left: { theory: ce.left.theory, sides: [...ce.left.sides], value: ce.left.text },
          right: { theory: ce.right.theory, sides: [...ce.right.sides], value: ce.right.text },
        },
      });
      return;
    }
    const p = progress[i]!;
    if (p.evidence.length === 0) {
      untested++;
      return;
    }
    let largest: SizeClass | undefined;
    let largestInstances = 0;
    for (const e of p.evidence) {
      const cls = plan.classForKey(e.classKey);
      if (!largest || compareClasses(cls, largest) > 0) [largest, largestInstances] = [cls, e.instances];
    }
    const sum = (f: (e: (typeof p.evidence)[number]) => number) => p.evidence.reduce((s, e) => s + f(e), 0);
    alive.push({ c, i, instances: sum((e) => e.instances), nonzero: sum((e) => e.nonzero), largest, largestInstances, verified: p.verified.size });
  });
  alive.sort((a, b) => b.nonzero - a.nonzero || b.instances - a.instances || (a.largest && b.largest ? compareClasses(b.largest, a.largest) : 0) || a.c.complexity - b.c.complexity);
  const groups = groupSurvivors(alive.map((a) => a.c), plan.compiled.lengths);
  const firstOfGroup = new Map<number, number>();
  groups.forEach((g, k) => firstOfGroup.has(g) || firstOfGroup.set(g, k));
  if (r.out) mkdirSync(r.out, { recursive: true });
  const survivors = alive.map((a, k) => {
    const rule = ruleOf(a.c, progress[a.i]!, plan);
    let claim = survivorClaim(a.c, input, rule);
    try {
      parseClaim(claim);
    } catch {
      // The rule fits the classes swept but not every class the family declares: keep the search claim.
      claim = candidateClaim(a.c, input);
    }
    const file = r.out ? join(r.out, `${claim.id}.json`) : null;
    if (file) writeFileSync(file, `${JSON.stringify(claim, null, 2)}\n`);
    const lead = firstOfGroup.get(groups[k]!)!;
    const evidence: SurvivorEvidence = {
      instances: a.instances,
      nonzeroInstances: a.nonzero,
      classesVerified: a.verified,
      largestClass: a.largest ? { key: a.largest.key, lengths: [...a.largest.lengths], instances: a.largestInstances } : null,
      group: groups[k]!,
      equivalentTo: lead === k ? null : candidateClaim(alive[lead]!.c, input).id,
      description: a.c.description,
      permutationRule: rule ?? null,
      testedAs: candidateClaim(a.c, input).id,
      file,
    };
    return { claim, evidence };
  });
  return {
    survivors,
    dropped,
    candidates: candidates.length,
    untested,
    classes: r.classes.map((c) => c.key),
    valuesComputed: r.valuesComputed,
    interrupted: r.interrupted,
    elapsedMs: Date.now() - r.began,
  };
}
