/**
 * Deleting rows others refer to: what the question says (names, never ids) and what each
 * answer does. Expected names and counts are read by hand from the demo project
 * (src/ledger/model/demo.ts: the phase "Piling and groundworks" holds four duties).
 */
import { describe, expect, it } from 'vitest';
import { referencesTo, withReferencedRowsDeleted } from '../../../src/app/state/row-references.ts';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { validateProject } from '../../../src/ledger/validate/validate.ts';

describe('referencesTo', () => {
  it('a phase names the duties that work in it, by name, and the phases they can move to', () => {
    const refs = referencesTo(demoProject(), 'phases', ['ph-ground'])!;
    expect(refs.subject).toBe('Phase “Piling and groundworks”');
    expect(refs.dependants).toBe(
      'the duties “Install the bearing piles”, “Dig the basement”, “Move spoil across the site” and “Compact the piling mat” work in it',
    );
    expect(refs.moveTargets.map((t) => t.name)).toEqual([
      'Demolition and breaking out',
      'Frame, services and landscaping',
    ]);
    expect(refs.dependants).not.toContain('d-pile');
  });

  it('a phase nothing works in, and a receiver, can go at once', () => {
    const p = demoProject();
    p.phases.push({ id: 'ph-empty', name: 'Snagging', periodId: 'day', start: '08:00', end: '18:00' });
    expect(referencesTo(p, 'phases', ['ph-empty'])).toBeUndefined();
    expect(referencesTo(p, 'receivers', ['r-school'])).toBeUndefined();
  });

  it('a duty names its machines; a period names its phases', () => {
    const p = demoProject();
    const duty = referencesTo(p, 'duties', ['d-mat'])!;
    expect(duty.subject).toBe('Duty “Compact the piling mat”');
    expect(duty.dependants).toMatch(/^\d+ machines “.+” are offered for it$/);
    expect(referencesTo(p, 'periods', ['day'])!.dependants).toMatch(
      /^the phases “Demolition and breaking out”, .+ are assessed over it$/,
    );
  });
});

describe('withReferencedRowsDeleted', () => {
  it('moving the duties keeps every duty and leaves a valid project', () => {
    const p = demoProject();
    const refs = referencesTo(p, 'phases', ['ph-ground'])!;
    const next = withReferencedRowsDeleted(p, refs, { kind: 'move', to: 'ph-frame' });
    expect(next.phases.map((x) => x.id)).toEqual(['ph-demolition', 'ph-frame']);
    expect(next.duties.length).toBe(p.duties.length);
    expect(next.duties.filter((d) => d.phaseId === 'ph-frame').length).toBe(
      p.duties.filter((d) => d.phaseId === 'ph-ground' || d.phaseId === 'ph-frame').length,
    );
    expect(validateProject(next)).toEqual([]);
  });

  it('deleting them too removes the duties and their machines, and undo brings all back', () => {
    const ws = new Workspace(demoProject());
    const before = ws.project;
    const refs = ws.referencesTo('phases', ['ph-ground'])!;
    ws.deleteReferencedRows(refs, { kind: 'delete-too' });
    expect(ws.project.duties.some((d) => d.phaseId === 'ph-ground')).toBe(false);
    expect(ws.project.candidates.some((c) => c.dutyId === 'd-pile')).toBe(false);
    expect(validateProject(ws.project)).toEqual([]);
    ws.undo();
    expect(ws.project).toBe(before);
  });

  it('moving a duty’s machines to another duty keeps them, unpinned', () => {
    const p = demoProject();
    p.candidates = p.candidates.map((c) => (c.dutyId === 'd-mat' ? { ...c, pinned: true } : c));
    const moved = p.candidates.filter((c) => c.dutyId === 'd-mat').map((c) => c.id);
    const next = withReferencedRowsDeleted(p, referencesTo(p, 'duties', ['d-mat'])!, { kind: 'move', to: 'd-dig' });
    for (const id of moved) {
      const c = next.candidates.find((x) => x.id === id)!;
      expect(c.dutyId).toBe('d-dig');
      expect(c.pinned).toBeUndefined();
    }
  });
});

describe('Workspace.addRow', () => {
  it('adds a first receiver, phase and duty to an empty project, one undo step each', () => {
    const p = demoProject();
    const empty = { ...p, receivers: [], phases: [], duties: [], candidates: [] };
    const ws = new Workspace(empty);
    expect(ws.addRow('candidates')).toBeUndefined(); // a machine needs a duty first
    const r = ws.addRow('receivers')!;
    expect(ws.project.receivers.map((x) => x.id)).toEqual([r]);
    ws.addRow('phases');
    const d = ws.addRow('duties')!;
    expect(ws.project.duties[0]!.id).toBe(d);
    expect(ws.project.duties[0]!.phaseId).toBe(ws.project.phases[0]!.id);
    const c = ws.addRow('candidates')!;
    expect(ws.project.candidates[0]).toMatchObject({ id: c, dutyId: d });
    ws.undo();
    expect(ws.project.candidates).toEqual([]);
  });
});
