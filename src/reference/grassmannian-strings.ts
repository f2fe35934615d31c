import { CodedError } from '../errors/index.js';

/** Throws unless k and n are integers with 0 ≤ k ≤ n. */
export function checkGrassmannian(k: number, n: number): void {
  if (!Number.isInteger(n) || n < 0) {
    throw new CodedError('invalid_argument', { what: 'Grassmannian n', expected: 'a non-negative integer', received: `${n}` });
  }
  if (!Number.isInteger(k) || k < 0 || k > n) {
    throw new CodedError('invalid_argument', { what: 'Grassmannian k', expected: `an integer in [0, ${n}]`, received: `${k}` });
  }
}

/** Throws unless `s` is a 0/1 string (of length n with k ones when those are given). */
export function checkString(s: string, k?: number, n?: number): void {
  if (!/^[01]*$/.test(s)) {
    throw new CodedError('invalid_string', { what: 'Schubert string', expected: 'only 0s and 1s', received: `"${s}"` });
  }
  if (n !== undefined && s.length !== n) {
    throw new CodedError('invalid_string', { what: 'Schubert string length', expected: `${n}`, received: `${s.length} ("${s}")` });
  }
  if (k !== undefined) {
    const ones = countOnes(s);
    if (ones !== k) {
      throw new CodedError('invalid_string', { what: 'Schubert string ones', expected: `${k}`, received: `${ones} ("${s}")` });
    }
  }
}

function countOnes(s: string): number {
  let c = 0;
  for (const ch of s) if (ch === '1') c++;
  return c;
}

/** Codimension of the Schubert class: the number of pairs i < j with s_i = 1 and s_j = 0. */
export function inv(s: string): number {
  checkString(s);
  let zerosSeen = 0;
  let total = 0;
  // Scan right to left so each 1 adds the 0s to its right in one pass.
  for (let i = s.length - 1; i >= 0; i--) {
    if (s[i] === '0') zerosSeen++;
    else total += zerosSeen;
  }
  return total;
}

/** Partition of a string: for each 1 from the left, the number of 0s to its right. */
export function stringToPartition(s: string): number[] {
  checkString(s);
  const zerosRight: number[] = [];
  let zeros = 0;
  for (let i = s.length - 1; i >= 0; i--) {
    if (s[i] === '0') zeros++;
    else zerosRight.push(zeros);
  }
  return zerosRight.reverse();
}

/** Inverse of `stringToPartition`: the string of Gr(k, n) whose partition is `p` (k weakly decreasing parts ≤ n−k). */
export function partitionToString(p: readonly number[], k: number, n: number): string {
  checkGrassmannian(k, n);
  if (p.length > k) {
    throw new CodedError('invalid_argument', { what: 'Partition length', expected: `at most ${k} parts`, received: `${p.length}` });
  }
  const parts = [...p];
  while (parts.length < k) parts.push(0);
  for (let i = 0; i < k; i++) {
    const v = parts[i]!;
    const prev = i === 0 ? n - k : parts[i - 1]!;
    if (!Number.isInteger(v) || v < 0 || v > prev) {
      throw new CodedError('invalid_argument', { what: `Partition part ${i + 1}`, expected: `an integer in [0, ${prev}]`, received: `${v}` });
    }
  }
  const chars: string[] = new Array<string>(n).fill('0');
  // The i-th 1 has p_i zeros to its right, hence (n−k) − p_i zeros and i ones to its left.
  for (let i = 0; i < k; i++) chars[i + (n - k - parts[i]!)] = '1';
  return chars.join('');
}

/** All strings of Gr(k, n), sorted by increasing inv and then lexicographically. */
export function grassmannianStrings(k: number, n: number): string[] {
  checkGrassmannian(k, n);
  const out: string[] = [];
  const build = (prefix: string, onesLeft: number): void => {
    const room = n - prefix.length;
    if (room === 0) {
      out.push(prefix);
      return;
    }
    if (room > onesLeft) build(prefix + '0', onesLeft);
    if (onesLeft > 0) build(prefix + '1', onesLeft - 1);
  };
  build('', k);
  const invs = new Map(out.map((s) => [s, inv(s)]));
  return out.sort((a, b) => invs.get(a)! - invs.get(b)! || (a < b ? -1 : a > b ? 1 : 0));
}

/** Bruhat order a ≤ b on strings of the same Grassmannian: containment of partitions. */
export function bruhatLeq(a: string, b: string): boolean {
  checkString(a);
  checkString(b, countOnes(a), a.length);
  const pa = stringToPartition(a);
  const pb = stringToPartition(b);
  return pa.every((v, i) => v <= pb[i]!);
}

/** Poincaré dual class: the reversed string (its partition is the complement in the k×(n−k) box). */
export function dualString(s: string): string {
  checkString(s);
  return [...s].reverse().join('');
}

/** Conjugate class in Gr(n−k, n): swap 0↔1 and reverse, which transposes the partition. */
export function conjugateString(s: string): string {
  checkString(s);
  return [...s].reverse().map((c) => (c === '0' ? '1' : '0')).join('');
}

/** Conjugate (transpose) of a partition, trailing zeros dropped. */
export function conjugatePartition(p: readonly number[]): number[] {
  const first = p[0] ?? 0;
  const out: number[] = [];
  for (let c = 1; c <= first; c++) out.push(p.filter((v) => v >= c).length);
  return out;
}
