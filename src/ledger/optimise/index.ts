/** The fleet optimiser: public entry points. */
export { optimiseFleet, describeOver, type FleetOptimiseOptions, type OptimiseProgress } from './optimise.ts';
export { loadHighsSolver, type HighsLoadOptions } from './load-highs.ts';
export type { LpSolver, LpSolution } from './solver.ts';
export { LIMIT_TOLERANCE_DB } from './outcome.ts';
