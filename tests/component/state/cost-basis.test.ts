/** In the machines grid, typing a price on a hired machine never erases its rates; switching back restores them. */
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

describe('hire and purchase figures both kept', () => {
  it('a price typed on a hired machine switches it to purchase with its rates set aside; choosing hire brings them back', () => {
    const ws = new Workspace(demoProject());
    const hired = ws.project.candidates.find((c) => c.cost.kind === 'hire' && c.cost.weekRate !== undefined)!;
    const rates = hired.cost;
    const cell = (columnId: string) => {
      const row = ws.project.candidates.find((c) => c.id === hired.id)!;
      return ws.candidateTable.columns.find((c) => c.id === columnId)!.display(row);
    };
    ws.applyCellTexts('candidates', [{ rowId: hired.id, columnId: 'price', text: '85000' }]);
    expect(cell('costKind')).toBe('purchase');
    expect(cell('dayRate')).toBe('');
    expect(ws.problem('candidates', hired.id, 'lifeDays')).toMatch(/working life: not filled in/);
    ws.applyCellTexts('candidates', [{ rowId: hired.id, columnId: 'lifeDays', text: '1800' }]);
    ws.applyCellTexts('candidates', [{ rowId: hired.id, columnId: 'costKind', text: 'hire' }]);
    const back = ws.project.candidates.find((c) => c.id === hired.id)!;
    expect(back.cost).toEqual(rates);
    expect(cell('price')).toBe('');
    for (const column of ['dayRate', 'weekRate', 'monthRate', 'price', 'lifeDays', 'resaleValue'])
      expect(ws.problem('candidates', hired.id, column) ?? '').not.toMatch(/NaN/);
    // and purchase again: the price and life typed before are there
    ws.applyCellTexts('candidates', [{ rowId: hired.id, columnId: 'costKind', text: 'purchase' }]);
    expect(cell('price')).toBe('85000');
    expect(cell('lifeDays')).toBe('1800');
    // one undo step per action: undo returns to hire with the rates
    ws.undo();
    expect(ws.project.candidates.find((c) => c.id === hired.id)!.cost).toEqual(rates);
  });
});
