/**
 * The inputs sheet: the project's data as a reviewer would check it — periods, phases,
 * receivers with their limits, duties with the chosen candidate, the screening and stated
 * distance of every duty–receiver pair, and the candidate machines. Units are in the
 * headers; every input cell carries the input fill. Text a user typed that could not be
 * read is written back as typed.
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Project, Screening } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { minutesOfDay } from '../../ledger/prediction/clock.ts';
import { abs, absColumnRange, absRowRange, num, text } from './cells.ts';
import { MONEY_FIELDS } from './candidate-columns.ts';
import { candidateTableLayout } from './candidate-notes.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { pairKey, type InputRefs } from './refs.ts';
import {
  CORE_FILL,
  INPUT_FILL,
  NOTE_FONT,
  TIME_FORMAT,
  moneyFormat,
  printSetup,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { rowsOf, writeStreamedTable, writeTable, type TableColumn } from './table.ts';
import { own } from '../../ledger/model/own.ts';
import {
  DUTY_NUMBERS as D,
  FACADE,
  PERIOD_TIMES,
  PHASE_TIMES,
  RECEIVER_KIND,
  RECEIVER_NUMBERS as R,
  headerFor,
} from '../../ledger/catalogue/index.ts';

export const INPUTS = 'inputs';

/** A time of day as a spreadsheet time (fraction of a day), or the text as typed. */
function timeValue(textValue: string): CellValue {
  const minutes = minutesOfDay(textValue);
  return Number.isNaN(minutes) ? text(textValue) : minutes / 1440;
}

/** Candidates grouped by duty in duty order, project order within a duty; unknown duties last. */
export function candidatesInTableOrder(project: Project): Project['candidates'] {
  const dutyIndex = new Map(project.duties.map((d, i) => [d.id, i]));
  return project.candidates
    .map((c, i) => ({ c, i, d: dutyIndex.get(c.dutyId) ?? project.duties.length }))
    .sort((a, b) => a.d - b.d || a.i - b.i)
    .map((x) => x.c);
}

function screeningColumns(s: Screening | undefined): [string, number | null, number | null] {
  if (!s) return ['none', null, null];
  if (s.kind === 'explicit') return ['explicit', num(s.db), null];
  if (s.kind === 'barrier') return ['barrier', null, num(s.pathDifferenceM)];
  return [s.kind, null, null];
}

/**
 * Writes the inputs sheet and returns where every input went. `pause`: the streaming writer's
 * wait between blocks of candidate rows (writeStreamedTable).
 */
export async function writeInputsSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  checks: Record<string, CandidateCheck>,
  pause?: () => Promise<void>,
): Promise<InputRefs> {
  const ws = wb.addWorksheet(INPUTS, { views: [{ state: 'frozen', ySplit: 3, xSplit: 1 }], pageSetup: FIT_TO_WIDTH });
  const unread = project.unreadCells ?? {};
  const anyUnread = Object.keys(unread).length > 0;
  const raw = (list: string, id: string, fieldName: string): string | undefined =>
    anyUnread ? unread[`${list}/${id}/${fieldName}`] : undefined;
  /** A number input, or the text the user typed when it could not be read. */
  const numIn = (list: string, id: string, fieldName: string, value: number | undefined | null): CellValue => {
    const typed = raw(list, id, fieldName);
    return typed !== undefined ? text(typed) : num(value);
  };
  const money = moneyFormat(project.currency);

  // Widths first: the streaming writer writes them with the first row it is given.
  ws.getColumn(1).width = 14;
  ws.getColumn(2).width = 24;
  writeTitle(
    ws,
    `Inputs — ${text(project.name)}`,
    'The project as entered. Yellow cells are inputs: change one and the levels, compliance and contribution sheets recalculate.',
  );
  const legendInput = ws.getCell(3, 2);
  legendInput.value = 'Input (change here)';
  legendInput.fill = INPUT_FILL;
  const legendCore = ws.getCell(3, 3);
  legendCore.value = 'Computed by the core, taken as given';
  legendCore.fill = CORE_FILL;
  ws.getCell(3, 1).value = 'Legend:';
  ws.getCell(3, 1).font = NOTE_FONT;

  const refs: InputRefs = {
    periods: new Map(),
    phases: new Map(),
    receivers: new Map(),
    duties: new Map(),
    pairs: new Map(),
    candidates: new Map(),
    candidateOrder: [],
    candidateRows: { first: 0, last: -1 },
  };

  // Row plan: each table takes title + header + rows, then one blank row.
  const receivers = project.receivers;
  const pairsCount = project.duties.length * receivers.length;
  const start = {
    periods: 5,
    phases: 0,
    receivers: 0,
    duties: 0,
    pairs: 0,
    candidates: 0,
  };
  start.phases = start.periods + 3 + project.periods.length;
  start.receivers = start.phases + 3 + project.phases.length;
  start.duties = start.receivers + 3 + receivers.length;
  start.pairs = start.duties + 3 + project.duties.length;
  start.candidates = start.pairs + 3 + pairsCount;
  const candidates = candidatesInTableOrder(project);
  const candidateFirst = start.candidates + 2;
  // The first and last candidate row of each duty (a duty's candidates are together in table order).
  const dutyRows = new Map<string, { first: number; last: number }>();
  candidates.forEach((c, i) => {
    const span = dutyRows.get(c.dutyId);
    if (span) span.last = candidateFirst + i;
    else dutyRows.set(c.dutyId, { first: candidateFirst + i, last: candidateFirst + i });
  });

  // Periods
  const periodCols: TableColumn[] = [
    { header: 'Period ID', role: 'input', width: 12 },
    { header: 'Assessment period', role: 'input', width: 26 },
    { header: PERIOD_TIMES.start.workbookHeader, role: 'input', numFmt: TIME_FORMAT },
    { header: PERIOD_TIMES.end.workbookHeader, role: 'input', numFmt: TIME_FORMAT },
  ];
  const periodPlace = writeTable(
    ws,
    start.periods,
    'Assessment periods (a limit LAeq,T applies over each)',
    periodCols,
    project.periods.map((p) => [text(p.id), text(p.name), timeValue(p.start), timeValue(p.end)]),
  );
  project.periods.forEach((p, i) => {
    const row = periodPlace.firstRow + i;
    refs.periods.set(p.id, { row, name: abs(INPUTS, 2, row), start: abs(INPUTS, 3, row), end: abs(INPUTS, 4, row) });
  });

  // Phases
  const phaseCols: TableColumn[] = [
    { header: 'Phase ID', role: 'input' },
    { header: 'Phase of the works', role: 'input' },
    { header: 'Period ID', role: 'input' },
    { header: PHASE_TIMES.start.workbookHeader, role: 'input', numFmt: TIME_FORMAT },
    { header: PHASE_TIMES.end.workbookHeader, role: 'input', numFmt: TIME_FORMAT },
  ];
  const phasePlace = writeTable(
    ws,
    start.phases,
    'Phases of the works (working hours)',
    phaseCols,
    project.phases.map((p) => [text(p.id), text(p.name), text(p.periodId), timeValue(p.start), timeValue(p.end)]),
  );
  project.phases.forEach((p, i) => {
    const row = phasePlace.firstRow + i;
    refs.phases.set(p.id, {
      row,
      id: abs(INPUTS, 1, row),
      name: abs(INPUTS, 2, row),
      periodId: p.periodId,
      start: abs(INPUTS, 4, row),
      end: abs(INPUTS, 5, row),
    });
  });

  // Receivers
  const receiverCols: TableColumn[] = [
    { header: 'Receiver ID', role: 'input' },
    { header: 'Receiver', role: 'input' },
    { header: RECEIVER_KIND.workbookHeader, role: 'input' },
    { header: R.x.workbookHeader, role: 'input' },
    { header: R.y.workbookHeader, role: 'input' },
    { header: R.heightM.workbookHeader, role: 'input' },
    { header: FACADE.workbookHeader, role: 'input' },
    { header: R.ambientDb.workbookHeader, role: 'input' },
    ...project.periods.map((p): TableColumn => ({
      header: headerFor(R.limitDb.workbookHeader, text(p.name)),
      role: 'input',
      width: 12,
    })),
  ];
  const receiverPlace = writeTable(
    ws,
    start.receivers,
    'Receivers (limits per assessment period; blank = not assessed)',
    receiverCols,
    receivers.map((r) => [
      text(r.id),
      text(r.name),
      text(r.kind),
      numIn('receivers', r.id, 'x', r.x),
      numIn('receivers', r.id, 'y', r.y),
      numIn('receivers', r.id, 'heightM', r.heightM),
      r.facade === true,
      numIn('receivers', r.id, 'ambientDb', r.ambientDb),
      ...project.periods.map((p) => numIn('receivers', r.id, `limitsDb.${p.id}`, own(r.limitsDb, p.id))),
    ]),
  );
  receivers.forEach((r, i) => {
    const row = receiverPlace.firstRow + i;
    refs.receivers.set(r.id, {
      row,
      id: abs(INPUTS, 1, row),
      name: abs(INPUTS, 2, row),
      x: abs(INPUTS, 4, row),
      y: abs(INPUTS, 5, row),
      height: abs(INPUTS, 6, row),
      facade: abs(INPUTS, 7, row),
      limitByPeriod: new Map(project.periods.map((p, k) => [p.id, abs(INPUTS, 9 + k, row)])),
    });
  });

  // Duties
  const dutyCols: TableColumn[] = [
    { header: 'Duty ID', role: 'input' },
    { header: 'Duty', role: 'input' },
    { header: 'Phase ID', role: 'input' },
    { header: D.count.workbookHeader, role: 'input' },
    { header: D.onTimePct.workbookHeader, role: 'input' },
    { header: D.durationDays.workbookHeader, role: 'input' },
    { header: 'Location (point / distances)', role: 'input' },
    { header: D.x.workbookHeader, role: 'input' },
    { header: D.y.workbookHeader, role: 'input' },
    { header: D.sourceHeightM.workbookHeader, role: 'input' },
    { header: 'Baseline candidate ID', role: 'input' },
    { header: 'CHOSEN candidate ID (change to try another)', role: 'input', width: 14 },
  ];
  const dutyPlace = writeTable(
    ws,
    start.duties,
    'Duties (one machine choice each; the chosen candidate drives the levels)',
    dutyCols,
    project.duties.map((d) => [
      text(d.id),
      text(d.name),
      text(d.phaseId),
      numIn('duties', d.id, 'count', d.count),
      numIn('duties', d.id, 'onTimePct', d.onTimePct),
      numIn('duties', d.id, 'durationDays', d.durationDays),
      text(d.location?.kind),
      d.location?.kind === 'point' ? numIn('duties', d.id, 'location.x', d.location.x) : null,
      d.location?.kind === 'point' ? numIn('duties', d.id, 'location.y', d.location.y) : null,
      numIn('duties', d.id, 'sourceHeightM', d.sourceHeightM),
      text(d.baselineCandidateId),
      text(own(evaluation.fleet, d.id) ?? d.baselineCandidateId),
    ]),
  );
  const idColumn = 1; // the candidates table starts with the candidate ID
  project.duties.forEach((d, i) => {
    const row = dutyPlace.firstRow + i;
    refs.duties.set(d.id, {
      row,
      id: abs(INPUTS, 1, row),
      name: abs(INPUTS, 2, row),
      phaseId: abs(INPUTS, 3, row),
      count: abs(INPUTS, 4, row),
      onTime: abs(INPUTS, 5, row),
      x: abs(INPUTS, 8, row),
      y: abs(INPUTS, 9, row),
      sourceHeight: abs(INPUTS, 10, row),
      chosen: abs(INPUTS, 12, row),
    });
    const rows = dutyRows.get(d.id);
    if (rows) {
      const range = absColumnRange(INPUTS, idColumn, rows.first, rows.last).replace(`${INPUTS}!`, '');
      ws.getCell(row, 12).dataValidation = {
        type: 'list',
        allowBlank: false,
        formulae: [range],
        showErrorMessage: true,
        errorTitle: 'Chosen candidate',
        error: `Choose one of this duty's candidate IDs (candidates table, rows ${rows.first}–${rows.last}).`,
      };
    }
  });

  // Duty–receiver pairs
  const pairCols: TableColumn[] = [
    { header: 'Duty ID', role: 'input' },
    { header: 'Receiver ID', role: 'input' },
    { header: 'Screening (none / top-visible / hidden / explicit / barrier)', role: 'input', width: 16 },
    { header: R.screeningDb.workbookHeader, role: 'input' },
    { header: R.pathDifferenceM.workbookHeader, role: 'input' },
    { header: D.distanceM.workbookHeader, role: 'input' },
  ];
  const pairRows: CellValue[][] = [];
  const pairIds: [string, string][] = [];
  for (const d of project.duties) {
    for (const r of receivers) {
      const [kind, db, z] = screeningColumns(own(r.screening, d.id));
      const stated =
        d.location?.kind === 'distances'
          ? numIn('duties', d.id, `location.distancesM.${r.id}`, own(d.location.distancesM, r.id))
          : null;
      pairRows.push([text(d.id), text(r.id), kind, db, z, stated]);
      pairIds.push([d.id, r.id]);
    }
  }
  const pairPlace = writeTable(ws, start.pairs, 'Duty to receiver: screening and stated distances', pairCols, pairRows);
  pairIds.forEach(([dutyId, receiverId], i) => {
    const row = pairPlace.firstRow + i;
    refs.pairs.set(pairKey(dutyId, receiverId), {
      screeningKind: abs(INPUTS, 3, row),
      screeningDb: abs(INPUTS, 4, row),
      pathDifference: abs(INPUTS, 5, row),
      statedDistance: abs(INPUTS, 6, row),
    });
  });

  // Candidates: the input columns, with two read-only columns (blue) beside the ones they
  // explain: the stand-in marker after the declared LWA, the limit's quantity with its unit
  // after the directive quantity. Reading the table back finds columns by header and skips these.
  const layout = candidateTableLayout();
  const candidateCols: TableColumn[] = layout.map((entry) => {
    if (entry.kind === 'note') return { header: entry.header, role: entry.role, width: entry.width, wrap: true };
    const c = entry.column;
    return {
      header: c.field === 'dayRate' || MONEY_FIELDS.has(c.field) ? `${c.header} (${text(project.currency)})` : c.header,
      role: 'input',
      width: c.width,
      ...(MONEY_FIELDS.has(c.field) ? { numFmt: money } : {}),
    };
  });
  const candidatePlace = await writeStreamedTable(
    ws,
    start.candidates,
    'Candidate machines (grouped by duty)',
    candidateCols,
    rowsOf(candidates, (c) => {
      const check = own(checks, c.id);
      return layout.map((entry) => {
        if (entry.kind === 'note') return entry.value(c, check);
        const column = entry.column;
        const typed = raw('candidates', c.id, column.field) ?? raw('candidates', c.id, `cost.${column.field}`);
        if (typed !== undefined) return text(typed);
        const v = column.get(c);
        if (v === undefined || v === null) return null;
        if (column.kind === 'number') return num(v as number);
        if (column.kind === 'boolean') return v === true;
        return text(v);
      });
    }),
    // The last table on the sheet: its rows go to the streaming writer as they are written.
    { sparse: true, pause },
  );
  const position = new Map(
    layout.map((entry, j) => [entry.kind === 'input' ? entry.column.field : entry.header, j + 1]),
  );
  const col = (fieldName: string) => position.get(fieldName) as number;
  const firstBand = col('bandsDb.0');
  candidates.forEach((c, i) => {
    const row = candidatePlace.firstRow + i;
    refs.candidateOrder.push(c.id);
    refs.candidates.set(c.id, {
      row,
      id: abs(INPUTS, col('id'), row),
      dutyId: c.dutyId,
      label: abs(INPUTS, col('label'), row),
      lwa: abs(INPUTS, col('lwaDb'), row),
      declaration: abs(INPUTS, col('declaration'), row),
      uncertainty: abs(INPUTS, col('uncertaintyDb'), row),
      character: abs(INPUTS, col('character'), row),
      operatorLpa: abs(INPUTS, col('operatorLpaDb'), row),
      operatorHours: abs(INPUTS, col('operatorHoursPerDay'), row),
      bands: absRowRange(INPUTS, firstBand, firstBand + 7, row),
    });
  });
  refs.candidateRows = { first: candidatePlace.firstRow, last: candidatePlace.lastRow };
  printSetup(ws, { landscape: true, repeatRows: [1, 3] });
  return refs;
}
