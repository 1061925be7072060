/**
 * The quick calculation's form: the fields as typed, read into the core's
 * SingleMachineInput. Reading text into numbers only; the level itself comes from
 * singleMachineLevel (src/core/single-machine-level.ts).
 */
import type { SingleMachineInput, SingleMachineLevel } from '../../core/single-machine-level.ts';
import type { NumberRule } from '../../ledger/validate/field-checks.ts';
import { RULES } from '../../ledger/validate/validate-rules.ts';
import { readNumberCell } from '../../ledger/catalogue/index.ts';

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
  /**
   * The project file's rule for the same quantity (from the field catalogue): its range and
   * unit words, so the form accepts what the grid and `ledger level` accept. Without one, the
   * core checks the range.
   */
  rule?: NumberRule;
}

/** A field read with a project rule: its accepted words are the rule's. */
const ruled = (id: FieldId, name: string, unit: string, rule: NumberRule): FieldSpec => ({
  id,
  name,
  unit,
  accepted: `use ${rule.accepted}`,
  rule,
});

export const FIELDS: Record<FieldId, FieldSpec> = {
  lw: ruled('lw', 'LWA', 'dB', RULES.lwaDb),
  distance: ruled('distance', 'Distance', 'm', RULES.distanceM),
  q: { id: 'q', name: 'Directivity Q', unit: '', accepted: 'use 1, 2, 4 or 8' },
  onTime: ruled('onTime', 'On-time', '%', RULES.onTimePct),
  count: ruled('count', 'Number of units', '', RULES.count),
  screeningDb: ruled('screeningDb', 'Screening', 'dB', RULES.screeningDb),
  barrier: ruled('barrier', 'Barrier path difference', 'm', RULES.pathDifferenceM),
  hs: ruled('hs', 'Source height', 'm', RULES.heightM),
  hr: ruled('hr', 'Receiver height', 'm', RULES.heightM),
  ground: ruled('ground', 'Ground factor G', '', RULES.groundFactor),
  temperature: ruled('temperature', 'Temperature', '°C', RULES.temperatureC),
  humidity: ruled('humidity', 'Relative humidity', '%', RULES.humidityPct),
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
  c0: ruled('c0', 'Meteorological factor C0', 'dB', RULES.c0Db),
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
 * One field's number. A field with a project rule is read as the grid reads a cell (its unit
 * words, range and wholeness; a decimal comma or point); the others as a plain number, their
 * range left to the core. Returns the number or the problem's words.
 */
function readField(spec: FieldSpec, text: string): number | string {
  if (!spec.rule) return readNumber(text) ?? 'is not a number';
  const r = spec.rule;
  const reading = readNumberCell(text, ',', {
    accepted: spec.accepted,
    ...(r.min !== undefined ? { min: r.min } : {}),
    ...(r.max !== undefined ? { max: r.max } : {}),
    ...(r.aboveMin ? { minExclusive: true } : {}),
    ...(r.integer ? { whole: true } : {}),
    ...(r.suffixes ? { suffixes: r.suffixes } : {}),
  });
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
    const value = text.trim() === '' ? 'is empty' : readField(spec, text);
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
