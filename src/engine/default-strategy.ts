import type { SweepStrategy } from './numeric-kernel.js';
import type { PieceSet } from './piece-set.js';

// Measured (test/bench/results.md, "Sweep strategy per theory"; work = profiles the sweep writes): meeting
// in the middle writes least in cohomology, equivariant, K-theory and dual K-theory (0.4–0.8× backward at
// n = 16…24), but in ssm-nonequivariant, whose two extra pieces make the top-down frontier grow fastest,
// sweeping up from side 5 alone writes 0.7–0.8× what meeting does (n = 12, 16, 20).
const BACKWARD: ReadonlySet<string> = new Set(['ssm-nonequivariant']);

/** The sweep strategy a count uses when none is given: per built-in theory, `meet` for any other piece set. */
export function defaultStrategy(pieces: PieceSet): SweepStrategy {
  return BACKWARD.has(pieces.name) ? 'backward' : 'meet';
}
