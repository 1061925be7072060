/**
 * Screening per duty and receiver, and the assessment periods: edited through the
 * Workspace (one undo step each), bad input kept as typed with a message, results not
 * computed while it stands. Rule-of-thumb screening values (−5 dB top just visible,
 * −10 dB fully hidden) are common practice in UK and Hong Kong construction noise guidance.
 */
import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import { Workspace } from '../../../src/app/state/workspace.svelte.ts';
import ScreeningEditor from '../../../src/app/shell/ScreeningEditor.svelte';
import PeriodsEditor from '../../../src/app/shell/PeriodsEditor.svelte';
import { screeningCell, screeningEntry } from '../../../src/app/shell/screening-editor.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';

/** Tolerance for level differences, dB. */
const TOL_DB = 0.01;

function firstPair(ws: Workspace) {
  const duty = ws.project.duties[0]!;
  const receiver = ws.project.receivers.find((r) => !r.screening[duty.id])!;
  const baseline = duty.baselineCandidateId;
  return { duty, receiver, level: () => ws.evaluation!.contributionDb(baseline, receiver.id) };
}

describe('screening cells', () => {
  it('screeningCell reads a stored reduction with the project’s separator', () => {
    expect(screeningCell({ kind: 'explicit', db: 7.5 }, undefined, ',')).toEqual({
      kind: 'explicit',
      amount: '7,5',
      unread: false,
    });
    expect(screeningCell({ kind: 'barrier', pathDifferenceM: 0.8 }, undefined, '.')).toEqual({
      kind: 'barrier',
      amount: '0.8',
      unread: false,
    });
    expect(screeningCell(undefined, undefined, '.')).toEqual({ kind: 'none', amount: '', unread: false });
  });

  it('screeningCell shows the kept text of an unread amount under its kind', () => {
    expect(screeningCell({ kind: 'barrier', pathDifferenceM: NaN }, 'z 0,8x', ',')).toEqual({
      kind: 'barrier',
      amount: '0,8x',
      unread: true,
    });
    expect(screeningCell({ kind: 'explicit', db: NaN }, 'seven dB', '.')).toEqual({
      kind: 'explicit',
      amount: 'seven',
      unread: true,
    });
  });

  it('screeningEntry writes the words the screening column reads', () => {
    expect(screeningEntry('hidden', '')).toBe('out of sight');
    expect(screeningEntry('top-visible', '')).toBe('top in sight');
    expect(screeningEntry('explicit', ' 7,5 ')).toBe('7,5 dB');
    expect(screeningEntry('barrier', '0.8')).toBe('z 0.8');
  });
});

describe('screening through the Workspace', () => {
  it('a fully hidden machine is 10 dB quieter at that receiver, and undo brings it back', () => {
    const ws = new Workspace(demoProject());
    const { duty, receiver, level } = firstPair(ws);
    const before = level();
    ws.applyCellTexts('receivers', [
      { rowId: receiver.id, columnId: `screening:${duty.id}`, text: screeningEntry('hidden', '') },
    ]);
    expect(ws.project.receivers.find((r) => r.id === receiver.id)!.screening[duty.id]).toEqual({ kind: 'hidden' });
    // Common practice: fully hidden behind a hoarding −10 dB.
    expect(Math.abs(before - level() - 10)).toBeLessThan(TOL_DB);
    ws.undo();
    expect(Math.abs(level() - before)).toBeLessThan(TOL_DB);
  });

  it('an unreadable reduction is kept as typed, gets a message, and the level is not computed', () => {
    const ws = new Workspace(demoProject());
    const { duty, receiver, level } = firstPair(ws);
    const columnId = `screening:${duty.id}`;
    ws.applyCellTexts('receivers', [{ rowId: receiver.id, columnId, text: screeningEntry('explicit', '7,5x') }]);
    expect(ws.rawText('receivers', receiver.id, columnId)).toBe('7,5x dB');
    expect(ws.problem('receivers', receiver.id, columnId)).toMatch(
      /: "7,5x dB" is not a reduction in dB \(use a reduction in dB from 0 to 40, e\.g\. 7\.5\)$/,
    );
    expect(Number.isNaN(level())).toBe(true);
    // The path problem it causes is not repeated on the receiver's name: the kept text has its own message.
    expect(ws.problem('receivers', receiver.id, 'name')).toBeUndefined();
    ws.applyCellTexts('receivers', [{ rowId: receiver.id, columnId, text: screeningEntry('explicit', '7.5') }]);
    expect(ws.rawText('receivers', receiver.id, columnId)).toBeUndefined();
    expect(Number.isFinite(level())).toBe(true);
  });

  it('ScreeningEditor writes the choice of a cell and offers a barrier only with ISO 9613-2', async () => {
    const ws = new Workspace(demoProject());
    const { duty, receiver } = firstPair(ws);
    render(ScreeningEditor, { props: { workspace: ws } });
    const select = screen.getByRole('combobox', {
      name: `Screening of ${receiver.name} from ${duty.name}`,
    }) as HTMLSelectElement;
    const barrier = within(select).getByRole('option', { name: /barrier/ }) as HTMLOptionElement;
    expect(ws.project.propagation.method).toBe('simple');
    expect(barrier.disabled).toBe(true);
    await fireEvent.change(select, { target: { value: 'top-visible' } });
    expect(ws.project.receivers.find((r) => r.id === receiver.id)!.screening[duty.id]).toEqual({ kind: 'top-visible' });
  });

  it('ScreeningEditor asks for the amount of a stated reduction and keeps bad text with its message', async () => {
    const ws = new Workspace(demoProject());
    const { duty, receiver } = firstPair(ws);
    render(ScreeningEditor, { props: { workspace: ws } });
    const select = screen.getByRole('combobox', { name: `Screening of ${receiver.name} from ${duty.name}` });
    await fireEvent.change(select, { target: { value: 'explicit' } });
    // Nothing is written until an amount is typed.
    expect(ws.project.receivers.find((r) => r.id === receiver.id)!.screening[duty.id]).toBeUndefined();
    const amount = screen.getByRole('textbox', {
      name: `Reduction in dB, ${receiver.name} from ${duty.name}`,
    }) as HTMLInputElement;
    await fireEvent.change(amount, { target: { value: 'lots' } });
    const kept = screen.getByRole('textbox', {
      name: `Reduction in dB, ${receiver.name} from ${duty.name}`,
    }) as HTMLInputElement;
    expect(kept.value).toBe('lots');
    expect(kept.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/"lots dB" is not a reduction in dB/)).toBeTruthy();
    await fireEvent.change(kept, { target: { value: '6' } });
    expect(ws.project.receivers.find((r) => r.id === receiver.id)!.screening[duty.id]).toEqual({
      kind: 'explicit',
      db: 6,
    });
  });
});

describe('assessment periods', () => {
  it('a period’s hours are edited as HH:MM, and an unreadable time is kept with its message', () => {
    const ws = new Workspace(demoProject());
    const period = ws.project.periods[0]!;
    ws.applyCellTexts('periods', [{ rowId: period.id, columnId: 'start', text: '7.30' }]);
    expect(ws.project.periods[0]!.start).toBe('07:30');
    ws.applyCellTexts('periods', [{ rowId: period.id, columnId: 'end', text: '25:00' }]);
    expect(ws.project.periods[0]!.end).toBe(period.end);
    expect(ws.rawText('periods', period.id, 'end')).toBe('25:00');
    expect(ws.problem('periods', period.id, 'end')).toBe(
      '"Weekday daytime" (row 1), To: "25:00" is not a time (use a time of day HH:MM from 00:00 to 24:00, e.g. 07:00)',
    );
  });

  it('removePeriod refuses a period a phase uses, and removes an unused one with the receivers’ limits for it', () => {
    const ws = new Workspace(demoProject());
    const used = ws.project.periods[0]!;
    expect(ws.removePeriod(used.id)).toMatch(/is used by the phases? /);
    expect(ws.project.periods).toHaveLength(1);
    const id = ws.addPeriod('Evening', '19:00', '23:00');
    ws.applyCellTexts('receivers', [{ rowId: ws.project.receivers[0]!.id, columnId: `limit:${id}`, text: '55' }]);
    expect(ws.project.receivers[0]!.limitsDb[id]).toBe(55);
    expect(ws.removePeriod(id)).toBeUndefined();
    expect(ws.project.periods.map((p) => p.id)).toEqual([used.id]);
    expect(ws.project.receivers[0]!.limitsDb[id]).toBeUndefined();
    ws.undo();
    expect(ws.project.periods).toHaveLength(2);
  });

  it('PeriodsEditor shows kept text of a bad time, with its message, and asks what to do with the phases of a removed period', async () => {
    const ws = new Workspace(demoProject());
    ws.addPeriod(); // a second period to move the demo's phases to
    render(PeriodsEditor, { props: { workspace: ws } });
    const to = screen.getAllByRole('textbox', { name: 'To' })[0] as HTMLInputElement;
    await fireEvent.change(to, { target: { value: 'late' } });
    const kept = screen.getAllByRole('textbox', { name: 'To' })[0] as HTMLInputElement;
    expect(kept.value).toBe('late');
    expect(kept.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText(/"late" is not a time/)).toBeTruthy();
    const period = ws.project.periods[0]!;
    const phases = ws.project.phases.filter((p) => p.periodId === period.id);
    const other = ws.project.periods.find((p) => p.id !== period.id)!;
    await fireEvent.click(screen.getAllByRole('button', { name: /^Remove period/ })[0]!);
    // never silently: the dialog names the period and its phases, by name
    const said = screen.getByTestId('delete-references').textContent ?? '';
    expect(said).toContain(period.name);
    for (const p of phases) expect(said).toContain(p.name);
    expect(ws.project.periods).toHaveLength(2);
    await fireEvent.change(screen.getByLabelText('Move the phases to'), { target: { value: other.id } });
    await fireEvent.click(screen.getByRole('button', { name: 'Move the phases and delete', hidden: true }));
    expect(ws.project.periods.map((p) => p.id)).toEqual([other.id]);
    for (const p of phases) expect(ws.project.phases.find((x) => x.id === p.id)?.periodId).toBe(other.id);
  });
});
