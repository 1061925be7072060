/**
 * Round trip: the workbook this program exports, imported again, gives back every
 * candidate field (ids aside: an import gives fresh ones), unread text included.
 */
import { describe, expect, it } from 'vitest';
import { exportWorkbook } from '../../../../src/io/workbook/index.ts';
import { candidatesInTableOrder } from '../../../../src/io/workbook/inputs-sheet.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Candidate, Project } from '../../../../src/ledger/model/model.ts';
import { buildPreview, prepareImport, readTable } from '../../../../src/io/import/index.ts';

/** A candidate as plain data without its id, optional flags made explicit. */
function comparable(c: Candidate): Record<string, unknown> {
  const { id: _id, ...rest } = c;
  return { ...rest, pinned: c.pinned ?? false, excluded: c.excluded ?? false };
}

function awkwardProject(): Project {
  const project = demoProject();
  const [a, b, c, d] = project.candidates;
  a!.label = '=HYPERLINK("http://example.invalid","x")';
  b!.pinned = true;
  c!.excluded = true;
  d!.cost = { kind: 'purchase', price: 48_000, lifeDays: 1800, resaleValue: 9000 };
  d!.lwaOrigin = 'from-pressure';
  return project;
}

describe('export then import of the candidate list', () => {
  it('exportWorkbook → readTable → buildPreview loses no candidate field', async () => {
    const project = awkwardProject();
    const bytes = await exportWorkbook(project, { evaluation: evaluateProject(project) });
    const table = await readTable(bytes, 'shortlist.xlsx');
    const setup = prepareImport(table);
    const preview = buildPreview(table, { ...setup, dutyId: '', duties: project.duties });
    expect(preview.problems.filter((p) => p.severity === 'error')).toEqual([]);
    const expected = candidatesInTableOrder(project).map(comparable);
    expect(preview.candidates.map(comparable)).toEqual(expected);
  });

  it('a cell whose text could not be read is exported as typed and comes back as an unread cell', async () => {
    const project = demoProject();
    const target = project.candidates[1]!;
    target.lwaDb = NaN;
    project.unreadCells = { [`candidates/${target.id}/lwaDb`]: '12O' };
    const bytes = await exportWorkbook(project, { evaluation: evaluateProject(project) });
    const table = await readTable(bytes, 'shortlist.xlsx');
    const preview = buildPreview(table, { ...prepareImport(table), dutyId: '', duties: project.duties });
    const index = candidatesInTableOrder(project).indexOf(target);
    const back = preview.candidates[index]!;
    expect(back.label).toBe(target.label);
    expect(back.lwaDb).toBeNaN();
    expect(preview.unreadCells[`candidates/${back.id}/lwaDb`]).toBe('12O');
  });
});
