/**
 * The candidate fields a supplier list's columns can feed, with the words and units each
 * accepts. A field's `label` is what the mapping screen and the command line show; its
 * `accepted` text completes problem messages ("use dB, e.g. 104.5").
 */
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';

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

const DB_UNITS = ['dB(A)', 'dB (A)', 'dBA', 'dB'] as const;
const MONEY = 'an amount of money, e.g. 120.00';

const number = (key: ImportField, label: string, accepted: string, extra: Partial<FieldSpec> = {}): FieldSpec => ({
  key,
  label,
  kind: 'number',
  accepted,
  ...extra,
});

const bandFields: FieldSpec[] = OCTAVE_BANDS_HZ.map((hz) =>
  number(`band${hz}` as BandField, `Lw ${hz >= 1000 ? `${hz / 1000} kHz` : `${hz} Hz`} band, dB`, 'dB, e.g. 98.0', {
    units: DB_UNITS,
    min: 0,
    max: 180,
  }),
);

/** Every field, in the order the mapping screen lists them. */
export const FIELD_SPECS: readonly FieldSpec[] = [
  { key: 'label', label: 'Machine (label)', kind: 'text' },
  { key: 'category', label: 'Category', kind: 'text' },
  { key: 'directiveCategory', label: 'Directive 2000/14/EC type', kind: 'text' },
  { key: 'source', label: 'Source of the data', kind: 'text' },
  { key: 'dutyRef', label: 'Duty (id or name in the project)', kind: 'text' },
  number('lwaDb', 'LWA, dB (sound power level)', 'dB, e.g. 104.5', { units: DB_UNITS, min: 20, max: 180 }),
  number('soundPowerW', 'Sound power, W', 'watts greater than 0, e.g. 0.5', {
    units: ['watts', 'watt', 'W'],
    min: 0,
    minExclusive: true,
    max: 1e6,
  }),
  number('pressureDb', 'LpA at a distance, dB (converted)', 'dB, e.g. 78', { units: DB_UNITS, min: 0, max: 180 }),
  number('pressureDistanceM', 'Distance of that LpA, m', 'metres greater than 0, e.g. 10', {
    units: ['metres', 'meters', 'm'],
    min: 0,
    minExclusive: true,
    max: 10_000,
  }),
  number('uncertaintyDb', 'Uncertainty K, dB', 'dB from 0 to 10, e.g. 2', { units: DB_UNITS, min: 0, max: 10 }),
  {
    key: 'declaration',
    label: 'Declared as (guaranteed/measured)',
    kind: 'choice',
    choices: [
      { value: 'guaranteed', words: ['guaranteed', 'declared', 'ld', 'marking', 'g'] },
      { value: 'measured', words: ['measured', 'l', 'm', 'test'] },
    ],
  },
  {
    key: 'lwaOrigin',
    label: 'LWA obtained as (declared/watts/pressure)',
    kind: 'choice',
    choices: [
      { value: 'declared', words: ['declared', 'marking', 'data sheet'] },
      { value: 'from-watts', words: ['from watts', 'watts'] },
      { value: 'from-pressure', words: ['from pressure', 'pressure', 'back calculated'] },
      { value: 'permissible-stand-in', words: ['permissible stand in', 'stand in', 'permissible'] },
    ],
  },
  number('netPowerKw', 'Net power, kW', 'kW, e.g. 55', { units: ['kW'], min: 0, max: 100_000 }),
  number('directiveQuantity', 'Size for limit: mass kg / cutting width cm / electric kW', 'a number, e.g. 25', {
    units: ['kg', 'cm', 'kW'],
    min: 0,
    minExclusive: true,
  }),
  number('operatorLpaDb', 'Operator LpA, dB', 'dB, e.g. 82', { units: DB_UNITS, min: 0, max: 180 }),
  number('operatorHoursPerDay', 'Operator hours a day', 'hours from 0 to 24, e.g. 6', {
    units: ['hours', 'hrs', 'h'],
    min: 0,
    max: 24,
  }),
  {
    key: 'costKind',
    label: 'Cost basis (hire/purchase)',
    kind: 'choice',
    choices: [
      { value: 'hire', words: ['hire', 'rent', 'rental', 'hired'] },
      { value: 'purchase', words: ['purchase', 'buy', 'bought', 'own', 'owned'] },
    ],
  },
  number('dayRate', 'Hire rate per day', MONEY, { money: true, min: 0 }),
  number('weekRate', 'Hire rate per week', MONEY, { money: true, min: 0 }),
  number('monthRate', 'Hire rate per month', MONEY, { money: true, min: 0 }),
  number('price', 'Purchase price', MONEY, { money: true, min: 0 }),
  number('lifeDays', 'Working life, days', 'days greater than 0, e.g. 1500', {
    units: ['days', 'day', 'd'],
    min: 0,
    minExclusive: true,
  }),
  number('resaleValue', 'Resale value', MONEY, { money: true, min: 0 }),
  number('runningPerDay', 'Fuel/energy per day', MONEY, { money: true, min: 0 }),
  number('fixedCharges', 'Delivery and one-off charges', MONEY, { money: true, min: 0 }),
  {
    key: 'energy',
    label: 'Power source (fuel or energy)',
    kind: 'choice',
    choices: [
      { value: 'diesel', words: ['diesel', 'gas oil', 'hvo', 'red diesel', 'd'] },
      { value: 'petrol', words: ['petrol', 'gasoline', 'unleaded', 'p'] },
      { value: 'electric', words: ['electric', 'electricity', 'mains', 'e', 'elec'] },
      { value: 'battery', words: ['battery', 'battery electric', 'cordless', 'bev'] },
      { value: 'hybrid', words: ['hybrid', 'diesel electric', 'diesel/electric'] },
      { value: 'other', words: ['other', 'lpg', 'gas', 'hydrogen', 'manual'] },
    ],
  },
  {
    key: 'character',
    label: 'Tonal/impulsive character',
    kind: 'choice',
    choices: [
      { value: 'none', words: ['none', 'no', 'n', 'broadband', 'neither'] },
      { value: 'tonal', words: ['tonal', 'tone', 'tones', 't'] },
      { value: 'impulsive', words: ['impulsive', 'impulse', 'impact', 'i', 'percussive'] },
    ],
  },
  {
    key: 'pinned',
    label: 'Pinned (must use)',
    kind: 'choice',
    choices: [
      { value: 'yes', words: ['true', 'yes', 'y', '1', 'x', 'ja', 'oui'] },
      { value: 'no', words: ['false', 'no', 'n', '0'] },
    ],
  },
  {
    key: 'excluded',
    label: 'Excluded (must not use)',
    kind: 'choice',
    choices: [
      { value: 'yes', words: ['true', 'yes', 'y', '1', 'x', 'ja', 'oui'] },
      { value: 'no', words: ['false', 'no', 'n', '0'] },
    ],
  },
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
