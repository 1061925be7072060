/**
 * The register workbook: the buyer's register (one row per machine, every figure and its
 * source), the buyer's shortlist (the comparison without a site: whole-life cost, hire,
 * directive margin, footprint, exposure, against the reference machine, machines no other
 * beats on both marked) with the method and its limits, and the fleet against a criterion.
 * Values as the ledger computed them (no formulas). Pure TypeScript on exceljs; the app
 * loads it with a dynamic import().
 */
import ExcelJS from 'exceljs';
import type { Register } from '../../ledger/register/model.ts';
import type { Comparison } from '../../ledger/register/compare.ts';
import type { FleetView } from '../../ledger/register/fleet-view.ts';
import { FOOTPRINT_METHOD } from '../../ledger/register/footprint.ts';
import { EXPOSURE_CAUTION } from '../../ledger/checks/operator-exposure.ts';
import {
  DB_FORMAT,
  METRE_FORMAT,
  NOTE_FONT,
  STAND_IN_FONT,
  moneyFormat,
  styleHeaderRow,
  writeTitle,
} from '../workbook/styles.ts';
import { REGISTER_COLUMNS, figureSourcesText, getPath } from './register-columns.ts';
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

export const REGISTER_SHEET = 'register';
export const BUYER_SHORTLIST_SHEET = 'buyer shortlist';
export const FLEET_SHEET = 'fleet';
/** Row of the register sheet's headers (title and note above it). */
export const REGISTER_HEADER_ROW = 4;

export interface RegisterWorkbookOptions {
  comparison?: Comparison;
  fleet?: FleetView;
  created?: Date;
}

const CAUTION =
  'Comparison without a site: a prediction at real receivers needs the project view (ISO 9613-2 quotes about ±3 dB). A competent acoustician and the local authority decide what is acceptable.';

function writeRegisterSheet(wb: ExcelJS.Workbook, register: Register): void {
  const ws = wb.addWorksheet(REGISTER_SHEET, { views: [{ state: 'frozen', ySplit: REGISTER_HEADER_ROW, xSplit: 2 }] });
  writeTitle(
    ws,
    `Machine register: ${register.name}`,
    `Currency ${register.currency}; ${register.settings.workingDaysPerYear} working days a year; operator ${register.settings.operatorHoursPerDay} h a day. Yellow cells are inputs; a cell that could not be read holds the text as typed.`,
  );
  ws.getCell(3, 1).value = 'Working days a year';
  ws.getCell(3, 2).value = register.settings.workingDaysPerYear;
  ws.getCell(3, 3).value = 'Operator hours a day';
  ws.getCell(3, 4).value = register.settings.operatorHoursPerDay;
  const money = moneyFormat(register.currency);
  REGISTER_COLUMNS.forEach((col, i) => {
    ws.getCell(REGISTER_HEADER_ROW, i + 1).value = col.header;
    ws.getColumn(i + 1).width = col.width;
  });
  styleHeaderRow(ws, REGISTER_HEADER_ROW, 1, REGISTER_COLUMNS.length);
  const unread = register.unreadCells ?? {};
  register.machines.forEach((m, r) => {
    const row = ws.getRow(REGISTER_HEADER_ROW + 1 + r);
    REGISTER_COLUMNS.forEach((col, i) => {
      const cell = row.getCell(i + 1);
      const typed = unread[`machines/${m.id}/${col.path}`];
      if (typed !== undefined) {
        cell.value = typed;
        return;
      }
      const value = col.path === 'figureSources' ? figureSourcesText(m.figureSources) : getPath(m, col.path);
      if (value === undefined || value === null || (typeof value === 'number' && !Number.isFinite(value))) return;
      cell.value = value as ExcelJS.CellValue;
      if (col.money) cell.numFmt = money;
    });
  });
}

const SHORTLIST_HEADERS = [
  'Machine ID',
  'Machine',
  'Directive type',
  'LWA (dB)',
  'Stand-in',
  'Permissible (dB)',
  'Margin under permissible (dB)',
  'Footprint distance (m)',
  'Footprint area (m²)',
  'Owned per year',
  'Hired per year',
  'Cost compared per year',
  'dB quieter than reference',
  'Footprint reduction (m²)',
  'Footprint reduction (%)',
  'Extra cost per year',
  'dB per 1,000 a year',
  'm² per 1,000 a year',
  'Operator L_EX,8h (dB(A))',
  'No other beats it on cost and LWA',
  'Rank by cost compared (cheapest 1)',
  'Rank by LWA (quietest 1)',
  'Notes',
];

/**
 * Places of the values, 1 for the least; equal values share a place (1, 2, 2, 4); a value
 * not known has none (null). O(n log n).
 * @example ranks([300, 100, 200, NaN]) // [3, 1, 2, null]
 */
export function ranks(values: readonly number[]): (number | null)[] {
  const known = values.filter((v) => Number.isFinite(v)).sort((a, b) => a - b);
  return values.map((v) => (Number.isFinite(v) ? known.indexOf(v) + 1 : null));
}

function writeShortlistSheet(wb: ExcelJS.Workbook, c: Comparison): void {
  const ws = wb.addWorksheet(BUYER_SHORTLIST_SHEET, { views: [{ state: 'frozen', ySplit: 6, xSplit: 2 }] });
  const reference = c.rows.find((r) => r.isReference);
  writeTitle(
    ws,
    'Buyer’s shortlist (no site)',
    `Criterion ${c.criterionDb} dB L_Aeq at ${c.onTimePct} % on-time; ${c.workingDaysPerYear} working days a year; operator ${c.operatorHoursPerDay} h a day; cost compared: ${c.costBasis === 'owned' ? 'owning' : 'hiring'}; reference machine: ${reference ? reference.label : 'none'}.`,
  );
  ws.getCell(3, 1).value = FOOTPRINT_METHOD;
  ws.getCell(3, 1).font = NOTE_FONT;
  ws.getCell(4, 1).value =
    `Whole-life cost per working year = (price − resale value) / life in years + running cost per day × working days a year; a life in working days is divided by the working days a year. Hire: the cheapest mix of 28-day months, 7-day weeks and days for the working days, plus running. ${CAUTION} ${EXPOSURE_CAUTION}`;
  ws.getCell(4, 1).font = NOTE_FONT;
  SHORTLIST_HEADERS.forEach((h, i) => (ws.getCell(6, i + 1).value = h));
  styleHeaderRow(ws, 6, 1, SHORTLIST_HEADERS.length);
  const money = moneyFormat(c.currency);
  const fin = (x: number | undefined) => (x === undefined || !Number.isFinite(x) ? null : x);
  const costRank = ranks(c.rows.map((r) => r.costPerYear));
  const lwaRank = ranks(c.rows.map((r) => r.lwaDb));
  c.rows.forEach((r, k) => {
    const a = r.againstReference;
    const notes = [
      r.isReference ? 'reference' : '',
      a?.freeWin ? FLAG_WORDS.freeWin : '',
      r.directiveNote ?? '',
      r.lwaExplanation,
    ]
      .filter(Boolean)
      .join('; ');
    const values = [
      r.machineId,
      r.label,
      r.directiveCategory ?? '',
      fin(r.lwaDb),
      r.standIn ? 'STAND-IN' : '',
      fin(r.permissibleDb),
      fin(r.directiveMarginDb),
      fin(r.footprint.radiusM),
      fin(r.footprint.areaM2),
      fin(r.cost.ownedPerYear),
      fin(r.cost.hiredPerYear),
      fin(r.costPerYear),
      fin(a?.dbReduction),
      fin(a?.areaReductionM2),
      fin(a?.areaReductionPct),
      fin(a?.extraCostPerYear),
      fin(a?.dbPerThousand),
      fin(a?.m2PerThousand),
      fin(r.exposure?.dailyExposureDb),
      r.nonDominated ? 'yes' : '',
      costRank[k] ?? null,
      lwaRank[k] ?? null,
      notes,
    ];
    const row = ws.getRow(7 + k);
    values.forEach((v, i) => (row.getCell(i + 1).value = v));
    for (const col of [4, 6, 7, 13, 19]) row.getCell(col).numFmt = DB_FORMAT;
    row.getCell(8).numFmt = METRE_FORMAT;
    row.getCell(9).numFmt = '#,##0';
    for (const col of [10, 11, 12, 16]) row.getCell(col).numFmt = money;
    for (const col of [14]) row.getCell(col).numFmt = '#,##0';
    for (const col of [15, 17, 18]) row.getCell(col).numFmt = '0.0';
    if (r.standIn) row.getCell(5).font = STAND_IN_FONT;
  });
  ws.getColumn(2).width = 40;
  for (let i = 3; i <= SHORTLIST_HEADERS.length; i++) ws.getColumn(i).width = 13;
  ws.getColumn(SHORTLIST_HEADERS.length).width = 50;
}

function writeFleetSheet(wb: ExcelJS.Workbook, v: FleetView, currency: string): void {
  const ws = wb.addWorksheet(FLEET_SHEET, { views: [{ state: 'frozen', ySplit: 4 }] });
  writeTitle(
    ws,
    `Fleet against ${v.criterionLwaDb} dB LWA`,
    'Machines whose guaranteed LWA is above the criterion, type by type, and the cost of replacing each with the register machine of the same type that meets it at the lowest purchase price (resale of the old machine not counted).',
  );
  const headers = [
    'Type',
    'Machines',
    'Over the criterion',
    'LWA not known',
    'Machines over',
    'Replacement',
    'Replacement price',
    'Cost of replacing',
  ];
  headers.forEach((h, i) => (ws.getCell(4, i + 1).value = h));
  styleHeaderRow(ws, 4, 1, headers.length);
  const money = moneyFormat(currency);
  v.rows.forEach((r, k) => {
    const row = ws.getRow(5 + k);
    [
      r.type,
      r.machines,
      r.over,
      r.unknown,
      r.overIds.join(', '),
      r.replacementLabel ?? (r.over > 0 ? 'none in the register meets it' : ''),
      r.replacementPrice ?? null,
      Number.isFinite(r.replacementCost) ? r.replacementCost : null,
    ].forEach((value, i) => (row.getCell(i + 1).value = value));
    row.getCell(7).numFmt = money;
    row.getCell(8).numFmt = money;
  });
  const total = ws.getRow(6 + v.rows.length);
  total.getCell(1).value = 'Total';
  total.getCell(3).value = v.totalOver;
  total.getCell(8).value = v.totalReplacementCost;
  total.getCell(8).numFmt = money;
  total.font = { bold: true };
  ws.getColumn(1).width = 22;
  ws.getColumn(5).width = 22;
  ws.getColumn(6).width = 40;
  for (const c of [2, 3, 4, 7, 8]) ws.getColumn(c).width = 14;
}

/**
 * Builds the register workbook in memory.
 * @example (await buildRegisterWorkbook(demoRegister())).worksheets.map((w) => w.name) // ['register']
 */
export function buildRegisterWorkbook(register: Register, options: RegisterWorkbookOptions = {}): ExcelJS.Workbook {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Plant Noise Ledger';
  wb.title = register.name;
  wb.created = options.created ?? new Date();
  wb.modified = wb.created;
  writeRegisterSheet(wb, register);
  if (options.comparison) writeShortlistSheet(wb, options.comparison);
  if (options.fleet) writeFleetSheet(wb, options.fleet, register.currency);
  return wb;
}

/** The register workbook as .xlsx bytes. */
export async function exportRegisterWorkbook(
  register: Register,
  options: RegisterWorkbookOptions = {},
): Promise<Uint8Array> {
  const buffer = await buildRegisterWorkbook(register, options).xlsx.writeBuffer();
  return new Uint8Array(buffer as ArrayBuffer);
}
