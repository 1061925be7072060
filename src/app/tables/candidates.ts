/**
 * Columns of the candidate machines table: the inputs of each candidate, then the figures
 * the ledger computes for it (cost for its duty, level at the chosen receiver, reduction
 * against the duty's baseline, dB per 1,000 of extra cost, rank, flags).
 */
import type { Candidate, CandidateCost, Project } from '../../ledger/model/model.ts';
import type { Evaluation, RankingRow } from '../../ledger/model/results.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { booleanColumn, choiceColumn, numberColumn, textColumn } from './cells.ts';
import { formatFigure, formatMoney, formatNumber, readChoice, readNumber, NOT_COMPUTED } from './parse.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import {
  checkFlags,
  directiveQuantityColumn,
  directiveTypeColumn,
  exposureColumns,
  penaltyColumn,
  permissibleColumn,
  ratingColumns,
  type ChecksById,
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
  /** The ledger's candidate checks by candidate id (permissible level, rated LWA, penalty, exposure). */
  checks?: ChecksById;
}

const DECLARATIONS = [
  { value: 'guaranteed', label: 'guaranteed' },
  { value: 'measured', label: 'measured + K' },
] as const;
const ORIGINS = [
  { value: 'declared', label: 'declared' },
  { value: 'from-watts', label: 'from watts' },
  { value: 'from-pressure', label: 'from pressure' },
  { value: 'permissible-stand-in', label: 'permissible stand-in' },
] as const;
const CHARACTERS = [
  { value: 'none', label: 'none' },
  { value: 'tonal', label: 'tonal' },
  { value: 'impulsive', label: 'impulsive' },
] as const;
const ENERGIES = [
  { value: 'diesel', label: 'diesel' },
  { value: 'petrol', label: 'petrol' },
  { value: 'electric', label: 'electric' },
  { value: 'battery', label: 'battery' },
  { value: 'hybrid', label: 'hybrid' },
  { value: 'other', label: 'other' },
] as const;
const COST_BASES = [
  { value: 'hire', label: 'hire' },
  { value: 'purchase', label: 'purchase' },
] as const;

const MONEY = {
  accepted: 'use an amount of 0 or more, e.g. 420.50',
  min: 0,
  prefixes: ['£', '€', '$', 'CHF', 'kr'],
  suffixes: ['€', 'kr', 'CHF'],
};

/** Short descriptions of the cost columns, shown on hover and on focus. */
const COST_WORDS: Record<string, string> = {
  dayRate: 'hire charge for one unit for one day',
  weekRate: 'hire charge for one unit for a week, used where it is cheaper than days',
  monthRate: 'hire charge for one unit for a month, used where it is cheaper than weeks or days',
  price: 'purchase price of one unit',
  lifeDays: 'working days over which a purchase is spread',
  resaleValue: 'what a bought unit is worth at the end of its life',
};

/** A money column on one cost basis: writing a value switches the candidate to that basis. */
function costColumn(
  id: string,
  header: string,
  key: string,
  basis: CandidateCost['kind'],
  optional: boolean,
  ctx: TableContext,
  width = 104,
): LedgerColumn<Candidate> {
  const column = numberColumn<Candidate>(
    {
      id,
      header,
      ...(key === 'lifeDays' ? {} : { unit: ctx.project.currency }),
      field: `cost.${key}`,
      optional,
      width,
      describe: COST_WORDS[key] ?? header,
      rule: key === 'lifeDays' ? { accepted: 'use days above 0, e.g. 1825', min: 0, minExclusive: true } : MONEY,
    },
    ctx.separator,
  );
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
  const column = choiceColumn<Candidate, CandidateCost['kind']>(
    { id: 'costKind', header: 'Cost basis', field: 'cost.kind', width: 110 },
    COST_BASES,
  );
  return {
    ...column,
    write(row, text) {
      const reading = readChoice(text, COST_BASES);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      return { row: withCostBasis(row, reading.value) };
    },
  };
}

/** Octave-band Lw as eight numbers separated by spaces or semicolons. */
function bandsColumn(ctx: TableContext): LedgerColumn<Candidate> {
  const accepted = `use eight levels in dB for 63 Hz to 8 kHz separated by spaces or semicolons, e.g. 98 101 104 103 100 97 92 86`;
  return {
    id: 'bandsDb',
    header: 'Octave bands Lw',
    unit: 'dB',
    width: 200,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'bandsDb',
    describe: accepted,
    value: (row) => row.bandsDb?.join(' '),
    display: (row) => (row.bandsDb ? row.bandsDb.map((b) => formatNumber(b, ctx.separator, 1)).join(' ') : ''),
    write(row, text) {
      const t = text.trim();
      if (t === '') {
        const { bandsDb: _drop, ...rest } = row;
        return { row: rest };
      }
      const parts = t.split(/[\s;]+/);
      const values = parts.map((p) => readNumber(p, ctx.separator));
      if (values.length !== 8 || values.some((v) => v === undefined)) {
        return {
          row: { ...row, bandsDb: [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN] },
          failure: { problem: 'is not eight numbers', accepted },
        };
      }
      return { row: { ...row, bandsDb: values as number[] } };
    },
  };
}

/** The duty column: which duty a candidate is offered for, by duty name. */
function dutyColumn(project: Project): LedgerColumn<Candidate> {
  const choices = project.duties.map((d) => ({ value: d.id, label: d.name }));
  return choiceColumn<Candidate, string>({ id: 'dutyId', header: 'Duty', field: 'dutyId', width: 150 }, choices);
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
      `dB at ${fig.receiverName}`,
      110,
      levelOf,
      (r) => formatFigure(levelOf(r), sep, 1),
      'this machine’s contribution LAeq,T at the chosen receiver',
    ),
    computed(
      'reduction',
      'Reduction',
      'dB',
      106,
      (r) => rankOf(r)?.reductionDb,
      (r) => formatFigure(rankOf(r)?.reductionDb, sep, 1),
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
      value: (r) => candidateFlags(rankOf(r), r, own(fig.checks, r.id)).join(', '),
      display: (r) => candidateFlags(rankOf(r), r, own(fig.checks, r.id)).join(', '),
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
  return [
    textColumn<Candidate>({
      id: 'label',
      header: 'Machine',
      field: 'label',
      width: 200,
      required: 'type a name for the machine',
    }),
    numberColumn<Candidate>(
      {
        id: 'lwaDb',
        header: 'LWA',
        unit: 'dB',
        field: 'lwaDb',
        optional: true,
        width: 84,
        rule: { accepted: 'use dB, e.g. 104.5', min: 0, max: 200, suffixes: ['dB(A)', 'dBA', 'dB'] },
      },
      sep,
    ),
    costColumn('dayRate', 'Day rate', 'dayRate', 'hire', false, fig, 100),
    ...computedColumns(fig),
    ...ratingColumns(fig, fig.checks),
    choiceColumn<Candidate, Candidate['declaration']>(
      {
        id: 'declaration',
        header: 'Declared as',
        field: 'declaration',
        width: 130,
        describe: 'how the LWA is declared: guaranteed (a maximum), measured (a typical value, plus K) or estimated',
      },
      DECLARATIONS,
    ),
    numberColumn<Candidate>(
      {
        id: 'uncertaintyDb',
        header: 'K',
        unit: 'dB',
        describe: 'declared uncertainty of the LWA (ISO 4871); blank when none is given',
        field: 'uncertaintyDb',
        optional: true,
        width: 64,
        rule: { accepted: 'use an uncertainty in dB, e.g. 2.5', min: 0, max: 10, suffixes: ['dB'] },
      },
      sep,
    ),
    costBasisColumn(),
    costColumn('weekRate', 'Week rate', 'weekRate', 'hire', true, fig),
    costColumn('monthRate', 'Month rate', 'monthRate', 'hire', true, fig),
    costColumn('price', 'Price', 'price', 'purchase', false, fig),
    costColumn('lifeDays', 'Life (days)', 'lifeDays', 'purchase', false, fig, 100),
    costColumn('resaleValue', 'Resale', 'resaleValue', 'purchase', false, fig),
    numberColumn<Candidate>(
      {
        id: 'runningPerDay',
        header: 'Running per day',
        unit: fig.project.currency,
        field: 'runningPerDay',
        width: 136,
        describe: 'fuel or energy, operator and upkeep for one unit for one working day',
        rule: MONEY,
      },
      sep,
    ),
    numberColumn<Candidate>(
      {
        id: 'fixedCharges',
        header: 'One-off charges',
        unit: fig.project.currency,
        field: 'fixedCharges',
        width: 136,
        describe: 'charges paid once for the duty, e.g. delivery and collection',
        rule: MONEY,
      },
      sep,
    ),
    textColumn<Candidate>({
      id: 'category',
      header: 'Category',
      field: 'category',
      width: 130,
      describe: 'kind of machine, in your own words (e.g. excavator, breaker)',
    }),
    choiceColumn<Candidate, Candidate['character']>(
      {
        id: 'character',
        header: 'Character',
        field: 'character',
        width: 104,
        describe:
          'none, tonal or impulsive; tonal and impulsive machines draw the project’s character penalty at receivers',
      },
      CHARACTERS,
    ),
    penaltyColumn(fig, fig.checks),
    choiceColumn<Candidate, Candidate['energy']>(
      {
        id: 'energy',
        header: 'Power source',
        field: 'energy',
        width: 110,
        describe: 'what drives the machine: diesel, electric, battery, hybrid…; counted by an electric-share clause',
      },
      ENERGIES,
    ),
    choiceColumn<Candidate, Candidate['lwaOrigin']>(
      {
        id: 'lwaOrigin',
        header: 'LWA obtained as',
        field: 'lwaOrigin',
        width: 140,
        describe:
          'declared (marking or data sheet), worked from a sound power in watts, worked back from a pressure level measured at a distance, or the Directive 2000/14/EC permissible level standing in',
      },
      ORIGINS,
    ),
    directiveTypeColumn(),
    numberColumn<Candidate>(
      {
        id: 'netPowerKw',
        header: 'Net power',
        unit: 'kW',
        field: 'netPowerKw',
        optional: true,
        width: 104,
        rule: { accepted: 'use kW above 0, e.g. 110', min: 0, minExclusive: true, suffixes: ['kW'] },
      },
      sep,
    ),
    directiveQuantityColumn(sep),
    permissibleColumn(fig.checks),
    bandsColumn(fig),
    numberColumn<Candidate>(
      {
        id: 'operatorLpaDb',
        header: 'Operator LpA',
        unit: 'dB',
        field: 'operatorLpaDb',
        optional: true,
        width: 124,
        rule: { accepted: 'use dB, e.g. 82.5', min: 0, max: 160, suffixes: ['dB(A)', 'dBA', 'dB'] },
      },
      sep,
    ),
    numberColumn<Candidate>(
      {
        id: 'operatorHoursPerDay',
        header: 'Operator hours',
        unit: 'h a day',
        field: 'operatorHoursPerDay',
        optional: true,
        width: 130,
        rule: { accepted: 'use hours from 0 to 24, e.g. 7.5', min: 0, max: 24, suffixes: ['h'] },
      },
      sep,
    ),
    ...exposureColumns(fig, fig.checks),
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
  return rows
    .map((row, i) => ({ row, i, d: order.get(row.dutyId) ?? Number.MAX_SAFE_INTEGER }))
    .sort((a, b) => a.d - b.d || a.i - b.i)
    .map((x) => x.row);
}
