/**
 * The quick calculation's form: the fields as typed, read into the core's
 * SingleMachineInput. Reading text into numbers only; the level itself comes from
 * singleMachineLevel (src/core/single-machine-level.ts).
 */
import type { SingleMachineInput, SingleMachineLevel } from '../../core/single-machine-level.ts';
import {
  CALCULATION_NUMBERS,
  DUTY_NUMBERS,
  MACHINE_NUMBERS,
  RECEIVER_NUMBERS,
  SETTINGS_NUMBERS,
  readNumberCell,
  readRule,
  type NumberField,
} from '../../ledger/catalogue/index.ts';

export type FieldId =
  | 'lw'
  | 'distance'
  | 'q'
  | 'onTime'
  | 'count'
  | 'screeningDb'
  | 'barrier'
  | 'hs'
  | 'hr'
  | 'ground'
  | 'temperature'
  | 'humidity'
  | 'c0'
  | 'hoursWorked'
  | 'periodHours'
  | 'penalty';

export type ScreeningKind = 'none' | 'top-visible' | 'hidden' | 'explicit' | 'barrier';

/** Everything the user typed or chose, kept exactly as given. */
export interface QuickCalcForm {
  method: 'simple' | 'iso9613-2';
  text: Record<FieldId, string>;
  screening: ScreeningKind;
  facade: boolean;
  /** ISO 9613-2:1996 ground method: general (clause 7.3.1, the default) or alternative (clause 7.3.2). */
  groundMethod: 'general' | 'alternative';
}

export interface FieldSpec {
  id: FieldId;
  /** Name shown beside the field and used in messages. */
  name: string;
  unit: string;
  /**
   * The field catalogue's number for the same quantity: its range and unit words, so the form
   * accepts what the grid and `ledger level` accept.
   */
  field: NumberField;
  /** What is accepted, completing "(use …)": the catalogue's words, and for some fields a hint. */
  accepted: string;
}

/** A field read with a catalogue number; `name` and `hint` where the form words it its own way. */
const fieldSpec = (id: FieldId, field: NumberField, name = field.header, hint = ''): FieldSpec => ({
  id,
  name,
  unit: field.unit,
  field,
  accepted: `use ${field.accepted}${hint ? `; ${hint}` : ''}`,
});

const BOTH_HOURS = 'leave both hours empty for the whole period';
const M = MACHINE_NUMBERS;
const D = DUTY_NUMBERS;
const R = RECEIVER_NUMBERS;
const S = SETTINGS_NUMBERS;
const C = CALCULATION_NUMBERS;

export const FIELDS: Record<FieldId, FieldSpec> = {
  lw: fieldSpec('lw', M.lwaDb),
  distance: fieldSpec('distance', D.distanceM, 'Distance'),
  q: fieldSpec('q', C.directivityQ),
  onTime: fieldSpec('onTime', D.onTimePct),
  count: fieldSpec('count', D.count, 'Number of units'),
  screeningDb: fieldSpec('screeningDb', R.screeningDb, 'Screening'),
  barrier: fieldSpec('barrier', R.pathDifferenceM, 'Barrier path difference'),
  hs: fieldSpec('hs', D.sourceHeightM),
  hr: fieldSpec('hr', R.heightM, 'Receiver height'),
  ground: fieldSpec('ground', S.groundFactor),
  temperature: fieldSpec('temperature', S.temperatureC),
  humidity: fieldSpec('humidity', S.humidityPct),
  hoursWorked: fieldSpec('hoursWorked', C.hoursWorked, undefined, BOTH_HOURS),
  periodHours: fieldSpec('periodHours', C.periodHours, undefined, BOTH_HOURS),
  penalty: fieldSpec('penalty', C.characterPenaltyDb, undefined, 'empty for none'),
  c0: fieldSpec('c0', S.c0Db),
};

/** A form with the usual starting values (ISO 9613-2 atmosphere 10 °C, 70 %, as in its Table 2). */
export function defaultForm(): QuickCalcForm {
  return {
    method: 'simple',
    text: {
      lw: '105',
      distance: '50',
      q: '2',
      onTime: '100',
      count: '1',
      screeningDb: '',
      barrier: '',
      hs: '1.5',
      hr: '4',
      ground: '0.5',
      temperature: '10',
      humidity: '70',
      c0: '0',
      hoursWorked: '',
      periodHours: '',
      penalty: '',
    },
    screening: 'none',
    facade: false,
    groundMethod: 'general',
  };
}

export type FormReading =
  { ok: true; input: SingleMachineInput } | { ok: false; problems: Partial<Record<FieldId, string>> };

/** Fields that may be left empty: the working hours (both empty: the whole period) and the penalty (empty: none). */
export const OPTIONAL_FIELDS: readonly FieldId[] = ['hoursWorked', 'periodHours', 'penalty'];

/** Fields the current choices use. */
export function activeFields(form: QuickCalcForm): FieldId[] {
  const ids: FieldId[] = ['lw', 'distance'];
  if (form.method === 'simple') ids.push('q');
  ids.push('onTime', 'count', ...OPTIONAL_FIELDS);
  if (form.screening === 'explicit') ids.push('screeningDb');
  if (form.screening === 'barrier' && form.method === 'iso9613-2') ids.push('barrier');
  if (form.method === 'iso9613-2') ids.push('hs', 'hr', 'ground', 'temperature', 'humidity', 'c0');
  return ids;
}

/**
 * One field's number, read by the catalogue's reader as the grid reads a cell (its unit
 * words, range and wholeness; a decimal comma or point). Returns the number or the problem's words.
 * @example readQuickCalcField('lw', '105 dB(A)') // 105
 * @example readQuickCalcField('lw', '12O') // "is not a number"
 */
export function readQuickCalcField(id: FieldId, text: string): number | string {
  const { field, accepted } = FIELDS[id];
  const reading = readNumberCell(text, ',', { ...readRule(field), accepted });
  return reading.ok ? reading.value : reading.problem;
}

/**
 * Reads the form into the core's input. Unreadable text gives a message in the pattern
 * `LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)`, a
 * value out of the project file's range `LWA: "160" is out of range (use …)`; the ranges of
 * the fields with no project rule are left to the core.
 */
export function readForm(form: QuickCalcForm): FormReading {
  const problems: Partial<Record<FieldId, string>> = {};
  const values: Partial<Record<FieldId, number>> = {};
  for (const id of activeFields(form)) {
    const text = form.text[id] ?? '';
    if (OPTIONAL_FIELDS.includes(id) && text.trim() === '') continue;
    const spec = FIELDS[id];
    const value = text.trim() === '' ? 'is empty' : readQuickCalcField(id, text);
    if (typeof value === 'string') {
      problems[id] =
        text.trim() === ''
          ? `${spec.name}: nothing given (${spec.accepted})`
          : `${spec.name}: ${JSON.stringify(text)} ${value} (${spec.accepted})`;
    } else values[id] = value;
  }
  const worked = values.hoursWorked;
  const period = values.periodHours;
  if ((worked === undefined) !== (period === undefined) && !problems.hoursWorked && !problems.periodHours) {
    const missing: FieldId = worked === undefined ? 'hoursWorked' : 'periodHours';
    problems[missing] =
      `${FIELDS[missing].name}: nothing given (give both hours, or leave both empty for the whole period)`;
  }
  if (Object.keys(problems).length) return { ok: false, problems };
  const v = (id: FieldId) => values[id] as number;
  const input: SingleMachineInput = {
    lwDb: v('lw'),
    distanceM: v('distance'),
    method: form.method,
    onTimePct: v('onTime'),
    count: v('count'),
    facade: form.facade,
  };
  if (worked !== undefined && period !== undefined) {
    input.hoursWorked = worked;
    input.periodHours = period;
  }
  if (values.penalty !== undefined) input.penaltyDb = values.penalty;
  if (form.method === 'simple') input.q = v('q');
  switch (form.screening) {
    case 'top-visible':
    case 'hidden':
      input.screening = { kind: form.screening };
      break;
    case 'explicit':
      input.screening = { kind: 'explicit', db: v('screeningDb') };
      break;
    case 'barrier':
      if (form.method === 'iso9613-2') input.screening = { kind: 'barrier', pathDifferenceM: v('barrier') };
      break;
    default:
      input.screening = { kind: 'none' };
  }
  if (form.method === 'iso9613-2') {
    input.propagation = {
      sourceHeightM: v('hs'),
      receiverHeightM: v('hr'),
      groundFactor: v('ground'),
      temperatureC: v('temperature'),
      humidityPct: v('humidity'),
      groundMethod: form.groundMethod ?? 'general',
      cmet: { c0Db: v('c0') },
    };
  }
  return { ok: true, input };
}

/** The form field an error from the core is about, from the input it names. */
export function fieldOfInput(input: string): FieldId | undefined {
  const map: Record<string, FieldId> = {
    'sound power level': 'lw',
    distance: 'distance',
    'projected distance': 'distance',
    'directivity Q': 'q',
    'on-time': 'onTime',
    count: 'count',
    screening: 'screeningDb',
    'barrier path difference': 'barrier',
    'path difference': 'barrier',
    'source height': 'hs',
    'receiver height': 'hr',
    'mean path height': 'hs',
    'ground factor': 'ground',
    'source ground factor': 'ground',
    'middle ground factor': 'ground',
    'receiver ground factor': 'ground',
    temperature: 'temperature',
    humidity: 'humidity',
    C0: 'c0',
    'working hours': 'hoursWorked',
    'assessment period': 'periodHours',
    'character penalty': 'penalty',
  };
  return map[input];
}

/** What the quick calculation shows: the core's level, or the problems of the fields that cannot be read. */
export type QuickCalcOutcome =
  | { kind: 'level'; result: SingleMachineLevel }
  | { kind: 'problems'; problems: Partial<Record<FieldId, string>>; general?: string };
