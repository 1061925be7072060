/**
 * The JSON Schemas of the project file and the register file state the catalogue's ranges:
 * a range changed in `ledger/catalogue` and not in the schema fails here.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import {
  CLOCK_PATTERN,
  CURRENCY_CODE,
  DUTY_NUMBERS,
  LIFE_UNIT,
  MACHINE_NUMBERS,
  PERIOD_TIMES,
  PLAN_NUMBERS,
  PHASE_TIMES,
  RECEIVER_KIND,
  RECEIVER_NUMBERS,
  REGISTER_LIFE,
  REGISTER_LIFE_ANY_UNIT,
  SETTINGS_NUMBERS,
  UNCERTAINTY_NUMBERS,
  type NumberField,
} from '../../../../src/ledger/catalogue/index.ts';

type Json = Record<string, unknown>;
const load = (name: string) =>
  JSON.parse(readFileSync(new URL(`../../../../static/${name}`, import.meta.url), 'utf8')) as Json;
const project = load('project.schema.json');
const register = load('register.schema.json');

/** The number branch of a property that may also hold null (an unreadable cell). */
function numberOf(property: unknown): Json {
  const p = property as Json;
  if (p.type === 'number' || p.type === 'integer') return p;
  if (p.type === 'array') return numberOf(p.items);
  const branch = ((p.anyOf ?? p.oneOf ?? []) as Json[]).find((b) => b.type === 'number' || b.type === 'integer');
  if (!branch) throw new Error(`no number in ${JSON.stringify(p)}`);
  return branch;
}

function rangeOf(schemaNumber: Json): Pick<NumberField, 'min' | 'max' | 'aboveMin'> {
  return schemaNumber.exclusiveMinimum !== undefined
    ? { min: schemaNumber.exclusiveMinimum as number, max: schemaNumber.maximum as number, aboveMin: true }
    : { min: schemaNumber.minimum as number, max: schemaNumber.maximum as number, aboveMin: false };
}

const catalogueRange = (f: NumberField) => ({ min: f.min, max: f.max, aboveMin: f.aboveMin === true });
/** Whether the schema asks for a whole number. */
const wholeIn = (property: unknown) => numberOf(property).type === 'integer';

const defs = project.$defs as Record<string, Json>;
const candidate = (defs.candidate as Json).properties as Json;
const costs = (defs.cost as Json).oneOf as Json[];
const costProperty = (name: string) => costs.map((c) => (c.properties as Json)[name]).find((p) => p !== undefined);

describe('static/project.schema.json states the catalogue’s ranges', () => {
  it.each([
    ['lwaDb', MACHINE_NUMBERS.lwaDb],
    ['bandsDb', MACHINE_NUMBERS.bandDb],
    ['uncertaintyDb', MACHINE_NUMBERS.uncertaintyDb],
    ['operatorLpaDb', MACHINE_NUMBERS.operatorLpaDb],
    ['operatorHoursPerDay', MACHINE_NUMBERS.operatorHoursPerDay],
    ['netPowerKw', MACHINE_NUMBERS.netPowerKw],
    ['directiveQuantity', MACHINE_NUMBERS.directiveQuantity],
    ['runningPerDay', MACHINE_NUMBERS.runningPerDay],
    ['fixedCharges', MACHINE_NUMBERS.fixedCharges],
  ] as const)('candidate %s', (name, field) => {
    expect(rangeOf(numberOf(candidate[name]))).toEqual(catalogueRange(field));
  });

  it.each([
    ['dayRate', MACHINE_NUMBERS.dayRate],
    ['weekRate', MACHINE_NUMBERS.weekRate],
    ['monthRate', MACHINE_NUMBERS.monthRate],
    ['price', MACHINE_NUMBERS.price],
    ['resaleValue', MACHINE_NUMBERS.resaleValue],
    ['lifeDays', MACHINE_NUMBERS.lifeDays],
  ] as const)('candidate cost %s', (name, field) => {
    expect(rangeOf(numberOf(costProperty(name)))).toEqual(catalogueRange(field));
  });
});

describe('static/project.schema.json states the ranges of a duty, a receiver, a phase and a period', () => {
  const duty = (defs.duty as Json).properties as Json;
  const receiver = (defs.receiver as Json).properties as Json;
  const onTimeRange = (duty.onTimeRangePct as Json).properties as Json;
  const locations = (defs.location as Json).oneOf as Json[];
  const locationProperty = (kind: string) =>
    locations.find((l) => ((l.properties as Json).kind as Json).const === kind)!.properties as Json;
  const screenings = (defs.screening as Json).oneOf as Json[];
  const screeningProperty = (name: string) =>
    screenings.map((b) => (b.properties as Json | undefined)?.[name]).find((p) => p !== undefined);

  it.each([
    ['duty count', duty.count, DUTY_NUMBERS.count],
    ['duty onTimePct', duty.onTimePct, DUTY_NUMBERS.onTimePct],
    ['duty onTimeRangePct.lowPct', onTimeRange.lowPct, DUTY_NUMBERS.onTimeLowPct],
    ['duty onTimeRangePct.highPct', onTimeRange.highPct, DUTY_NUMBERS.onTimeHighPct],
    ['duty durationDays', duty.durationDays, DUTY_NUMBERS.durationDays],
    ['duty sourceHeightM', duty.sourceHeightM, DUTY_NUMBERS.sourceHeightM],
    ['duty location.x', locationProperty('point').x, DUTY_NUMBERS.x],
    ['duty location.y', locationProperty('point').y, DUTY_NUMBERS.y],
    [
      'duty location.distancesM',
      (locationProperty('distances').distancesM as Json).additionalProperties,
      DUTY_NUMBERS.distanceM,
    ],
    ['receiver x', receiver.x, RECEIVER_NUMBERS.x],
    ['receiver y', receiver.y, RECEIVER_NUMBERS.y],
    ['receiver heightM', receiver.heightM, RECEIVER_NUMBERS.heightM],
    ['receiver limitsDb', (receiver.limitsDb as Json).additionalProperties, RECEIVER_NUMBERS.limitDb],
    ['receiver ambientDb', receiver.ambientDb, RECEIVER_NUMBERS.ambientDb],
    ['screening db', screeningProperty('db'), RECEIVER_NUMBERS.screeningDb],
    ['screening pathDifferenceM', screeningProperty('pathDifferenceM'), RECEIVER_NUMBERS.pathDifferenceM],
  ] as [string, unknown, NumberField][])('%s', (_name, property, field) => {
    expect(rangeOf(numberOf(property))).toEqual(catalogueRange(field));
    expect(wholeIn(property)).toBe(field.integer === true);
  });

  it('receiver kind lists the catalogue’s choices', () => {
    expect((receiver.kind as Json).enum).toEqual(RECEIVER_KIND.choices.map((c) => c.value));
  });

  it.each([
    ['period start', (defs.period as Json).properties as Json, 'start', PERIOD_TIMES.start],
    ['period end', (defs.period as Json).properties as Json, 'end', PERIOD_TIMES.end],
    ['phase start', (defs.phase as Json).properties as Json, 'start', PHASE_TIMES.start],
    ['phase end', (defs.phase as Json).properties as Json, 'end', PHASE_TIMES.end],
  ] as const)('%s is a time of day of the catalogue’s pattern', (_name, properties, key, field) => {
    expect(field.path).toBe(key);
    expect((properties[key] as Json).pattern).toBe(CLOCK_PATTERN.source);
  });
});

describe('static/project.schema.json states the ranges of the settings', () => {
  const iso = ((defs.propagation as Json).oneOf as Json[])[1]!.properties as Json;
  const settings = (defs.settings as Json).properties as Json;
  const uncertainty = ((project.properties as Json).uncertainty as Json).properties as Json;
  const S = SETTINGS_NUMBERS;

  it.each([
    ['propagation temperatureC', iso.temperatureC, S.temperatureC],
    ['propagation humidityPct', iso.humidityPct, S.humidityPct],
    ['propagation pressureKPa', iso.pressureKPa, S.pressureKPa],
    ['propagation groundFactor', iso.groundFactor, S.groundFactor],
    ['propagation c0Db', iso.c0Db, S.c0Db],
    ['propagation sourceHeightM', iso.sourceHeightM, S.sourceHeightM],
    ['settings referenceDistanceM', settings.referenceDistanceM, S.referenceDistanceM],
    ...Object.entries(UNCERTAINTY_NUMBERS).map(([key, field]) => [`uncertainty ${key}`, uncertainty[key], field]),
  ] as [string, unknown, NumberField][])('%s', (_name, property, field) => {
    expect(rangeOf(numberOf(property))).toEqual(catalogueRange(field));
    expect(wholeIn(property)).toBe(field.integer === true);
  });

  it('every setting’s path names where the schema keeps it', () => {
    for (const field of [...Object.values(SETTINGS_NUMBERS), ...Object.values(UNCERTAINTY_NUMBERS)]) {
      const [owner, key] = field.path.split('.') as [string, string];
      const properties = owner === 'propagation' ? iso : owner === 'settings' ? settings : uncertainty;
      expect(properties[key], field.path).toBeDefined();
    }
  });
});

describe('static/project.schema.json states the ranges of the site plan and the currency', () => {
  const barrier = (defs.barrier as Json).properties as Json;
  const sitePlan = (defs.sitePlan as Json).properties as Json;
  const image = (sitePlan.image as Json).properties as Json;
  const origin = (image.originPx as Json).properties as Json;

  it.each([
    ['barrier heightM', barrier.heightM, PLAN_NUMBERS.barrierHeightM],
    ['image widthPx', image.widthPx, PLAN_NUMBERS.imagePx],
    ['image heightPx', image.heightPx, PLAN_NUMBERS.imagePx],
    ['image metresPerPixel', image.metresPerPixel, PLAN_NUMBERS.metresPerPixel],
    ['image originPx.x', origin.x, PLAN_NUMBERS.pixel],
    ['image originPx.y', origin.y, PLAN_NUMBERS.pixel],
    ['image northDeg', image.northDeg, PLAN_NUMBERS.northDeg],
  ] as [string, unknown, NumberField][])('%s', (_name, property, field) => {
    expect(rangeOf(numberOf(property))).toEqual(catalogueRange(field));
    expect(wholeIn(property)).toBe(field.integer === true);
  });

  it('the currency has the catalogue’s pattern in both schemas', () => {
    expect(((project.properties as Json).currency as Json).pattern).toBe(CURRENCY_CODE.pattern.source);
    expect(((register.properties as Json).currency as Json).pattern).toBe(CURRENCY_CODE.pattern.source);
  });
});

describe('static/register.schema.json states the catalogue’s ranges', () => {
  const machine = ((register.$defs as Json).machine as Json).properties as Json;
  it.each([
    ['lwaDb', MACHINE_NUMBERS.lwaDb],
    ['uncertaintyDb', MACHINE_NUMBERS.uncertaintyDb],
    ['operatorLpaDb', MACHINE_NUMBERS.operatorLpaDb],
    ['netPowerKw', MACHINE_NUMBERS.netPowerKw],
    ['directiveQuantity', MACHINE_NUMBERS.directiveQuantity],
  ] as const)('machine %s', (name, field) => {
    expect(rangeOf(numberOf(machine[name]))).toEqual(catalogueRange(field));
  });

  it('machine purchase.life takes the widest of the life’s two ranges (working days), the years’ inside it', () => {
    const purchase = (machine.purchase as Json).properties as Json;
    expect(rangeOf(numberOf(purchase.life))).toEqual(catalogueRange(REGISTER_LIFE_ANY_UNIT));
    expect(REGISTER_LIFE.years.max).toBeLessThanOrEqual(REGISTER_LIFE.workingDays.max);
    expect((purchase.lifeUnit as Json).enum).toEqual(LIFE_UNIT.choices.map((c) => c.value));
  });
});
