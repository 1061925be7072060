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
import { fitHeader, nextId } from '../tables/column.ts';
import { textColumn } from '../tables/cells.ts';
import type { DecimalSeparator } from '../tables/parse.ts';
import { bandsColumn, catalogueChoiceColumn, catalogueNumberColumn } from '../tables/catalogue-columns.ts';
import {
  CHARACTER,
  DECLARATION,
  ENERGY,
  LIFE_UNIT,
  LWA_ORIGIN,
  MACHINE_NUMBERS,
  lifeFieldOf,
} from '../../ledger/catalogue/index.ts';
import { directiveQuantityColumn, directiveTypeColumn } from '../tables/check-columns.ts';
import { applyCellTexts, deleteTableRows, type CellChange } from '../tables/apply.ts';
import { tableProblems, type CellProblems } from '../tables/problems.ts';

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

/**
 * The life of a bought machine, read with the catalogue's range for the unit the row keeps it
 * in (years, or working days), so "8 years" or "1600 days" is read and a life in days typed
 * into a row kept in years is refused with the years' range.
 */
function lifeColumn(separator: DecimalSeparator): LedgerColumn<RegisterMachine> {
  const place = { optional: true, width: 74, id: 'life' } as const;
  const inUnit = (unit: unknown) =>
    catalogueNumberColumn<RegisterMachine>(lifeFieldOf(unit), separator, place, (row) => tidyTerms(row));
  const years = inUnit('years');
  const workingDays = inUnit('working-days');
  return {
    ...years,
    unit: undefined,
    write: (row, text) => (row.purchase?.lifeUnit === 'working-days' ? workingDays : years).write!(row, text),
  };
}

/** A money term kept in the register's own place ("purchase.price", "hire.dayRate"). */
function termColumn(
  key: 'price' | 'resaleValue' | 'dayRate' | 'weekRate' | 'monthRate',
  header: string,
  path: string,
  ctx: { separator: DecimalSeparator; currency: string },
  width = 104,
): LedgerColumn<RegisterMachine> {
  return catalogueNumberColumn<RegisterMachine>(
    MACHINE_NUMBERS[key],
    ctx.separator,
    { id: key, header, path, optional: true, width, ...(ctx.currency ? { unit: ctx.currency } : {}) },
    (row) => tidyTerms(row),
  );
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
export function registerColumns(separator: DecimalSeparator, currency = ''): LedgerColumn<RegisterMachine>[] {
  const columns = baseColumns(separator, currency);
  const at = columns.findIndex((c) => c.id === 'source') + 1;
  return [...columns.slice(0, at), fitHeader(figureSourcesColumn(columns)), ...columns.slice(at)];
}

function baseColumns(separator: DecimalSeparator, currency: string): LedgerColumn<RegisterMachine>[] {
  const ctx = { separator, currency };
  return [
    textColumn<RegisterMachine>({
      id: 'label',
      header: 'Machine',
      field: 'label',
      width: 220,
      required: 'type a name for the machine',
      describe: 'the machine’s name as you will recognise it, e.g. "Mini excavator 1.9 t, electric"',
    }),
    textColumn<RegisterMachine>({
      id: 'category',
      header: 'Category',
      field: 'category',
      width: 140,
      describe: 'your own grouping, e.g. "excavator 20 t"',
    }),
    directiveTypeColumn() as unknown as LedgerColumn<RegisterMachine>,
    catalogueNumberColumn<RegisterMachine>(MACHINE_NUMBERS.lwaDb, separator, { optional: true, width: 84 }),
    catalogueChoiceColumn<RegisterMachine, RegisterMachine['declaration']>(DECLARATION, 130),
    catalogueNumberColumn<RegisterMachine>(MACHINE_NUMBERS.uncertaintyDb, separator, { optional: true, width: 64 }),
    catalogueNumberColumn<RegisterMachine>(MACHINE_NUMBERS.netPowerKw, separator, { optional: true, width: 104 }),
    directiveQuantityColumn(separator) as unknown as LedgerColumn<RegisterMachine>,
    termColumn('price', 'Price', 'purchase.price', ctx, 110),
    termColumn('resaleValue', 'Resale value', 'purchase.resaleValue', ctx, 120),
    lifeColumn(separator),
    catalogueChoiceColumn<RegisterMachine, PurchaseTerms['lifeUnit']>(LIFE_UNIT, 120, (row) => tidyTerms(row)),
    catalogueNumberColumn<RegisterMachine>(MACHINE_NUMBERS.runningPerDay, separator, {
      width: 136,
      ...(currency ? { unit: currency } : {}),
    }),
    termColumn('dayRate', 'Hire per day', 'hire.dayRate', ctx),
    termColumn('weekRate', 'Hire per week', 'hire.weekRate', ctx),
    termColumn('monthRate', 'Hire per month', 'hire.monthRate', ctx, 124),
    catalogueNumberColumn<RegisterMachine>(MACHINE_NUMBERS.operatorLpaDb, separator, { optional: true, width: 124 }),
    catalogueChoiceColumn<RegisterMachine, RegisterMachine['energy']>(ENERGY, 110),
    catalogueChoiceColumn<RegisterMachine, RegisterMachine['character']>(CHARACTER, 104),
    catalogueChoiceColumn<RegisterMachine, RegisterMachine['lwaOrigin']>(LWA_ORIGIN, 140),
    bandsColumn<RegisterMachine>(separator),
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
export function registerTable(separator: DecimalSeparator, currency = ''): TableDefinition<RegisterMachine> {
  return {
    list: 'machines' as TableList,
    label: 'Machine register',
    rows: (owner) => (owner as unknown as Register).machines,
    columns: registerColumns(separator, currency),
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
