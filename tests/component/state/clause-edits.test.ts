/**
 * Edits in the tender clauses grid that change nothing leave the clauses exactly as they
 * were: no new list, no undo step, nothing saved. Writing back what a cell shows (a paste of
 * the same block, a choice picked again, a fill down onto equal cells) once replaced the
 * whole clause list, and rewrote a boundary's coordinates rounded to six decimals and a list
 * of receivers named with a ";" as two unknown names. Places and numbers are invented.
 */
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import type { Clause, Project } from '../../../src/ledger/model/model.ts';
import type { TableDefinition } from '../../../src/app/tables/column.ts';

function projectWithClauses(): Project {
  const demo = demoProject();
  const receivers = demo.receivers.map((r, i) => (i === 1 ? { ...r, name: 'Flats 1; 2 Rope Walk' } : r));
  const periodId = demo.periods[0]!.id;
  const clauses: Clause[] = [
    {
      id: 'k1',
      ref: '7.1',
      text: 'Limit at the school and the flats',
      kind: 'limit',
      periodId,
      limitDb: 65,
      receiverIds: [receivers[0]!.id, receivers[1]!.id],
    },
    {
      id: 'k2',
      ref: '7.2',
      text: 'Limit along the north boundary',
      kind: 'limit',
      periodId,
      limitDb: 70,
      area: 'boundary',
      boundary: [
        { x: 0.1234567, y: 12.00000004 },
        { x: 40, y: 0 },
      ],
    },
    { id: 'k3', ref: '7.3', text: 'Method statement', kind: 'statement', statement: 'We will' },
  ];
  return { ...demo, receivers, clauses };
}

/** The text a clause cell shows in the grid. */
function shown(ws: Workspace, rowId: string, columnId: string): string {
  const column = (ws.table('clauses') as TableDefinition<Clause>).columns.find((c) => c.id === columnId)!;
  return column.display(ws.project.clauses!.find((c) => c.id === rowId)!);
}

describe('clause edits that change nothing', () => {
  it('pasting back every cell of the clauses as they show leaves the same project, with no undo step', () => {
    const ws = new Workspace(projectWithClauses());
    const before = ws.project;
    const changes = before.clauses!.flatMap((row) =>
      (ws.table('clauses') as TableDefinition<Clause>).columns
        .filter((c) => c.editable)
        .map((c) => ({ rowId: row.id, columnId: c.id, text: shown(ws, row.id, c.id) })),
    );
    ws.applyCellTexts('clauses', changes);
    expect(ws.project).toBe(before);
    expect(ws.project.clauses).toBe(before.clauses);
    expect(ws.canUndo).toBe(false);
  });

  it('a boundary written back as shown keeps its coordinates to the last decimal', () => {
    const ws = new Workspace(projectWithClauses());
    expect(shown(ws, 'k2', 'boundary')).toBe('0.123457 12; 40 0');
    ws.applyCellTexts('clauses', [{ rowId: 'k2', columnId: 'boundary', text: '0.123457 12; 40 0' }]);
    expect(ws.project.clauses!.find((c) => c.id === 'k2')!.boundary).toEqual([
      { x: 0.1234567, y: 12.00000004 },
      { x: 40, y: 0 },
    ]);
  });

  it('a receiver list written back as shown keeps a receiver whose name holds ";"', () => {
    const ws = new Workspace(projectWithClauses());
    const ids = ws.project.clauses!.find((c) => c.id === 'k1')!.receiverIds;
    const text = shown(ws, 'k1', 'receiverIds');
    expect(text).toContain('Flats 1; 2 Rope Walk');
    ws.applyCellTexts('clauses', [{ rowId: 'k1', columnId: 'receiverIds', text }]);
    expect(ws.project.clauses!.find((c) => c.id === 'k1')!.receiverIds).toEqual(ids);
    expect(ws.project.unreadCells).toBeUndefined();
  });

  it('a choice picked again (the grid sends its stored value) is no change', () => {
    const ws = new Workspace(projectWithClauses());
    const before = ws.project;
    ws.applyCellTexts('clauses', [{ rowId: 'k1', columnId: 'kind', text: 'limit' }]);
    expect(ws.project).toBe(before);
    expect(ws.canUndo).toBe(false);
  });

  it('a real edit still replaces just that clause, as one undo step', () => {
    const ws = new Workspace(projectWithClauses());
    const before = ws.project;
    ws.applyCellTexts('clauses', [{ rowId: 'k3', columnId: 'statement', text: 'We will, and we did' }]);
    expect(ws.project.clauses!.find((c) => c.id === 'k3')!.statement).toBe('We will, and we did');
    expect(ws.project.clauses![0]).toBe(before.clauses![0]);
    ws.undo();
    expect(ws.project.clauses).toEqual(before.clauses);
  });

  it('Delete on an optional choice (quantity, applies at) removes it, with no error kept', () => {
    const ws = new Workspace(projectWithClauses());
    ws.applyCellTexts('clauses', [
      { rowId: 'k2', columnId: 'area', text: '' },
      { rowId: 'k3', columnId: 'metric', text: '' },
    ]);
    expect(ws.project.clauses!.find((c) => c.id === 'k2')!.area).toBeUndefined();
    expect(ws.project.unreadCells).toBeUndefined();
  });
});
