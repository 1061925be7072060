/**
 * The workbook's look: header and section styles, the fill that marks input cells, the fill
 * of values the core computed and the workbook takes as given, number formats, print setup.
 * Colours are this project's own: a deep teal header, pale yellow inputs, pale blue core
 * values, a soft red for levels over their limit, amber for a stand-in sound power.
 */
import type { Alignment, Border, Fill, Font, PageSetup, Worksheet } from 'exceljs';

const solid = (argb: string): Fill => ({ type: 'pattern', pattern: 'solid', fgColor: { argb } });

/** Fill of cells a reviewer may change: the project's inputs and the chosen candidate per duty. */
export const INPUT_FILL = solid('FFFFF4C2');
/** Fill of values computed by the core and written as given (path attenuation terms, stand-ins). */
export const CORE_FILL = solid('FFDCEBF7');
/** Fill of a table's header row. */
export const HEADER_FILL = solid('FF1F5C5C');
/** Fill of a level over its limit (conditional format). */
export const OVER_FILL = solid('FFF4C7C3');
/** Fill of a stand-in sound power (the permissible level used where none is declared). */
export const STAND_IN_FILL = solid('FFFFD98A');
/** Fill of a section title row. */
export const SECTION_FILL = solid('FFE3EFEC');

export const HEADER_FONT: Partial<Font> = { bold: true, color: { argb: 'FFFFFFFF' } };
export const TITLE_FONT: Partial<Font> = { bold: true, size: 14, color: { argb: 'FF1F5C5C' } };
export const SECTION_FONT: Partial<Font> = { bold: true, size: 11, color: { argb: 'FF1F3F3F' } };
export const NOTE_FONT: Partial<Font> = { italic: true, size: 9, color: { argb: 'FF4A4A4A' } };
export const OVER_FONT: Partial<Font> = { bold: true, color: { argb: 'FF8B1A10' } };
export const STAND_IN_FONT: Partial<Font> = { bold: true, color: { argb: 'FF6B4200' } };

const thin: Partial<Border> = { style: 'thin', color: { argb: 'FFB8C4C4' } };
export const CELL_BORDER = { top: thin, left: thin, bottom: thin, right: thin };

export const HEADER_ALIGNMENT: Partial<Alignment> = { vertical: 'middle', horizontal: 'center', wrapText: true };

/** Level, dB, one decimal: 63.2 dB. */
export const DB_FORMAT = '0.0 "dB"';
/** A signed dB term or margin: +3.0 dB / −5.0 dB. */
export const SIGNED_DB_FORMAT = '+0.0 "dB";-0.0 "dB";0.0 "dB"';
/** A stand-in level: the number reads "101.0 dB STAND-IN" wherever it is shown. */
export const STAND_IN_DB_FORMAT = '0.0 "dB STAND-IN"';
/** Hours, one decimal. */
export const HOURS_FORMAT = '0.0 "h"';
/** Distance, m. */
export const METRE_FORMAT = '0.0 "m"';
/** Time of day. [hh] so 24:00 shows as 24:00. */
export const TIME_FORMAT = '[hh]:mm';
/** Plain number with up to three decimals. */
export const PLAIN_FORMAT = 'General';

const CURRENCY_SYMBOLS: Record<string, string> = { GBP: '£', EUR: '€', USD: '$', JPY: '¥' };

/**
 * Number format for money in the project's currency: the symbol when it has a common one,
 * else the ISO 4217 code after the amount; two decimals (none for JPY).
 * @example moneyFormat('GBP') // '"£"#,##0.00;-"£"#,##0.00'
 */
export function moneyFormat(currency: string): string {
  const code = /^[A-Z]{3}$/.test(currency) ? currency : 'XXX';
  const decimals = code === 'JPY' ? '#,##0' : '#,##0.00';
  const symbol = CURRENCY_SYMBOLS[code];
  return symbol ? `"${symbol}"${decimals};-"${symbol}"${decimals}` : `${decimals} "${code}";-${decimals} "${code}"`;
}

/** Styles one header row from column `first` to `last`. */
export function styleHeaderRow(ws: Worksheet, row: number, first: number, last: number): void {
  const r = ws.getRow(row);
  r.height = 30;
  for (let c = first; c <= last; c++) {
    const cell = r.getCell(c);
    cell.fill = HEADER_FILL;
    cell.font = HEADER_FONT;
    cell.alignment = HEADER_ALIGNMENT;
    cell.border = CELL_BORDER;
  }
}

/** Writes a sheet title and a note under it (rows 1 and 2). */
export function writeTitle(ws: Worksheet, title: string, note: string): void {
  const t = ws.getCell(1, 1);
  t.value = title;
  t.font = TITLE_FONT;
  const n = ws.getCell(2, 1);
  n.value = note;
  n.font = NOTE_FONT;
}

/** Writes a section title on a row, shaded across `width` columns. */
export function writeSection(ws: Worksheet, row: number, title: string, width: number): void {
  const r = ws.getRow(row);
  for (let c = 1; c <= width; c++) r.getCell(c).fill = SECTION_FILL;
  const cell = r.getCell(1);
  cell.value = title;
  cell.font = SECTION_FONT;
}

/**
 * Page setup every sheet is created with: A4, fitted to one page wide. The streaming writer
 * writes a sheet's "fit to page" flag when the sheet is created, so it must be known then;
 * printSetup completes the rest when the sheet is written.
 */
export const FIT_TO_WIDTH: Partial<PageSetup> = { paperSize: 9, fitToPage: true, fitToWidth: 1, fitToHeight: 0 };

/**
 * Print setup: A4, fitted to one page wide, the given rows repeated at the top of every page.
 * Landscape when the sheet is wide.
 */
export function printSetup(ws: Worksheet, options: { landscape: boolean; repeatRows?: [number, number] }): void {
  ws.pageSetup = {
    ...ws.pageSetup,
    paperSize: 9, // A4 in the OOXML paper-size table
    orientation: options.landscape ? 'landscape' : 'portrait',
    fitToPage: true,
    fitToWidth: 1,
    fitToHeight: 0,
    margins: { left: 0.5, right: 0.5, top: 0.6, bottom: 0.6, header: 0.3, footer: 0.3 },
  };
  if (options.repeatRows) ws.pageSetup.printTitlesRow = `${options.repeatRows[0]}:${options.repeatRows[1]}`;
  ws.headerFooter = { oddFooter: '&L&A&RPage &P of &N' };
}
