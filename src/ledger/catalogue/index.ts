/**
 * The field catalogue: every number, choice and time a user types for a machine, a duty, a
 * receiver, a phase, an assessment period, the project's settings or its site plan, defined once —
 * path, unit, range (with the reason for it), unit words, choices, grid header and its short
 * description, import label, workbook header. Validation, the grid, the supplier-list
 * importer, the workbook, the command line's flags and the JSON Schema read it, so they
 * accept the same values. A new field goes here first.
 */
export * from './field.ts';
export * from './suffixes.ts';
export * from './machine-numbers.ts';
export * from './machine-choices.ts';
export * from './site-numbers.ts';
export * from './duty-fields.ts';
export * from './receiver-fields.ts';
export * from './time-fields.ts';
export * from './settings-fields.ts';
export * from './uncertainty-fields.ts';
export * from './register-fields.ts';
export * from './calculation-fields.ts';
export * from './plan-fields.ts';
export * from './read-number.ts';
