/**
 * Validation: every problem of a project with its JSON path, the accepted ranges of each field, the plan's
 * checks, cleaning a file into a project the ledger can compute on, and what a new project still needs (readiness).
 */
export * from './field-checks.ts';
export * from './readiness.ts';
export * from './validate.ts';
export * from './validate-clean.ts';
export * from './validate-items.ts';
export * from './validate-plan.ts';
export * from './validate-rules.ts';
