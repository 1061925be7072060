/**
 * The shortlist sheet: the fleet this workbook evaluates, next to the cheapest compliant
 * fleet the optimiser found, the hand method's fleet and the baseline, with their costs and
 * the saving over the hand method; then each duty's ranking at its phase's worst receiver
 * (level, reduction, cost, dB per 1,000 of extra cost, flags). Values as the ledger computed
 * them at export: this sheet does not recalculate.
 */
import type { CellValue, Workbook } from 'exceljs';
import type { Candidate, Fleet, Project } from '../../ledger/model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../../ledger/model/model.ts';
import type { RankingRow } from '../../ledger/model/results.ts';
import { rankEveryDuty, type DutyRanking } from '../../ledger/ranking/rank-every-duty.ts';
import { OFF_BASIS_MARK } from '../../ledger/rating/rating.ts';
import { rankingUncertainty, type RankingUncertainty } from '../../ledger/ranking/ranking-uncertainty.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { num, text } from './cells.ts';
import { STAND_IN_MARK } from './candidate-notes.ts';
import {
  CELL_BORDER,
  DB_FORMAT,
  NOTE_FONT,
  SIGNED_DB_FORMAT,
  STAND_IN_FILL,
  STAND_IN_FONT,
  moneyFormat,
  printSetup,
  writeTitle,
  FIT_TO_WIDTH,
} from './styles.ts';
import { writeTable, type TableColumn } from './table.ts';
import type { WorkbookExportOptions } from './index.ts';
import { own } from '../../ledger/model/own.ts';
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

export const SHORTLIST = 'shortlist';

/**
 * Rows of a duty's ranking the sheet lists: the quietest this many, plus the baseline and
 * the chosen candidate wherever they rank. Every candidate's level is on the contributions
 * sheet whatever its rank.
 */
export const RANKING_ROWS_PER_DUTY = 40;

/** Pairs named in a duty's too-close-to-call note; the rest are counted. */
export const CLOSE_PAIRS_NAMED = 4;

/**
 * The too-close-to-call note of a duty's ranking: which pairs could swap places within the
 * declared uncertainty ±K (K as ISO 4871:1996 declares it; the rule is the ledger's own),
 * or that the order holds.
 * @example closeCallNote(u) // "TOO CLOSE TO CALL within ±K (the ledger’s own rule, …): places 1–2 could change. Robot (104.0 dB) and Crusher (105.0 dB) differ by 1.0 dB, within K 3.0 dB."
 */
export function closeCallNote(u: RankingUncertainty): string {
  if (u.firm) return u.summary;
  const moving = u.places.filter((p) => p.bestPlace !== p.worstPlace).length;
  const named = u.closePairs.slice(0, CLOSE_PAIRS_NAMED).map((p) => p.words.replace(/: too close to call$/, ''));
  const more = u.closePairs.length - named.length;
  return `TOO CLOSE TO CALL within ±K (the ledger’s own rule, not ISO 4871’s: levels no further apart than the larger K): ${moving} place${moving === 1 ? '' : 's'} could change. ${named.join('; ')}${more > 0 ? `; and ${more} more pair${more === 1 ? '' : 's'}` : ''}.`;
}

/** Words for a ranking row's flags. */
export function rankingFlags(row: RankingRow, standIn = false): string {
  const flags: string[] = [];
  if (standIn) flags.push('STAND-IN LWA');
  if (row.isBaseline) flags.push('baseline');
  if (row.freeWin) flags.push(FLAG_WORDS.freeWin);
  if (row.dominated) flags.push(FLAG_WORDS.dominated);
  if (row.overLimit) flags.push('OVER limit');
  if (row.offBasis) flags.push(`${OFF_BASIS_MARK}: ${row.offBasis}`);
  return flags.join(', ');
}

/** Writes the shortlist sheet. */
export function writeShortlistSheet(
  wb: Workbook,
  project: Project,
  options: WorkbookExportOptions,
  checks: Record<string, CandidateCheck>,
): void {
  const ws = wb.addWorksheet(SHORTLIST, { views: [{ state: 'frozen', ySplit: 2 }], pageSetup: FIT_TO_WIDTH });
  const { evaluation, optimise } = options;
  const money = moneyFormat(project.currency);
  writeTitle(
    ws,
    'Shortlist: fleets and rankings',
    'Values as the ledger computed them at export (this sheet does not recalculate; the levels and compliance sheets do). Costs cover every unit for the duty’s duration.',
  );
  const candidateById = new Map(project.candidates.map((c) => [c.id, c]));
  const label = (id: string | undefined) => (id ? text(candidateById.get(id)?.label ?? id) : '');
  /** "Machine [id]", with the stand-in marker where no LWA is declared. */
  const named = (id: string) => `${label(id)} [${text(id)}]${own(checks, id)?.standIn ? ` — ${STAND_IN_MARK}` : ''}`;
  const cost = (id: string | undefined) => (id ? num(own(evaluation.costs, id)?.total) : null);
  const phaseName = (id: string) => text(project.phases.find((p) => p.id === id)?.name ?? id);

  const fleets: { title: string; fleet: Fleet }[] = [{ title: 'Chosen in this workbook', fleet: evaluation.fleet }];
  if (optimise) {
    fleets.push({
      title: optimise.feasible ? 'Cheapest compliant (optimiser)' : 'Least exceedance (optimiser; no fleet complies)',
      fleet: optimise.best.fleet,
    });
    fleets.push({ title: 'Best-buy-first fleet (most dB per cost first, as by hand)', fleet: optimise.hand.fleet });
    fleets.push({ title: 'Baseline (what would be used anyway)', fleet: optimise.baseline.fleet });
  }
  const columns: TableColumn[] = [
    { header: 'Duty ID', role: 'text', width: 12 },
    { header: 'Duty', role: 'text', width: 36 },
    { header: 'Phase', role: 'text', width: 28 },
  ];
  for (const f of fleets) {
    columns.push({ header: `${f.title}: machine`, role: 'text', width: 30 });
    columns.push({ header: `Cost (${text(project.currency)})`, role: 'text', numFmt: money, width: 13 });
  }
  const rows: CellValue[][] = project.duties.map((d) => [
    text(d.id),
    text(d.name),
    phaseName(d.phaseId),
    ...fleets.flatMap((f) => {
      const id = own(f.fleet, d.id);
      return [id ? named(id) : '', cost(id)];
    }),
  ]);
  const totals: number[] = [evaluation.fleetCost];
  if (optimise) totals.push(optimise.best.cost, optimise.hand.cost, optimise.baseline.cost);
  rows.push(['', 'Total', '', ...totals.flatMap((t) => ['', num(t)])]);
  const fleetPlace = writeTable(ws, 4, 'Fleets', columns, rows);
  // The total row: bold (a whole new style per cell; the table's styles are shared).
  ws.getRow(fleetPlace.lastRow).eachCell((cell) => {
    cell.style = { ...cell.style, font: { bold: true } };
  });

  let row = fleetPlace.lastRow + 2;
  const lines: string[] = [];
  if (optimise) {
    lines.push(optimise.message);
    lines.push(
      optimise.proven
        ? 'The optimiser’s fleet is proven the cheapest (exact mixed-integer solution, HiGHS).'
        : 'The optimiser stopped before proving its fleet the cheapest.',
    );
    lines.push(
      optimise.hand.compliant
        ? 'The best-buy-first fleet meets every limit.'
        : 'The best-buy-first fleet does not meet every limit.',
    );
    if (optimise.savingOverHand !== undefined && Number.isFinite(optimise.savingOverHand)) {
      const s = ws.getCell(row, 2);
      s.value = 'Saving over the best-buy-first fleet';
      s.font = { bold: true };
      const v = ws.getCell(row, 3);
      v.value = optimise.savingOverHand;
      v.numFmt = money;
      v.font = { bold: true };
      row += 1;
    }
  } else {
    lines.push(
      'The optimiser was not run for this export: no cheapest compliant fleet or saving over the best-buy-first fleet to show.',
    );
  }
  for (const line of lines) {
    const cell = ws.getCell(row, 1);
    cell.value = text(line);
    cell.font = NOTE_FONT;
    row += 1;
  }
  row += 1;

  const rankColumns: TableColumn[] = [
    { header: 'Duty ID', role: 'text' },
    { header: 'Machine [candidate ID]', role: 'text', width: 28 },
    { header: 'Ranked at receiver', role: 'text' },
    { header: 'Rank', role: 'text', width: 6 },
    { header: 'Could rank within ±K (blank: firm; among those listed)', role: 'text', width: 12 },
    { header: 'Contribution (dB)', role: 'text', numFmt: DB_FORMAT, width: 11 },
    { header: 'Phase total with it (dB)', role: 'text', numFmt: DB_FORMAT, width: 11 },
    { header: 'Reduction vs baseline (dB)', role: 'text', numFmt: SIGNED_DB_FORMAT, width: 11 },
    { header: `Cost (${text(project.currency)})`, role: 'text', numFmt: money, width: 12 },
    { header: `Extra cost (${text(project.currency)})`, role: 'text', numFmt: money, width: 12 },
    { header: 'dB per 1,000 extra', role: 'text', numFmt: '0.00', width: 10 },
    { header: `Cost per dB (${text(project.currency)})`, role: 'text', numFmt: money, width: 12 },
    { header: 'Flags', role: 'text', width: 22 },
  ];
  const rankRows: CellValue[][] = [];
  /** Index in rankRows of each duty's note and of each stand-in row, to style them after. */
  const noteRows: number[] = [];
  const standInRows: number[] = [];
  // Every duty at its phase's worst receiver for the baseline fleet, or the reference receiver when there is none
  // (no receiver yet: a buyer comparing machines without a site) — the report's and `ledger evaluate`'s rule.
  let every: DutyRanking[] | undefined;
  for (const [dutyIndex, duty] of project.duties.entries()) {
    const given = own(options.rankings, duty.id);
    const ranked = given ?? (every ??= rankEveryDuty(project, evaluation))[dutyIndex];
    const receiverId = ranked?.receiverId ?? REFERENCE_RECEIVER_ID;
    const ranking = ranked?.rows ?? [];
    const receiverName =
      receiverId === REFERENCE_RECEIVER_ID
        ? `reference receiver at ${project.settings.referenceDistanceM} m (Q = 2)`
        : text(project.receivers.find((r) => r.id === receiverId)?.name ?? receiverId);
    const chosenId = own(evaluation.fleet, duty.id);
    const shown = ranking.filter((r, i) => i < RANKING_ROWS_PER_DUTY || r.isBaseline || r.candidateId === chosenId);
    // Which listed candidates could swap places within ±K, among the candidates listed (every
    // pair is compared: O(listed²), where the whole ranking could hold thousands of pairs).
    const uncertainty = rankingUncertainty(
      shown,
      shown.map((r) => candidateById.get(r.candidateId)).filter((c): c is Candidate => c !== undefined),
    );
    // Places count the listed rows with a level, quietest first; shown as the ranks they hold.
    const ranks = shown
      .filter((r) => Number.isFinite(r.contributionDb))
      .map((r) => r.rank)
      .sort((a, b) => a - b);
    const rankAt = (place: number) => ranks[place - 1] ?? place;
    const placeOf = new Map(
      uncertainty.places
        .filter((p) => p.bestPlace !== p.worstPlace)
        .map((p) => [p.candidateId, `${rankAt(p.bestPlace)}–${rankAt(p.worstPlace)}`]),
    );
    for (const r of shown) {
      const standIn = own(checks, r.candidateId)?.standIn === true;
      if (standIn) standInRows.push(rankRows.length);
      rankRows.push([
        text(duty.id),
        named(r.candidateId),
        receiverName,
        r.rank,
        placeOf.get(r.candidateId) ?? '',
        num(r.contributionDb),
        num(r.phaseTotalDb),
        num(r.reductionDb),
        cost(r.candidateId),
        num(r.extraCost),
        num(r.dbPer1000),
        num(r.costPerDb),
        rankingFlags(r, standIn),
      ]);
    }
    if (shown.length < ranking.length) {
      rankRows.push([
        text(duty.id),
        `… and ${ranking.length - shown.length} more candidates (each one’s level is on the contributions sheet)`,
        receiverName,
      ]);
    }
    if (ranking.length > 0) {
      noteRows.push(rankRows.length);
      rankRows.push([text(duty.id), text(closeCallNote(uncertainty))]);
    }
  }
  const rankPlace = writeTable(
    ws,
    row,
    'Ranking of each duty’s candidates at its phase’s worst receiver (quietest first)',
    rankColumns,
    rankRows,
    { sparse: true },
  );
  // The uncertainty notes: bold, spanning the row's width; stand-in machines in amber.
  const noteStyle = {
    font: { bold: true, color: { argb: 'FF6B4200' } },
    border: CELL_BORDER,
    alignment: { wrapText: true, vertical: 'top' as const },
  };
  const noteWidth = rankColumns.slice(1).reduce((w, c) => w + (c.width ?? 10), 0);
  for (const i of noteRows) {
    const r = rankPlace.firstRow + i;
    const cell = ws.getCell(r, 2);
    const words = String(cell.value ?? '');
    cell.style = noteStyle;
    ws.mergeCells(r, 2, r, rankColumns.length);
    ws.getRow(r).height = Math.max(1, Math.ceil(words.length / (noteWidth * 0.95))) * 13 + 4;
  }
  const standInStyle = { font: STAND_IN_FONT, fill: STAND_IN_FILL, border: CELL_BORDER };
  for (const i of standInRows) ws.getCell(rankPlace.firstRow + i, 2).style = standInStyle;
  printSetup(ws, { landscape: true, repeatRows: [1, 2] });
}
