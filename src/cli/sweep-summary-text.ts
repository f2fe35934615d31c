import { permutationText } from '../claims/index.js';
import type { ClaimSummary, SweepSummary } from '../run/sweep-summary.js';

const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

/** `(V vacuous, N nonzero)`: holds with both compared values zero, and with some value nonzero. */
function holdsSplit(vacuous: number, nonzero: number | null): string {
  return nonzero === null ? `(${vacuous} vacuous or more; nonzero not counted by an older store)` : `(${nonzero} nonzero, ${vacuous} vacuous: both values 0)`;
}

/** Permutations serving every instance of a class so far, in block/cycle notation, with their caveats. */
export function commonPermutationsText(p: { readonly common: readonly (readonly number[])[]; readonly lowerBound: boolean }, incomplete: boolean): string {
  const shown = p.common.slice(0, 4).map((q) => permutationText(q));
  const list = p.common.length === 0 ? 'no single permutation serves every instance' : `serving every instance: ${shown.join(', ')}${p.common.length > 4 ? ` and ${p.common.length - 4} more` : ''}`;
  const caveats = [
    incomplete ? 'class incomplete: instances not yet checked may rule some out' : '',
    p.lowerBound ? 'some instance had more than 720 working permutations and only the first 720 were kept, so more may serve all' : '',
  ].filter(Boolean);
  return `permutations ${list}${caveats.length ? ` (${caveats.join('; ')})` : ''}`;
}

function claimText(c: ClaimSummary): string[] {
  const lines = [
    `claim ${c.claimId} (${c.fingerprint.slice(0, 12)}), run ${c.runId}: ${c.status}${c.stopReason === 'finished' ? '' : ` (${c.stopReason.replace(/_/g, ' ')})`}`,
    `  checked ${c.instancesChecked} instances in ${seconds(c.elapsedMs)}: ${c.holds} hold ${holdsSplit(c.vacuous, c.nonzero)}, ${c.newCounterexamples} new counterexample${c.newCounterexamples === 1 ? '' : 's'}` +
      (c.skippedZero ? `, ${c.skippedZero} skipped (value 0)` : '') +
      (c.paired ? ` (${c.paired} decided with their involution partner)` : ''),
  ];
  if (c.method === 'modular' && c.instancesChecked > 0) lines.push(`  modular comparisons: chance of a false "holds" ≤ ${c.errorBound.toExponential(2)} (use --exact to avoid)`);
  if (c.rechecked.checked) lines.push(`  re-checked ${c.rechecked.checked} stored counterexample${c.rechecked.checked === 1 ? '' : 's'}: ${c.rechecked.stillFail} still fail${c.rechecked.nowHold ? `, ${c.rechecked.nowHold} NOW HOLD (stored result doubtful)` : ''}`);
  if (c.rechecked.partnersStored) {
    const n = c.rechecked.partnersStored;
    lines.push(`  stored ${n} failing partner${n === 1 ? '' : 's'} T(b) that an older store had counted as holding`);
  }
  if (c.overturned) lines.push(`  ${c.overturned} modular "fails" were overturned by exact recomputation`);
  lines.push('  classes:');
  for (const k of c.classes) {
    const state = k.state === 'verified' ? `verified (${k.method}${k.method === 'modular' ? `, error ≤ ${k.errorBound?.toExponential(1)}` : ''})` : k.state;
    const perms = k.commonPermutations ? `  ${commonPermutationsText(k.commonPermutations, k.state === 'incomplete')}` : '';
    const progress = k.state === 'incomplete' ? ` (${k.done} of ${k.instances} done)` : '';
    lines.push(`    ${k.key.padEnd(16)} sides ${k.lengths.join(',').padEnd(14)} ${k.instances.padStart(9)} instances  ${state}${progress}${k.checked ? `  (${k.checked} checked now, ${k.fails} fail)` : ''}${k.stored ? `  stored: ${k.stored.holds} hold ${holdsSplit(k.stored.vacuous, k.stored.nonzero)}, ${k.stored.fails} fail` : ''}${perms}`);
  }
  if (c.permutations) {
    lines.push(
      `  permutations found for ${c.permutations.instances} instances: ${c.permutations.distinct === 1 ? `the first one found is the same for all: [${c.permutations.common!.join(',')}]` : `the first one found takes ${c.permutations.distinct} values (an instance may have several; the class lines above list those serving a whole class)`}`,
    );
  }
  if (c.permutationRule === null) lines.push('  rule: none found that serves every swept class among single block reversals and shifts whose endpoints are affine in the family variables (coefficients −1..2, constants −2..3)');
  else if (c.permutationRule) lines.push(`  rule: ${c.permutationRule.text}; as a relation: "relation": ${JSON.stringify(c.permutationRule.relation)}`);
  if (c.counterexamples) lines.push(`  ${c.counterexamples} counterexample${c.counterexamples === 1 ? '' : 's'} stored`);
  if (c.outcome === 'empty') lines.push('  the family has no instance within its bounds: nothing was checked, so nothing is shown to hold');
  if (c.remaining) {
    const r = c.remaining;
    const what = [
      r.classes.length ? `${r.instances} instances in ${r.classes.length} class${r.classes.length === 1 ? '' : 'es'} (${r.classes.slice(0, 4).join('; ')}${r.classes.length > 4 ? '; …' : ''})` : '',
      r.rechecks ? `${r.rechecks} stored counterexample${r.rechecks === 1 ? '' : 's'} to re-check` : '',
    ].filter(Boolean);
    if (what.length) lines.push(`  unfinished: ${what.join(', ')}; run the same command again to finish${c.stopReason === 'time_limit' ? ' (with a larger --time-limit, or none)' : ''}`);
  }
  const f = c.firstCounterexample;
  if (f) {
    lines.push(
      `  first counterexample: class ${f.classKey}, index ${f.index}`,
      `    left  (${f.left.theory}) sides ${f.left.sides.map((s) => s || '-').join(' | ')}: ${f.left.text}`,
      `    right (${f.right.theory}) sides ${f.right.sides.map((s) => s || '-').join(' | ')}: ${f.right.text}`,
      ...(f.substituted ? [`    σ(right), σ = ${f.substitution ?? '(not recorded)'}: ${f.substituted.text}`] : []),
      `    replay: ${f.replay}`,
    );
  }
  return lines;
}

/** The human-readable end-of-run summary. */
export function sweepSummaryText(s: SweepSummary): string {
  const verdict = s.interrupted
    ? 'interrupted: finished chunks are stored; run the same command again to resume'
    : s.exitCode === 1
      ? 'a counterexample is known'
      : s.exitCode === 4
        ? s.claims.some((c) => c.outcome === 'incomplete')
          ? 'incomplete: part of the requested classes is unchecked (see "unfinished" above); nothing is claimed to hold'
          : s.claims.some((c) => c.stopReason !== 'finished')
            ? `stopped before the shard was done (${s.claims.map((c) => c.stopReason.replace(/_/g, ' ')).join(', ')}); run the same command again to resume`
            : 'nothing to check: the family is empty within its bounds'
        : 'holds on every requested class';
  return [...s.claims.flatMap(claimText), `store: ${s.db}`, `result: ${verdict} (${seconds(s.elapsedMs)})`].join('\n');
}

export { summaryJson } from './summary-json.js';
