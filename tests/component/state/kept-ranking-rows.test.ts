/**
 * An edit keeps the ranking rows it did not change as the same objects (the grid re-reads a
 * row only when what it is made from changed), and a row whose figures did change is new.
 * Figures here are the ledger's own ranking compared before and after; what is asserted is
 * identity and equality, not a level.
 */
import { describe, expect, it } from 'vitest';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import fc from 'fast-check';
import { keepRow, patchById } from '../../../src/app/state/rankings.svelte.ts';
import type { Candidate } from '../../../src/ledger/model/model.ts';
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
  it('the look-up by id, brought up to an edited list, equals one made afresh (ids repeated or not)', () => {
    // Property: whatever machines an edit replaces in place, patchById gives the map a new
    // Map(list.map(c => [c.id, c])) would; a list whose ids changed is refused.
    const machine = (id: string, n: number) => ({ id, label: `m${n}` }) as unknown as Candidate;
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom('a', 'b', 'c', 'd', 'e', 'f'), { minLength: 1, maxLength: 12 }),
        fc.array(fc.nat(), { maxLength: 6 }),
        (ids, replaced) => {
          const before = ids.map((id, n) => machine(id, n));
          const after = before.slice();
          for (const k of replaced) {
            const at = k % after.length;
            after[at] = machine(after[at]!.id, 100 + k);
          }
          const map = new Map(before.map((c) => [c.id, c] as const));
          expect(patchById(map, before, after)).toBe(true);
          expect([...map.entries()].sort()).toEqual(
            [...new Map(after.map((c) => [c.id, c] as const)).entries()].sort(),
          );
        },
      ),
    );
    const list = [machine('a', 0), machine('b', 1)];
    expect(patchById(new Map(), list, [list[1]!, list[0]!])).toBe(false);
    expect(patchById(new Map(), list, [list[0]!])).toBe(false);
  });
});
