/**
 * The Workspace: cell edits through the column parsers, unread cells, problems, undo/redo
 * over every kind of edit, and the derived evaluation. Expected directions of results rest
 * on common practice: levels add energetically, so raising one machine's LWA raises the
 * phase total at every receiver it reaches.
 */
import { describe, expect, it, vi } from 'vitest';
import { flushSync } from 'svelte';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import type { Project } from '../../../src/ledger/model/model.ts';

function baselineOfFirstDuty(project: Project) {
  const duty = project.duties[0]!;
  const index = project.candidates.findIndex((c) => c.id === duty.baselineCandidateId);
  return { duty, candidate: project.candidates[index]!, row: index + 1 };
}

function matrixLevel(ws: Workspace, phaseId: string, receiverId: string): number {
  return ws.evaluation!.matrix.find((c) => c.phaseId === phaseId && c.receiverId === receiverId)!.levelDb;
}

describe('Workspace editing', () => {
  it('applyCellTexts writes a typed LWA and the matrix follows', () => {
    const ws = new Workspace(demoProject());
    const { duty, candidate } = baselineOfFirstDuty(ws.project);
    const receiverId = ws.project.receivers[0]!.id;
    const before = matrixLevel(ws, duty.phaseId, receiverId);
    ws.applyCellTexts('candidates', [
      { rowId: candidate.id, columnId: 'lwaDb', text: String((candidate.lwaDb ?? 100) + 10) },
    ]);
    expect(ws.project.candidates.find((c) => c.id === candidate.id)!.lwaDb).toBe((candidate.lwaDb ?? 100) + 10);
    // Common practice: a louder baseline machine raises the phase total energetically.
    expect(matrixLevel(ws, duty.phaseId, receiverId)).toBeGreaterThan(before);
  });

  it('applyCellTexts reads a decimal comma when the project uses one', () => {
    const ws = new Workspace(demoProject());
    ws.setSettings({ decimalSeparator: ',' });
    const id = ws.project.candidates[0]!.id;
    // "104,5" is 104.5 written with a decimal comma (common practice in many locales).
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'lwaDb', text: '104,5' }]);
    expect(ws.project.candidates[0]!.lwaDb).toBe(104.5);
    expect(ws.candidateTable.columns.find((c) => c.id === 'lwaDb')!.display(ws.project.candidates[0]!)).toBe('104,5');
  });

  it('applyCellTexts keeps unreadable text, flags the cell and leaves results not computed', () => {
    const ws = new Workspace(demoProject());
    const { candidate, row } = baselineOfFirstDuty(ws.project);
    ws.applyCellTexts('candidates', [{ rowId: candidate.id, columnId: 'lwaDb', text: '12O' }]);
    const stored = ws.project.candidates.find((c) => c.id === candidate.id)!;
    expect(Number.isNaN(stored.lwaDb)).toBe(true);
    expect(ws.project.unreadCells).toEqual({ [`candidates/${candidate.id}/lwaDb`]: '12O' });
    expect(ws.rawText('candidates', candidate.id, 'lwaDb')).toBe('12O');
    expect(ws.problem('candidates', candidate.id, 'lwaDb')).toBe(
      `${JSON.stringify(candidate.label)} (row ${row}), LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)`,
    );
    const level = ws.candidateTable.columns.find((c) => c.id === 'levelAtReceiver')!;
    expect(level.display(stored)).toBe('not computed');
  });

  it('retyping a readable value clears the unread cell', () => {
    const ws = new Workspace(demoProject());
    const id = ws.project.candidates[0]!.id;
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'lwaDb', text: 'loud' }]);
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'lwaDb', text: '101' }]);
    expect(ws.project.unreadCells).toBeUndefined();
    expect(ws.problem('candidates', id, 'lwaDb')).toBeUndefined();
  });

  it('setSettings to a decimal comma re-reads kept text such as "104,5"', () => {
    const ws = new Workspace(demoProject());
    const id = ws.project.candidates[0]!.id;
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'lwaDb', text: '104,5' }]);
    expect(ws.project.unreadCells).toBeDefined();
    ws.setSettings({ decimalSeparator: ',' });
    expect(ws.project.candidates[0]!.lwaDb).toBe(104.5);
    expect(ws.project.unreadCells).toBeUndefined();
  });

  it('a paste past the end appends rows to the duty the paste started in', () => {
    const ws = new Workspace(demoProject());
    const duty = ws.project.duties[1]!;
    const count = ws.project.candidates.length;
    ws.applyCellTexts('candidates', [
      { rowId: null, newRow: 0, group: duty.id, columnId: 'label', text: 'Pasted one' },
      { rowId: null, newRow: 0, group: duty.id, columnId: 'lwaDb', text: '99' },
      { rowId: null, newRow: 1, group: duty.id, columnId: 'label', text: 'Pasted two' },
      { rowId: null, newRow: 1, group: duty.id, columnId: 'lwaDb', text: '98.5' },
    ]);
    expect(ws.project.candidates).toHaveLength(count + 2);
    const added = ws.project.candidates.filter((c) => c.label.startsWith('Pasted'));
    expect(added.map((c) => [c.dutyId, c.lwaDb])).toEqual([
      [duty.id, 99],
      [duty.id, 98.5],
    ]);
    // The new rows sit with their duty's other rows.
    const positions = ws.project.candidates.map((c, i) => (c.dutyId === duty.id ? i : -1)).filter((i) => i >= 0);
    expect(positions[positions.length - 1]! - positions[0]!).toBe(positions.length - 1);
  });

  it('a new candidate without a rate shows its cost as not computed, never 0', () => {
    const ws = new Workspace(demoProject());
    const id = ws.addCandidate(ws.project.duties[0]!.id, { label: 'No price yet', lwaDb: 100 });
    const cost = ws.candidateTable.columns.find((c) => c.id === 'costForDuty')!;
    expect(cost.display(ws.project.candidates.find((c) => c.id === id)!)).toBe('not computed');
  });

  it('writing a price switches a hire candidate to purchase', () => {
    const ws = new Workspace(demoProject());
    const hire = ws.project.candidates.find((c) => c.cost.kind === 'hire')!;
    ws.applyCellTexts('candidates', [{ rowId: hire.id, columnId: 'price', text: '45000' }]);
    const cost = ws.project.candidates.find((c) => c.id === hire.id)!.cost;
    expect(cost.kind).toBe('purchase');
    expect(cost.kind === 'purchase' && cost.price).toBe(45000);
  });

  it('setPinned pins one candidate and unpins the others of its duty', () => {
    const ws = new Workspace(demoProject());
    const duty = ws.project.duties[0]!;
    const [a, b] = ws.project.candidates.filter((c) => c.dutyId === duty.id);
    ws.setPinned(a!.id, true);
    ws.setPinned(b!.id, true);
    const byId = new Map(ws.project.candidates.map((c) => [c.id, c]));
    expect(byId.get(a!.id)!.pinned).toBeUndefined();
    expect(byId.get(b!.id)!.pinned).toBe(true);
  });
});

describe('Workspace imports and large projects', () => {
  it('addCandidates adds a supplier list as one undo step, renaming clashing ids with their unread cells', () => {
    const original = demoProject();
    const ws = new Workspace(original);
    const clash = original.candidates[0]!;
    ws.addCandidates([{ ...clash, label: 'Imported', lwaDb: NaN }], { [`candidates/${clash.id}/lwaDb`]: '1O1' });
    const added = ws.project.candidates.find((c) => c.label === 'Imported')!;
    expect(added.id).not.toBe(clash.id);
    expect(ws.project.unreadCells).toEqual({ [`candidates/${added.id}/lwaDb`]: '1O1' });
    expect(ws.rawText('candidates', added.id, 'lwaDb')).toBe('1O1');
    ws.undo();
    expect(ws.project).toBe(original);
  });

  it('a project of more than 1,000 machines is validated shortly after an edit, not during it', async () => {
    vi.useFakeTimers();
    try {
      const demo = demoProject();
      const many = Array.from({ length: 1001 }, (_, i) => ({
        ...demo.candidates[i % demo.candidates.length]!,
        id: `m${i}`,
      }));
      const ws = new Workspace({ ...demo, candidates: many });
      vi.advanceTimersByTime(1000);
      const mentions = () => ws.dataProblems.filter((p) => p.message.includes('no-such-duty')).length;
      expect(mentions()).toBe(0);
      // A machine offered for a duty that does not exist: a problem only validation finds.
      ws.addCandidates([{ ...demo.candidates[0]!, id: 'orphan', dutyId: 'no-such-duty' }]);
      expect(mentions()).toBe(0);
      vi.advanceTimersByTime(1000);
      expect(mentions()).toBeGreaterThan(0);
    } finally {
      vi.useRealTimers();
    }
  });
});

describe('Workspace undo and redo', () => {
  it('undo and redo cover a typed edit, a paste and a row deletion, in order', () => {
    const original = demoProject();
    const ws = new Workspace(original);
    const first = original.candidates[0]!;
    ws.applyCellTexts('candidates', [{ rowId: first.id, columnId: 'label', text: 'Renamed' }]);
    const afterEdit = ws.project;
    ws.applyCellTexts('candidates', [
      { rowId: null, newRow: 0, columnId: 'label', text: 'P1' },
      { rowId: null, newRow: 1, columnId: 'label', text: 'P2' },
    ]);
    const afterPaste = ws.project;
    ws.deleteRows('candidates', [first.id]);
    expect(ws.project.candidates.some((c) => c.id === first.id)).toBe(false);

    ws.undo();
    expect(ws.project).toBe(afterPaste);
    ws.undo();
    expect(ws.project).toBe(afterEdit);
    ws.undo();
    expect(ws.project).toBe(original);
    expect(ws.canUndo).toBe(false);

    ws.redo();
    ws.redo();
    expect(ws.project).toBe(afterPaste);
    expect(ws.project.candidates.filter((c) => c.label === 'P1' || c.label === 'P2')).toHaveLength(2);
    ws.redo();
    expect(ws.project.candidates.some((c) => c.id === first.id)).toBe(false);
    expect(ws.canRedo).toBe(false);
  });

  it('a new edit after an undo forgets what could be redone', () => {
    const ws = new Workspace(demoProject());
    const id = ws.project.candidates[0]!.id;
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'label', text: 'A' }]);
    ws.undo();
    ws.applyCellTexts('candidates', [{ rowId: id, columnId: 'label', text: 'B' }]);
    expect(ws.canRedo).toBe(false);
  });

  it('deleting a duty deletes its candidates, and one undo brings both back', () => {
    const original = demoProject();
    const ws = new Workspace(original);
    const duty = original.duties[0]!;
    ws.deleteRows('duties', [duty.id]);
    expect(ws.project.candidates.some((c) => c.dutyId === duty.id)).toBe(false);
    ws.undo();
    expect(ws.project).toBe(original);
  });

  it('onchange is called for every edit, undo and redo, and not for outside replacements', () => {
    const onchange = vi.fn();
    const ws = new Workspace(demoProject(), { onchange });
    ws.setName('Renamed project');
    ws.undo();
    ws.redo();
    ws.replaceFromOutside(demoProject());
    expect(onchange).toHaveBeenCalledTimes(3);
    expect(onchange.mock.calls[2]![0].name).toBe('Renamed project');
  });

  it('derived ranking follows the chosen duty', () => {
    const ws = new Workspace(demoProject());
    const second = ws.project.duties[1]!;
    ws.selectDuty(second.id);
    flushSync();
    expect(ws.ranking.length).toBeGreaterThan(0);
    const own = new Set(ws.project.candidates.filter((c) => c.dutyId === second.id).map((c) => c.id));
    expect(ws.ranking.every((r) => own.has(r.candidateId))).toBe(true);
  });

  it('runOptimiser keeps the result as a fleet of the project, and marks it stale after an input edit (not a rename)', async () => {
    const project = demoProject();
    const choice = {
      ...Object.fromEntries(project.duties.map((d) => [d.id, d.baselineCandidateId])),
      'd-slab': 'slab-crusher',
    };
    const fake = { feasible: true, best: { fleet: choice } } as never;
    const ws = new Workspace(project, { optimise: async () => fake });
    await ws.runOptimiser();
    expect(ws.optimiserResult).toBe(fake);
    expect(ws.optimiserFleet?.choice).toEqual(choice);
    expect(ws.optimiserStale).toBe(false);
    ws.setName('Changed');
    expect(ws.optimiserStale).toBe(false);
    ws.applyCellTexts('duties', [{ rowId: 'd-slab', columnId: 'onTimePct', text: '20' }]);
    expect(ws.optimiserStale).toBe(true);
    ws.undo();
    expect(ws.optimiserStale).toBe(false);
  });

  it('using the optimiser’s fleet changes the matrix; choosing a machine makes "My fleet" and keeps it assessed', async () => {
    const project = demoProject();
    const choice = {
      ...Object.fromEntries(project.duties.map((d) => [d.id, d.baselineCandidateId])),
      'd-slab': 'slab-crusher',
    };
    const ws = new Workspace(project, { optimise: async () => ({ feasible: true, best: { fleet: choice } }) as never });
    await ws.runOptimiser();
    const before = matrixLevel(ws, 'ph-demolition', 'r-terrace');
    ws.useFleet('Cheapest compliant (optimiser)');
    expect(ws.assessed.name).toBe('Cheapest compliant (optimiser)');
    // a 106 dB crusher in place of the 118 dB breaker lowers the energetic sum (common practice)
    expect(matrixLevel(ws, 'ph-demolition', 'r-terrace')).toBeLessThan(before);
    ws.chooseForFleet('shell-14t-electric');
    expect(ws.assessed.name).toBe('My fleet');
    expect(ws.assessed.fleet['d-slab']).toBe('slab-crusher');
    expect(ws.assessed.fleet['d-shell']).toBe('shell-14t-electric');
    expect(ws.evaluation!.fleet['d-shell']).toBe('shell-14t-electric');
    expect(ws.compliance!.fleet).toBe('fleet “My fleet”');
  });
});
