/**
 * The contributions sheet: one row per candidate machine. Its rated LWA (a formula on the
 * declared value, K and the level basis, with how it is found in words; a STAND-IN, amber,
 * where the directive's permissible level replaces a missing declared value), its character
 * penalty (its own term, from the assumptions sheet), whether it is the chosen candidate of
 * its duty, and per receiver its contribution LAeq,T and the energy it adds when chosen — the
 * quantity the levels sheet sums. All formulas, each with its cached result.
 *
 * Contribution = rated LWA + penalty + path total (paths sheet); for a machine with
 * octave-band sound power under the ISO 9613-2:1996 general method, the path is applied band
 * by band to its A-weighted spectrum:
 *   10·lg[Σ_b 10^((Lw_b + A_b,weight)/10)·10^(−A_b/10) / Σ_b 10^((Lw_b + A_b,weight)/10)].
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { hasBands } from '../../ledger/rating/rated-level.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { aWeightedTotalDb } from '../../core/standards/iec61672-1-2013.ts';
import { ratioFromDb } from '../../core/decibel.ts';
import { SharedColumnFormulas, absColumnRange, columnLetter, formula, num, text } from './cells.ts';
import { pairKey, type CandidateRef, type DutyRef, type InputRefs } from './refs.ts';
import { ratedWorkingWords } from './candidate-notes.ts';
import type { PathRefs } from './paths-sheet.ts';
import { DB_FORMAT, STAND_IN_DB_FORMAT, printSetup, writeTitle, FIT_TO_WIDTH } from './styles.ts';
import { rowsOf, writeStreamedTable, type TableColumn } from './table.ts';
import { candidatesInTableOrder } from './inputs-sheet.ts';
import { own } from '../../ledger/model/own.ts';

export const CONTRIBUTIONS = 'contributions';

export interface ContributionRefs {
  /** Range of the phase-id column over every candidate row. */
  phaseRange: string;
  /** Range of the character-penalty column over every candidate row. */
  penaltyRange: string;
  /** Range of the energy-when-chosen column per receiver id. */
  energyRange: Map<string, string>;
  /** Range of the contribution column per receiver id. */
  levelRange: Map<string, string>;
  /** Row of each candidate. */
  rowOf: Map<string, number>;
}

/** Column numbers of the fixed part of the sheet (receiver columns follow). */
const COL = { id: 1, duty: 2, phase: 3, declared: 4, standIn: 5, rated: 6, working: 7, penalty: 8, chosen: 9 } as const;
const L = (column: number) => columnLetter(column);

/** Formula templates of one duty's candidates ({r}: the row here, {i}: the row on the inputs sheet). */
interface Templates {
  phase?: string;
  declared: string;
  rated: string;
  penalty: string;
  chosen?: string;
  /** Per receiver: the contribution template, or undefined when the pair has no path row. */
  levels: (string | undefined)[];
  energies: string[];
}

/** An inputs-sheet address of a candidate's row as a template: its row becomes {i}. */
const inputCell = (address: string) => address.replace(/\$(\d+)$/, '{i}');
const inputRange = (range: string) => range.replace(/\$(\d+):/, '{i}:').replace(/\$(\d+)$/, '{i}');

function templatesFor(
  ref: CandidateRef,
  duty: DutyRef | undefined,
  bands: boolean,
  receiverIds: readonly string[],
  paths: PathRefs,
  dutyId: string,
): Templates {
  const id = inputCell(ref.id);
  const lwa = inputCell(ref.lwa);
  const band = inputRange(ref.bands);
  const declaration = inputCell(ref.declaration);
  const k = inputCell(ref.uncertainty);
  const D = `${L(COL.declared)}{r}`;
  const E = `${L(COL.standIn)}{r}`;
  const F = `${L(COL.rated)}{r}`;
  const H = `${L(COL.penalty)}{r}`;
  const fixed = COL.chosen;
  const t: Templates = {
    declared: `IF(ISBLANK(${lwa}),IF(COUNT(${band})=8,10*LOG10(SUMPRODUCT(10^((${band}+AWeightingDb)/10))),NA()),IF(ISNUMBER(${lwa}),${lwa},NA()))`,
    rated: `IF(AND(ISBLANK(${lwa}),COUNT(${band})<8),IF(ISNUMBER(${E}),${E},NA()),IF(LevelBasis="guaranteed",IF(${declaration}="measured",${D}+N(${k}),${D}),IF(${declaration}="guaranteed",${D}-N(${k}),${D})))`,
    penalty: `IF(${inputCell(ref.character)}="none",0,CharacterPenaltyDb)`,
    levels: receiverIds.map((receiverId) => {
      const path = paths.rows.get(pairKey(dutyId, receiverId));
      if (!path) return undefined;
      if (bands && path.bands && path.nonPath) {
        const spectrum = `10^((${band}+AWeightingDb)/10)`;
        return `${F}+${H}+${path.nonPath}+10*LOG10(SUMPRODUCT(${spectrum}*10^(-${path.bands}/10))/SUMPRODUCT(${spectrum}))`;
      }
      return `${F}+${H}+${path.total}`;
    }),
    energies: receiverIds.map((_, k2) => `IF($${L(COL.chosen)}{r}=1,10^(${L(fixed + 1 + k2)}{r}/10),0)`),
  };
  if (duty) {
    t.phase = duty.phaseId;
    t.chosen = `IF(${id}=${duty.chosen},1,0)`;
  }
  return t;
}

/**
 * Writes the contributions sheet. O(candidates × receivers); each row made as it is written
 * (`options.pause`: the streaming writer's wait between blocks of rows).
 */
export async function writeContributionsSheet(
  wb: Workbook,
  project: Project,
  evaluation: Evaluation,
  inputs: InputRefs,
  paths: PathRefs,
  checks: Record<string, CandidateCheck>,
  options: { shareFormulas: boolean; pause?: (() => Promise<void>) | undefined },
): Promise<ContributionRefs> {
  const ws = wb.addWorksheet(CONTRIBUTIONS, {
    views: [{ state: 'frozen', ySplit: 5, xSplit: 1 }],
    pageSetup: FIT_TO_WIDTH,
  });
  writeTitle(
    ws,
    'Contributions of each machine at each receiver, dB LAeq,T',
    'LWA used + character penalty + path total (paths sheet). "Chosen" compares the candidate with the duty’s CHOSEN cell on the inputs sheet; the levels sheet sums 10^(L/10) of the chosen rows. A STAND-IN level (amber) is the permissible level used where no LWA is declared.',
  );
  const receiverIds = paths.receiverIds;
  const receiverName = (id: string) => project.receivers.find((r) => r.id === id)?.name ?? 'reference receiver';
  const columns: TableColumn[] = [
    { header: 'Candidate ID', role: 'text', width: 12 },
    { header: 'Duty ID', role: 'text', width: 12 },
    { header: 'Phase ID', role: 'formula', width: 12 },
    { header: 'LWA declared, or from octave bands (dB)', role: 'formula', numFmt: DB_FORMAT, width: 12 },
    // Written only where a stand-in applies: amber, and the number reads "101.0 dB STAND-IN".
    {
      header: 'STAND-IN: permissible LWA where none is declared (dB; core)',
      role: 'stand-in',
      numFmt: STAND_IN_DB_FORMAT,
      width: 19,
    },
    { header: `LWA used (dB; basis in LevelBasis)`, role: 'formula', numFmt: DB_FORMAT, width: 10 },
    { header: 'How the rated LWA is found', role: 'text', width: 28, wrap: true },
    { header: 'Character penalty (dB; CharacterPenaltyDb)', role: 'formula', numFmt: DB_FORMAT, width: 14 },
    { header: 'Chosen (1 = yes)', role: 'formula', width: 8 },
  ];
  const fixed = columns.length;
  receiverIds.forEach((id) => {
    columns.push({ header: `At ${text(receiverName(id))} (dB)`, role: 'formula', numFmt: DB_FORMAT, width: 12 });
  });
  receiverIds.forEach((id) => {
    columns.push({
      header: `Energy if chosen, ${text(receiverName(id))} (10^(L/10))`,
      role: 'formula',
      numFmt: '0.000E+00',
      width: 14,
    });
  });

  const firstRow = 6;
  const candidates = candidatesInTableOrder(project);
  const rowOf = new Map<string, number>();
  const shared = new SharedColumnFormulas(inputs.candidateRows.first - firstRow, options.shareFormulas);
  const dutyById = new Map(project.duties.map((d) => [d.id, d]));
  const cache = new Map<string, Templates>();
  const rows = rowsOf(candidates, (c, i) => {
    const row = firstRow + i;
    rowOf.set(c.id, row);
    const ref = inputs.candidates.get(c.id) as CandidateRef;
    const duty = inputs.duties.get(c.dutyId);
    const bands = hasBands(c);
    const key = `${c.dutyId}\u0000${bands ? 1 : 0}`;
    let t = cache.get(key);
    if (!t) {
      t = templatesFor(ref, duty, bands, receiverIds, paths, c.dutyId);
      cache.set(key, t);
    }
    const check = own(checks, c.id);
    const declaredBlank = c.lwaDb === undefined || c.lwaDb === null;
    const declaredValue = declaredBlank
      ? bands
        ? aWeightedTotalDb(c.bandsDb as number[])
        : NaN
      : typeof c.lwaDb === 'number' && Number.isFinite(c.lwaDb)
        ? c.lwaDb
        : NaN;
    const chosen = own(evaluation.fleet, c.dutyId) === c.id ? 1 : 0;
    const values: CellValue[] = new Array(columns.length);
    values[COL.id - 1] = text(c.id);
    values[COL.duty - 1] = text(c.dutyId);
    values[COL.phase - 1] = t.phase
      ? shared.cell(COL.phase, row, t.phase, text(dutyById.get(c.dutyId)?.phaseId ?? ''))
      : null;
    values[COL.declared - 1] = shared.cell(COL.declared, row, t.declared, declaredValue);
    values[COL.standIn - 1] = check?.standIn ? num(check.ratedLwaDb) : null;
    values[COL.rated - 1] = shared.cell(COL.rated, row, t.rated, check?.ratedLwaDb ?? NaN);
    values[COL.working - 1] = text(ratedWorkingWords(check));
    values[COL.penalty - 1] = shared.cell(COL.penalty, row, t.penalty, check?.penaltyDb ?? 0);
    values[COL.chosen - 1] = t.chosen ? shared.cell(COL.chosen, row, t.chosen, chosen) : 0;
    receiverIds.forEach((receiverId, k) => {
      const level = evaluation.contributionDb(c.id, receiverId);
      const template = t.levels[k];
      values[fixed + k] = template ? shared.cell(fixed + 1 + k, row, template, level) : formula('NA()', NaN);
      values[fixed + receiverIds.length + k] = shared.cell(
        fixed + receiverIds.length + 1 + k,
        row,
        t.energies[k] as string,
        chosen ? ratioFromDb(level) : 0,
      );
    });
    return values;
  });
  const place = await writeStreamedTable(ws, 4, 'Contributions (formulas)', columns, rows, {
    sparse: true,
    pause: options.pause,
  });
  const last = Math.max(place.lastRow, place.firstRow);
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
  return {
    phaseRange: absColumnRange(CONTRIBUTIONS, COL.phase, place.firstRow, last),
    penaltyRange: absColumnRange(CONTRIBUTIONS, COL.penalty, place.firstRow, last),
    energyRange: new Map(
      receiverIds.map((id, k) => [
        id,
        absColumnRange(CONTRIBUTIONS, fixed + receiverIds.length + 1 + k, place.firstRow, last),
      ]),
    ),
    levelRange: new Map(
      receiverIds.map((id, k) => [id, absColumnRange(CONTRIBUTIONS, fixed + 1 + k, place.firstRow, last)]),
    ),
    rowOf,
  };
}
