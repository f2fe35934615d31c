/**
 * Ranking of the strings with a given content (how many of each label) in lexicographic order of the
 * alphabet: the combinatorial number system for two labels, multiset permutations in general.
 */

const factorials: bigint[] = [1n];

function factorial(n: number): bigint {
  while (factorials.length <= n) factorials.push(factorials[factorials.length - 1]! * BigInt(factorials.length));
  return factorials[n]!;
}

/** Number of strings with content `counts`: (Σc)! / Π c_i!. */
export function multinomial(counts: readonly number[]): bigint {
  let total = 0;
  let denominator = 1n;
  for (const c of counts) {
    total += c;
    denominator *= factorial(c);
  }
  return factorial(total) / denominator;
}

/** Index of `labels` (indices into the alphabet) among the strings of its content. */
export function rankString(labels: readonly number[], counts: readonly number[]): bigint {
  const left = [...counts];
  let total = multinomial(left);
  let remaining = labels.length;
  let rank = 0n;
  for (const a of labels) {
    // Strings continuing with label b: total · left[b] / remaining.
    for (let b = 0; b < a; b++) if (left[b]! > 0) rank += (total * BigInt(left[b]!)) / BigInt(remaining);
    total = (total * BigInt(left[a]!)) / BigInt(remaining);
    left[a]!--;
    remaining--;
  }
  return rank;
}

/** The string of content `counts` with index `rank`, as label indices. */
export function unrankString(rank: bigint, counts: readonly number[]): number[] {
  const left = [...counts];
  let total = multinomial(left);
  let remaining = left.reduce((s, c) => s + c, 0);
  const out: number[] = [];
  while (remaining > 0) {
    for (let b = 0; b < left.length; b++) {
      if (left[b] === 0) continue;
      const block = (total * BigInt(left[b]!)) / BigInt(remaining);
      if (rank < block) {
        out.push(b);
        total = block;
        left[b]!--;
        remaining--;
        break;
      }
      rank -= block;
    }
  }
  return out;
}

/** Every content vector (compositions of `length` into `parts`), in lexicographic order, filtered by fixed counts. */
export function contentVectors(length: number, parts: number, fixed: ReadonlyMap<number, number>): number[][] {
  const out: number[][] = [];
  const cur: number[] = [];
  const go = (k: number, rest: number) => {
    if (k === parts - 1) {
      const f = fixed.get(k);
      if (f === undefined || f === rest) out.push([...cur, rest]);
      return;
    }
    const f = fixed.get(k);
    for (let c = f ?? 0; c <= (f ?? rest) && c <= rest; c++) {
      cur.push(c);
      go(k + 1, rest - c);
      cur.pop();
    }
  };
  if (parts > 0) go(0, length);
  return out;
}

/** Steps `labels` to the next string of the same content in lexicographic order, in place; false at the last. */
export function nextString(labels: number[]): boolean {
  let i = labels.length - 2;
  while (i >= 0 && labels[i]! >= labels[i + 1]!) i--;
  if (i < 0) return false;
  let j = labels.length - 1;
  while (labels[j]! <= labels[i]!) j--;
  [labels[i], labels[j]] = [labels[j]!, labels[i]!];
  for (let a = i + 1, b = labels.length - 1; a < b; a++, b--) [labels[a], labels[b]] = [labels[b]!, labels[a]!];
  return true;
}
