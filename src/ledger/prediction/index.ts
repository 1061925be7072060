/**
 * Prediction: where sound travels (geometry, work areas, barriers), the attenuation of each location-receiver
 * path once per band, the duty's terms (on-time, count, hours, façade, screening), each candidate's contribution,
 * phase totals and the phase × period × receiver matrix, periods and times of day, and level against distance.
 */
export * from './barrier-screening.ts';
export * from './candidate-memo.ts';
export * from './clock.ts';
export * from './distance-curve.ts';
export * from './duty-terms.ts';
export * from './evaluate.ts';
export * from './evaluate-edit.ts';
export { stateOf, type EvaluationState, type NoteParts } from './evaluation-assembly.ts';
export * from './geometry.ts';
export * from './levels.ts';
export * from './path-accuracy.ts';
export * from './path-pair.ts';
export * from './path-screening.ts';
export * from './path-table.ts';
export * from './phase-periods.ts';
export * from './phase-total.ts';
export * from './plan-barrier-term.ts';
export * from './propagation-notes.ts';
export * from './safe.ts';
export * from './work-area.ts';
