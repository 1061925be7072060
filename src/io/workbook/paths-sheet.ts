/**
 * The paths sheet: for every duty and receiver, the distance and every term that takes the
 * machine's sound power to a level at the receiver — spreading or the ISO 9613-2:1996
 * attenuations, façade, screening, number of units, on-time and working hours — and their
 * sum. Every candidate of a duty shares its duty's row (attenuation depends on the path, not
 * the machine). Formulas refer to the inputs and assumptions sheets; the ISO terms D_c,
 * A_atm, A_gr, a barrier's D_z and the octave-band attenuations are written as values the
 * core computed (blue cells), with their labels. Under ISO 9613-2:1996 every column holds
 * the term with the sign it takes in the level (headed "−A_div", "+D_c"), screening is D_z in
 * A_bar = D_z − A_gr ≥ 0 (eq. 12, a formula) and C_met follows eqs 21, 22 from C0 (a formula).
 */
import { own } from '../../ledger/model/own.ts';
import type { CellValue, Workbook } from 'exceljs';
import type { Project } from '../../ledger/model/model.ts';
import { OCTAVE_BANDS_HZ, REFERENCE_RECEIVER_ID } from '../../ledger/model/model.ts';
import type { Term } from '../../ledger/model/results.ts';
import { buildPathTable, type PathEntry } from '../../ledger/prediction/path-table.ts';
import { dutyTerms } from '../../ledger/prediction/duty-terms.ts';
import { abs, formula, num, rel, text } from './cells.ts';
import { pairKey, type InputRefs } from './refs.ts';
import { SIGNED_DB_FORMAT, METRE_FORMAT, printSetup, writeTitle, FIT_TO_WIDTH } from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';
import { overlapDays, spanDays } from './time-formulas.ts';

export const PATHS = 'paths';

/** Where the sums of one (duty, receiver) row are, for the contributions sheet. */
export interface PathRow {
  /** Broadband path + receiver + duty terms, dB. */
  total: string;
  /** Receiver + duty terms alone (for machines with octave bands), dB. */
  nonPath?: string;
  /** The eight octave-band attenuations A, dB (positive), when the general method applies. */
  bands?: string;
}

export interface PathRefs {
  /** Key: pairKey(dutyId, receiverId). */
  rows: Map<string, PathRow>;
  /** Receiver ids the levels use: the project's receivers, or the reference receiver when there are none. */
  receiverIds: string[];
}

const termDb = (terms: readonly Term[], key: string): number => terms.find((t) => t.key === key)?.db ?? 0;

/** Writes the paths sheet. */
export function writePathsSheet(wb: Workbook, project: Project, inputs: InputRefs): PathRefs {
  const ws = wb.addWorksheet(PATHS, { views: [{ state: 'frozen', ySplit: 5, xSplit: 2 }], pageSetup: FIT_TO_WIDTH });
  const iso = project.propagation.method === 'iso9613-2:1996';
  const general =
    iso && project.propagation.method === 'iso9613-2:1996' && project.propagation.groundMethod === 'general';
  writeTitle(
    ws,
    'Paths: from sound power to level at each receiver',
    iso
      ? 'Per duty and receiver, dB added to the machine’s LWA: Lp = LWA + D_c − A_div − A_atm − A_gr − A_bar − C_met + corrections (ISO 9613-2:1996 eqs 3, 4, 6). d, A_div, A_bar and C_met are formulas; D_c, A_atm, A_gr and a barrier’s D_z (blue) are computed by the core and taken as given.'
      : 'Per duty and receiver, dB added to the machine’s LWA. Every cell is a formula on the inputs and assumptions sheets.',
  );
  const table = buildPathTable(project);
  const useReference = project.receivers.length === 0;
  const receiverIds = useReference ? [REFERENCE_RECEIVER_ID] : project.receivers.map((r) => r.id);

  const columns: TableColumn[] = [
    { header: 'Duty ID', role: 'text', width: 12 },
    { header: 'Receiver ID', role: 'text', width: 12 },
    { header: 'Distance d (m)', role: 'formula', numFmt: METRE_FORMAT, width: 10 },
  ];
  const add = (header: string, role: TableColumn['role']) => {
    columns.push({ header, role, numFmt: SIGNED_DB_FORMAT, width: 11 });
    return columns.length;
  };
  const col: Record<string, number> = {};
  if (iso) {
    const alternative =
      project.propagation.method === 'iso9613-2:1996' && project.propagation.groundMethod === 'alternative';
    col.dc = add(alternative ? '+D_c = D_Ω (eq. 11; core)' : '+D_c (0: general method; core)', 'core');
    col.adiv = add('−A_div = −(20·lg d + 11) (eq. 7)', 'formula');
    col.aatm = add('−A_atm, α at 500 Hz (eq. 8; core)', 'core');
    col.agr = add(alternative ? '−A_gr alternative (eq. 10; core)' : '−A_gr general at 500 Hz (Table 3; core)', 'core');
    col.abar = add('−A_bar = −max(0, D_z − A_gr) (eq. 12)', 'formula');
  } else {
    col.spreading = add('Spreading 10·lg(Q/(4πd²))', 'formula');
    col.abar = add('−D_z barrier on the plan, 500 Hz (eq. 14; core)', 'core');
  }
  col.facade = add('Façade', 'formula');
  if (!iso) col.screening = add('Screening', 'formula');
  if (iso) col.cmet = add('−C_met (eqs 21, 22)', 'formula');
  col.count = add('Units 10·lg n', 'formula');
  col.onTime = add('On-time 10·lg(η)', 'formula');
  col.workingHours = add('Working hours 10·lg(T_work/T)', 'formula');
  col.total = add('Total added to LWA (dB)', 'formula');
  col.nonPath = add('Receiver and duty terms only (dB)', 'formula');
  if (iso)
    col.dz = columns.push({
      header: 'Screening D_z (dB; rule of thumb, stated, or barrier from core)',
      role: 'formula',
      numFmt: '0.0',
      width: 11,
    });
  const bandStart = columns.length + 1;
  if (general) {
    OCTAVE_BANDS_HZ.forEach((hz) =>
      columns.push({ header: `A ${hz} Hz (dB; core)`, role: 'core', numFmt: '0.00', width: 9 }),
    );
  }
  // The plan's geometry of each path (version 7): the source point taken for a line or area,
  // and the barrier that cuts the line of sight with its ISO 9613-2:1996 eq. 16 distances.
  const geo = columns.length + 1;
  columns.push(
    { header: 'Source point x (m)', role: 'core', numFmt: METRE_FORMAT, width: 9 },
    { header: 'Source point y (m)', role: 'core', numFmt: METRE_FORMAT, width: 9 },
    { header: 'Barrier screening the path', role: 'text', width: 18 },
    { header: 'Path difference z (m; eq. 16)', role: 'core', numFmt: '0.000', width: 10 }, // negative: the line of sight passes over the top
    { header: 'd_ss source–edge (m)', role: 'core', numFmt: METRE_FORMAT, width: 9 },
    { header: 'd_sr edge–receiver (m)', role: 'core', numFmt: METRE_FORMAT, width: 9 },
    { header: 'a along the edge (m)', role: 'core', numFmt: METRE_FORMAT, width: 9 },
  );
  const noteCol = columns.length + 1;
  columns.push({ header: 'Note', role: 'text', width: 40 });

  const firstRow = 6;
  const nr = table.receiverIds.length;
  const rows: CellValue[][] = [];
  const refs: PathRefs = { rows: new Map(), receiverIds };
  project.duties.forEach((duty, u) => {
    const dutyRef = inputs.duties.get(duty.id);
    const duties = dutyTerms(project, duty);
    const phase = project.phases.find((p) => p.id === duty.phaseId);
    const phaseRef = phase ? inputs.phases.get(phase.id) : undefined;
    const periodRef = phase ? inputs.periods.get(phase.periodId) : undefined;
    receiverIds.forEach((receiverId) => {
      const row = firstRow + rows.length;
      const r = receiverId === REFERENCE_RECEIVER_ID ? nr - 1 : table.receiverIds.indexOf(receiverId);
      const entry = table.entries[u * nr + r] as PathEntry;
      const receiverRef = inputs.receivers.get(receiverId);
      const pair = inputs.pairs.get(pairKey(duty.id, receiverId));
      const values: CellValue[] = new Array(columns.length).fill(null);
      const set = (c: number, v: CellValue) => {
        values[c - 1] = v;
      };
      const here = (c: number) => rel(c, row);
      set(1, text(duty.id));
      set(2, text(receiverId));
      const d = here(3);
      // Distance
      if (receiverId === REFERENCE_RECEIVER_ID) {
        set(3, formula('ReferenceDistanceM', entry.distanceM));
      } else if (duty.location?.kind === 'distances' && pair) {
        set(3, formula(`${pair.statedDistance}`, entry.distanceM));
      } else if (duty.location?.kind === 'line' || duty.location?.kind === 'polygon') {
        // A line or area: the distance from its source point for this receiver (core; see the source point columns).
        set(3, num(entry.distanceM));
      } else if (dutyRef && receiverRef) {
        const hs = `IF(ISNUMBER(${dutyRef.sourceHeight}),${dutyRef.sourceHeight},DefaultSourceHeightM)`;
        set(
          3,
          formula(
            `SQRT((${receiverRef.x}-${dutyRef.x})^2+(${receiverRef.y}-${dutyRef.y})^2+(${hs}-${receiverRef.height})^2)`,
            entry.distanceM,
          ),
        );
      }
      const path = entry.pathTerms;
      const recv = entry.receiverTerms;
      if (receiverId === REFERENCE_RECEIVER_ID) {
        if (iso) {
          // The reference receiver always uses hemispherical spreading; its row carries it in the A_div column.
          set(col.adiv as number, formula(`10*LOG10(ReferenceQ/(4*PI()*${d}^2))`, termDb(path, 'spreading')));
          for (const k of ['dc', 'aatm', 'agr', 'abar']) set(col[k] as number, 0);
          set(col.cmet as number, 0);
        } else {
          set(col.spreading as number, formula(`10*LOG10(ReferenceQ/(4*PI()*${d}^2))`, termDb(path, 'spreading')));
          set(col.abar as number, 0);
          set(col.screening as number, 0);
        }
        set(col.facade as number, 0);
      } else {
        if (iso) {
          set(col.adiv as number, formula(`-(20*LOG10(${d})+AdivConstantDb)`, termDb(path, 'adiv')));
          for (const k of ['dc', 'aatm', 'agr']) set(col[k] as number, num(termDb(path, k)));
          const screening = own(project.receivers.find((x) => x.id === receiverId)?.screening, duty.id);
          const dzCell = here(col.dz as number);
          const dz = entry.dz;
          if (screening?.kind === 'barrier' || entry.barrier) {
            set(col.dz as number, dz === undefined ? null : num(dz));
          } else if (pair) {
            const k = pair.screeningKind;
            set(
              col.dz as number,
              formula(
                `IF(${k}="top-visible",ScreenTopVisibleDb,IF(${k}="hidden",ScreenHiddenDb,IF(AND(${k}="explicit",${pair.screeningDb}>0),${pair.screeningDb},"")))`,
                dz ?? '',
              ),
            );
          }
          set(
            col.abar as number,
            formula(`IF(ISNUMBER(${dzCell}),-MAX(0,${dzCell}+${here(col.agr as number)}),0)`, termDb(path, 'abar')),
          );
          if (dutyRef && receiverRef) {
            const hs = `IF(ISNUMBER(${dutyRef.sourceHeight}),${dutyRef.sourceHeight},DefaultSourceHeightM)`;
            const span = `10*(${hs}+${receiverRef.height})`;
            const dp = `SQRT(${d}^2-(${hs}-${receiverRef.height})^2)`;
            set(col.cmet as number, formula(`-IF(${dp}<=${span},0,C0Db*(1-${span}/${dp}))`, termDb(recv, 'cmet')));
          } else {
            set(col.cmet as number, num(termDb(recv, 'cmet')));
          }
        } else {
          set(col.spreading as number, formula(`10*LOG10(DirectivityQ/(4*PI()*${d}^2))`, termDb(path, 'spreading')));
          set(col.abar as number, num(termDb(path, 'abar')));
        }
        set(
          col.facade as number,
          receiverRef ? formula(`IF(${receiverRef.facade}=TRUE,FacadeDb,0)`, termDb(recv, 'facade')) : 0,
        );
        if (pair && !iso) {
          const k = pair.screeningKind;
          set(
            col.screening as number,
            formula(
              `-IF(${k}="top-visible",ScreenTopVisibleDb,IF(${k}="hidden",ScreenHiddenDb,IF(${k}="explicit",${pair.screeningDb},0)))`,
              termDb(recv, 'screening'),
            ),
          );
        }
      }
      if (dutyRef) {
        set(col.count as number, formula(`10*LOG10(${dutyRef.count})`, termDb(duties.terms, 'count')));
        set(col.onTime as number, formula(`10*LOG10(${dutyRef.onTime}/100)`, termDb(duties.terms, 'onTime')));
      }
      if (phaseRef && periodRef) {
        const worked = overlapDays(phaseRef.start, phaseRef.end, periodRef.start, periodRef.end);
        set(
          col.workingHours as number,
          formula(
            `10*LOG10(${worked}/${spanDays(periodRef.start, periodRef.end)})`,
            duties.problem ? NaN : termDb(duties.terms, 'workingHours'),
          ),
        );
      } else {
        set(col.workingHours as number, formula('NA()', NaN));
      }
      const first = here(4);
      const lastTerm = here(col.workingHours as number);
      const broadband = (table.broadbandDb[u * nr + r] as number) + duties.db;
      const problem = entry.problem ?? duties.problem;
      set(col.total as number, formula(problem ? 'NA()' : `SUM(${first}:${lastTerm})`, problem ? NaN : broadband));
      const nonPathFirst = here(col.facade as number);
      set(
        col.nonPath as number,
        formula(
          problem ? 'NA()' : `SUM(${nonPathFirst}:${lastTerm})`,
          problem ? NaN : (table.receiverDb[u * nr + r] as number) + duties.db,
        ),
      );
      const rowRef: PathRow = {
        total: abs(PATHS, col.total as number, row),
        nonPath: abs(PATHS, col.nonPath as number, row),
      };
      if (general && entry.bandAttenuationDb) {
        entry.bandAttenuationDb.forEach((a, b) => set(bandStart + b, num(a)));
        rowRef.bands = `${abs(PATHS, bandStart, row)}:${abs(PATHS, bandStart + 7, row).replace(`${PATHS}!`, '')}`;
      }
      const at = entry.sourceAt;
      if (at) {
        set(geo, num(at.x));
        set(geo + 1, num(at.y));
      }
      const b = entry.barrier;
      if (b) {
        set(geo + 2, text(b.barrierName));
        set(geo + 3, num(b.pathDifferenceM));
        set(geo + 4, num(b.sourceToEdgeM));
        set(geo + 5, num(b.edgeToReceiverM));
        set(geo + 6, num(b.lateralM));
      }
      const labels = [...path, ...recv].filter((t) => t.key !== 'facade').map((t) => t.label);
      set(noteCol, text(problem ? `not computed: ${problem}` : [...labels, ...(entry.notes ?? [])].join('; ')));
      rows.push(values);
      refs.rows.set(pairKey(duty.id, receiverId), rowRef);
    });
  });
  writeTable(ws, 4, 'Path terms, dB (signed: negative lowers the level)', columns, rows);
  printSetup(ws, { landscape: true, repeatRows: [5, 5] });
  return refs;
}
