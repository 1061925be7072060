/**
 * The JSON Schemas of the project file and the register file state the catalogue's ranges:
 * a range changed in `ledger/catalogue` and not in the schema fails here.
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { MACHINE_NUMBERS, type NumberField } from '../../../../src/ledger/catalogue/index.ts';

type Json = Record<string, unknown>;
const load = (name: string) =>
  JSON.parse(readFileSync(new URL(`../../../../static/${name}`, import.meta.url), 'utf8')) as Json;
const project = load('project.schema.json');
const register = load('register.schema.json');

/** The number branch of a property that may also hold null (an unreadable cell). */
function numberOf(property: unknown): Json {
  const p = property as Json;
  if (p.type === 'number') return p;
  if (p.type === 'array') return numberOf(p.items);
  const branch = ((p.anyOf ?? p.oneOf ?? []) as Json[]).find((b) => b.type === 'number');
  if (!branch) throw new Error(`no number in ${JSON.stringify(p)}`);
  return branch;
}

function rangeOf(schemaNumber: Json): Pick<NumberField, 'min' | 'max' | 'aboveMin'> {
  return schemaNumber.exclusiveMinimum !== undefined
    ? { min: schemaNumber.exclusiveMinimum as number, max: schemaNumber.maximum as number, aboveMin: true }
    : { min: schemaNumber.minimum as number, max: schemaNumber.maximum as number, aboveMin: false };
}

const catalogueRange = (f: NumberField) => ({ min: f.min, max: f.max, aboveMin: f.aboveMin === true });

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
});
