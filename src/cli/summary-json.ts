import { jsonInteger } from '../report/value-json.js';

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
