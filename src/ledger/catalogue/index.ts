/**
 * The field catalogue: every number and choice a user types for a machine, defined once —
 * path, unit, range (with the reason for it), unit words, choices, grid header and its short
 * description, import label, workbook header. Validation, the grid, the supplier-list
 * importer, the workbook, the command line's flags and the JSON Schema read it, so they
 * accept the same values. A new machine field goes here first.
 */
export * from './field.ts';
export * from './suffixes.ts';
export * from './machine-numbers.ts';
export * from './machine-choices.ts';
