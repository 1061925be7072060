/**
 * The quick calculation's form: the fields as typed, read into the core's
 * SingleMachineInput. Reading text into numbers only; the level itself comes from
 * singleMachineLevel (src/core/single-machine-level.ts).
 */
import type { SingleMachineInput, SingleMachineLevel } from '../../core/single-machine-level.ts';

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
  /** What is accepted, used in the "not a number" message. */
  accepted: string;
}

export const FIELDS: Record<FieldId, FieldSpec> = {
  lw: { id: 'lw', name: 'LWA', unit: 'dB', accepted: 'use dB, e.g. 104.5' },
  distance: { id: 'distance', name: 'Distance', unit: 'm', accepted: 'use metres, e.g. 25' },
  q: { id: 'q', name: 'Directivity Q', unit: '', accepted: 'use 1, 2, 4 or 8' },
  onTime: { id: 'onTime', name: 'On-time', unit: '%', accepted: 'use a percentage above 0 and up to 100, e.g. 60' },
  count: { id: 'count', name: 'Number of units', unit: '', accepted: 'use a whole number, e.g. 2' },
  screeningDb: { id: 'screeningDb', name: 'Screening', unit: 'dB', accepted: 'use a reduction in dB, e.g. 7' },
  barrier: { id: 'barrier', name: 'Barrier path difference', unit: 'm', accepted: 'use metres, e.g. 0.8' },
  hs: { id: 'hs', name: 'Source height', unit: 'm', accepted: 'use metres above ground, e.g. 1.5' },
  hr: { id: 'hr', name: 'Receiver height', unit: 'm', accepted: 'use metres above ground, e.g. 4' },
  ground: { id: 'ground', name: 'Ground factor G', unit: '', accepted: 'use 0 (hard) to 1 (porous), e.g. 0.5' },
  temperature: { id: 'temperature', name: 'Temperature', unit: '°C', accepted: 'use degrees Celsius, e.g. 10' },
  humidity: { id: 'humidity', name: 'Relative humidity', unit: '%', accepted: 'use a percentage, e.g. 70' },
  hoursWorked: {
    id: 'hoursWorked',
    name: 'Hours worked in the period',
    unit: 'h',
    accepted: 'use hours above 0 and up to the period, e.g. 10; leave both hours empty for the whole period',
  },
  periodHours: {
    id: 'periodHours',
    name: 'Assessment period',
    unit: 'h',
    accepted: 'use the period’s length in hours, e.g. 12; leave both hours empty for the whole period',
  },
  penalty: {
    id: 'penalty',
    name: 'Character penalty',
    unit: 'dB',
    accepted: 'use dB for tonal or impulsive noise, e.g. 3; empty for none',
  },
  c0: {
    id: 'c0',
    name: 'Meteorological factor C0',
    unit: 'dB',
    accepted: 'use dB from 0 to 5, e.g. 2; 0 for downwind',
  },
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

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i;

/**
 * Reads a typed number; a decimal comma is accepted when no point is present.
 * @example readNumber('104,5') // 104.5
 * @example readNumber('12O') // undefined
 */
export function readNumber(text: string): number | undefined {
  let s = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(/[\s\u00a0\u202f]/g, '');
  if (!s.includes('.') && (s.match(/,/g) ?? []).length === 1) s = s.replace(',', '.');
  if (!NUMBER.test(s)) return undefined;
  const value = Number(s);
  return Number.isFinite(value) ? value : undefined;
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
 * Reads the form into the core's input. Unreadable text gives a message in the pattern
 * `LWA: "12O" is not a number (use dB, e.g. 104.5)`; ranges are left to the core.
 */
export function readForm(form: QuickCalcForm): FormReading {
  const problems: Partial<Record<FieldId, string>> = {};
  const values: Partial<Record<FieldId, number>> = {};
  for (const id of activeFields(form)) {
    const text = form.text[id] ?? '';
    if (OPTIONAL_FIELDS.includes(id) && text.trim() === '') continue;
    const value = readNumber(text);
    if (value === undefined) {
      const spec = FIELDS[id];
      problems[id] =
        text.trim() === ''
          ? `${spec.name}: nothing given (${spec.accepted})`
          : `${spec.name}: ${JSON.stringify(text)} is not a number (${spec.accepted})`;
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
