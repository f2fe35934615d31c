import { toBigInt } from '../../engine/index.js';
import type { Value } from '../measure.js';

/** The two integer values (the compile check guarantees integer measures). */
export function integers(left: Value, right: Value): [bigint, bigint] {
  return [toBigInt((left as { v: number | bigint }).v), toBigInt((right as { v: number | bigint }).v)];
}
