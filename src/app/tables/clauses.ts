/**
 * Columns of the tender clauses table: the tender's number and words, the kind, and the
 * parameters each kind reads, side by side (a figure typed for one kind is kept when the
 * kind changes; only the kind's own parameters are used). Lists of receivers or duties are
 * typed as names separated by ";" (empty: every one); a boundary as points "x y" separated
 * by ";". Text that cannot be read is kept as typed and marked, like every other grid.
 */
import type { Clause, ClauseKind, Energy, SitePoint } from '../../ledger/clauses/clause.ts';
import { CLAUSE_RULES } from '../../ledger/clauses/clause-rules.ts';
import { RULES } from '../../ledger/validate/validate-rules.ts';
import type { LedgerColumn, TableContext, TableDefinition, WriteOutcome } from './column.ts';
import { fitHeader, nextId, setPath } from './column.ts';
import { choiceColumn, numberColumn, textColumn } from './cells.ts';
import { formatNumber, readNumber, readTime, type DecimalSeparator } from './parse.ts';

/** Short words for each kind in the grid (the value, e.g. "lwa-cap", is accepted too). */
export const KIND_CHOICES: readonly { value: ClauseKind; label: string }[] = [
  { value: 'limit', label: 'Limit' },
  { value: 'lwa-cap', label: 'LWA cap' },
  { value: 'lp-cap', label: 'Lp cap at a distance' },
  { value: 'hours', label: 'Working hours' },
  { value: 'share', label: 'Electric share' },
  { value: 'statement', label: 'Statement' },
];

const ENERGIES: readonly Energy[] = ['diesel', 'petrol', 'electric', 'battery', 'hybrid', 'other'];

/** Splits a typed list at ";", dropping empty parts. */
function parts(text: string): string[] {
  return text
    .split(';')
    .map((s) => s.trim())
    .filter((s) => s !== '');
}

/**
 * A column holding a list of ids of another table, typed as names (or ids) separated by ";".
 * An empty cell means every one. A name that matches nothing is kept as typed and marked; the
 * clause then cannot be judged until it is corrected.
 */
function idListColumn(
  base: { id: string; header: string; width: number; field: 'receiverIds' | 'dutyIds'; what: string; describe: string },
  rows: readonly { id: string; name: string }[],
): LedgerColumn<Clause> {
  const nameOf = new Map(rows.map((r) => [r.id, r.name] as const));
  const words = (row: Clause) => (row[base.field] ?? []).map((id) => nameOf.get(id) ?? id).join('; ');
  const accepted = `use names of the project’s ${base.what}s separated by ";" (${rows.length ? rows.map((r) => JSON.stringify(r.name)).join(', ') : `add a ${base.what} first`}), or leave empty for every ${base.what}`;
  return {
    id: base.id,
    header: base.header,
    width: base.width,
    kind: 'text',
    editable: true,
    align: 'start',
    field: base.field,
    describe: base.describe,
    value: words,
    display: words,
    write(row, text): WriteOutcome<Clause> {
      const typed = parts(text);
      if (typed.length === 0) return { row: setPath(row, base.field, undefined) };
      const ids: string[] = [];
      const unknown: string[] = [];
      for (const t of typed) {
        const lower = t.toLowerCase();
        const found =
          rows.find((r) => r.name.trim().toLowerCase() === lower) ?? rows.find((r) => r.id.toLowerCase() === lower);
        if (found) ids.push(found.id);
        else {
          unknown.push(t);
          ids.push(t);
        }
      }
      const written = setPath(row, base.field, ids);
      if (unknown.length === 0) return { row: written };
      const problem =
        typed.length === 1
          ? `is not a ${base.what} of this project`
          : `names ${unknown.map((u) => JSON.stringify(u)).join(', ')}, not ${unknown.length === 1 ? `a ${base.what}` : `${base.what}s`} of this project`;
      return { row: written, failure: { problem, accepted } };
    },
  };
}

/** Words for a boundary line, as typed back in: "0 0; 40 0; 40 25". */
export function boundaryText(points: readonly SitePoint[] | undefined, sep: DecimalSeparator): string {
  return (points ?? []).map((p) => `${formatNumber(p.x, sep)} ${formatNumber(p.y, sep)}`).join('; ');
}

/** Reads "x y; x y; …" (x and y separated by spaces, or by "," with a decimal point); undefined when a point cannot be read. */
export function readBoundary(text: string, sep: DecimalSeparator): SitePoint[] | undefined {
  const out: SitePoint[] = [];
  for (const part of parts(text)) {
    const xy = part.split(sep === '.' ? /[\s,]+/ : /\s+/).filter((s) => s !== '');
    if (xy.length !== 2) return undefined;
    const x = readNumber(xy[0] as string, sep);
    const y = readNumber(xy[1] as string, sep);
    if (x === undefined || y === undefined || Math.abs(x) > 100000 || Math.abs(y) > 100000) return undefined;
    out.push({ x, y });
  }
  return out;
}

function boundaryColumn(sep: DecimalSeparator): LedgerColumn<Clause> {
  return {
    id: 'boundary',
    header: 'Boundary points (x y; …)',
    width: 220,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'boundary',
    describe: `limit along a boundary: ${CLAUSE_RULES.boundaryAccepted}, metres on the site grid`,
    value: (row) => boundaryText(row.boundary, sep),
    display: (row) => boundaryText(row.boundary, sep),
    write(row, text): WriteOutcome<Clause> {
      if (text.trim() === '') return { row: setPath(row, 'boundary', undefined) };
      const points = readBoundary(text, sep);
      if (!points)
        return {
          row,
          failure: { problem: 'is not a list of points', accepted: `use ${CLAUSE_RULES.boundaryAccepted}` },
        };
      return { row: setPath(row, 'boundary', points) };
    },
  };
}

/** A time column that may be left empty (the clause's kind may not read it). */
function optionalTimeColumn(base: { id: 'start' | 'end'; header: string; describe: string }): LedgerColumn<Clause> {
  return {
    ...base,
    width: 110,
    kind: 'text',
    editable: true,
    align: 'end',
    field: base.id,
    value: (row) => row[base.id] ?? '',
    display: (row) => row[base.id] ?? '',
    write(row, text): WriteOutcome<Clause> {
      if (text.trim() === '') return { row: setPath(row, base.id, undefined) };
      const reading = readTime(text);
      if (!reading.ok) return { row, failure: { problem: reading.problem, accepted: reading.accepted } };
      return { row: setPath(row, base.id, reading.value) };
    },
  };
}

function energiesColumn(): LedgerColumn<Clause> {
  const words = (row: Clause) => (row.energies ?? []).join('; ');
  return {
    id: 'energies',
    header: 'Energies counted',
    width: 160,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'energies',
    describe: `electric share: the energies that count, separated by ";" (${ENERGIES.join(', ')}); empty: electric and battery`,
    value: words,
    display: words,
    write(row, text): WriteOutcome<Clause> {
      const typed = parts(text).map((t) => t.toLowerCase());
      if (typed.length === 0) return { row: setPath(row, 'energies', undefined) };
      const bad = typed.filter((t) => !(ENERGIES as readonly string[]).includes(t));
      const written = setPath(row, 'energies', typed);
      if (bad.length === 0) return { row: written };
      return {
        row: written,
        failure: {
          problem: `names ${bad.map((b) => JSON.stringify(b)).join(', ')}, not an energy`,
          accepted: `use one or more of ${ENERGIES.join(', ')} separated by ";"`,
        },
      };
    },
  };
}

export function clauseColumns(ctx: TableContext): LedgerColumn<Clause>[] {
  const sep = ctx.separator;
  const periods = ctx.project.periods.map((p) => ({ value: p.id, label: `${p.name} ${p.start}–${p.end}` }));
  const n = (
    field: string,
    header: string,
    unit: string,
    rule: { min?: number; max?: number; accepted: string },
    describe: string,
    suffix: string,
  ) =>
    numberColumn<Clause>(
      {
        id: field,
        header,
        unit,
        field,
        width: 100,
        optional: true,
        describe,
        rule: { ...rule, accepted: `use ${rule.accepted}`, suffixes: [suffix] },
      },
      sep,
    );
  return [
    textColumn<Clause>({
      id: 'ref',
      header: 'Clause',
      field: 'ref',
      width: 90,
      describe: 'the tender’s clause number, e.g. 7.3.2',
    }),
    textColumn<Clause>({
      id: 'text',
      header: 'Tender’s words',
      field: 'text',
      width: 320,
      describe: 'the clause as the tender words it (type or paste)',
    }),
    choiceColumn<Clause, ClauseKind>(
      {
        id: 'kind',
        header: 'Kind',
        field: 'kind',
        width: 170,
        describe: `what the clause asks: ${KIND_CHOICES.map((k) => k.label).join(', ')}`,
      },
      KIND_CHOICES,
    ),
    choiceColumn<Clause, string>(
      {
        id: 'periodId',
        optional: true,
        header: 'Period',
        field: 'periodId',
        width: 200,
        describe: 'limit: the assessment period the limit is for',
      },
      periods,
    ),
    n('limitDb', 'Limit', 'dB', RULES.limitDb, 'limit: the limit in dB (LAeq,T or LAr,T over the period)', 'dB'),
    choiceColumn<Clause, 'laeq' | 'rating'>(
      {
        id: 'metric',
        optional: true,
        header: 'Quantity',
        field: 'metric',
        width: 110,
        describe: 'limit: LAeq,T (default) or the rating level LAr,T with the character penalty',
      },
      [
        { value: 'laeq', label: 'LAeq,T' },
        { value: 'rating', label: 'LAr,T' },
      ],
    ),
    choiceColumn<Clause, 'receivers' | 'boundary'>(
      {
        id: 'area',
        optional: true,
        header: 'Applies at',
        field: 'area',
        width: 120,
        describe: 'limit: at receivers (default) or along a boundary',
      },
      [
        { value: 'receivers', label: 'receivers' },
        { value: 'boundary', label: 'boundary' },
      ],
    ),
    idListColumn(
      {
        id: 'receiverIds',
        header: 'Receivers',
        width: 200,
        field: 'receiverIds',
        what: 'receiver',
        describe: 'limit at receivers: receiver names separated by ";"; empty: every receiver',
      },
      ctx.project.receivers,
    ),
    boundaryColumn(sep),
    n(
      'spacingM',
      'Point spacing',
      'm',
      CLAUSE_RULES.spacingM,
      'limit along a boundary: the most distance between assessment points, m (empty: 5 m)',
      'm',
    ),
    n(
      'heightM',
      'Point height',
      'm',
      RULES.heightM,
      'limit along a boundary: the height of the assessment points, m (empty: 1.5 m)',
      'm',
    ),
    n('maxDb', 'Cap', 'dB', CLAUSE_RULES.capDb, 'LWA cap, Lp cap: the most each machine may reach, dB', 'dB'),
    n(
      'distanceM',
      'Cap distance',
      'm',
      RULES.distanceM,
      'Lp cap: the distance of the stated level, m (empty: 10 m); worked with hemispherical spreading',
      'm',
    ),
    idListColumn(
      {
        id: 'dutyIds',
        header: 'Duties',
        width: 200,
        field: 'dutyIds',
        what: 'duty',
        describe: 'caps, working hours, electric share: duty names separated by ";"; empty: every duty',
      },
      ctx.project.duties,
    ),
    choiceColumn<Clause, 'impulsive' | 'tonal' | 'any'>(
      {
        id: 'character',
        optional: true,
        header: 'Character',
        field: 'character',
        width: 120,
        describe: 'working hours: the work restricted (impulsive by default, tonal, or any work)',
      },
      [
        { value: 'impulsive', label: 'impulsive' },
        { value: 'tonal', label: 'tonal' },
        { value: 'any', label: 'any work' },
      ],
    ),
    optionalTimeColumn({
      id: 'start',
      header: 'Allowed from',
      describe: 'working hours: the work is allowed from, HH:MM, e.g. 08:00',
    }),
    optionalTimeColumn({
      id: 'end',
      header: 'Allowed until',
      describe: 'working hours: the work is allowed until, HH:MM, e.g. 18:00 (earlier than the start: past midnight)',
    }),
    choiceColumn<Clause, 'count' | 'hours'>(
      {
        id: 'basis',
        optional: true,
        header: 'Share by',
        field: 'basis',
        width: 130,
        describe: 'electric share: by count of units (default) or by machine-hours on site',
      },
      [
        { value: 'count', label: 'count' },
        { value: 'hours', label: 'machine-hours' },
      ],
    ),
    n('minPct', 'Least share', '%', CLAUSE_RULES.sharePct, 'electric share: the least share, %', '%'),
    energiesColumn(),
    textColumn<Clause>({
      id: 'statement',
      header: 'Contractor’s statement',
      field: 'statement',
      width: 300,
      describe: 'the contractor’s answer (a statement clause is answered by it; a note for the others)',
    }),
  ].map(fitHeader);
}

export function clauseTable(ctx: TableContext): TableDefinition<Clause> {
  return {
    list: 'clauses',
    label: 'Tender noise clauses',
    rows: (project) => project.clauses ?? [],
    columns: clauseColumns(ctx),
    blankRow: (_project, taken) => ({ id: nextId('k', taken), ref: '', text: '', kind: 'statement' }),
    withRows: (project, rows) => ({ ...project, clauses: rows }),
  };
}
