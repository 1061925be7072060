/**
 * Three-way merge of projects cell by cell (two tabs, and undo of one tab's own edits).
 * Check values are worked by hand from the rule: a cell changed on one side only takes
 * that side's value; a cell changed on both sides is settled by `prefer` and listed.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mergeProjects, same } from '../../../../src/ledger/file/project-merge.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Candidate, Project } from '../../../../src/ledger/model/model.ts';

const base = demoProject();
const n = base.candidates.length;

function setCandidate(project: Project, index: number, patch: Partial<Candidate>): Project {
  return { ...project, candidates: project.candidates.map((c, i) => (i === index ? { ...c, ...patch } : c)) };
}

describe('mergeProjects', () => {
  it('keeps both sides’ edits to different cells of one row and of different rows', () => {
    const mine = setCandidate(base, 0, { lwaDb: 111 });
    const theirs = setCandidate(setCandidate(base, 0, { label: 'Renamed elsewhere' }), 2, { runningPerDay: 55 });
    const { project, conflicts } = mergeProjects(base, mine, theirs, 'mine');
    expect(conflicts).toEqual([]);
    expect(project.candidates[0]).toMatchObject({ lwaDb: 111, label: 'Renamed elsewhere' });
    expect(project.candidates[2]!.runningPerDay).toBe(55);
    // rows neither side touched keep their identity
    expect(project.candidates[1]).toBe(base.candidates[1]);
  });

  it('settles a cell both changed by `prefer` and lists it', () => {
    const mine = setCandidate(base, 0, { lwaDb: 101 });
    const theirs = setCandidate(base, 0, { lwaDb: 104 });
    const kept = mergeProjects(base, mine, theirs, 'mine');
    expect(kept.project.candidates[0]!.lwaDb).toBe(101);
    expect(kept.conflicts).toEqual([
      {
        list: 'candidates',
        rowId: base.candidates[0]!.id,
        rowName: base.candidates[0]!.label,
        field: 'lwaDb',
        mine: 101,
        theirs: 104,
        kept: 'mine',
      },
    ]);
    const left = mergeProjects(base, mine, theirs, 'theirs');
    expect(left.project.candidates[0]!.lwaDb).toBe(104);
    expect(left.conflicts[0]!.kept).toBe('theirs');
  });

  it('two sides setting a cell to the same value is no conflict', () => {
    const mine = setCandidate(base, 0, { lwaDb: 101 });
    const theirs = setCandidate(base, 0, { lwaDb: 101 });
    expect(mergeProjects(base, mine, theirs, 'mine').conflicts).toEqual([]);
  });

  it('a row I added goes after the row that precedes it in my list; a row they deleted stays deleted', () => {
    const added: Candidate = { ...base.candidates[0]!, id: 'new1', label: 'Added here' };
    const mine: Project = { ...base, candidates: [base.candidates[0]!, added, ...base.candidates.slice(1)] };
    const theirs: Project = { ...base, candidates: base.candidates.filter((_, i) => i !== 3) };
    const { project, conflicts } = mergeProjects(base, mine, theirs, 'mine');
    expect(conflicts).toEqual([]);
    expect(project.candidates.map((c) => c.id)).toEqual([
      base.candidates[0]!.id,
      'new1',
      ...base.candidates
        .slice(1)
        .filter((_, i) => i !== 2)
        .map((c) => c.id),
    ]);
  });

  it('an unread cell’s text merges per cell, beside the other side’s unread cell', () => {
    const a = base.candidates[0]!.id;
    const b = base.candidates[1]!.id;
    const mine = { ...setCandidate(base, 0, { lwaDb: NaN }), unreadCells: { [`candidates/${a}/lwaDb`]: 'loud' } };
    const theirs = { ...setCandidate(base, 1, { lwaDb: NaN }), unreadCells: { [`candidates/${b}/lwaDb`]: 'quiet' } };
    const { project, conflicts } = mergeProjects(base, mine, theirs, 'mine');
    expect(conflicts).toEqual([]);
    expect(project.unreadCells).toEqual({ [`candidates/${a}/lwaDb`]: 'loud', [`candidates/${b}/lwaDb`]: 'quiet' });
  });

  it('undo as a merge: my edit undone on top of another tab’s later edit to another cell keeps theirs', () => {
    const mineAfter = setCandidate(base, 0, { lwaDb: 111 });
    const current = setCandidate(mineAfter, 1, { lwaDb: 122 }); // another tab's edit arrived
    const { project } = mergeProjects(mineAfter, base, current, 'theirs');
    expect(project.candidates[0]!.lwaDb).toBe(base.candidates[0]!.lwaDb);
    expect(project.candidates[1]!.lwaDb).toBe(122);
  });
});

describe('mergeProjects properties (fast-check)', () => {
  const edit = fc.record({
    row: fc.integer({ min: 0, max: n - 1 }),
    field: fc.constantFrom('lwaDb' as const, 'runningPerDay' as const, 'fixedCharges' as const),
    value: fc.integer({ min: 1, max: 500 }),
  });
  const edits = fc.array(edit, { maxLength: 6 });
  const apply = (
    project: Project,
    list: { row: number; field: 'lwaDb' | 'runningPerDay' | 'fixedCharges'; value: number }[],
  ) => list.reduce((p, e) => setCandidate(p, e.row, { [e.field]: e.value }), project);

  it('merging with an unchanged side gives the other side', () => {
    fc.assert(
      fc.property(edits, (list) => {
        const mine = apply(base, list);
        expect(mergeProjects(base, mine, base, 'mine').project).toBe(mine);
        expect(mergeProjects(base, base, mine, 'mine').project).toBe(mine);
      }),
    );
  });

  it('every cell changed on one side only ends with that side’s value; conflicts are exactly the cells both changed differently', () => {
    fc.assert(
      fc.property(edits, edits, fc.constantFrom('mine' as const, 'theirs' as const), (a, b, prefer) => {
        const mine = apply(base, a);
        const theirs = apply(base, b);
        const { project, conflicts } = mergeProjects(base, mine, theirs, prefer);
        let expectedConflicts = 0;
        for (let i = 0; i < n; i++) {
          for (const f of ['lwaDb', 'runningPerDay', 'fixedCharges'] as const) {
            const bv = base.candidates[i]![f];
            const mv = mine.candidates[i]![f];
            const tv = theirs.candidates[i]![f];
            const got = project.candidates[i]![f];
            if (same(mv, bv)) expect(got).toBe(tv);
            else if (same(tv, bv) || same(tv, mv)) expect(got).toBe(mv);
            else {
              expectedConflicts++;
              expect(got).toBe(prefer === 'mine' ? mv : tv);
            }
          }
        }
        expect(conflicts.length).toBe(expectedConflicts);
      }),
    );
  });
});
