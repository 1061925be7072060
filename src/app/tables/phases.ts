/** Columns of the phases table: each stage of the works, its assessment period and working hours. */
import type { Phase } from '../../ledger/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { choiceColumn, textColumn, timeColumn } from './cells.ts';

export function phaseColumns(ctx: TableContext): LedgerColumn<Phase>[] {
  const periods = ctx.project.periods.map((p) => ({ value: p.id, label: `${p.name} ${p.start}–${p.end}` }));
  return [
    textColumn<Phase>({ id: 'name', header: 'Phase', field: 'name', width: 220, required: 'type a name for the phase' }),
    choiceColumn<Phase, string>({ id: 'periodId', header: 'Assessment period', field: 'periodId', width: 220 }, periods),
    timeColumn<Phase>({ id: 'start', header: 'Work starts', field: 'start', width: 100 }),
    timeColumn<Phase>({ id: 'end', header: 'Work ends', field: 'end', width: 100 }),
  ].map(fitHeader);
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
