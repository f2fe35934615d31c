import { jsonInteger } from '../report/value-json.js';
import type { ClaimSummary, SweepSummary } from '../run/sweep-summary.js';

const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

function claimText(c: ClaimSummary): string[] {
  const lines = [
    `claim ${c.claimId} (${c.fingerprint.slice(0, 12)}), run ${c.runId}: ${c.status}${c.stopReason === 'finished' ? '' : ` (${c.stopReason.replace(/_/g, ' ')})`}`,
    `  checked ${c.instancesChecked} instances in ${seconds(c.elapsedMs)}: ${c.holds} hold, ${c.newCounterexamples} new counterexample${c.newCounterexamples === 1 ? '' : 's'}` +
      (c.skippedZero ? `, ${c.skippedZero} skipped (value 0)` : '') +
      (c.paired ? `, ${c.paired} covered by their involution partner` : ''),
  ];
  if (c.method === 'modular' && c.instancesChecked > 0) lines.push(`  modular comparisons: chance of a false "holds" ≤ ${c.errorBound.toExponential(2)} (use --exact to avoid)`);
  if (c.rechecked.checked) lines.push(`  re-checked ${c.rechecked.checked} stored counterexample${c.rechecked.checked === 1 ? '' : 's'}: ${c.rechecked.stillFail} still fail${c.rechecked.nowHold ? `, ${c.rechecked.nowHold} NOW HOLD (stored result doubtful)` : ''}`);
  if (c.overturned) lines.push(`  ${c.overturned} modular "fails" were overturned by exact recomputation`);
  lines.push('  classes:');
  for (const k of c.classes) {
    const state = k.state === 'verified' ? `verified (${k.method}${k.method === 'modular' ? `, error ≤ ${k.errorBound?.toExponential(1)}` : ''})` : k.state;
    const perms = k.commonPermutations
      ? `  one permutation for all: ${k.commonPermutations.common.length ? k.commonPermutations.common.slice(0, 3).map((p) => `[${p.join(',')}]`).join(' ') : 'none'}${k.commonPermutations.lowerBound ? ' (lists truncated)' : ''}`
      : '';
    const progress = k.state === 'incomplete' ? ` (${k.done} of ${k.instances} done)` : '';
    lines.push(`    ${k.key.padEnd(16)} sides ${k.lengths.join(',').padEnd(14)} ${k.instances.padStart(9)} instances  ${state}${progress}${k.checked ? `  (${k.checked} checked now, ${k.fails} fail)` : ''}${perms}`);
  }
  if (c.permutations) {
    lines.push(
      `  permutations found for ${c.permutations.instances} instances: ${c.permutations.distinct === 1 ? `the first one found is the same for all: [${c.permutations.common!.join(',')}]` : `the first one found takes ${c.permutations.distinct} values (an instance may have several; the class lines above list those serving a whole class)`}`,
    );
  }
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
          : 'nothing to check: the family is empty within its bounds'
        : 'holds on every requested class';
  return [...s.claims.flatMap(claimText), `store: ${s.db}`, `result: ${verdict} (${seconds(s.elapsedMs)})`].join('\n');
}

/** JSON text of any summary: bigints become decimal strings. */
export function summaryJson(value: unknown): string {
  // Counts are JSON numbers while they are safe integers and decimal strings beyond 2^53 (README, "Exactness"):
  // bigints, and the instance counts kept as decimal strings, follow that one rule.
  return JSON.stringify(value, (k, v: unknown) => {
    if (typeof v === 'bigint') return jsonInteger(v);
    if ((k === 'instances' || k === 'done') && typeof v === 'string' && /^\d+$/.test(v)) return jsonInteger(BigInt(v));
    return v;
  });
}
