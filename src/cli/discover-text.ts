import type { DiscoverResult } from '../discover/build-discover-result.js';

const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

function ruleText(r: DiscoverResult['survivors'][number]['evidence']['permutationRule']): string {
  if (!r) return '';
  return r.relation.type === 'equal' ? 'y unchanged' : r.text;
}

/** The text report of a discover run. */
export function discoverText(r: DiscoverResult, family: string, theories: readonly string[]): string {
  const lines = [
    `discover ${family} (${theories.join(', ')}): ${r.candidates} candidates on ${r.classes.length} classes${r.classes.length ? ` (${r.classes[0]} … ${r.classes[r.classes.length - 1]})` : ''}, ${r.valuesComputed} values computed, ${seconds(r.elapsedMs)}${r.interrupted ? ' — INTERRUPTED, run again to resume' : ''}`,
  ];
  lines.push(`survivors: ${r.survivors.length}${r.survivors.length ? ' (ranked by evidence; one group = equivalent through a surviving symmetry)' : ''}`);
  if (r.survivors.length) {
    const width = Math.max(5, ...r.survivors.map((s) => s.claim.id.length));
    lines.push(`  ${'#'.padStart(3)}  group  ${'claim'.padEnd(width)}  ${'instances'.padStart(9)}  ${'nonzero'.padStart(7)}  largest class verified  rule`);
    r.survivors.forEach((s, k) => {
      const e = s.evidence;
      const largest = e.largestClass ? `${e.largestClass.key} (${e.largestClass.instances})` : '-';
      lines.push(`  ${String(k + 1).padStart(3)}  ${String(e.group).padStart(5)}  ${s.claim.id.padEnd(width)}  ${String(e.instances).padStart(9)}  ${String(e.nonzeroInstances).padStart(7)}  ${largest.padEnd(22)}  ${ruleText(e.permutationRule)}`);
      lines.push(`       ${''.padStart(5)}  ${e.description}`);
    });
    const file = r.survivors[0]!.evidence.file;
    if (file) lines.push(`  claim files in ${file.slice(0, file.lastIndexOf('/') + 1) || '.'}; sweep one further with: puzzlesweep run ${file} --max …`);
  }
  if (r.untested) lines.push(`untested: ${r.untested} candidates (the run stopped before their first class)`);
  lines.push(`dropped: ${r.dropped.length}`);
  for (const d of r.dropped) {
    const c = d.counterexample;
    lines.push(`  ${d.claim.id}: first counterexample in ${c.classKey} #${c.index}: ${c.left.value} ≠ ${c.right.value}`);
  }
  return lines.join('\n');
}
