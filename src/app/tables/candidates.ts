/**
 * Columns of the candidate machines table: the inputs of each candidate, then the figures
 * the ledger computes for it (cost for its duty, level at the chosen receiver, reduction
 * against the duty's baseline, dB per 1,000 of extra cost, rank, flags).
 */
import type { Candidate, CandidateCost, Project } from '../../ledger/model/model.ts';
import type { Evaluation, RankingRow } from '../../ledger/model/results.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { booleanColumn, choiceColumn, textColumn } from './cells.ts';
import { formatFigure, formatMoney, readChoice, NOT_COMPUTED } from './parse.ts';
import { bandsColumn, catalogueChoiceColumn, catalogueNumberColumn } from './catalogue-columns.ts';
import {
  CHARACTER,
  COST_KIND,
  DECLARATION,
  ENERGY,
  LWA_ORIGIN,
  MACHINE_NUMBERS,
  gridChoices,
} from '../../ledger/catalogue/index.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import {
  checkFlags,
  directiveQuantityColumn,
  directiveTypeColumn,
  exposureColumns,
  penaltyColumn,
  permissibleColumn,
  ratingColumns,
  type CheckOf,
} from './check-columns.ts';
import { own } from '../../ledger/model/own.ts';
import { withCostBasis } from '../../ledger/costs/cost-basis.ts';
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

export { withCostBasis };

/** The computed figures the candidate table shows, from the Workspace. */
export interface CandidateFigures extends TableContext {
  evaluation?: Evaluation;
  /** Ranking row of every candidate, at the receiver the user chose, by candidate id. */
  ranking: Map<string, RankingRow>;
  /** Header words for the chosen receiver, e.g. "Mill Lane School" or "worst receiver". */
  receiverName: string;
  /** The ledger's check of a candidate (permissible level, rated LWA, penalty, exposure). */
  checkOf?: CheckOf;
}

/** A money column (or the working life) on one cost basis: writing a value switches the candidate to that basis. */
function costColumn(
  key: 'dayRate' | 'weekRate' | 'monthRate' | 'price' | 'lifeDays' | 'resaleValue',
  basis: CandidateCost['kind'],
  optional: boolean,
  ctx: TableContext,
  width = 104,
): LedgerColumn<Candidate> {
  const column = catalogueNumberColumn<Candidate>(MACHINE_NUMBERS[key], ctx.separator, {
    ...(key === 'lifeDays' ? {} : { unit: ctx.project.currency }),
    optional,
    width,
  });
  const write = column.write!;
  return {
    ...column,
    display: (row) => (row.cost.kind === basis ? column.display(row) : ''),
    value: (row) => (row.cost.kind === basis ? column.value(row) : undefined),
    write(row, text) {
      if (row.cost.kind !== basis) {
        if (text.trim() === '') return { row };
        return write(withCostBasis(row, basis), text);
      }
      return write(row, text);
    },
  };
}

/** Hire or purchase; switching keeps the row and asks for the new basis' amounts. */
function costBasisColumn(): LedgerColumn<Candidate> {
  const choices = gridChoices(COST_KIND);
  const column = choiceColumn<Candidate, CandidateCost['kind']>(
    { id: 'costKind', header: COST_KIND.header, field: COST_KIND.path, width: 110, describe: COST_KIND.describe },
    choices,
  );
  return {
    ...column,
    write(row, text) {
      const reading = readChoice(text, choices);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      return { row: withCostBasis(row, reading.value) };
    },
  };
}

/** The duty column: which duty a candidate is offered for, by duty name. */
function dutyColumn(project: Project): LedgerColumn<Candidate> {
  const choices = project.duties.map((d) => ({ value: d.id, label: d.name }));
  return choiceColumn<Candidate, string>(
    { id: 'dutyId', header: 'Duty', field: 'dutyId', width: 150, describe: 'the duty this machine is offered for' },
    choices,
  );
}

/** Computed columns: read-only figures from the evaluation and ranking. */
function computedColumns(fig: CandidateFigures): LedgerColumn<Candidate>[] {
  const sep = fig.separator;
  const rankOf = (row: Candidate) => fig.ranking.get(row.id);
  const number = (value: number | undefined) => (value === undefined || Number.isNaN(value) ? undefined : value);
  const computed = (
    id: string,
    header: string,
    unit: string | undefined,
    width: number,
    get: (row: Candidate) => number | undefined,
    show: (row: Candidate) => string,
    describe: string,
  ): LedgerColumn<Candidate> => ({
    id,
    header,
    ...(unit ? { unit } : {}),
    width,
    kind: 'computed',
    editable: false,
    align: 'end',
    value: (r) => number(get(r)),
    display: show,
    describe,
  });

  const costOf = (row: Candidate) => own(fig.evaluation?.costs, row.id)?.total;
  const levelOf = (row: Candidate) => rankOf(row)?.contributionDb;
  return [
    computed(
      'costForDuty',
      'Cost for duty',
      fig.project.currency,
      124,
      costOf,
      (r) => formatMoney(costOf(r), sep),
      'all units for the duty’s days: hire or spread purchase, running and one-off charges',
    ),
    computed(
      'levelAtReceiver',
      'Level',
      // the receiver is named in the description and in the picker above the grid: in the unit line it was cut
      'dB',
      110,
      levelOf,
      (r) => formatFigure(levelOf(r), sep, 1),
      `this machine’s contribution LAeq,T at ${fig.receiverName} (chosen above the grid, “Levels worked out at”)`,
    ),
    computed(
      'reduction',
      'Reduction',
      'dB',
      106,
      (r) => rankOf(r)?.reductionDb,
      (r) => formatFigure(rankOf(r)?.reductionDb, sep, reductionDecimals(rankOf(r)?.reductionDb)),
      'phase total with the baseline machine minus phase total with this one',
    ),
    computed(
      'dbPer1000',
      'dB per 1,000',
      undefined,
      116,
      (r) => rankOf(r)?.dbPer1000,
      (r) => {
        const row = rankOf(r);
        if (!row || Number.isNaN(row.reductionDb) || Number.isNaN(row.extraCost)) return NOT_COMPUTED;
        if (row.dbPer1000 === undefined) return row.isBaseline ? '—' : 'no extra cost';
        return formatFigure(row.dbPer1000, sep, 2);
      },
      'reduction in dB for each 1,000 of extra cost over the baseline',
    ),
    computed(
      'rank',
      'Rank',
      undefined,
      76,
      (r) => rankOf(r)?.rank,
      (r) => {
        const row = rankOf(r);
        return row && Number.isFinite(row.rank) ? String(row.rank) : NOT_COMPUTED;
      },
      'place in the duty by level at the receiver, quietest first',
    ),
    {
      id: 'flags',
      header: 'Flags',
      width: 190,
      kind: 'computed',
      editable: false,
      align: 'start',
      describe: `baseline, over limit, ${FLAG_WORDS.freeWin} (quieter than the baseline at no extra cost), ${FLAG_WORDS.dominated} (another machine is at least as quiet and as cheap), over permissible (declared level above the Directive 2000/14/EC limit), stand-in LWA (no declared level: the permissible level stands in)`,
      value: (r) => candidateFlags(rankOf(r), r, fig.checkOf?.(r)).join(', '),
      display: (r) => candidateFlags(rankOf(r), r, fig.checkOf?.(r)).join(', '),
    },
  ];
}

/** Words for a candidate's flags, most important first. */
export function candidateFlags(row: RankingRow | undefined, candidate: Candidate, check?: CandidateCheck): string[] {
  const flags: string[] = [];
  if (row?.isBaseline) flags.push('baseline');
  if (row?.overLimit) flags.push('over limit');
  flags.push(...checkFlags(check));
  if (row?.freeWin) flags.push(FLAG_WORDS.freeWin);
  if (row?.dominated) flags.push(FLAG_WORDS.dominated);
  if (candidate.pinned) flags.push('pinned');
  if (candidate.excluded) flags.push('excluded');
  return flags;
}

/** Every column of the candidate table, inputs and computed figures. */
export function candidateColumns(fig: CandidateFigures): LedgerColumn<Candidate>[] {
  const sep = fig.separator;
  const currency = fig.project.currency;
  return [
    textColumn<Candidate>({
      id: 'label',
      header: 'Machine',
      field: 'label',
      // wide enough for a typical name beside its "over" and "base" marks
      width: 250,
      required: 'type a name for the machine',
      describe: 'the machine’s name as you will recognise it, e.g. "Mini excavator 1.9 t, electric"',
    }),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.lwaDb, sep, { optional: true, width: 84 }),
    costColumn('dayRate', 'hire', false, fig, 100),
    ...computedColumns(fig),
    ...ratingColumns(fig, fig.checkOf),
    catalogueChoiceColumn<Candidate, Candidate['declaration']>(DECLARATION, 130),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.uncertaintyDb, sep, { optional: true, width: 64 }),
    costBasisColumn(),
    costColumn('weekRate', 'hire', true, fig),
    costColumn('monthRate', 'hire', true, fig),
    costColumn('price', 'purchase', false, fig),
    costColumn('lifeDays', 'purchase', false, fig, 100),
    costColumn('resaleValue', 'purchase', false, fig),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.runningPerDay, sep, { unit: currency, width: 136 }),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.fixedCharges, sep, { unit: currency, width: 136 }),
    textColumn<Candidate>({
      id: 'category',
      header: 'Category',
      field: 'category',
      width: 130,
      describe: 'kind of machine, in your own words (e.g. excavator, breaker)',
    }),
    catalogueChoiceColumn<Candidate, Candidate['character']>(CHARACTER, 104),
    penaltyColumn(fig, fig.checkOf),
    catalogueChoiceColumn<Candidate, Candidate['energy']>(ENERGY, 110),
    catalogueChoiceColumn<Candidate, Candidate['lwaOrigin']>(LWA_ORIGIN, 140),
    directiveTypeColumn(),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.netPowerKw, sep, { optional: true, width: 104 }),
    directiveQuantityColumn(sep),
    permissibleColumn(fig.checkOf),
    bandsColumn<Candidate>(sep),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.operatorLpaDb, sep, { optional: true, width: 124 }),
    catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.operatorHoursPerDay, sep, {
      unit: 'h a day',
      optional: true,
      width: 130,
    }),
    ...exposureColumns(fig, fig.checkOf),
    textColumn<Candidate>({
      id: 'source',
      header: 'Data source',
      field: 'source',
      width: 180,
      describe: 'where the figures came from (document, supplier, date), for a reviewer',
    }),
    booleanColumn<Candidate>({
      id: 'pinned',
      header: 'Pinned',
      field: 'pinned',
      width: 84,
      describe: 'yes: the optimiser must choose this machine for its duty',
    }),
    booleanColumn<Candidate>({
      id: 'excluded',
      header: 'Excluded',
      field: 'excluded',
      width: 96,
      describe: 'yes: the optimiser must not choose this machine',
    }),
    dutyColumn(fig.project),
  ].map(fitHeader);
}

/** A blank candidate for a duty: nothing known yet, so results read "not computed" until the user fills it in. */
export function blankCandidate(id: string, dutyId: string): Candidate {
  return {
    id,
    dutyId,
    label: '',
    category: '',
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: '',
    cost: { kind: 'hire', dayRate: NaN },
    runningPerDay: 0,
    fixedCharges: 0,
  };
}

/** The candidate table. New rows join the duty of the row the user worked next to, else the first duty. */
export function candidateTable(fig: CandidateFigures): TableDefinition<Candidate> {
  return {
    list: 'candidates',
    label: 'Candidate machines by duty',
    rows: (project) => project.candidates,
    columns: candidateColumns(fig),
    blankRow(project, taken, hint, group) {
      const known = (id: string | undefined) =>
        id !== undefined && project.duties.some((d) => d.id === id) ? id : undefined;
      const dutyId = known(group) ?? known(hint?.dutyId) ?? project.duties[0]?.id ?? '';
      return blankCandidate(nextId('c', taken), dutyId);
    },
    withRows: (project, rows) => ({ ...project, candidates: groupByDuty(project, rows) }),
  };
}

/** Orders candidates by their duty's place in the project (stable within a duty), so each duty's rows stay together. */
export function groupByDuty(project: Project, rows: Candidate[]): Candidate[] {
  const order = new Map(project.duties.map((d, i) => [d.id, i] as const));
  const place = (row: Candidate) => order.get(row.dutyId) ?? Number.MAX_SAFE_INTEGER;
  // the usual case, an edit that moved no machine to another duty: already in order, one pass
  // (neighbours of the same duty, nearly all of them, are passed without a look-up)
  let ordered = true;
  for (let i = 1; i < rows.length && ordered; i++)
    ordered = rows[i - 1]!.dutyId === rows[i]!.dutyId || place(rows[i - 1]!) <= place(rows[i]!);
  if (ordered) return rows;
  return rows
    .map((row, i) => ({ row, i, d: order.get(row.dutyId) ?? Number.MAX_SAFE_INTEGER }))
    .sort((a, b) => a.d - b.d || a.i - b.i)
    .map((x) => x.row);
}

/** Decimals of a reduction: one, or more for one that is not zero but would read 0.0 (its dB per 1,000 is not read as of nothing). */
function reductionDecimals(db: number | undefined): number {
  if (db === undefined || !Number.isFinite(db) || db === 0 || Math.abs(db) >= 0.05) return 1;
  return Math.abs(db) >= 0.005 ? 2 : 3;
}
