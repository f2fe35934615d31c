import { CodedError } from '../errors/index.js';

/** A Grassmannian Gr(k, n): k-planes in n-space; its Schubert classes are 0/1 strings of length n with k ones. */
export interface Grassmannian {
  readonly k: number;
  readonly n: number;
}

/**
 * The partition of a 0/1 string: for each 1 from the left, the number of 0s to its right
 * (so `1100 ↦ (2,2)`, `0101 ↦ (1,0)`); trailing zero parts are dropped.
 */
export function partitionOfString(s: string): number[] {
  const parts: number[] = [];
  let zeros = 0;
  for (let i = s.length - 1; i >= 0; i--) {
    if (s[i] === '0') zeros++;
    else parts.push(zeros);
  }
  return parts.reverse().filter((p) => p > 0);
}

/** The 0/1 string of a partition inside the k × (n−k) box; throws `invalid_argument` naming `where` when it does not fit. */
export function stringOfPartition(parts: readonly number[], g: Grassmannian, where = '--partitions'): string {
  const width = g.n - g.k;
  const box = `the ${g.k} × ${width} box of Gr(${g.k},${g.n})`;
  if (parts.length > g.k || parts.some((p) => p > width)) {
    throw new CodedError('invalid_argument', { what: 'Partition', expected: `at most ${g.k} parts, each at most ${width} (${box})`, received: `${partitionText(parts)}` }, {
      path: where,
      hint: 'a larger Grassmannian fits it: raise n (and k for more parts)',
    });
  }
  const chars: string[] = [];
  // The i-th 1 (1-based) has (n−k) − λ_i zeros and i−1 ones to its left.
  let placed = 0;
  for (let i = 0; i < g.k; i++) {
    const zerosBefore = width - (parts[i] ?? 0);
    while (chars.length - placed < zerosBefore) chars.push('0');
    chars.push('1');
    placed++;
  }
  while (chars.length < g.n) chars.push('0');
  return chars.join('');
}

/** Parses one partition as typed: `321` (one digit per part), `12.3.1` or `15.` (parts ≥ 10 need dots), `0` or `-` for ∅. */
export function parsePartition(text: string, where = '--partitions'): number[] {
  const t = text.trim();
  if (t === '' || t === '-' || t === '0' || t === '∅') return [];
  const ok = t.includes('.') ? /^\d+(\.\d+)*\.?$/.test(t) : /^\d+$/.test(t);
  if (!ok) {
    throw new CodedError('invalid_argument', { what: 'Partition', expected: `digits such as 321, or parts joined by '.' such as 12.3.1`, received: `'${text}'` }, {
      path: where,
      hint: "write the empty partition as 0 or '-'",
    });
  }
  const parts = (t.includes('.') ? t.split('.').filter((x) => x !== '') : [...t]).map(Number);
  for (let i = 1; i < parts.length; i++) {
    if (parts[i]! > parts[i - 1]!) {
      throw new CodedError('invalid_argument', { what: 'Partition', expected: 'weakly decreasing parts', received: `'${text}' (${parts.join(', ')})` }, {
        path: where,
        ...(t.includes('.') ? {} : { hint: "a part of 10 or more needs '.' between parts, e.g. 12.3.1" }),
      });
    }
  }
  return parts.filter((p) => p > 0);
}

/** A partition as a user would type it back: `321`, `12.3.1`, or `0` for the empty partition. */
export function partitionText(parts: readonly number[]): string {
  const nonzero = parts.filter((p) => p > 0);
  if (nonzero.length === 0) return '0';
  // One part of 10 or more keeps a trailing dot, so that `15.` is (15) and `15` is (1,5).
  if (nonzero.some((p) => p >= 10)) return nonzero.length === 1 ? `${nonzero[0]}.` : nonzero.join('.');
  return nonzero.join('');
}

/** Parses `k,n` as a Grassmannian, 0 ≤ k ≤ n. */
export function parseGrassmannian(text: string, where = '--grassmannian'): Grassmannian {
  const m = /^\s*(\d+)\s*,\s*(\d+)\s*$/.exec(text);
  const k = m ? Number(m[1]) : NaN;
  const n = m ? Number(m[2]) : NaN;
  if (!m || k > n || n < 1) {
    throw new CodedError('invalid_argument', { what: 'Grassmannian', expected: 'k,n with 0 ≤ k ≤ n and n ≥ 1', received: `'${text}'` }, { path: where, hint: 'e.g. --grassmannian 3,7 for Gr(3,7)' });
  }
  return { k, n };
}

/** Gr(k, n) of a 0/1 string, or undefined for other alphabets. */
export function grassmannianOfString(s: string): Grassmannian | undefined {
  if (!/^[01]*$/.test(s)) return undefined;
  return { k: [...s].filter((c) => c === '1').length, n: s.length };
}
