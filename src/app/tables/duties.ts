/**
 * Columns of the duties table: what each duty needs, when and where it works, and the
 * machine it would use anyway (its baseline). Location is a point on the site grid (X, Y)
 * or a stated distance to each receiver; typing into one kind switches the duty to it.
 */
import type { Duty, Project } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { choiceColumn, textColumn } from './cells.ts';
import { catalogueNumberColumn } from './catalogue-columns.ts';
import { DUTY_NUMBERS } from '../../ledger/catalogue/index.ts';
import { pathGeometry, sourceHeightOf } from '../../ledger/prediction/geometry.ts';
import { areaCentre } from '../../ledger/prediction/work-area.ts';

const D = DUTY_NUMBERS;

/** The duty with its location switched to a point on the grid (kept when it already is one). */
function asPoint(duty: Duty): Duty {
  if (duty.location.kind === 'point') return duty;
  return { ...duty, location: { kind: 'point', x: NaN, y: NaN } };
}

/** The duty with its location switched to stated distances, starting from the grid distances it had. */
function asDistances(duty: Duty, project: Project): Duty {
  if (duty.location.kind === 'distances') return duty;
  const height = sourceHeightOf(duty, project.propagation);
  const distancesM: Record<string, number> = {};
  for (const r of project.receivers) {
    const d = pathGeometry(duty, r, height).distanceM;
    if (Number.isFinite(d)) distancesM[r.id] = Math.round(d * 10) / 10;
  }
  return { ...duty, location: { kind: 'distances', distancesM } };
}

/**
 * A line or area shows its centroid in the X and Y columns (the point the plan's handle
 * sits on); typing a coordinate there moves the whole line or area, shape kept.
 */
function areaAsPoint(duty: Duty): Duty | undefined {
  const loc = duty.location;
  if (loc.kind !== 'line' && loc.kind !== 'polygon') return undefined;
  const c = areaCentre(loc);
  return c ? { ...duty, location: { kind: 'point', x: c.x, y: c.y } } : undefined;
}

function locationColumn(column: LedgerColumn<Duty>, kind: 'point' | 'distances', project: Project): LedgerColumn<Duty> {
  const write = column.write!;
  return {
    ...column,
    display: (row) => {
      const area = kind === 'point' ? areaAsPoint(row) : undefined;
      if (area) return column.display(area);
      return row.location.kind === kind ? column.display(row) : '';
    },
    value: (row) => {
      const area = kind === 'point' ? areaAsPoint(row) : undefined;
      if (area) return column.value(area);
      return row.location.kind === kind ? column.value(row) : undefined;
    },
    write(row, text) {
      const area = kind === 'point' ? areaAsPoint(row) : undefined;
      if (area && area.location.kind === 'point' && (row.location.kind === 'line' || row.location.kind === 'polygon')) {
        const out = write(area, text);
        if (out.failure || out.row.location.kind !== 'point')
          return { row, ...(out.failure ? { failure: out.failure } : {}) };
        const dx = out.row.location.x - area.location.x;
        const dy = out.row.location.y - area.location.y;
        return {
          row: {
            ...row,
            location: { ...row.location, points: row.location.points.map((p) => ({ x: p.x + dx, y: p.y + dy })) },
          },
        };
      }
      if (row.location.kind === kind) return write(row, text);
      if (text.trim() === '') return { row };
      return write(kind === 'point' ? asPoint(row) : asDistances(row, project), text);
    },
  };
}

/** A duty whose on-time range has neither end left loses the range. */
function dropEmptyRange(row: Duty): Duty {
  const r = row.onTimeRangePct;
  if (r && r.lowPct === undefined && r.highPct === undefined) {
    const { onTimeRangePct: _r, ...rest } = row;
    return rest;
  }
  return row;
}

/** The baseline column: a candidate of the duty, typed by its name. */
function baselineColumn(project: Project): LedgerColumn<Duty> {
  const labelOf = (row: Duty) => project.candidates.find((c) => c.id === row.baselineCandidateId)?.label ?? '';
  return {
    id: 'baseline',
    header: 'Baseline machine',
    width: 190,
    kind: 'text',
    editable: true,
    align: 'start',
    field: 'baselineCandidateId',
    describe: 'the name of one of this duty’s candidate machines',
    value: labelOf,
    display: labelOf,
    write(row, text) {
      const t = text.trim().toLowerCase();
      const own = project.candidates.filter((c) => c.dutyId === row.id);
      const found = own.find((c) => c.label.trim().toLowerCase() === t) ?? own.find((c) => c.id.toLowerCase() === t);
      if (found) return { row: { ...row, baselineCandidateId: found.id } };
      const names = own
        .slice(0, 4)
        .map((c) => c.label)
        .join(', ');
      return {
        row,
        failure: {
          problem: 'is not a candidate of this duty',
          accepted: own.length
            ? `use the name of one of its machines, e.g. ${names}`
            : 'add candidate machines for this duty first',
        },
      };
    },
  };
}

export function dutyColumns(ctx: TableContext): LedgerColumn<Duty>[] {
  const { project, separator: sep } = ctx;
  return [
    textColumn<Duty>({ id: 'name', header: 'Duty', field: 'name', width: 190, required: 'type a name for the duty' }),
    choiceColumn<Duty, string>(
      { id: 'phaseId', header: 'Phase', field: 'phaseId', width: 150 },
      project.phases.map((p) => ({ value: p.id, label: p.name })),
    ),
    catalogueNumberColumn<Duty>(D.count, sep, { width: 64 }),
    catalogueNumberColumn<Duty>(D.onTimePct, sep, { width: 76 }),
    catalogueNumberColumn<Duty>(D.onTimeLowPct, sep, { id: 'onTimeLow', optional: true, width: 96 }, dropEmptyRange),
    catalogueNumberColumn<Duty>(D.onTimeHighPct, sep, { id: 'onTimeHigh', optional: true, width: 96 }, dropEmptyRange),
    catalogueNumberColumn<Duty>(D.durationDays, sep, { unit: '', width: 90 }),
    baselineColumn(project),
    locationColumn(catalogueNumberColumn<Duty>(D.x, sep, { width: 70 }), 'point', project),
    locationColumn(catalogueNumberColumn<Duty>(D.y, sep, { width: 70 }), 'point', project),
    ...project.receivers.map((r) =>
      locationColumn(
        catalogueNumberColumn<Duty>(D.distanceM, sep, {
          id: `distance:${r.id}`,
          path: `${D.distanceM.path}.${r.id}`,
          header: `${D.distanceM.header} ${r.name}`,
          optional: true,
          width: 120,
        }),
        'distances',
        project,
      ),
    ),
    catalogueNumberColumn<Duty>(D.sourceHeightM, sep, { optional: true, width: 90 }),
  ].map(fitHeader);
}

export function dutyTable(ctx: TableContext): TableDefinition<Duty> {
  return {
    list: 'duties',
    label: 'Duties',
    rows: (project) => project.duties,
    columns: dutyColumns(ctx),
    blankRow(project, taken, hint) {
      return {
        id: nextId('d', taken),
        name: '',
        phaseId: hint?.phaseId ?? project.phases[0]?.id ?? '',
        count: 1,
        onTimePct: 100,
        durationDays: NaN,
        location: { kind: 'point', x: NaN, y: NaN },
        baselineCandidateId: '',
      };
    },
    withRows: (project, rows) => ({ ...project, duties: rows }),
  };
}
