/**
 * How often this thread parsed a claim with zod and compiled one (a claim program, or its bounds raised).
 * A sweep should parse once per process or worker and compile once per worker; tests read these.
 */
export const claimCompileCounts = { parses: 0, compiles: 0 };
