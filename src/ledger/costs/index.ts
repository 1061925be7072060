/**
 * Costs: a candidate's cost for the duty (hire or own), money amounts and their reading, each with its explanation.
 */
export * from './cost.ts';
export * from './hire.ts';
export * from './money.ts';
export * from './cost-basis.ts';
