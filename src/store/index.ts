/** The SQLite results store: open it, then read and write through these record functions. */
export * from './open-store.js';
export * from './claim-records.js';
export * from './run-records.js';
export * from './chunk-records.js';
export * from './chunk-completion.js';
export * from './counterexample-records.js';
export * from './verified-class-records.js';
export * from './permutation-records.js';
export * from './shard-records.js';
export * from './discover-evidence-records.js';
export * from './merge-stores.js';
export * from './class-tallies.js';
export * from './store-fault.js';
export * from './class-progress.js';
export * from './process-identity.js';
