/**
 * The columns of the register sheet: header words, where the value lives in a register
 * machine (a dotted path) and whether it is a number. The same list writes the sheet and
 * reads it back, so a register round-trips through its workbook.
 */
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';

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
}

const bands: RegisterColumn[] = OCTAVE_BANDS_HZ.map((hz, i) => ({
  header: `Lw ${hz >= 1000 ? `${hz / 1000}k` : hz} Hz (dB)`,
  path: `bandsDb.${i}`,
  kind: 'number',
  width: 10,
}));

export const REGISTER_COLUMNS: readonly RegisterColumn[] = [
  { header: 'Machine ID', path: 'id', kind: 'text', width: 10 },
  { header: 'Machine', path: 'label', kind: 'text', width: 40 },
  { header: 'Category', path: 'category', kind: 'text', width: 18 },
  { header: 'Directive type', path: 'directiveCategory', kind: 'text', width: 16 },
  { header: 'Net power (kW)', path: 'netPowerKw', kind: 'number', width: 10 },
  { header: 'Size for limit', formerly: ['Directive quantity'], path: 'directiveQuantity', kind: 'number', width: 11 },
  { header: 'LWA (dB)', path: 'lwaDb', kind: 'number', width: 9 },
  { header: 'Declared as', path: 'declaration', kind: 'text', width: 12 },
  { header: 'K (dB)', path: 'uncertaintyDb', kind: 'number', width: 7 },
  { header: 'LWA obtained as', formerly: ['LWA from'], path: 'lwaOrigin', kind: 'text', width: 14 },
  { header: 'Operator LpA (dB)', path: 'operatorLpaDb', kind: 'number', width: 10 },
  { header: 'Character', path: 'character', kind: 'text', width: 10 },
  { header: 'Power source', formerly: ['Energy'], path: 'energy', kind: 'text', width: 10 },
  { header: 'Price', path: 'purchase.price', kind: 'number', width: 13, money: true },
  { header: 'Resale value', path: 'purchase.resaleValue', kind: 'number', width: 13, money: true },
  { header: 'Life', path: 'purchase.life', kind: 'number', width: 8 },
  { header: 'Life unit', path: 'purchase.lifeUnit', kind: 'text', width: 12 },
  { header: 'Running per day', path: 'runningPerDay', kind: 'number', width: 11, money: true },
  { header: 'Hire per day', path: 'hire.dayRate', kind: 'number', width: 11, money: true },
  { header: 'Hire per week', path: 'hire.weekRate', kind: 'number', width: 11, money: true },
  { header: 'Hire per month', path: 'hire.monthRate', kind: 'number', width: 11, money: true },
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
