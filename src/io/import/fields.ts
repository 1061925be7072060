/**
 * The candidate fields a supplier list's columns can feed, with the words and units each
 * accepts: the machine's numbers and choices are taken from the field catalogue
 * (`ledger/catalogue`), so an import accepts exactly what the grid and validation accept. A field's `label` is what the mapping screen and the command line show; its
 * `accepted` text completes problem messages ("use dB, e.g. 104.5").
 */
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import {
  CHARACTER,
  COST_KIND,
  DECLARATION,
  DB_SUFFIXES,
  ENERGY,
  LWA_ORIGIN,
  MACHINE_NUMBERS,
  type ChoiceField,
  type NumberField,
} from '../../ledger/catalogue/index.ts';

export type BandField = `band${(typeof OCTAVE_BANDS_HZ)[number]}`;

export type ImportField =
  | 'label'
  | 'category'
  | 'directiveCategory'
  | 'source'
  | 'energy'
  | 'character'
  | 'declaration'
  | 'lwaOrigin'
  | 'costKind'
  | 'pinned'
  | 'excluded'
  | 'dutyRef'
  | 'lwaDb'
  | 'soundPowerW'
  | 'pressureDb'
  | 'pressureDistanceM'
  | 'uncertaintyDb'
  | 'netPowerKw'
  | 'directiveQuantity'
  | 'operatorLpaDb'
  | 'operatorHoursPerDay'
  | 'dayRate'
  | 'weekRate'
  | 'monthRate'
  | 'price'
  | 'lifeDays'
  | 'resaleValue'
  | 'runningPerDay'
  | 'fixedCharges'
  | BandField;

export interface FieldSpec {
  key: ImportField;
  /** Short name shown in the mapping screen. */
  label: string;
  kind: 'text' | 'number' | 'choice';
  /** For numbers: what is accepted, completing "(use …)". */
  accepted?: string;
  /** For numbers: unit words that may follow the number in a cell and are ignored. */
  units?: readonly string[];
  /** For numbers: a leading or trailing currency sign is ignored. */
  money?: boolean;
  /** For numbers: the accepted range, inclusive (exclusive at min when minExclusive). */
  min?: number;
  max?: number;
  minExclusive?: boolean;
  /** For choices: accepted words → value. */
  choices?: readonly { value: string; words: readonly string[] }[];
}

/** A catalogue number as an import field: its label, range, unit words and accepted words. */
const fromCatalogue = (key: ImportField, field: NumberField, label = field.importLabel ?? field.header): FieldSpec => ({
  key,
  label,
  kind: 'number',
  accepted: field.accepted,
  ...(field.money ? { money: true } : { units: field.suffixes }),
  min: field.min,
  max: field.max,
  ...(field.aboveMin ? { minExclusive: true } : {}),
});

/** A catalogue choice as an import field: its label and the words read as each value. */
const choiceFromCatalogue = (key: ImportField, field: ChoiceField): FieldSpec => ({
  key,
  label: field.importLabel ?? field.header,
  kind: 'choice',
  choices: field.choices.map((c) => ({ value: c.value, words: c.words })),
});

const YES_NO = [
  { value: 'yes', words: ['true', 'yes', 'y', '1', 'x', 'ja', 'oui'] },
  { value: 'no', words: ['false', 'no', 'n', '0'] },
] as const;

const bandFields: FieldSpec[] = OCTAVE_BANDS_HZ.map((hz) =>
  fromCatalogue(
    `band${hz}` as BandField,
    MACHINE_NUMBERS.bandDb,
    `Lw ${hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`} band, dB`,
  ),
);

/** Every field, in the order the mapping screen lists them. */
export const FIELD_SPECS: readonly FieldSpec[] = [
  { key: 'label', label: 'Machine (label)', kind: 'text' },
  { key: 'category', label: 'Category', kind: 'text' },
  { key: 'directiveCategory', label: 'Directive 2000/14/EC type', kind: 'text' },
  { key: 'source', label: 'Source of the data', kind: 'text' },
  { key: 'dutyRef', label: 'Duty (id or name in the project)', kind: 'text' },
  fromCatalogue('lwaDb', MACHINE_NUMBERS.lwaDb),
  // Import only: converted to an LWA, whose range is then checked (build-preview.ts).
  {
    key: 'soundPowerW',
    label: 'Sound power, W',
    kind: 'number',
    accepted: 'watts greater than 0, e.g. 0.5',
    units: ['watts', 'watt', 'W'],
    min: 0,
    minExclusive: true,
    max: 1e6,
  },
  {
    key: 'pressureDb',
    label: 'LpA at a distance, dB (converted)',
    kind: 'number',
    accepted: 'dB, e.g. 78',
    units: DB_SUFFIXES,
    min: 0,
    max: 180,
  },
  {
    key: 'pressureDistanceM',
    label: 'Distance of that LpA, m',
    kind: 'number',
    accepted: 'metres greater than 0, e.g. 10',
    units: ['metres', 'meters', 'm'],
    min: 0,
    minExclusive: true,
    max: 10_000,
  },
  fromCatalogue('uncertaintyDb', MACHINE_NUMBERS.uncertaintyDb),
  choiceFromCatalogue('declaration', DECLARATION),
  choiceFromCatalogue('lwaOrigin', LWA_ORIGIN),
  fromCatalogue('netPowerKw', MACHINE_NUMBERS.netPowerKw),
  fromCatalogue('directiveQuantity', MACHINE_NUMBERS.directiveQuantity),
  fromCatalogue('operatorLpaDb', MACHINE_NUMBERS.operatorLpaDb),
  fromCatalogue('operatorHoursPerDay', MACHINE_NUMBERS.operatorHoursPerDay),
  choiceFromCatalogue('costKind', COST_KIND),
  fromCatalogue('dayRate', MACHINE_NUMBERS.dayRate),
  fromCatalogue('weekRate', MACHINE_NUMBERS.weekRate),
  fromCatalogue('monthRate', MACHINE_NUMBERS.monthRate),
  fromCatalogue('price', MACHINE_NUMBERS.price),
  fromCatalogue('lifeDays', MACHINE_NUMBERS.lifeDays),
  fromCatalogue('resaleValue', MACHINE_NUMBERS.resaleValue),
  fromCatalogue('runningPerDay', MACHINE_NUMBERS.runningPerDay),
  fromCatalogue('fixedCharges', MACHINE_NUMBERS.fixedCharges),
  choiceFromCatalogue('energy', ENERGY),
  choiceFromCatalogue('character', CHARACTER),
  { key: 'pinned', label: 'Pinned (must use)', kind: 'choice', choices: YES_NO },
  { key: 'excluded', label: 'Excluded (must not use)', kind: 'choice', choices: YES_NO },
  ...bandFields,
];

const byKey = new Map<string, FieldSpec>(FIELD_SPECS.map((f) => [f.key, f]));

/** The spec of a field key, or undefined when the key is not a field (safe for any text). */
export function fieldSpec(key: string): FieldSpec | undefined {
  return byKey.get(key);
}

/** True when the text names a field. */
export function isImportField(key: string): key is ImportField {
  return byKey.has(key);
}

/** The octave band index (0 = 63 Hz) of a band field, or -1. */
export function bandIndex(field: ImportField): number {
  if (!field.startsWith('band')) return -1;
  return OCTAVE_BANDS_HZ.indexOf(Number(field.slice(4)) as (typeof OCTAVE_BANDS_HZ)[number]);
}
