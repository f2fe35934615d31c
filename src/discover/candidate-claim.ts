import type { ClaimInput, PermutationRule } from '../claims/index.js';
import { valueRing } from '../engine/index.js';
import type { Candidate } from './candidate-space.js';
import type { DiscoverInput } from './discover-input.js';

const kebab = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '');

/** The claim id of a candidate: family prefix, theory, transform. */
export function candidateId(c: Candidate, input: DiscoverInput): string {
  return kebab(`${input.prefix}-${c.left.name}-${c.name}`);
}

/** The candidate as a complete claim, exactly as discover tests it (and stores it). */
export function candidateClaim(c: Candidate, input: DiscoverInput): ClaimInput {
  const statement = `Candidate from discover: ${c.description} keeps the ${c.left.name} value${c.left === c.right ? '' : ` (the right side measured in ${c.right.name})`}${c.polynomial ? `, up to a permutation of ${valueRing(c.left.pieces).letter}_1..${valueRing(c.left.pieces).letter}_N` : ''}.`;
  return {
    id: candidateId(c, input),
    statement,
    theory: c.left.input,
    family: input.family,
    transform: [...c.steps],
    compare: {
      measure: { type: 'value' },
      relation: c.polynomial ? { type: 'equalUpToPermutation', searchSpace: input.space.permutations } : { type: 'equal' },
      ...(c.left === c.right ? {} : { rightTheory: c.right.input }),
    },
  };
}

/**
 * A survivor as a claim file to sweep further: the candidate itself, or, when one permutation rule
 * serves every class, the sharper claim with that substitution (or plain equality for the identity).
 */
export function survivorClaim(c: Candidate, input: DiscoverInput, rule: PermutationRule | undefined): ClaimInput {
  const claim = candidateClaim(c, input);
  if (!c.polynomial || rule === undefined) return claim;
  const base = `Found by discover: ${c.description} keeps the ${c.left.name} value${c.left === c.right ? '' : ` (the right side measured in ${c.right.name})`}`;
  if (rule.relation.type === 'equal') {
    return { ...claim, id: `${claim.id}-equal`, statement: `${base}.`, compare: { ...claim.compare, relation: rule.relation } };
  }
  const steps = rule.relation.substitution.map((s) =>
    s.type === 'reverseBlock' ? `reversing y_(${s.from})..y_(${s.to})` : s.type === 'shiftBlock' ? `shifting y_(${s.from})..y_(${s.to}) cyclically by ${s.by}` : JSON.stringify(s),
  );
  return { ...claim, id: `${claim.id}-substituted`, statement: `${base}, after ${steps.join(' then ')} on the right.`, compare: { ...claim.compare, relation: { type: 'equalAfterSubstitution', substitution: [...rule.relation.substitution] } } };
}
