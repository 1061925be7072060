import { describe, expect, it } from 'vitest';
import { stepWords } from '../../../../src/app/state/step-words.ts';
import { candidate, duty, projectShell } from '../../ledger/fixtures.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';

function project(): Project {
  return projectShell({
    duties: [duty({ id: 'u1', name: 'Dig' })],
    candidates: [candidate({ id: 'c1', label: 'Dumper 6 t' }), candidate({ id: 'c2', label: 'Dumper 9 t' })],
  });
}

describe('stepWords', () => {
  it('stepWords names the one machine edited, by its name', () => {
    const p = project();
    const next = { ...p, candidates: [{ ...p.candidates[0]!, lwaDb: 99 }, p.candidates[1]!] };
    expect(stepWords(p, next)).toBe('the edit to machine “Dumper 6 t”');
  });

  it('stepWords names a row added and counts rows deleted', () => {
    const p = project();
    const added = { ...p, duties: [...p.duties, duty({ id: 'u2', name: 'Pump the slab' })] };
    expect(stepWords(p, added)).toBe('adding duty “Pump the slab”');
    expect(stepWords(p, { ...p, candidates: [] })).toBe('deleting 2 machines');
  });

  it('stepWords says the order changed only when it did (a copied list is no change)', () => {
    const p = project();
    expect(stepWords(p, { ...p, candidates: [...p.candidates], name: 'Renamed' })).toBe('the project’s new name');
    expect(stepWords(p, { ...p, candidates: [p.candidates[1]!, p.candidates[0]!] })).toBe(
      'the new order of the machines',
    );
  });

  it('stepWords names the machine whose unreadable text was typed, never its id', () => {
    const p = project();
    const next = { ...p, unreadCells: { 'candidates/c2/lwaDb': '1O5' } };
    expect(stepWords(p, next)).toBe('the edit to machine “Dumper 9 t”');
  });

  it('stepWords falls back to "the last edit" when nothing it knows changed', () => {
    const p = project();
    expect(stepWords(p, { ...p })).toBe('the last edit');
  });

  it('stepWords names a renamed machine by the name shown after an undo (before) or a redo (after)', () => {
    const p = project();
    const next = { ...p, candidates: [{ ...p.candidates[0]!, label: 'Dumper 6 t, electric' }, p.candidates[1]!] };
    expect(stepWords(p, next, 'before')).toBe('the edit to machine “Dumper 6 t”');
    expect(stepWords(p, next, 'after')).toBe('the edit to machine “Dumper 6 t, electric”');
  });
});
