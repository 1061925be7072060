/**
 * The contributions sheet: one row per candidate machine. Its rated LWA (a formula on the
 * declared value, K and the level basis), its character penalty, whether it is the chosen
 * candidate of its duty, and per receiver its contribution LAeq,T and the energy it adds when
 * chosen — the quantity the levels sheet sums. All formulas, each with its cached result.
 *
 * Contribution = rated LWA + penalty + path total (paths sheet); for a machine with
 * octave-band sound power under the ISO 9613-2:1996 general method, the path is applied band
 * by band to its A-weighted spectrum:
 *   10·lg[Σ_b 10^((Lw_b + A_b,weight)/10)·10^(−A_b/10) / Σ_b 10^((Lw_b + A_b,weight)/10)].
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Project } from '../../ledger/model.ts';
import type { Evaluation } from '../../ledger/results.ts';
import { hasBands, ratedLevel } from '../../ledger/rated-level.ts';
import { aWeightedTotalDb } from '../../core/standards/iec61672-1-2013.ts';
import { ratioFromDb } from '../../core/decibel.ts';
import { SharedColumnFormulas, absColumnRange, columnLetter, formula, text } from './cells.ts';
import { pairKey, type InputRefs } from './refs.ts';
import type { PathRefs } from './paths-sheet.ts';
import { DB_FORMAT, printSetup, writeTitle } from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';
import { candidatesInTableOrder } from './inputs-sheet.ts';

export const CONTRIBUTIONS = 'contributions';

export interface ContributionRefs {
  /** Range of the phase-id column over every candidate row. */
  phaseRange: string;
  /** Range of the energy-when-chosen column per receiver id. */
  energyRange: Map<string, string>;
  /** Range of the contribution column per receiver id. */
  levelRange: Map<string, string>;
  /** Row of each candidate. */
  rowOf: Map<string, number>;
}

/** Writes the contributions sheet. */
export function writeContributionsSheet(wb: Workbook, project: Project, evaluation: Evaluation, inputs: InputRefs, paths: PathRefs): ContributionRefs {
  const ws = wb.addWorksheet(CONTRIBUTIONS, { views: [{ state: 'frozen', ySplit: 5, xSplit: 1 }] });
  writeTitle(
    ws,
    'Contributions of each machine at each receiver, dB LAeq,T',
    'Rated LWA + character penalty + path total (paths sheet). "Chosen" compares the candidate with the duty’s CHOSEN cell on the inputs sheet; the levels sheet sums 10^(L/10) of the chosen rows.',
  );
  const receiverIds = paths.receiverIds;
  const receiverName = (id: string) => project.receivers.find((r) => r.id === id)?.name ?? 'reference receiver';
  const columns: TableColumn[] = [
    { header: 'Candidate ID', role: 'text', width: 12 },
    { header: 'Duty ID', role: 'text', width: 12 },
    { header: 'Phase ID', role: 'formula', width: 12 },
    { header: 'LWA declared, or from octave bands (dB)', role: 'formula', numFmt: DB_FORMAT, width: 12 },
    { header: 'Permissible stand-in, Directive 2000/14/EC (dB; core)', role: 'core', numFmt: DB_FORMAT, width: 12 },
    { header: 'Rated LWA (dB)', role: 'formula', numFmt: DB_FORMAT, width: 10 },
    { header: 'Character penalty (dB)', role: 'formula', numFmt: DB_FORMAT, width: 10 },
    { header: 'Chosen (1 = yes)', role: 'formula', width: 8 },
  ];
  const fixed = columns.length;
  receiverIds.forEach((id) => {
    columns.push({ header: `At ${text(receiverName(id))} (dB)`, role: 'formula', numFmt: DB_FORMAT, width: 12 });
  });
  receiverIds.forEach((id) => {
    columns.push({ header: `Energy if chosen, ${text(receiverName(id))} (10^(L/10))`, role: 'formula', numFmt: '0.000E+00', width: 12 });
  });

  const firstRow = 6;
  const candidates = candidatesInTableOrder(project);
  const rowOf = new Map<string, number>();
  const shared = new SharedColumnFormulas(inputs.candidateRows.first - firstRow);
  /** An inputs-sheet address of this candidate's row, as a template ({i} = its row). */
  const inputCell = (address: string | undefined) => (address ? address.replace(/\$(\d+)$/, '{i}') : '""');
  const inputRange = (range: string | undefined) => (range ? range.replace(/\$(\d+):/, '{i}:').replace(/\$(\d+)$/, '{i}') : '""');
  const rows: CellValue[][] = candidates.map((c, i) => {
    const row = firstRow + i;
    rowOf.set(c.id, row);
    const ref = inputs.candidates.get(c.id);
    const duty = inputs.duties.get(c.dutyId);
    const phaseId = project.duties.find((d) => d.id === c.dutyId)?.phaseId ?? '';
    const rated = ratedLevel(c, project.settings);
    const bands = hasBands(c);
    const declaredBlank = c.lwaDb === undefined || c.lwaDb === null;
    const basisValue = declaredBlank ? (bands ? aWeightedTotalDb(c.bandsDb as number[]) : NaN) : typeof c.lwaDb === 'number' && Number.isFinite(c.lwaDb) ? c.lwaDb : NaN;
    const chosen = evaluation.fleet[c.dutyId] === c.id ? 1 : 0;
    const values: CellValue[] = [];
    const id = inputCell(ref?.id);
    const L = inputCell(ref?.lwa);
    const B = inputRange(ref?.bands);
    const D = inputCell(ref?.declaration);
    const K = inputCell(ref?.uncertainty);
    const put = (template: string, result: number | string | boolean) => values.push(shared.cell(values.length + 1, row, template, result));
    values.push(text(c.id));
    values.push(text(c.dutyId));
    if (duty) put(duty.phaseId, text(phaseId));
    else values.push('');
    put(`IF(ISBLANK(${L}),IF(COUNT(${B})=8,10*LOG10(SUMPRODUCT(10^((${B}+AWeightingDb)/10))),NA()),IF(ISNUMBER(${L}),${L},NA()))`, basisValue);
    values.push(rated.standIn ? rated.lwaDb : null);
    put(
      `IF(AND(ISBLANK(${L}),COUNT(${B})<8),IF(ISNUMBER(E{r}),E{r},NA()),IF(LevelBasis="guaranteed",IF(${D}="measured",D{r}+N(${K}),D{r}),IF(${D}="guaranteed",D{r}-N(${K}),D{r})))`,
      rated.lwaDb,
    );
    put(`IF(${inputCell(ref?.character)}="none",0,CharacterPenaltyDb)`, c.character === 'none' ? 0 : project.settings.characterPenaltyDb);
    if (duty && ref) put(`IF(${id}=${duty.chosen},1,0)`, chosen);
    else values.push(0);
    const levels = receiverIds.map((receiverId) => evaluation.contributionDb(c.id, receiverId));
    receiverIds.forEach((receiverId, k) => {
      const path = paths.rows.get(pairKey(c.dutyId, receiverId));
      if (!path) {
        values.push(formula('NA()', NaN));
        return;
      }
      if (bands && path.bands && path.nonPath) {
        const spectrum = `10^((${B}+AWeightingDb)/10)`;
        put(`F{r}+G{r}+${path.nonPath}+10*LOG10(SUMPRODUCT(${spectrum}*10^(-${path.bands}/10))/SUMPRODUCT(${spectrum}))`, levels[k] as number);
      } else {
        put(`F{r}+G{r}+${path.total}`, levels[k] as number);
      }
    });
    receiverIds.forEach((_, k) => {
      const level = levels[k] as number;
      put(`IF($H{r}=1,10^(${columnLetter(fixed + 1 + k)}{r}/10),0)`, chosen ? ratioFromDb(level) : 0);
    });
    return values;
  });
  const place = writeTable(ws, 4, 'Contributions (formulas)', columns, rows);
  const last = Math.max(place.lastRow, place.firstRow);
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
  return {
    phaseRange: absColumnRange(CONTRIBUTIONS, 3, place.firstRow, last),
    energyRange: new Map(receiverIds.map((id, k) => [id, absColumnRange(CONTRIBUTIONS, fixed + receiverIds.length + 1 + k, place.firstRow, last)])),
    levelRange: new Map(receiverIds.map((id, k) => [id, absColumnRange(CONTRIBUTIONS, fixed + 1 + k, place.firstRow, last)])),
    rowOf,
  };
}

