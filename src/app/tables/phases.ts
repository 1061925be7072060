/** Columns of the phases table: each stage of the works, its own assessment period, working hours and the periods it is assessed in. */
import type { Phase } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { choiceColumn, textColumn } from './cells.ts';
import { catalogueTimeColumn } from './catalogue-columns.ts';
import { PHASE_TIMES } from '../../ledger/catalogue/index.ts';
import { phasePeriods } from '../../ledger/prediction/phase-periods.ts';
import { fixed } from '../results/format.ts';

export function phaseColumns(ctx: TableContext): LedgerColumn<Phase>[] {
  const periods = ctx.project.periods.map((p) => ({ value: p.id, label: `${p.name} ${p.start}–${p.end}` }));
  return [
    textColumn<Phase>({
      id: 'name',
      header: 'Phase',
      field: 'name',
      width: 220,
      required: 'type a name for the phase',
    }),
    choiceColumn<Phase, string>({ id: 'periodId', header: 'Own period', field: 'periodId', width: 220 }, periods),
    catalogueTimeColumn<Phase>(PHASE_TIMES.start, 100),
    catalogueTimeColumn<Phase>(PHASE_TIMES.end, 100),
    assessedColumn(ctx),
  ].map(fitHeader);
}

/**
 * Computed: the periods the phase is assessed in with the hours worked in each, and the
 * hours in no period, e.g. "Day 12 of 12 h · Evening 2 of 4 h" or "… · 1 h in no period, not assessed".
 */
function assessedColumn(ctx: TableContext): LedgerColumn<Phase> {
  const name = new Map(ctx.project.periods.map((p) => [p.id, p.name || p.id]));
  const hours = (h: number) => fixed(h, Number.isInteger(h) ? 0 : 2, ctx.separator);
  const words = (row: Phase) => {
    const found = phasePeriods(ctx.project, row);
    const parts = found.periods.map(
      (p) => `${name.get(p.periodId) ?? p.periodId} ${hours(p.hoursWorked)} of ${hours(p.periodHours)} h`,
    );
    if (found.unassessedHours > 0) parts.push(`${hours(found.unassessedHours)} h in no period, not assessed`);
    return parts.join(' · ') || 'in no period';
  };
  return {
    id: 'assessedIn',
    header: 'Assessed in',
    width: 280,
    kind: 'computed',
    editable: false,
    value: words,
    display: words,
    describe:
      'the periods the working hours fall in, with the hours worked in each: the own period, then every other period the remaining hours run into; hours in no period are not assessed',
  };
}

export function phaseTable(ctx: TableContext): TableDefinition<Phase> {
  return {
    list: 'phases',
    label: 'Phases of the works',
    rows: (project) => project.phases,
    columns: phaseColumns(ctx),
    blankRow(project, taken, hint) {
      const periodId = hint?.periodId ?? project.periods[0]?.id ?? '';
      return { id: nextId('ph', taken), name: '', periodId, start: '08:00', end: '18:00' };
    },
    withRows: (project, rows) => ({ ...project, phases: rows }),
  };
}
