/** The engine's public surface: everything else in the project imports from here. */
export * from './engine-error.js';
export * from './region.js';
export * from './lattice.js';
export * from './piece-set.js';
export * from './theories.js';
export * from './boundary.js';
export * from './semiring.js';
export * from './semirings/safe-integer.js';
export * from './semirings/integer-semiring.js';
export * from './semirings/polynomial.js';
export * from './semirings/polynomial-semiring.js';
export * from './semirings/modular-semiring.js';
export * from './semirings/statistic-semiring.js';
export * from './weigher.js';
export * from './transfer-count.js';
export * from './puzzle-enumeration.js';
export * from './completion.js';
