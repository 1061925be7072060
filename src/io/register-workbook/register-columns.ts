/**
 * The columns of the register sheet: header words, where the value lives in a register
 * machine (a dotted path) and whether it is a number. The same list writes the sheet and
 * reads it back, so a register round-trips through its workbook. A machine's field takes its
 * header, range, unit words and choice words from the field catalogue (`ledger/catalogue`),
 * so the sheet reads "104 dB" or "measured + K" as the grid and the importer do; the
 * headers this sheet once wrote are still read back.
 */
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import {
  CHARACTER,
  DECLARATION,
  ENERGY,
  LIFE_UNIT,
  LWA_ORIGIN,
  MACHINE_NUMBERS as M,
  REGISTER_LIFE_ANY_UNIT,
  type ChoiceField,
  type NumberField,
} from '../../ledger/catalogue/index.ts';

export interface RegisterColumn {
  header: string;
  /** Dotted path in a RegisterMachine, e.g. "purchase.price", "bandsDb.3". */
  path: string;
  kind: 'text' | 'number';
  width: number;
  /** Headers earlier versions wrote, still read back. */
  formerly?: readonly string[];
  /** A money column (number format in the register's currency). */
  money?: boolean;
  /** The catalogue's number: its range, unit words and accepted words read a cell written as text. */
  number?: NumberField;
  /** The catalogue's choice: its values, labels and words read a cell. */
  choice?: ChoiceField;
}

/** A catalogue number's column; `header` replaces the catalogue's where the register's reads differently. */
function numberColumn(path: string, field: NumberField, width: number, formerly: readonly string[], header?: string) {
  const earlier = [...formerly, ...(field.formerHeaders ?? [])].filter((h) => h !== (header ?? field.workbookHeader));
  return {
    header: header ?? field.workbookHeader,
    path,
    kind: 'number',
    width,
    number: field,
    ...(earlier.length ? { formerly: earlier } : {}),
    ...(field.money ? { money: true } : {}),
  } satisfies RegisterColumn;
}

/** A catalogue choice's column. */
function choiceColumn(field: ChoiceField, width: number, formerly: readonly string[]): RegisterColumn {
  return {
    header: field.workbookHeader,
    path: field.path,
    kind: 'text',
    width,
    choice: field,
    formerly: [...formerly, ...(field.formerHeaders ?? [])],
  };
}

const bands: RegisterColumn[] = OCTAVE_BANDS_HZ.map((hz, i) => ({
  header: `Lw ${hz >= 1000 ? `${hz / 1000}k` : hz} Hz (dB)`,
  path: `bandsDb.${i}`,
  kind: 'number',
  width: 10,
  number: M.bandDb,
}));

export const REGISTER_COLUMNS: readonly RegisterColumn[] = [
  { header: 'Machine ID', path: 'id', kind: 'text', width: 10 },
  { header: 'Machine', path: 'label', kind: 'text', width: 40 },
  { header: 'Category', path: 'category', kind: 'text', width: 18 },
  { header: 'Directive type', path: 'directiveCategory', kind: 'text', width: 16 },
  numberColumn('netPowerKw', M.netPowerKw, 10, []),
  numberColumn('directiveQuantity', M.directiveQuantity, 11, ['Size for limit', 'Directive quantity']),
  numberColumn('lwaDb', M.lwaDb, 9, ['LWA (dB)']),
  choiceColumn(DECLARATION, 12, ['Declared as']),
  numberColumn('uncertaintyDb', M.uncertaintyDb, 7, ['K (dB)']),
  choiceColumn(LWA_ORIGIN, 14, ['LWA from']),
  numberColumn('operatorLpaDb', M.operatorLpaDb, 10, []),
  choiceColumn(CHARACTER, 10, ['Character']),
  choiceColumn(ENERGY, 10, []),
  numberColumn('purchase.price', M.price, 13, [], 'Price'),
  numberColumn('purchase.resaleValue', M.resaleValue, 13, [], 'Resale value'),
  // The widest of the life's two ranges reads the cell; validation then holds it to its unit's.
  numberColumn('purchase.life', REGISTER_LIFE_ANY_UNIT, 8, []),
  choiceColumn(LIFE_UNIT, 12, []),
  numberColumn('runningPerDay', M.runningPerDay, 11, [], 'Running per day'),
  numberColumn('hire.dayRate', M.dayRate, 11, [], 'Hire per day'),
  numberColumn('hire.weekRate', M.weekRate, 11, [], 'Hire per week'),
  numberColumn('hire.monthRate', M.monthRate, 11, [], 'Hire per month'),
  { header: 'Source', path: 'source', kind: 'text', width: 30 },
  { header: 'Sources of single figures', path: 'figureSources', kind: 'text', width: 34 },
  ...bands,
];

/** Reads a dotted path. */
export function getPath(target: unknown, path: string): unknown {
  let value: unknown = target;
  for (const part of path.split('.')) {
    if (value === null || typeof value !== 'object') return undefined;
    value = (value as Record<string, unknown>)[part];
  }
  return value;
}

/** Sets a dotted path, creating objects (and, for a numeric last part, arrays) on the way. */
export function setPath(target: Record<string, unknown>, path: string, value: unknown): void {
  const parts = path.split('.');
  let at: Record<string, unknown> = target;
  parts.slice(0, -1).forEach((part, i) => {
    const nextIsIndex = /^\d+$/.test(parts[i + 1] as string);
    if (typeof at[part] !== 'object' || at[part] === null) at[part] = nextIsIndex ? [] : {};
    at = at[part] as Record<string, unknown>;
  });
  at[parts[parts.length - 1] as string] = value;
}

/** "lwaDb: data sheet; purchase.price: quotation" ↔ { lwaDb: 'data sheet', 'purchase.price': 'quotation' }. */
export function figureSourcesText(sources: Record<string, string> | undefined): string {
  return sources
    ? Object.entries(sources)
        .map(([k, v]) => `${k}: ${v}`)
        .join('; ')
    : '';
}

export function figureSourcesFromText(text: string): Record<string, string> | undefined {
  const out: Record<string, string> = {};
  for (const part of text.split(';')) {
    const at = part.indexOf(':');
    if (at <= 0) continue;
    out[part.slice(0, at).trim()] = part.slice(at + 1).trim();
  }
  return Object.keys(out).length ? out : undefined;
}
