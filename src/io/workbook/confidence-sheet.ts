/**
 * The confidence sheet: how sure compliance is for the fleet the workbook describes — per
 * phase, period and receiver the probability of meeting the limit (simulated with the
 * project's draws and seed, with its sampling error, beside the analytic figure) and the
 * 90 %-sure level; the probability that every limit is met at once; then the inputs of the
 * model (its settings, each machine's K and σ, each path's accuracy and σ, on-time ranges)
 * and its assumptions in words, with the caution. Values, not formulas: the simulation is
 * the ledger's (ledger/uncertainty/), seeded so that the same project gives the same sheet.
 */
import type { Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { complianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import { BOUND_NAME, CONFIDENCE_CAUTION } from '../../ledger/uncertainty/assumptions.ts';
import { DEFAULT_UNCERTAINTY } from '../../ledger/uncertainty/settings.ts';
import { UNCERTAINTY_NUMBERS } from '../../ledger/catalogue/index.ts';
import {
  DB_FORMAT,
  NOTE_FONT,
  SIGNED_DB_FORMAT,
  printSetup,
  writeSection,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';

export const CONFIDENCE = 'confidence';

const PCT = '0.00%';
const finite = (x: number) => (Number.isFinite(x) ? x : null);

/** Writes the confidence sheet for the evaluation's fleet. */
export function writeConfidenceSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  fleetName = 'baseline',
): void {
  const ws = wb.addWorksheet(CONFIDENCE, {
    views: [{ state: 'frozen', ySplit: 5, xSplit: 3 }],
    pageSetup: FIT_TO_WIDTH,
  });
  const r = complianceConfidence(project, evaluation);
  writeTitle(
    ws,
    `How sure compliance is, fleet ${fleetName}`,
    `Every limit met at once: ${(100 * r.joint.probability).toFixed(2)} % ± ${(100 * r.joint.standardError).toFixed(2)} % (simulated, ${r.draws} draws, seed ${r.seed}); analytic bounds ${(100 * r.joint.lowerBound).toFixed(1)}–${(100 * r.joint.upperBound).toFixed(1)} %. ${CONFIDENCE_CAUTION}`,
  );
  const name = {
    phase: (id: string) => project.phases.find((p) => p.id === id)?.name ?? id,
    period: (id: string) => project.periods.find((p) => p.id === id)?.name ?? id,
    receiver: (id: string) => project.receivers.find((x) => x.id === id)?.name ?? id,
  };
  const cellColumns: TableColumn[] = [
    { header: 'Phase', role: 'text', width: 22 },
    { header: 'Period', role: 'text', width: 16 },
    { header: 'Receiver', role: 'text', width: 22 },
    { header: 'Level (rated)', role: 'core', numFmt: DB_FORMAT, width: 10 },
    { header: 'Limit', role: 'input', numFmt: DB_FORMAT, width: 9 },
    { header: 'Margin', role: 'core', numFmt: SIGNED_DB_FORMAT, width: 9 },
    { header: 'P(meet), simulated', role: 'core', numFmt: PCT, width: 11 },
    { header: 'Sampling error (1 s.e.; 3/n where no draw failed)', role: 'core', numFmt: PCT, width: 13 },
    { header: 'P(meet), analytic', role: 'core', numFmt: PCT, width: 11 },
    { header: `${BOUND_NAME}, simulated`, role: 'core', numFmt: DB_FORMAT, width: 12 },
    { header: '95 % range, low', role: 'core', numFmt: DB_FORMAT, width: 10 },
    { header: '95 % range, high', role: 'core', numFmt: DB_FORMAT, width: 10 },
  ];
  const cellRows = r.cells.map((c) => [
    name.phase(c.phaseId),
    name.period(c.periodId),
    name.receiver(c.receiverId),
    finite(c.levelDb),
    finite(c.limitDb),
    finite(c.marginDb),
    finite(c.simulated.probability),
    finite(c.simulated.standardError),
    finite(c.analytic.probability),
    finite(c.simulated.boundDb),
    finite(c.simulated.boundRangeDb[0]),
    finite(c.simulated.boundRangeDb[1]),
  ]);
  let row = writeTable(ws, 4, 'Probability of meeting each limit', cellColumns, cellRows).lastRow + 2;

  const s = r.model.settings;
  const settingRows = (Object.keys(UNCERTAINTY_NUMBERS) as (keyof typeof UNCERTAINTY_NUMBERS)[]).map((key) => [
    UNCERTAINTY_NUMBERS[key].workbookHeader,
    s[key],
    UNCERTAINTY_NUMBERS[key].unit,
    DEFAULT_UNCERTAINTY[key],
  ]);
  row =
    writeTable(
      ws,
      row,
      'Model settings (project file "uncertainty")',
      [
        { header: 'Setting', role: 'text', width: 22 },
        { header: 'Value', role: 'input', width: 10 },
        { header: 'Unit', role: 'text', width: 8 },
        { header: 'Default', role: 'text', width: 10 },
      ],
      settingRows,
    ).lastRow + 2;

  const machineRows = r.model.duties.map((d) => [
    d.dutyName,
    d.candidateLabel,
    finite(d.machine.kDb),
    d.machine.kAssumed ? 'assumed (none declared)' : 'declared',
    finite(d.machine.sigmaDb),
    finite(d.machine.centreShiftDb),
    d.onTime ? d.onTime.lowPct : null,
    d.onTime ? d.onTime.highPct : null,
  ]);
  row =
    writeTable(
      ws,
      row,
      'Machines: centred on the mean level, σ = K / f; on-time drawn uniformly between lowest and highest',
      [
        { header: 'Duty', role: 'text', width: 22 },
        { header: 'Machine', role: 'text', width: 16 },
        { header: 'K (dB)', role: 'input', numFmt: '0.0', width: 22 },
        { header: 'K from', role: 'text', width: 10 },
        { header: 'σ (dB)', role: 'core', numFmt: '0.00', width: 9 },
        { header: 'Mean − rated level (dB)', role: 'core', numFmt: SIGNED_DB_FORMAT, width: 11 },
        { header: 'On-time lowest (%)', role: 'input', width: 11 },
        { header: 'On-time highest (%)', role: 'input', width: 11 },
      ],
      machineRows,
    ).lastRow + 2;

  const pathRows = r.model.paths.map((p) => [
    project.duties.find((d) => d.id === p.dutyId)?.name ?? p.dutyId,
    name.receiver(p.receiverId),
    p.accuracyDb,
    p.sigmaDb,
    p.source,
  ]);
  row =
    writeTable(
      ws,
      row,
      'Paths: the method’s accuracy read as a standard deviation (one error per place and receiver, shared by every phase and period)',
      [
        { header: 'Duty (first at this place)', role: 'text', width: 22 },
        { header: 'Receiver', role: 'text', width: 16 },
        { header: 'Accuracy (± dB)', role: 'input', numFmt: '0.0', width: 22 },
        { header: 'σ (dB)', role: 'core', numFmt: '0.00', width: 10 },
        { header: 'From', role: 'text', width: 9 },
      ],
      pathRows,
    ).lastRow + 2;

  writeSection(ws, row, 'Assumptions', 6);
  for (const line of [...r.assumptions, CONFIDENCE_CAUTION]) {
    row += 1;
    const cell = ws.getCell(row, 1);
    cell.value = line;
    cell.font = NOTE_FONT;
  }
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
}
