/** Test helpers that enumerate small shapes and labelings by brute force. */

/** Every 0/1 string of a length, in lexicographic order. */
export function binaryStrings(length: number): string[] {
  const out: string[] = [];
  for (let m = 0; m < 1 << length; m++) out.push(Array.from({ length }, (_, i) => (m >> (length - 1 - i)) & 1).join(''));
  return out;
}

/** Strings of Gr(k, n): length n with k ones. */
export function grassmannianStrings(k: number, n: number): string[] {
  return binaryStrings(n).filter((s) => [...s].filter((c) => c === '1').length === k);
}

/** Side lengths of every region with positive area whose completed triangle has side ≤ maxN. */
export function regionShapes(maxN: number): number[][] {
  const out: number[][] = [];
  for (let s6 = 0; s6 <= maxN; s6++)
    for (let s1 = 0; s1 + s6 <= maxN; s1++)
      for (let s2 = 0; s2 + s1 + s6 <= maxN; s2++) {
        const n = s6 + s1 + s2;
        for (let s4 = 0; s4 <= n - s2; s4++) {
          const s3 = n - s2 - s4;
          const s5 = n - s4 - s6;
          if (s5 < 0 || n * n - s2 * s2 - s4 * s4 - s6 * s6 <= 0) continue;
          out.push([s1, s2, s3, s4, s5, s6]);
        }
      }
  return out;
}

/** Every 0/1 labeling of the six sides. */
export function* labelings(lengths: readonly number[]): Generator<string[]> {
  const choices = lengths.map(binaryStrings);
  function* rec(i: number, acc: string[]): Generator<string[]> {
    if (i === 6) {
      yield [...acc];
      return;
    }
    for (const s of choices[i]!) yield* rec(i + 1, [...acc, s]);
  }
  yield* rec(0, []);
}

/** Partition of a Grassmannian string: for each 1, the number of 0s to its right. */
export function stringOfPartition(parts: readonly number[], n: number): string {
  const zeros = n - parts.length;
  let s = '';
  let before = 0;
  for (const p of parts) {
    s += '0'.repeat(zeros - p - before) + '1';
    before = zeros - p;
  }
  return s + '0'.repeat(zeros - before);
}

/** The partition of a Grassmannian string (inverse of stringOfPartition). */
export function partitionOfString(s: string): number[] {
  const parts: number[] = [];
  let zerosAfter = [...s].filter((c) => c === '0').length;
  for (const c of s) {
    if (c === '0') zerosAfter--;
    else parts.push(zerosAfter);
  }
  return parts;
}

/** Codimension of a Schubert class: pairs i < j with s_i = 1, s_j = 0. */
export function inversions(s: string): number {
  let ones = 0;
  let inv = 0;
  for (const c of s) {
    if (c === '1') ones++;
    else inv += ones;
  }
  return inv;
}

/** Containment of partitions, i.e. Bruhat order on Grassmannian strings. */
export function contains(big: readonly number[], small: readonly number[]): boolean {
  return small.every((p, i) => p <= (big[i] ?? 0));
}
