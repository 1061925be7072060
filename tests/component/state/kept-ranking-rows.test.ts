/**
 * An edit keeps the ranking rows it did not change as the same objects (the grid re-reads a
 * row only when what it is made from changed), and a row whose figures did change is new.
 * Figures here are the ledger's own ranking compared before and after; what is asserted is
 * identity and equality, not a level.
 */
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { keepRow } from '../../../src/app/state/rankings.svelte.ts';
import { sameInputs } from '../../../src/app/grid/row-inputs.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import type { RankingRow } from '../../../src/ledger/model/results.ts';

const row = (extra: Partial<RankingRow> = {}): RankingRow => ({
  candidateId: 'm1',
  rank: 1,
  contributionDb: 60.2,
  phaseTotalDb: 65,
  reductionDb: NaN,
  extraCost: 0,
  dominated: false,
  freeWin: false,
  overLimit: false,
  isBaseline: true,
  ...extra,
});

describe('keeping ranking rows whose figures did not change', () => {
  it('keepRow keeps the earlier row when every figure is the same, NaN included', () => {
    const a = row();
    expect(keepRow(a, row())).toBe(a);
    expect(keepRow(undefined, a)).toBe(a);
    const moved = row({ rank: 2 });
    expect(keepRow(a, moved)).toBe(moved);
    // a figure present on one side only is a change
    const withRate = row({ dbPer1000: 1.5 });
    expect(keepRow(a, withRate)).toBe(withRate);
    expect(keepRow(withRate, a)).toBe(a);
  });

  it('sameInputs compares in order with Object.is', () => {
    const o = {};
    expect(sameInputs([o, 1, NaN], [o, 1, NaN])).toBe(true);
    expect(sameInputs([o, {}], [o, {}])).toBe(false);
    expect(sameInputs([1, 2], [2, 1])).toBe(false);
    expect(sameInputs([1], [1, undefined])).toBe(false);
  });

  it('an edit of one machine keeps the other duties’ rows and renews the edited machine’s', () => {
    const ws = new Workspace(demoProject());
    const project = ws.project;
    const edited = project.candidates[0]!;
    // a machine of another duty without a message (a row with one is re-read with every edit, by design)
    const other = project.candidates.find((c) => c.dutyId !== edited.dutyId && !ws.flagged('candidates', c.id, c))!;
    const before = { edited: ws.rankingOf(edited.id), other: ws.rankingOf(other.id) };
    expect(before.edited).toBeDefined();
    ws.applyCellTexts('candidates', [{ rowId: edited.id, columnId: 'lwaDb', text: String((edited.lwaDb ?? 100) + 3) }]);
    const after = { edited: ws.rankingOf(edited.id), other: ws.rankingOf(other.id) };
    expect(after.edited).not.toBe(before.edited);
    expect(after.edited!.contributionDb).toBeGreaterThan(before.edited!.contributionDb);
    // another duty's row: the same figures, so the same object (unless the edit moved the phase's worst receiver)
    if (JSON.stringify(after.other) === JSON.stringify(before.other)) expect(after.other).toBe(before.other);
    // the grid's inputs of the other row are unchanged; the edited row's are not
    const inputs = (id: string) => {
      const c = ws.project.candidates.find((x) => x.id === id)!;
      return ws.candidateRowInputs(id, c);
    };
    const otherInputs = inputs(other.id);
    expect(sameInputs(otherInputs, inputs(other.id))).toBe(true);
    const editedInputs = inputs(edited.id);
    ws.applyCellTexts('candidates', [{ rowId: edited.id, columnId: 'lwaDb', text: String(edited.lwaDb ?? 100) }]);
    expect(sameInputs(editedInputs, inputs(edited.id))).toBe(false);
  });
});
