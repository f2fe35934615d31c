/** An exact integer: a JS number while it is safe, a bigint once it would overflow 2^53. */
export type SafeInt = number | bigint;

export function addInt(a: SafeInt, b: SafeInt): SafeInt {
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a + b;
    if (Number.isSafeInteger(r)) return r;
  }
  return BigInt(a) + BigInt(b);
}

export function mulInt(a: SafeInt, b: SafeInt): SafeInt {
  if (typeof a === 'number' && typeof b === 'number') {
    const r = a * b;
    if (Number.isSafeInteger(r)) return r;
  }
  return BigInt(a) * BigInt(b);
}

export function toBigInt(a: SafeInt): bigint {
  return typeof a === 'bigint' ? a : BigInt(a);
}

export function intEquals(a: SafeInt, b: SafeInt): boolean {
  return typeof a === 'number' && typeof b === 'number' ? a === b : toBigInt(a) === toBigInt(b);
}

export function isZeroInt(a: SafeInt): boolean {
  return a === 0 || a === 0n;
}
