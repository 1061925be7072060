/**
 * The columns of the candidates table on the inputs sheet, in order, with how each reads
 * its value from a candidate and writes it back. The same list writes the table and reads
 * it back, so an exported candidate list returns unchanged.
 */
import type { Candidate } from '../../ledger/model/model.ts';
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import {
  CHARACTER,
  COST_KIND,
  DECLARATION,
  ENERGY,
  LWA_ORIGIN,
  MACHINE_NUMBERS,
} from '../../ledger/catalogue/index.ts';

export type ColumnKind = 'text' | 'number' | 'boolean';

export interface CandidateColumn {
  /** Field name as used in unread-cell keys ("candidates/<id>/<field>"). */
  field: string;
  /** Header with its unit. */
  header: string;
  /** Headers earlier versions wrote, still read back. */
  formerly?: readonly string[];
  width: number;
  kind: ColumnKind;
  /** Accepted words for a text column with a fixed list. */
  choices?: readonly string[];
  get(candidate: Candidate): string | number | boolean | undefined;
  /** Writes a read value into a candidate under construction (plain record). */
  set(target: Record<string, unknown>, value: string | number | boolean): void;
}

const field = (name: string) => (t: Record<string, unknown>, v: unknown) => {
  t[name] = v;
};

const costField = (name: string) => (t: Record<string, unknown>, v: unknown) => {
  const cost = (t.cost ?? {}) as Record<string, unknown>;
  cost[name] = v;
  t.cost = cost;
};

function plain(
  fieldName: keyof Candidate,
  header: string,
  width: number,
  kind: ColumnKind,
  choices?: readonly string[],
): CandidateColumn {
  return {
    field: fieldName,
    header,
    width,
    kind,
    ...(choices ? { choices } : {}),
    get: (c) => c[fieldName] as string | number | boolean | undefined,
    set: field(fieldName),
  };
}

function costColumn(name: string, header: string, kind: 'hire' | 'purchase'): CandidateColumn {
  return {
    field: name,
    header,
    width: 11,
    kind: 'number',
    get: (c) =>
      c.cost?.kind === kind
        ? ((c.cost as unknown as Record<string, number | undefined>)[name] ?? undefined)
        : undefined,
    set: costField(name),
  };
}

/** The band columns, 63 Hz … 8 kHz: octave-band sound power Lw, dB (unweighted). */
const bandColumns: CandidateColumn[] = OCTAVE_BANDS_HZ.map((hz, i) => ({
  field: `bandsDb.${i}`,
  header: `Lw ${hz >= 1000 ? `${hz / 1000} k` : hz} Hz (dB)`,
  width: 9,
  kind: 'number' as const,
  get: (c: Candidate) => (Array.isArray(c.bandsDb) ? c.bandsDb[i] : undefined),
  set: (t: Record<string, unknown>, v: unknown) => {
    const bands = (Array.isArray(t.bandsDb) ? t.bandsDb : []) as unknown[];
    bands[i] = v;
    t.bandsDb = bands;
  },
}));

/** A column of a catalogue field: its workbook header and the headers it once had. */
function fromCatalogue(
  fieldName: keyof Candidate,
  field: { workbookHeader: string; formerHeaders?: readonly string[] },
  width: number,
  kind: ColumnKind,
  choices?: readonly { value: string }[],
): CandidateColumn {
  return {
    ...plain(
      fieldName,
      field.workbookHeader,
      width,
      kind,
      choices?.map((c) => c.value),
    ),
    ...(field.formerHeaders ? { formerly: field.formerHeaders } : {}),
  };
}

const M = MACHINE_NUMBERS;

/** Every column of the candidates table, in order. Headers of the machine's fields come from the field catalogue. */
export const CANDIDATE_COLUMNS: readonly CandidateColumn[] = [
  plain('id', 'Candidate ID', 12, 'text'),
  plain('dutyId', 'Duty ID', 12, 'text'),
  plain('label', 'Machine', 26, 'text'),
  plain('category', 'Category', 16, 'text'),
  fromCatalogue('lwaDb', M.lwaDb, 10, 'number'),
  fromCatalogue('declaration', DECLARATION, 13, 'text', DECLARATION.choices),
  fromCatalogue('uncertaintyDb', M.uncertaintyDb, 10, 'number'),
  fromCatalogue('lwaOrigin', LWA_ORIGIN, 14, 'text', LWA_ORIGIN.choices),
  plain('source', 'Source of LWA', 24, 'text'),
  fromCatalogue('character', CHARACTER, 12, 'text', CHARACTER.choices),
  fromCatalogue('energy', ENERGY, 10, 'text', ENERGY.choices),
  {
    field: 'cost.kind',
    header: COST_KIND.workbookHeader,
    width: 11,
    kind: 'text',
    choices: COST_KIND.choices.map((c) => c.value),
    get: (c) => c.cost?.kind,
    set: costField('kind'),
  },
  costColumn('dayRate', M.dayRate.workbookHeader, 'hire'),
  costColumn('weekRate', M.weekRate.workbookHeader, 'hire'),
  costColumn('monthRate', M.monthRate.workbookHeader, 'hire'),
  costColumn('price', M.price.workbookHeader, 'purchase'),
  costColumn('lifeDays', M.lifeDays.workbookHeader, 'purchase'),
  costColumn('resaleValue', M.resaleValue.workbookHeader, 'purchase'),
  fromCatalogue('runningPerDay', M.runningPerDay, 11, 'number'),
  fromCatalogue('fixedCharges', M.fixedCharges, 11, 'number'),
  plain('directiveCategory', 'Directive 2000/14/EC type', 16, 'text'),
  fromCatalogue('netPowerKw', M.netPowerKw, 9, 'number'),
  fromCatalogue('directiveQuantity', M.directiveQuantity, 11, 'number'),
  fromCatalogue('operatorLpaDb', M.operatorLpaDb, 9, 'number'),
  fromCatalogue('operatorHoursPerDay', M.operatorHoursPerDay, 10, 'number'),
  plain('pinned', 'Pinned (must use)', 9, 'boolean'),
  plain('excluded', 'Excluded (must not use)', 9, 'boolean'),
  ...bandColumns,
];

/** Index (0-based) of a column by field name. */
export function candidateColumnIndex(fieldName: string): number {
  const i = CANDIDATE_COLUMNS.findIndex((c) => c.field === fieldName);
  if (i < 0) throw new Error(`no candidate column ${fieldName}`);
  return i;
}

/** Money columns (formatted in the project currency). */
export const MONEY_FIELDS: ReadonlySet<string> = new Set([
  'dayRate',
  'weekRate',
  'monthRate',
  'price',
  'resaleValue',
  'runningPerDay',
  'fixedCharges',
]);
