/**
 * Checks a buyer or reviewer makes: each candidate against the directive, its declaration and the operator's
 * exposure; the compliance statement handed over; two fleets side by side.
 */
export * from './candidate-checks.ts';
export * from './compliance-statement.ts';
export * from './fleet-comparison.ts';
export * from './operator-exposure.ts';
export * from './receiver-summary.ts';
