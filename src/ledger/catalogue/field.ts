/**
 * The shape of one field of the catalogue: what a user types into the project and how every
 * reader (validation, the grid, the supplier-list importer, the workbook, the command line,
 * the JSON Schema) names, reads and checks it. A field is written once — a machine's in
 * ./machine-numbers.ts or ./machine-choices.ts, a duty's in ./duty-fields.ts, a receiver's in
 * ./receiver-fields.ts, a phase's or period's in ./time-fields.ts, a setting's in
 * ./settings-fields.ts, a site plan's or level map's in ./plan-fields.ts — and the readers take its
 * range, suffixes and words from there.
 */

/** A number the user types: its range, the unit words that may follow it, and its names. */
export interface NumberField {
  /** Where it lives in a candidate (dotted), e.g. "lwaDb", "cost.dayRate". */
  path: string;
  /** Unit shown beside the grid header and in messages, e.g. "dB", "kW"; money: the project's currency. */
  unit: string;
  /** Inclusive minimum, or the bound a value must be above when `aboveMin`. */
  min: number;
  aboveMin?: boolean;
  /** Inclusive maximum. */
  max: number;
  integer?: boolean;
  /** Unit words a cell may carry after the number ("104 dB(A)"), ignored when read; longest first. */
  suffixes: readonly string[];
  /** A sum of money: a currency sign or code before or after the number is ignored. */
  money?: boolean;
  /** What is accepted, completing "(use …)": the range in words and an example. */
  accepted: string;
  /** Why this range: the trade's figures or the standard it comes from. */
  why: string;
  /** The grid's column header. */
  header: string;
  /** Short description shown on hover and keyboard focus of the header. */
  describe: string;
  /** The name a supplier list's column is mapped to, in the import's mapping screen (a machine's fields only). */
  importLabel?: string;
  /** The header of the workbook's inputs table (with its unit). */
  workbookHeader: string;
  /** Headers earlier versions of the workbook wrote, still read back. */
  formerHeaders?: readonly string[];
}

/** A time of day typed as HH:MM: the start or end of a period or of a phase's working hours. */
export interface TimeField {
  path: string;
  /** What is accepted, completing "(use …)". */
  accepted: string;
  /** Why: what the time is and how it is read. */
  why: string;
  header: string;
  describe: string;
  workbookHeader: string;
}

/** The stored form of a time of day, "00:00" to "24:00" (the JSON Schema's pattern). */
export const CLOCK_PATTERN = /^(([01][0-9]|2[0-3]):[0-5][0-9]|24:00)$/;

/**
 * A header for one of several columns of a field, one per item (a limit per period, a
 * distance per receiver): the item's name goes before the unit.
 * @example headerFor('Limit LAeq (dB)', 'Day') // "Limit LAeq, Day (dB)"
 */
export function headerFor(header: string, item: string): string {
  const unit = /\s(\([^()]*\))$/.exec(header);
  return unit ? `${header.slice(0, unit.index)}, ${item} ${unit[1]}` : `${header}, ${item}`;
}

/** One word of a choice field: the stored value, the label shown, and the words an import reads as it. */
export interface Choice<T extends string = string> {
  value: T;
  label: string;
  /** Words a supplier list may use for it (lower case). */
  words: readonly string[];
}

/** A field chosen from a fixed list. */
export interface ChoiceField<T extends string = string> {
  path: string;
  choices: readonly Choice<T>[];
  header: string;
  describe: string;
  /** The import's mapping label (a machine's fields only). */
  importLabel?: string;
  workbookHeader: string;
  formerHeaders?: readonly string[];
}

/** A field of free text. */
export interface TextField {
  path: string;
  header: string;
  describe: string;
  importLabel: string;
  workbookHeader: string;
}

/**
 * True when a number lies in the field's range (and is whole when it must be).
 * @example fieldAccepts(MACHINE_NUMBERS.lwaDb, 104.5) // true
 */
export function fieldAccepts(field: Pick<NumberField, 'min' | 'max' | 'aboveMin' | 'integer'>, value: number): boolean {
  if (!Number.isFinite(value)) return false;
  if (field.aboveMin ? value <= field.min : value < field.min) return false;
  if (value > field.max) return false;
  return !field.integer || Number.isInteger(value);
}

/**
 * The range in words, e.g. "from 40 to 150 dB" or "above 0 and up to 24 h".
 * @example rangeWords(MACHINE_NUMBERS.operatorHoursPerDay) // "above 0 and up to 24 h"
 */
export function rangeWords(field: Pick<NumberField, 'min' | 'max' | 'aboveMin' | 'unit' | 'money'>): string {
  const unit = field.money || field.unit === '' ? '' : ` ${field.unit}`;
  return field.aboveMin
    ? `above ${field.min} and up to ${field.max}${unit}`
    : `from ${field.min} to ${field.max}${unit}`;
}
