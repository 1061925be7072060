/**
 * Projects for the workbook tests: the demo, the demo under the ISO 9613-2:1996 general
 * method (octave bands, barrier, ground), and the demo with hostile text everywhere.
 */
import ExcelJS from 'exceljs';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';

/** The demo project under ISO 9613-2:1996 with the general ground method and one barrier. */
export function isoDemoProject(): Project {
  const p = demoProject();
  p.propagation = {
    method: 'iso9613-2:1996',
    temperatureC: 10,
    humidityPct: 70,
    pressureKPa: 101.325,
    groundFactor: 0.5,
    groundMethod: 'general',
    sourceHeightM: 1.5,
    c0Db: 0,
  };
  const school = p.receivers.find((r) => r.id === 'r-school');
  if (school) school.screening = { ...school.screening, 'd-dig': { kind: 'barrier', pathDifferenceM: 0.4 } };
  return p;
}

/**
 * The demo with a day 07:00–19:00, an evening 19:00–23:00 and a night 23:00–07:00 (invented
 * limits): demolition runs 07:00–21:00 (12 h in the day, 2 h in the evening), groundworks
 * are night works 23:00–03:00.
 */
export function periodsDemoProject(): Project {
  const p = demoProject();
  p.periods = [
    { id: 'day', name: 'Weekday daytime', start: '07:00', end: '19:00' },
    { id: 'evening', name: 'Evening', start: '19:00', end: '23:00' },
    { id: 'night', name: 'Night', start: '23:00', end: '07:00' },
  ];
  const demolition = p.phases[0]!;
  demolition.start = '07:00';
  demolition.end = '21:00';
  const ground = p.phases[1]!;
  ground.periodId = 'night';
  ground.start = '23:00';
  ground.end = '03:00';
  for (const r of p.receivers) r.limitsDb = { ...r.limitsDb, evening: 60, night: 50 };
  return p;
}

/** Strings that a spreadsheet would take for formulas if they were written carelessly. */
export const HOSTILE = ['=HYPERLINK("http://example.invalid","x")', '+1+1', '-2+3', '@SUM(A1:A2)', '=1/0'];

/** The demo with formula-like text in names, labels, sources and categories. */
export function hostileProject(): Project {
  const p = demoProject();
  p.name = HOSTILE[0] as string;
  p.receivers[0]!.name = HOSTILE[3] as string;
  p.phases[0]!.name = HOSTILE[1] as string;
  p.candidates[0]!.label = HOSTILE[0] as string;
  p.candidates[1]!.source = HOSTILE[1] as string;
  p.candidates[2]!.category = HOSTILE[2] as string;
  p.candidates[3]!.label = `${HOSTILE[4]}\u0007bell`;
  return p;
}

/** Loads exported bytes with exceljs. */
export async function load(bytes: Uint8Array): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  return wb;
}

/** Every cell of a sheet. */
export function cellsOf(ws: ExcelJS.Worksheet): ExcelJS.Cell[] {
  const cells: ExcelJS.Cell[] = [];
  ws.eachRow({ includeEmpty: false }, (row) => row.eachCell({ includeEmpty: false }, (cell) => cells.push(cell)));
  return cells;
}
