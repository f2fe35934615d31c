import type { Permutation } from './substitution.js';

/**
 * A permutation of y_1..y_m written out readably: `id`, one block reversal `rev[p..q]` (y_k ↦ y_(p+q−k)),
 * one cyclic shift `shift[p..q] by s` (y_k ↦ y_(p + (k−p+s) mod (q−p+1))), or else disjoint cycles `(1 3 2)(4 5)`.
 */
export function permutationText(p: Permutation): string {
  const moved = p.map((x, i) => (x !== i + 1 ? i + 1 : 0)).filter((k) => k > 0);
  if (moved.length === 0) return 'id';
  const [lo, hi] = [moved[0]!, moved[moved.length - 1]!];
  const block = (f: (k: number) => number) => p.every((x, i) => (i + 1 < lo || i + 1 > hi ? x === i + 1 : x === f(i + 1)));
  if (block((k) => lo + hi - k)) return `rev[${lo}..${hi}]`;
  const len = hi - lo + 1;
  const by = (((p[lo - 1]! - lo) % len) + len) % len;
  if (block((k) => lo + ((k - lo + by) % len))) return `shift[${lo}..${hi}] by ${by}`;
  return cycleText(p);
}

/** Disjoint-cycle notation of a permutation (fixed points omitted). */
export function cycleText(p: Permutation): string {
  const seen = new Set<number>();
  let out = '';
  for (let start = 1; start <= p.length; start++) {
    if (seen.has(start) || p[start - 1] === start) continue;
    const cycle: number[] = [];
    for (let k = start; !seen.has(k); k = p[k - 1]!) {
      seen.add(k);
      cycle.push(k);
    }
    out += `(${cycle.join(' ')})`;
  }
  return out || 'id';
}
