/**
 * Every reader of a number takes its range and unit words from the field catalogue, so a
 * value one reader accepts every reader accepts, and one refused by one is refused by all:
 * validation, the grid's cell reader, the supplier-list importer (a machine's numbers),
 * the Settings pane (the project's settings), the quick calculation and the command line's flags. A duty's and a receiver's numbers are written into the real
 * columns of the duties and receivers grids.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { byFlag, byValidation, values } from './reader-probes.ts';
import {
  DUTY_NUMBERS,
  MACHINE_NUMBERS,
  RECEIVER_NUMBERS,
  REGISTER_LIFE,
  REGISTER_LIFE_ANY_UNIT,
  SETTINGS_NUMBERS,
  UNCERTAINTY_NUMBERS,
  fieldAccepts,
  readNumberCell,
  readRule,
  type NumberField,
} from '../../../../src/ledger/catalogue/index.ts';
import { UNCERTAINTY_RULES } from '../../../../src/ledger/uncertainty/settings.ts';
import { emptyRegister, type Register, type RegisterMachine } from '../../../../src/ledger/register/model.ts';
import { demoRegister } from '../../../../src/ledger/register/demo-register.ts';
import { validateRegister } from '../../../../src/ledger/register/validate-register.ts';
import { registerColumns } from '../../../../src/app/register/register-table.ts';
import {
  FIELDS as QUICK_CALC_FIELDS,
  readQuickCalcField,
  type FieldId,
} from '../../../../src/app/results/quick-calc-form.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Duty, Receiver } from '../../../../src/ledger/model/model.ts';
import { dutyColumns } from '../../../../src/app/tables/duties.ts';
import { receiverColumns } from '../../../../src/app/tables/receivers.ts';
import type { LedgerColumn } from '../../../../src/app/tables/column.ts';
import { RULES } from '../../../../src/ledger/validate/validate-rules.ts';
import { readNumberCell as readGridCell } from '../../../../src/app/tables/parse.ts';
import { gridRule } from '../../../../src/app/tables/catalogue-columns.ts';
import { readNumberCell as readImportCell } from '../../../../src/io/import/read-cell.ts';
import type { ImportField } from '../../../../src/io/import/fields.ts';
import { FLAG_RULES } from '../../../../src/cli/flag-rules.ts';
import type { NumberRule } from '../../../../src/ledger/validate/field-checks.ts';

interface Readers {
  field: NumberField;
  validation: NumberRule;
  importField: ImportField;
  flag?: NumberRule;
}

const READERS: Record<string, Readers> = {
  lwaDb: { field: MACHINE_NUMBERS.lwaDb, validation: RULES.lwaDb, importField: 'lwaDb', flag: FLAG_RULES.lwaDb },
  bandDb: { field: MACHINE_NUMBERS.bandDb, validation: RULES.bandDb, importField: 'band500', flag: FLAG_RULES.bandDb },
  uncertaintyDb: {
    field: MACHINE_NUMBERS.uncertaintyDb,
    validation: RULES.uncertaintyDb,
    importField: 'uncertaintyDb',
  },
  operatorLpaDb: {
    field: MACHINE_NUMBERS.operatorLpaDb,
    validation: RULES.operatorLpaDb,
    importField: 'operatorLpaDb',
    flag: FLAG_RULES.operatorLpaDb,
  },
  operatorHoursPerDay: {
    field: MACHINE_NUMBERS.operatorHoursPerDay,
    validation: RULES.operatorHours,
    importField: 'operatorHoursPerDay',
    flag: FLAG_RULES.operatorHours,
  },
  netPowerKw: { field: MACHINE_NUMBERS.netPowerKw, validation: RULES.netPowerKw, importField: 'netPowerKw' },
  directiveQuantity: {
    field: MACHINE_NUMBERS.directiveQuantity,
    validation: RULES.directiveQuantity,
    importField: 'directiveQuantity',
    flag: FLAG_RULES.directiveQuantity,
  },
  dayRate: { field: MACHINE_NUMBERS.dayRate, validation: RULES.money, importField: 'dayRate', flag: FLAG_RULES.money },
  lifeDays: { field: MACHINE_NUMBERS.lifeDays, validation: RULES.lifeDays, importField: 'lifeDays' },
};

const byGrid = (field: NumberField, text: string) => readGridCell(text, '.', gridRule(field)).ok;
const byImport = (importField: ImportField, text: string) =>
  readImportCell(text, { rowNumber: 2, column: 0, columnName: 'x', field: importField }, '.').kind === 'value';

describe.each(Object.entries(READERS))('%s: every reader accepts the same values', (_name, r) => {
  it('a number alone is accepted by validation, the grid, the importer and the flag alike, exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(r.field), (value) => {
        const text = String(value);
        const expected = fieldAccepts(r.field, value);
        expect(byValidation(r.validation, value)).toBe(expected);
        expect(byGrid(r.field, text)).toBe(expected);
        expect(byImport(r.importField, text)).toBe(expected);
        if (r.flag) expect(byFlag(r.flag, text)).toBe(expected);
      }),
      { numRuns: 300 },
    );
  });

  it.runIf(r.field.suffixes.length > 0)(
    'a number followed by a unit word is read alike by the grid, the importer and the flag (skipped where the field takes no unit word)',
    () => {
      fc.assert(
        fc.property(
          values(r.field),
          fc.constantFrom(...r.field.suffixes),
          fc.constantFrom('', ' '),
          (value, unit, gap) => {
            const text = `${value}${gap}${unit}`;
            const expected = fieldAccepts(r.field, value);
            expect(byGrid(r.field, text)).toBe(expected);
            expect(byImport(r.importField, text)).toBe(expected);
            if (r.flag) expect(byFlag(r.flag, text)).toBe(expected);
          },
        ),
        { numRuns: 200 },
      );
    },
  );
});

describe('the catalogue’s ranges', () => {
  // Each range is chosen from the trade; the reason is written beside it in machine-numbers.ts.
  it.each([
    ['lwaDb', 40, 150], // Directive 2000/14/EC limits ~93–115 dB; declared plant ~65–135 dB (common practice)
    ['operatorLpaDb', 40, 140], // cab ~65 dB to breaker ~115 dB; 140 dB is Directive 2003/10/EC's peak limit
    ['bandDb', 0, 170], // LWA top plus the 26.2 dB A-weighting at 63 Hz (IEC 61672-1:2013 Table 3), rounded
    ['uncertaintyDb', 0, 10], // ISO 4871:1996 K of 1.5–4 dB in practice
  ] as const)('%s runs from %d to %d dB', (key, min, max) => {
    expect([MACHINE_NUMBERS[key].min, MACHINE_NUMBERS[key].max]).toEqual([min, max]);
  });

  it('every range says why it was chosen', () => {
    for (const field of Object.values(MACHINE_NUMBERS)) expect(field.why.length).toBeGreaterThan(20);
  });
});

const demo = demoProject();
const ctx = { project: demo, separator: '.' as const };
const duty = demo.duties.find((d) => d.location.kind === 'point')!;
const receiver = demo.receivers[0]!;
const period = demo.periods[0]!;
const dutyColumn = (id: string) => dutyColumns(ctx).find((c) => c.id === id)!;
const receiverColumn = (id: string) => receiverColumns(ctx).find((c) => c.id === id)!;
/** Whether the grid's real column takes the text without a message. */
const byColumn =
  <Row>(column: LedgerColumn<Row>, row: Row, wrap: (text: string) => string = (t) => t) =>
  (text: string) =>
    column.write!(row, wrap(text)).failure === undefined;

interface ProjectReaders {
  field: NumberField;
  validation: NumberRule;
  grid: (text: string) => boolean;
  flag?: NumberRule;
}

const D = DUTY_NUMBERS;
const R = RECEIVER_NUMBERS;
const PROJECT_READERS: Record<string, ProjectReaders> = {
  'duty count': {
    field: D.count,
    validation: RULES.count,
    grid: byColumn<Duty>(dutyColumn('count'), duty),
    flag: FLAG_RULES.count,
  },
  'duty on-time': {
    field: D.onTimePct,
    validation: RULES.onTimePct,
    grid: byColumn<Duty>(dutyColumn('onTimePct'), duty),
    flag: FLAG_RULES.onTimePct,
  },
  'duty on-time lowest': {
    field: D.onTimeLowPct,
    validation: RULES.onTimePct,
    grid: byColumn<Duty>(dutyColumn('onTimeLow'), duty),
  },
  'duty days needed': {
    field: D.durationDays,
    validation: RULES.durationDays,
    grid: byColumn<Duty>(dutyColumn('durationDays'), duty),
  },
  'duty x': { field: D.x, validation: RULES.coordinateM, grid: byColumn<Duty>(dutyColumn('x'), duty) },
  'duty distance': {
    field: D.distanceM,
    validation: RULES.distanceM,
    grid: byColumn<Duty>(dutyColumn(`distance:${receiver.id}`), duty),
    flag: FLAG_RULES.distanceM,
  },
  'duty source height': {
    field: D.sourceHeightM,
    validation: RULES.heightM,
    grid: byColumn<Duty>(dutyColumn('sourceHeightM'), duty),
    flag: FLAG_RULES.heightM,
  },
  'receiver y': { field: R.y, validation: RULES.coordinateM, grid: byColumn<Receiver>(receiverColumn('y'), receiver) },
  'receiver height': {
    field: R.heightM,
    validation: RULES.heightM,
    grid: byColumn<Receiver>(receiverColumn('heightM'), receiver),
  },
  'receiver limit': {
    field: R.limitDb,
    validation: RULES.limitDb,
    grid: byColumn<Receiver>(receiverColumn(`limit:${period.id}`), receiver),
    flag: FLAG_RULES.criterionDb,
  },
  'receiver ambient': {
    field: R.ambientDb,
    validation: RULES.ambientDb,
    grid: byColumn<Receiver>(receiverColumn('ambientDb'), receiver),
  },
  'screening reduction': {
    field: R.screeningDb,
    validation: RULES.screeningDb,
    grid: byColumn<Receiver>(receiverColumn(`screening:${duty.id}`), receiver, (t) => `${t} dB`),
    flag: FLAG_RULES.screeningDb,
  },
  'barrier path difference': {
    field: R.pathDifferenceM,
    validation: RULES.pathDifferenceM,
    grid: byColumn<Receiver>(receiverColumn(`screening:${duty.id}`), receiver, (t) => `z ${t}`),
    flag: FLAG_RULES.pathDifferenceM,
  },
};

describe.each(Object.entries(PROJECT_READERS))('%s: every reader accepts the same values', (_name, r) => {
  it('a number is accepted by validation, the grid’s column and the flag alike, exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(r.field), (value) => {
        const text = String(value);
        const expected = fieldAccepts(r.field, value);
        expect(byValidation(r.validation, value)).toBe(expected);
        expect(r.grid(text)).toBe(expected);
        if (r.flag) expect(byFlag(r.flag, text)).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });
});

describe('the ranges of a duty and a receiver', () => {
  it('every range says why it was chosen', () => {
    for (const field of [...Object.values(DUTY_NUMBERS), ...Object.values(RECEIVER_NUMBERS)])
      expect(field.why.length).toBeGreaterThan(20);
  });
});

describe.each(Object.entries(PROJECT_READERS).filter(([, r]) => r.field.suffixes.length > 0))(
  '%s: a number followed by a unit word',
  (name, r) => {
    it('is read alike by the grid’s column and the flag', () => {
      fc.assert(
        fc.property(
          values(r.field),
          fc.constantFrom(...r.field.suffixes),
          fc.constantFrom('', ' '),
          (value, unit, gap) => {
            const text = `${value}${gap}${unit}`;
            const expected = fieldAccepts(r.field, value);
            // the screening column reads "7.5 dB" and "z 0.8 m": the unit is already written there
            if (!name.startsWith('screening') && !name.startsWith('barrier')) expect(r.grid(text)).toBe(expected);
            if (r.flag) expect(byFlag(r.flag, text)).toBe(expected);
          },
        ),
        { numRuns: 100 },
      );
    });
  },
);

interface SettingReaders {
  field: NumberField;
  validation: NumberRule;
  flag?: NumberRule;
}

const S = SETTINGS_NUMBERS;
const SETTING_READERS: Record<string, SettingReaders> = {
  temperature: { field: S.temperatureC, validation: RULES.temperatureC, flag: FLAG_RULES.temperatureC },
  humidity: { field: S.humidityPct, validation: RULES.humidityPct, flag: FLAG_RULES.humidityPct },
  pressure: { field: S.pressureKPa, validation: RULES.pressureKPa, flag: FLAG_RULES.pressureKPa },
  'ground factor': { field: S.groundFactor, validation: RULES.groundFactor, flag: FLAG_RULES.groundFactor },
  C0: { field: S.c0Db, validation: RULES.c0Db, flag: FLAG_RULES.c0Db },
  'default source height': { field: S.sourceHeightM, validation: RULES.defaultSourceHeightM },
  'reference distance': { field: S.referenceDistanceM, validation: RULES.referenceDistanceM },
  ...Object.fromEntries(
    (Object.keys(UNCERTAINTY_NUMBERS) as (keyof typeof UNCERTAINTY_NUMBERS)[]).map((key) => [
      key,
      {
        field: UNCERTAINTY_NUMBERS[key],
        validation: UNCERTAINTY_RULES[key],
        ...(key === 'draws' || key === 'seed' ? { flag: UNCERTAINTY_RULES[key] } : {}),
      },
    ]),
  ),
};

/** The Settings pane's reading of a typed value (app/shell/SettingNumber.svelte). */
const bySettingsPane = (field: NumberField, text: string) => readNumberCell(text, '.', readRule(field)).ok;

describe.each(Object.entries(SETTING_READERS))('setting %s: every reader accepts the same values', (_name, r) => {
  it('a number, alone or with a unit word, is accepted by validation, the Settings pane and the flag alike, exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(r.field), fc.constantFrom('', ...r.field.suffixes.map((u) => ` ${u}`)), (value, unit) => {
        const expected = fieldAccepts(r.field, value);
        expect(byValidation(r.validation, value)).toBe(expected);
        expect(bySettingsPane(r.field, `${value}${unit}`)).toBe(expected);
        if (r.flag) expect(byFlag(r.flag, `${value}${unit}`)).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });

  it('says why its range was chosen', () => {
    expect(r.field.why.length).toBeGreaterThan(20);
  });
});

describe.each([
  ['years', REGISTER_LIFE.years],
  ['working-days', REGISTER_LIFE.workingDays],
] as const)('register life in %s: every reader accepts the same values', (unit, field) => {
  const first = demoRegister().machines[0]!;
  const machine: RegisterMachine = {
    ...first,
    purchase: { price: 100000, resaleValue: 20000, life: 8, lifeUnit: unit },
  };

  const lifeColumn = registerColumns('.').find((c) => c.id === 'life')!;
  const register = (life: number): Register => ({
    ...emptyRegister(),
    machines: [{ ...machine, purchase: { ...machine.purchase!, life } }],
  });
  const byRegisterValidation = (value: number) =>
    !validateRegister(register(value)).some((p) => p.path === '$.machines[0].purchase.life');

  it('a number, alone or with a unit word, is accepted by validation, the register grid and the register workbook alike, exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(field), fc.constantFrom('', ...field.suffixes.map((u) => ` ${u}`)), (value, word) => {
        const expected = fieldAccepts(field, value);
        expect(byRegisterValidation(value)).toBe(expected);
        expect(lifeColumn.write!(machine, `${value}${word}`).failure === undefined).toBe(expected);
        // the register workbook reads with the widest range and validation holds the value to its unit's
        const readByWorkbook = readNumberCell(`${value}${word}`, '.', readRule(REGISTER_LIFE_ANY_UNIT));
        expect(readByWorkbook.ok && byRegisterValidation(readByWorkbook.value)).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });
});

/** `ledger level`'s flag for each field of the quick calculation: the two read the same inputs. */
const LEVEL_FLAGS: Record<FieldId, NumberRule> = {
  lw: FLAG_RULES.lwaDb,
  distance: FLAG_RULES.distanceM,
  q: FLAG_RULES.q,
  onTime: FLAG_RULES.onTimePct,
  count: FLAG_RULES.count,
  screeningDb: FLAG_RULES.screeningDb,
  barrier: FLAG_RULES.pathDifferenceM,
  hs: FLAG_RULES.heightM,
  hr: FLAG_RULES.heightM,
  ground: FLAG_RULES.groundFactor,
  temperature: FLAG_RULES.temperatureC,
  humidity: FLAG_RULES.humidityPct,
  c0: FLAG_RULES.c0Db,
  hoursWorked: FLAG_RULES.periodHours,
  periodHours: FLAG_RULES.periodHours,
  penalty: FLAG_RULES.penaltyDb,
};

describe.each(Object.entries(QUICK_CALC_FIELDS) as [FieldId, (typeof QUICK_CALC_FIELDS)[FieldId]][])(
  'quick calculation %s: every reader accepts the same values',
  (id, spec) => {
    it('a number, alone or with a unit word, is accepted by the quick calculation and `ledger level` alike, exactly when the catalogue range holds', () => {
      fc.assert(
        fc.property(
          values(spec.field),
          fc.constantFrom('', ...spec.field.suffixes.map((u) => ` ${u}`)),
          (value, unit) => {
            const expected = fieldAccepts(spec.field, value);
            expect(typeof readQuickCalcField(id, `${value}${unit}`) === 'number').toBe(expected);
            expect(byFlag(LEVEL_FLAGS[id], `${value}${unit}`)).toBe(expected);
          },
        ),
        { numRuns: 100 },
      );
    });
  },
);
