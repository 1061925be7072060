/**
 * The assumptions sheet: every setting the formulas use, each in a named cell (the names
 * appear in the formulas, e.g. FacadeDb), the source of each machine's LWA, and the cautions.
 */
import type { Workbook, Worksheet } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import { DEFAULT_SOURCE_HEIGHT_M } from '../../ledger/prediction/geometry.ts';
import { REFERENCE_Q } from '../../ledger/prediction/path-table.ts';
import { FACADE_CORRECTION_DB, SCREENING_HIDDEN_DB, SCREENING_TOP_VISIBLE_DB } from '../../core/corrections.ts';
import { A_WEIGHTING_OCTAVE_DB } from '../../core/standards/iec61672-1-2013.ts';
import { REFERENCE_DURATION_H } from '../../core/standards/iso9612-2009.ts';
import { EXPOSURE_VALUES_DB } from '../../core/standards/directive-2003-10-ec.ts';
import { NIOSH_CRITERION } from '../../core/allowed-exposure-time.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { abs, absRowRange, text } from './cells.ts';
import { standInWords } from './candidate-notes.ts';
import { candidatesInTableOrder } from './inputs-sheet.ts';
import { CELL_BORDER, INPUT_FILL, NOTE_FONT, printSetup, writeSection, writeTitle, FIT_TO_WIDTH } from './styles.ts';
import { rowsOf, writeStreamedTable, writeTable } from './table.ts';
import { own } from '../../ledger/model/own.ts';
import { ISO_ASSEMBLY } from '../../core/iso9613-machine-terms.ts';
import { propagationNotes } from '../../ledger/prediction/propagation-notes.ts';
import type { DataProblem } from '../../ledger/model/results.ts';
import { SCREENING_RULE_SOURCE, SCREENING_WORDS } from '../../core/screening-words.ts';
import { BARRIER_RULE_WORDS } from '../../ledger/prediction/barrier-screening.ts';
import { SETTINGS_NUMBERS } from '../../ledger/catalogue/index.ts';

export const ASSUMPTIONS = 'assumptions';

/** Accuracy ISO 9613-2:1996 quotes for broadband predictions up to 1 km, ± dB (clause 9, Table 5). */
export const ACCURACY_DB = 3;
/** Constant of the geometric divergence A_div = 20·lg(d/d0) + 11, dB (ISO 9613-2:1996 eq. 7). */
export const ADIV_CONSTANT_DB = 11;

/** The method's name as the statements and notes print it. */
export function methodName(project: Project): string {
  return project.propagation.method === 'iso9613-2:1996' ? 'ISO 9613-2:1996' : 'simple point-source';
}

/** The cautions printed with every prediction. */
export const CAUTIONS: readonly string[] = [
  `Predictions are estimates: ISO 9613-2:1996 quotes an accuracy of about ±${ACCURACY_DB} dB for broadband levels up to 1 km; site conditions, machine condition and operator behaviour change real levels.`,
  'A competent acoustician and the local authority’s requirements decide; local codes, permits and licensed practice rule over these figures.',
  'Declared sound power levels are taken as given by their sources; a stand-in permissible level (Directive 2000/14/EC) is not a measurement.',
  'Operator exposure figures do not replace a workplace exposure assessment.',
];

interface Setting {
  /** Defined name of the value cell, when formulas use it. */
  name?: string;
  label: string;
  value: string | number | boolean;
  unit: string;
  note: string;
}

function settingsOf(project: Project): Setting[] {
  const prop = project.propagation;
  const s = project.settings;
  const list: Setting[] = [
    {
      name: 'Method',
      label: 'Propagation method',
      value: methodName(project),
      unit: '',
      note:
        prop.method === 'iso9613-2:1996'
          ? `ISO 9613-2:1996 (first edition) outdoor propagation. ${ISO_ASSEMBLY} A_atm, A_gr, A_bar and D_c computed by the core (paths sheet, blue cells).`
          : 'Point source: Lp = LWA + 10·lg(Q/(4πd²)) (common practice; textbook).',
    },
  ];
  const notes = propagationNotes(prop);
  if (prop.method === 'simple') {
    list.push({
      name: 'DirectivityQ',
      label: 'Directivity factor Q',
      value: prop.q,
      unit: '',
      note: '1 free field, 2 on hard ground, 4 ground and a wall, 8 a corner.',
    });
  } else {
    list.push(
      {
        name: 'AdivConstantDb',
        label: 'A_div constant (eq. 7: A_div = 20·lg(d/1 m) + 11)',
        value: ADIV_CONSTANT_DB,
        unit: 'dB',
        note: 'ISO 9613-2:1996 clause 7.1, eq. 7.',
      },
      {
        name: 'TemperatureC',
        label: SETTINGS_NUMBERS.temperatureC.workbookHeader,
        value: prop.temperatureC,
        unit: SETTINGS_NUMBERS.temperatureC.unit,
        note: 'Atmospheric absorption α from ISO 9613-1:1993.',
      },
      {
        name: 'HumidityPct',
        label: SETTINGS_NUMBERS.humidityPct.workbookHeader,
        value: prop.humidityPct,
        unit: SETTINGS_NUMBERS.humidityPct.unit,
        note: 'Atmospheric absorption α from ISO 9613-1:1993.',
      },
      {
        name: 'PressureKPa',
        label: SETTINGS_NUMBERS.pressureKPa.workbookHeader,
        value: prop.pressureKPa,
        unit: SETTINGS_NUMBERS.pressureKPa.unit,
        note: '',
      },
      {
        name: 'GroundFactorG',
        label: SETTINGS_NUMBERS.groundFactor.workbookHeader,
        value: prop.groundFactor,
        unit: SETTINGS_NUMBERS.groundFactor.unit,
        note: '0 hard … 1 porous, for source, middle and receiver regions.',
      },
      {
        name: 'GroundMethod',
        label: 'Ground method',
        value: prop.groundMethod,
        unit: '',
        note: [...notes.notes.slice(1), ...notes.warnings.map((w) => `WARNING: ${w}`)].join(' '),
      },
      {
        name: 'C0Db',
        label: SETTINGS_NUMBERS.c0Db.workbookHeader,
        value: prop.c0Db,
        unit: SETTINGS_NUMBERS.c0Db.unit,
        note: 'Per path C_met = 0 for d_p ≤ 10(h_s + h_r), else C0·[1 − 10(h_s + h_r)/d_p] (ISO 9613-2:1996 eqs 21, 22; paths sheet). 0 = downwind, short-term prediction.',
      },
    );
  }
  list.push(
    {
      name: 'DefaultSourceHeightM',
      label: SETTINGS_NUMBERS.sourceHeightM.workbookHeader,
      value: prop.method === 'iso9613-2:1996' ? prop.sourceHeightM : DEFAULT_SOURCE_HEIGHT_M,
      unit: 'm',
      note: 'Distance d = √(Δx² + Δy² + (h_s − h_r)²).',
    },
    {
      name: 'FacadeDb',
      label: 'Façade correction',
      value: FACADE_CORRECTION_DB,
      unit: 'dB',
      note: 'Added where a receiver is assessed 1 m in front of a façade (common practice).',
    },
    {
      name: 'ScreenTopVisibleDb',
      label: `Screening, ${SCREENING_WORDS['top-visible'].long}`,
      value: SCREENING_TOP_VISIBLE_DB,
      unit: 'dB',
      note: `Reduction: ${SCREENING_RULE_SOURCE}.`,
    },
    {
      name: 'ScreenHiddenDb',
      label: `Screening, ${SCREENING_WORDS.hidden.long}`,
      value: SCREENING_HIDDEN_DB,
      unit: 'dB',
      note: `Reduction: ${SCREENING_RULE_SOURCE}.`,
    },
    {
      name: 'CharacterPenaltyDb',
      label: 'Character penalty (tonal or impulsive), this project',
      value: s.characterPenaltyDb,
      unit: 'dB',
      note: 'Project setting (0, 3 or 6 dB): added to the rating level of tonal or impulsive machines at every receiver; its own column on the contributions sheet.',
    },
    {
      name: 'LevelBasis',
      label: 'Level basis (guaranteed / measured)',
      value: s.levelBasis,
      unit: '',
      note: 'ISO 4871:1996 declarations. guaranteed: the declared value Ld = L + K (the Directive 2000/14/EC marking); measured: L alone. Rankings and the optimiser use this basis.',
    },
    {
      label: 'LWA used for each candidate',
      value: 'per candidate',
      unit: 'dB',
      note: 'Contributions sheet, column "LWA used": a formula on the declared value, its declaration (guaranteed / measured), K and LevelBasis. A STAND-IN (no declared value) is the permissible level, marked as such on every sheet.',
    },
    {
      label: 'On-time',
      value: 'per duty',
      unit: '%',
      note: 'Inputs sheet, duties table; correction 10·lg(on-time / 100).',
    },
    { label: 'Number of units', value: 'per duty', unit: '', note: 'Inputs sheet, duties table; correction 10·lg n.' },
    {
      label: 'Working hours',
      value: 'per phase',
      unit: 'hh:mm',
      note: 'Correction 10·lg(hours worked inside the period / period length).',
    },
    {
      name: 'ReferenceDistanceM',
      label: SETTINGS_NUMBERS.referenceDistanceM.workbookHeader,
      value: s.referenceDistanceM,
      unit: SETTINGS_NUMBERS.referenceDistanceM.unit,
      note: 'Used when the project has no receivers: hemispherical spreading.',
    },
    {
      name: 'ReferenceQ',
      label: 'Reference receiver directivity Q',
      value: REFERENCE_Q,
      unit: '',
      note: 'Hemisphere (source on hard ground).',
    },
    ...((project.barriers ?? []).length > 0
      ? [
          {
            label: 'Barriers on the plan',
            value: (project.barriers ?? []).length,
            unit: '',
            note: `${BARRIER_RULE_WORDS} Paths sheet: each path's geometry and the barrier that screens it.`,
          },
        ]
      : []),
    {
      name: 'AccuracyDb',
      label: 'Quoted accuracy of the predictions',
      value: ACCURACY_DB,
      unit: '± dB',
      note: "ISO 9613-2:1996 clause 9, Table 5: broadband, downwind, up to 1 km, mean height up to 30 m, no screening or reflection. Paths outside it are named in the paths sheet's Note column and below.",
    },
    {
      name: 'Currency',
      label: 'Currency',
      value: text(project.currency),
      unit: '',
      note: 'ISO 4217 code; all money in this workbook.',
    },
    {
      name: 'ExposureReferenceH',
      label: 'Reference duration of the daily exposure T0',
      value: REFERENCE_DURATION_H,
      unit: 'h',
      note: 'ISO 9612:2009: L_EX,8h = LpA + 10·lg(T / T0) (checks sheet).',
    },
    {
      name: 'LowerActionDb',
      label: 'Lower exposure action value',
      value: EXPOSURE_VALUES_DB.lowerAction,
      unit: 'dB(A)',
      note: 'Directive 2003/10/EC Article 3(1)(c), L_EX,8h.',
    },
    {
      name: 'UpperActionDb',
      label: 'Upper exposure action value',
      value: EXPOSURE_VALUES_DB.upperAction,
      unit: 'dB(A)',
      note: 'Directive 2003/10/EC Article 3(1)(b), L_EX,8h.',
    },
    {
      name: 'ExposureLimitDb',
      label: 'Exposure limit value',
      value: EXPOSURE_VALUES_DB.limit,
      unit: 'dB(A)',
      note: 'Directive 2003/10/EC Article 3(1)(a), L_EX,8h; counts the attenuation of the hearing protection worn.',
    },
    {
      name: 'TimeCriterionDb',
      label: 'Criterion of the time a day',
      value: NIOSH_CRITERION.criterionDb,
      unit: 'dB(A)',
      note: 'Time until 85 dB(A) is reached: T = T0 / 2^((LpA − 85)/q) (NIOSH 98-126).',
    },
    {
      name: 'ExchangeRateDb',
      label: 'Exchange rate q of the time a day',
      value: NIOSH_CRITERION.exchangeRateDb,
      unit: 'dB',
      note: '3 dB per halving of time (equal energy; NIOSH 98-126).',
    },
  );
  return list;
}

function writeSettings(wb: Workbook, ws: Worksheet, project: Project, startRow: number): number {
  const list = settingsOf(project);
  const place = writeTable(
    ws,
    startRow,
    'Settings used by the formulas (named cells)',
    [
      { header: 'Setting', role: 'text', width: 40 },
      { header: 'Value', role: 'input', width: 18 },
      { header: 'Unit', role: 'text', width: 8 },
      { header: 'Name in formulas', role: 'text', width: 20 },
      { header: 'Source / note', role: 'text', width: 70 },
    ],
    list.map((s) => [s.label, s.value, s.unit, s.name ?? '', s.note]),
  );
  list.forEach((s, i) => {
    if (s.name) wb.definedNames.add(abs(ASSUMPTIONS, 2, place.firstRow + i), s.name);
  });
  return place.lastRow + 2;
}

function writeAWeighting(wb: Workbook, ws: Worksheet, startRow: number): number {
  writeSection(ws, startRow, 'A-weighting at the octave bands (IEC 61672-1:2013 Table 3), dB — name AWeightingDb', 10);
  const header = ws.getRow(startRow + 1);
  const values = ws.getRow(startRow + 2);
  header.getCell(1).value = 'Band (Hz)';
  values.getCell(1).value = 'A-weighting (dB)';
  OCTAVE_BANDS_HZ.forEach((hz, i) => {
    header.getCell(2 + i).value = hz;
    const cell = values.getCell(2 + i);
    cell.value = A_WEIGHTING_OCTAVE_DB[i] as number;
    cell.fill = INPUT_FILL;
    cell.border = CELL_BORDER;
  });
  wb.definedNames.add(absRowRange(ASSUMPTIONS, 2, 9, startRow + 2), 'AWeightingDb');
  return startRow + 4;
}

/**
 * The evaluation's notes, one line each: working hours that fall in no assessment period
 * (not assessed), and under ISO 9613-2:1996 the paths for which its Table 5 states no
 * accuracy (grouped by reason, ledger/prediction/path-accuracy.ts) or an atmosphere outside ISO
 * 9613-1:1993's stated range. Under ISO 9613-2 with nothing outside, one line says so.
 */
function writeAssessmentNotes(ws: Worksheet, project: Project, notes: readonly DataProblem[], row: number): number {
  const lines = notes.map((n) => n.message);
  if (project.propagation.method === 'iso9613-2:1996' && !lines.some((l) => l.includes('ISO 9613-'))) {
    lines.push(
      'Every path lies within the range for which ISO 9613-2:1996 Table 5 states its accuracy (±3 dB; ±1 dB under 100 m at mean heights of 5 to 30 m).',
    );
  }
  if (lines.length === 0) return row;
  writeSection(
    ws,
    row,
    'Notes on the assessment (hours not assessed; accuracy, ISO 9613-2:1996 Table 5 and ISO 9613-1:1993)',
    5,
  );
  lines.forEach((line, i) => {
    const cell = ws.getCell(row + 1 + i, 1);
    cell.value = line;
    cell.alignment = { wrapText: false };
  });
  return row + lines.length + 2;
}

/** Writes the assumptions sheet. */
export async function writeAssumptionsSheet(
  wb: Workbook,
  project: Project,
  checks: Record<string, CandidateCheck>,
  notes: readonly DataProblem[] = [],
  pause?: () => Promise<void>,
): Promise<void> {
  const ws = wb.addWorksheet(ASSUMPTIONS, { views: [{ state: 'frozen', ySplit: 2 }], pageSetup: FIT_TO_WIDTH });
  writeTitle(
    ws,
    'Assumptions',
    'Every setting the formulas use, the source of each machine’s sound power, and the cautions that go with the predictions.',
  );
  ws.getCell(3, 1).value = 'Values in yellow are read by the formulas; change one and every sheet recalculates.';
  ws.getCell(3, 1).font = NOTE_FONT;
  let row = 4;
  row = writeSettings(wb, ws, project, row);
  row = writeAWeighting(wb, ws, row);

  writeSection(ws, row, 'Cautions', 5);
  CAUTIONS.forEach((c, i) => {
    const cell = ws.getCell(row + 1 + i, 1);
    cell.value = c;
    cell.alignment = { wrapText: false };
  });
  row += CAUTIONS.length + 2;
  row = writeAssessmentNotes(ws, project, notes, row);

  // Per machine, where its sound power comes from. How each rated LWA follows from it is on
  // the contributions sheet, beside the formula that computes it.
  const candidates = candidatesInTableOrder(project);
  await writeStreamedTable(
    ws,
    row,
    'Source of each machine’s sound power (LWA); how the rated LWA follows: contributions sheet',
    // Two columns: the source text runs on over the empty cells to its right.
    [
      { header: 'Machine [candidate ID]', role: 'text', width: 40 },
      { header: 'Source of the declared value (origin)', role: 'text', width: 18 },
    ],
    rowsOf(candidates, (c) => {
      const stand = standInWords(own(checks, c.id));
      const source = `${c.source ?? ''}${c.lwaOrigin && c.lwaOrigin !== 'declared' ? ` (${c.lwaOrigin})` : ''}`;
      return [text(`${c.label} [${c.id}]`), text(stand ? `${stand}. ${source}` : source)];
    }),
    { sparse: true, pause },
  );
  printSetup(ws, { landscape: true, repeatRows: [1, 2] });
}
