/**
 * The project model: the file's types (the contract of the whole program), the site plan's types, result types,
 * named fleets, reading records by own keys, and the invented demo project. Everything else in the ledger reads these.
 */
export * from './demo.ts';
export * from './demo-candidates.ts';
export * from './fleets.ts';
export * from './limits.ts';
export * from './model.ts';
export * from './own.ts';
export * from './plan-model.ts';
export * from './results.ts';
