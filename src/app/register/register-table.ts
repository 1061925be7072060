/**
 * The buyer's register as a grid: one row per machine, the columns the register keeps
 * (identity, directive type, noise data, costs to own, run and hire, source), typed text
 * read with the same cell readers as the project's tables. Unread text is kept in
 * `register.unreadCells` under "machines/<id>/<field>", exactly as a register file keeps it.
 *
 * The project's table helpers (apply, problems) work on any object with `unreadCells` and
 * a list of rows; this file adapts the register to them in one place.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { DataProblem } from '../../ledger/model/results.ts';
import type { Register, RegisterMachine, PurchaseTerms, HireTerms } from '../../ledger/register/model.ts';
import type { LedgerColumn, TableDefinition, TableList } from '../tables/column.ts';
import type { NumberRule } from '../tables/parse.ts';
import { fitHeader, nextId } from '../tables/column.ts';
import { choiceColumn, numberColumn, textColumn } from '../tables/cells.ts';
import { readNumber, formatNumber, type DecimalSeparator } from '../tables/parse.ts';
import { directiveQuantityColumn, directiveTypeColumn } from '../tables/check-columns.ts';
import { applyCellTexts, deleteTableRows, type CellChange } from '../tables/apply.ts';
import { tableProblems, type CellProblems } from '../tables/problems.ts';

const MONEY: NumberRule = {
  accepted: 'use an amount of 0 or more, e.g. 420.50',
  min: 0,
  prefixes: ['£', '€', '$', 'CHF', 'kr'],
  suffixes: ['€', 'kr', 'CHF'],
};
const DECLARATIONS = [
  { value: 'guaranteed', label: 'guaranteed' },
  { value: 'measured', label: 'measured + K' },
] as const;
const ORIGINS = [
  { value: 'declared', label: 'declared' },
  { value: 'from-watts', label: 'from watts' },
  { value: 'from-pressure', label: 'from pressure' },
  { value: 'permissible-stand-in', label: 'permissible stand-in' },
] as const;
const CHARACTERS = [
  { value: 'none', label: 'none' },
  { value: 'tonal', label: 'tonal' },
  { value: 'impulsive', label: 'impulsive' },
] as const;
const ENERGIES = [
  { value: 'diesel', label: 'diesel' },
  { value: 'petrol', label: 'petrol' },
  { value: 'electric', label: 'electric' },
  { value: 'battery', label: 'battery' },
  { value: 'hybrid', label: 'hybrid' },
  { value: 'other', label: 'other' },
] as const;
const LIFE_UNITS = [
  { value: 'years', label: 'years' },
  { value: 'working-days', label: 'working days' },
] as const;

/**
 * Keeps the optional purchase and hire terms whole: a term typed into a machine without
 * them starts them (price, resale, life: what is not typed yet is missing and flagged, never
 * filled in; a life starts in years); terms emptied of every amount are removed (purchase
 * terms keep a life unit of working days chosen by hand, so that choice is not lost).
 */
function tidyTerms(m: RegisterMachine): RegisterMachine {
  let out = m;
  const p = out.purchase as Partial<PurchaseTerms> | undefined;
  if (p) {
    if (p.price === undefined && p.resaleValue === undefined && p.life === undefined && p.lifeUnit !== 'working-days') {
      const { purchase: _gone, ...rest } = out;
      out = rest;
    } else if (p.lifeUnit === undefined) out = { ...out, purchase: { ...(p as PurchaseTerms), lifeUnit: 'years' } };
  }
  const h = out.hire as Partial<HireTerms> | undefined;
  if (h && h.dayRate === undefined && h.weekRate === undefined && h.monthRate === undefined) {
    const { hire: _gone, ...rest } = out;
    out = rest;
  }
  return out;
}

function termColumn(
  id: string,
  header: string,
  field: string,
  ctx: { separator: DecimalSeparator },
  rule = MONEY,
  width = 104,
): LedgerColumn<RegisterMachine> {
  return numberColumn<RegisterMachine>({ id, header, field, optional: true, width, rule }, ctx.separator, (row) =>
    tidyTerms(row),
  );
}

/** Octave-band Lw as eight numbers separated by spaces or semicolons. */
function bandsColumn(separator: DecimalSeparator): LedgerColumn<RegisterMachine> {
  const accepted =
    'use eight levels in dB for 63 Hz to 8 kHz separated by spaces or semicolons, e.g. 98 101 104 103 100 97 92 86';
  return {
    id: 'bandsDb',
    header: 'Octave bands Lw',
    unit: 'dB',
    width: 200,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'bandsDb',
    describe: accepted,
    value: (row) => row.bandsDb?.join(' '),
    display: (row) => (row.bandsDb ? row.bandsDb.map((b) => formatNumber(b, separator, 1)).join(' ') : ''),
    write(row, text) {
      const t = text.trim();
      if (t === '') {
        const { bandsDb: _drop, ...rest } = row;
        return { row: rest };
      }
      const values = t.split(/[\s;]+/).map((p) => readNumber(p, separator));
      if (values.length !== 8 || values.some((v) => v === undefined)) {
        return {
          row: { ...row, bandsDb: [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN] },
          failure: { problem: 'is not eight numbers', accepted },
        };
      }
      return { row: { ...row, bandsDb: values as number[] } };
    },
  };
}

/**
 * The source of single figures, typed as "LWA: data sheet 2025; Price: quotation 14/2026"
 * (a column's header or its field, then the source). Text naming no column is kept as typed
 * and marked; the machine's sources stay as they were.
 */
function figureSourcesColumn(columns: readonly LedgerColumn<RegisterMachine>[]): LedgerColumn<RegisterMachine> {
  const byWord = new Map<string, string>();
  for (const c of columns) {
    if (!c.editable || !c.field) continue;
    byWord.set(c.header.toLowerCase(), c.field);
    byWord.set(c.field.toLowerCase(), c.field);
  }
  const headerOf = new Map(columns.filter((c) => c.field).map((c) => [c.field as string, c.header] as const));
  const accepted =
    'use "column: source" pairs separated by semicolons, e.g. LWA: data sheet 2025; Price: quotation 14/2026';
  const show = (row: RegisterMachine) =>
    Object.entries(row.figureSources ?? {})
      .map(([k, v]) => `${headerOf.get(k) ?? k}: ${v}`)
      .join('; ');
  return {
    id: 'figureSources',
    header: 'Figure sources',
    width: 240,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'figureSources',
    describe: `where single figures came from when it differs from the data source; ${accepted}`,
    value: show,
    display: show,
    write(row, text) {
      const parts = text
        .split(';')
        .map((p) => p.trim())
        .filter((p) => p !== '');
      if (parts.length === 0) {
        const { figureSources: _gone, ...rest } = row;
        return { row: rest };
      }
      const out: Record<string, string> = {};
      for (const part of parts) {
        const at = part.indexOf(':');
        const field = at > 0 ? byWord.get(part.slice(0, at).trim().toLowerCase()) : undefined;
        const source = at > 0 ? part.slice(at + 1).trim() : '';
        if (!field || source === '')
          return { row, failure: { problem: `has "${part}", which names no column and source`, accepted } };
        out[field] = source;
      }
      return { row: { ...row, figureSources: out } };
    },
  };
}

/** Every column of the register grid. */
export function registerColumns(separator: DecimalSeparator): LedgerColumn<RegisterMachine>[] {
  const columns = baseColumns(separator);
  const at = columns.findIndex((c) => c.id === 'source') + 1;
  return [...columns.slice(0, at), fitHeader(figureSourcesColumn(columns)), ...columns.slice(at)];
}

function baseColumns(separator: DecimalSeparator): LedgerColumn<RegisterMachine>[] {
  const ctx = { separator };
  return [
    textColumn<RegisterMachine>({
      id: 'label',
      header: 'Machine',
      field: 'label',
      width: 220,
      required: 'type a name for the machine',
    }),
    textColumn<RegisterMachine>({
      id: 'category',
      header: 'Category',
      field: 'category',
      width: 140,
      describe: 'your own grouping, e.g. "excavator 20 t"',
    }),
    directiveTypeColumn() as unknown as LedgerColumn<RegisterMachine>,
    numberColumn<RegisterMachine>(
      {
        id: 'lwaDb',
        header: 'LWA',
        unit: 'dB',
        field: 'lwaDb',
        optional: true,
        width: 84,
        rule: { accepted: 'use dB, e.g. 104.5', min: 0, max: 200, suffixes: ['dB(A)', 'dBA', 'dB'] },
      },
      separator,
    ),
    choiceColumn<RegisterMachine, RegisterMachine['declaration']>(
      { id: 'declaration', header: 'Declared as', field: 'declaration', width: 130 },
      DECLARATIONS,
    ),
    numberColumn<RegisterMachine>(
      {
        id: 'uncertaintyDb',
        header: 'K',
        unit: 'dB',
        field: 'uncertaintyDb',
        optional: true,
        width: 64,
        rule: { accepted: 'use an uncertainty in dB, e.g. 2.5', min: 0, max: 10, suffixes: ['dB'] },
      },
      separator,
    ),
    numberColumn<RegisterMachine>(
      {
        id: 'netPowerKw',
        header: 'Net power',
        unit: 'kW',
        field: 'netPowerKw',
        optional: true,
        width: 104,
        rule: { accepted: 'use kW above 0, e.g. 110', min: 0, minExclusive: true, suffixes: ['kW'] },
      },
      separator,
    ),
    directiveQuantityColumn(separator) as unknown as LedgerColumn<RegisterMachine>,
    termColumn('price', 'Price', 'purchase.price', ctx, MONEY, 110),
    termColumn('resaleValue', 'Resale value', 'purchase.resaleValue', ctx, MONEY, 120),
    termColumn(
      'life',
      'Life',
      'purchase.life',
      ctx,
      {
        accepted: 'use a life above 0 (years, or working days when the unit says so), e.g. 8',
        min: 0,
        minExclusive: true,
      },
      74,
    ),
    choiceColumn<RegisterMachine, PurchaseTerms['lifeUnit']>(
      {
        id: 'lifeUnit',
        header: 'Life in',
        field: 'purchase.lifeUnit',
        width: 120,
        describe: 'years, or working days (converted with your working days a year)',
      },
      LIFE_UNITS,
      (row) => tidyTerms(row),
    ),
    numberColumn<RegisterMachine>(
      {
        id: 'runningPerDay',
        header: 'Running per day',
        field: 'runningPerDay',
        width: 136,
        rule: MONEY,
        describe: 'fuel or energy per working day',
      },
      separator,
    ),
    termColumn('dayRate', 'Hire per day', 'hire.dayRate', ctx),
    termColumn('weekRate', 'Hire per week', 'hire.weekRate', ctx),
    termColumn('monthRate', 'Hire per month', 'hire.monthRate', ctx, MONEY, 124),
    numberColumn<RegisterMachine>(
      {
        id: 'operatorLpaDb',
        header: 'Operator LpA',
        unit: 'dB',
        field: 'operatorLpaDb',
        optional: true,
        width: 124,
        rule: { accepted: 'use dB, e.g. 82.5', min: 0, max: 160, suffixes: ['dB(A)', 'dBA', 'dB'] },
      },
      separator,
    ),
    choiceColumn<RegisterMachine, RegisterMachine['energy']>(
      { id: 'energy', header: 'Power source', field: 'energy', width: 110 },
      ENERGIES,
    ),
    choiceColumn<RegisterMachine, RegisterMachine['character']>(
      { id: 'character', header: 'Character', field: 'character', width: 104 },
      CHARACTERS,
    ),
    choiceColumn<RegisterMachine, RegisterMachine['lwaOrigin']>(
      { id: 'lwaOrigin', header: 'LWA obtained as', field: 'lwaOrigin', width: 140 },
      ORIGINS,
    ),
    bandsColumn(separator),
    textColumn<RegisterMachine>({
      id: 'source',
      header: 'Data source',
      field: 'source',
      width: 200,
      describe: 'where the figures came from: data sheet, marking, supplier’s quote…',
    }),
    {
      ...textColumn<RegisterMachine>({ id: 'id', header: 'Id', field: 'id', width: 70 }),
      editable: false,
      kind: 'computed' as const,
      describe: 'the register id a project’s copy remembers',
    },
  ].map(fitHeader);
}

/** A machine with nothing known yet: the comparison reads "not known" until it is filled in. */
export function blankMachine(id: string): RegisterMachine {
  return {
    id,
    label: '',
    category: '',
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: '',
    runningPerDay: 0,
  };
}

/** The register grid's table, in the shape the project's table helpers take. */
export function registerTable(separator: DecimalSeparator): TableDefinition<RegisterMachine> {
  return {
    list: 'machines' as TableList,
    label: 'Machine register',
    rows: (owner) => (owner as unknown as Register).machines,
    columns: registerColumns(separator),
    blankRow: (_owner, taken) => blankMachine(nextId('m', taken)),
    withRows: (owner, rows) => ({ ...(owner as unknown as Register), machines: rows }) as unknown as Project,
  };
}

/** The register with one user action's cell edits applied (the input is not changed). O(changes + machines). */
export function applyRegisterEdits(
  register: Register,
  table: TableDefinition<RegisterMachine>,
  changes: readonly CellChange[],
): Register {
  return applyCellTexts(register as unknown as Project, table, changes) as unknown as Register;
}

/** The register without these machines (and their unread cells). */
export function deleteMachines(
  register: Register,
  table: TableDefinition<RegisterMachine>,
  ids: readonly string[],
): Register {
  return deleteTableRows(register as unknown as Project, table, ids) as unknown as Register;
}

/** Problem messages by cell: unread text, then validation problems ("$.machines[2].lwaDb"). */
export function registerProblems(
  register: Register,
  table: TableDefinition<RegisterMachine>,
  problems: readonly DataProblem[],
): CellProblems {
  return tableProblems(register as unknown as Project, table, problems);
}
