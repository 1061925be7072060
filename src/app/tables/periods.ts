/**
 * Columns of the assessment periods: the name and the hours over which a limit applies
 * (LAeq,T with T the period's length). Edited in Settings, through the same writing,
 * kept-text and message machinery as the grids.
 */
import type { AssessmentPeriod } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { nextId } from './column.ts';
import { textColumn } from './cells.ts';
import { catalogueTimeColumn } from './catalogue-columns.ts';
import { PERIOD_TIMES } from '../../ledger/catalogue/index.ts';

export function periodColumns(): LedgerColumn<AssessmentPeriod>[] {
  return [
    textColumn<AssessmentPeriod>({
      id: 'name',
      header: 'Period',
      field: 'name',
      width: 200,
      required: 'type a name for the period, e.g. Weekday daytime',
    }),
    catalogueTimeColumn<AssessmentPeriod>(PERIOD_TIMES.start, 90),
    catalogueTimeColumn<AssessmentPeriod>(PERIOD_TIMES.end, 90),
  ];
}

export function periodTable(_ctx: TableContext): TableDefinition<AssessmentPeriod> {
  return {
    list: 'periods',
    label: 'Assessment periods',
    rows: (project) => project.periods,
    columns: periodColumns(),
    blankRow: (_project, taken) => ({ id: nextId('t', taken), name: 'New period', start: '07:00', end: '19:00' }),
    withRows: (project, rows) => ({ ...project, periods: rows }),
  };
}
