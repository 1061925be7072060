/**
 * The supplier-list import dialog: reading a file, changing the mapping, the preview with
 * flagged rows, confirming (candidates and unread cells handed over) and cancelling
 * (nothing handed over, the project untouched). Files are read on the test's thread
 * (readInProcess): the reader code is the one the worker runs.
 */
import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/svelte';
import { ImportDialog, readInProcess } from '../../../src/app/import/index.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import type { Candidate } from '../../../src/ledger/model/model.ts';

const LIST =
  'Hire list, spring\n\nModel,LWA dB,Rate £/day,Remarks\nQuiet excavator,99,310,new\nBreaker,12O,85,\nPump,,40,92\n';

function fileOf(text: string, name: string): File {
  const file = new File([text], name, { type: 'text/csv' });
  // jsdom's File may lack arrayBuffer(); the reader needs it.
  if (typeof file.arrayBuffer !== 'function') {
    Object.defineProperty(file, 'arrayBuffer', { value: async () => new TextEncoder().encode(text).buffer });
  }
  return file;
}

async function openWith(text: string, name = 'list.csv') {
  const project = demoProject();
  const before = structuredClone(project);
  const onconfirm = vi.fn<(c: Candidate[], u: Record<string, string>) => void>();
  const oncancel = vi.fn();
  const dutyId = project.duties[0]!.id;
  render(ImportDialog, { props: { project, dutyId, onconfirm, oncancel, reader: readInProcess } });
  const input = document.querySelector('input[type="file"]') as HTMLInputElement;
  Object.defineProperty(input, 'files', { value: [fileOf(text, name)], configurable: true });
  await fireEvent.change(input);
  return { project, before, onconfirm, oncancel, dutyId };
}

describe('ImportDialog', () => {
  it('the preview shows the level that will be used, L + K where K is given, and the duty each row goes to', async () => {
    const { project, dutyId } = await openWith(
      'Model,LWA dB,K dB,Rate £/day\nQuiet excavator,99,2,310\nLoud excavator,104,,300\n',
    );
    const region = await screen.findByRole('region', { name: 'Preview of the machines to import' });
    const first = region.querySelector('tr[data-row="2"]') as HTMLElement;
    // measured L 99 with K 2 is rated on the guaranteed value L + K = 101 (ISO 4871:1996, Ld = L + K)
    expect(within(first).getByText('101.0')).toBeTruthy();
    expect(within(first).getByText('measured 99.0 + K 2.0 = 101.0')).toBeTruthy();
    const dutyName = project.duties.find((d) => d.id === dutyId)!.name;
    expect(within(first).getByText(dutyName)).toBeTruthy();
    const second = region.querySelector('tr[data-row="3"]') as HTMLElement;
    expect(within(second).getByText('104.0')).toBeTruthy();
    expect(screen.getByRole('button', { name: `Add 2 machines to ${dutyName}` })).toBeTruthy();
  });

  it('reads a file and suggests a mapping from the header row below the title', async () => {
    await openWith(LIST);
    const select = await screen.findByLabelText('Field for column B (LWA dB)');
    expect((select as HTMLSelectElement).value).toBe('lwaDb');
    expect((screen.getByLabelText('Field for column D (Remarks)') as HTMLSelectElement).value).toBe('');
    expect(screen.getByText(/"list\.csv": 3 machines, 1 flagged\./)).toBeTruthy();
  });

  it('the preview marks the flagged row and the cell that could not be read, with its message', async () => {
    await openWith(LIST);
    const region = await screen.findByRole('region', { name: 'Preview of the machines to import' });
    const row = region.querySelector('tr[data-row="5"]') as HTMLElement;
    expect(row.classList.contains('flagged')).toBe(true);
    const bad = within(row).getByText('12O');
    expect(bad.getAttribute('aria-invalid')).toBe('true');
    expect(bad.getAttribute('title')).toBe(
      'Row 5, LWA dB: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
    expect(
      screen.getByText(
        'Row 5, LWA dB: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
      ),
    ).toBeTruthy();
    await fireEvent.click(screen.getByLabelText('Show only flagged rows'));
    expect(region.querySelectorAll('tbody tr')).toHaveLength(1);
  });

  it('changing a mapping rebuilds the preview', async () => {
    const { onconfirm } = await openWith(LIST);
    const remarks = await screen.findByLabelText('Field for column D (Remarks)');
    await fireEvent.change(remarks, { target: { value: 'category' } });
    const lwa = screen.getByLabelText('Field for column B (LWA dB)');
    await fireEvent.change(lwa, { target: { value: '' } });
    expect(screen.queryByText(/could not be read/)).toBeNull();
    await fireEvent.click(screen.getByRole('button', { name: /^Add 3 machines/ }));
    const [candidates] = onconfirm.mock.calls[0]!;
    expect(candidates.map((c) => c.category)).toEqual(['new', '', '92']);
    expect(candidates.every((c) => c.lwaDb === undefined)).toBe(true);
  });

  it('confirm hands over every candidate, flagged ones included, and the unread cells', async () => {
    const { onconfirm, oncancel, project, before, dutyId } = await openWith(LIST);
    const button = await screen.findByRole('button', { name: /^Add 3 machines to / });
    await fireEvent.click(button);
    expect(onconfirm).toHaveBeenCalledTimes(1);
    expect(oncancel).not.toHaveBeenCalled();
    const [candidates, unread] = onconfirm.mock.calls[0]!;
    expect(candidates.map((c) => [c.label, c.lwaDb, c.dutyId])).toEqual([
      ['Quiet excavator', 99, dutyId],
      ['Breaker', NaN, dutyId],
      ['Pump', undefined, dutyId],
    ]);
    const ids = new Set(project.candidates.map((c) => c.id));
    expect(candidates.some((c) => ids.has(c.id))).toBe(false);
    expect(unread).toEqual({ [`candidates/${candidates[1]!.id}/lwaDb`]: '12O' });
    expect(project).toEqual(before); // the dialog itself changes nothing
  });

  it('cancel hands over nothing and leaves the project unchanged', async () => {
    const { onconfirm, oncancel, project, before } = await openWith(LIST);
    await screen.findByRole('button', { name: /^Add 3 machines/ });
    await fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(oncancel).toHaveBeenCalledTimes(1);
    expect(onconfirm).not.toHaveBeenCalled();
    expect(project).toEqual(before);
  });

  it('a refused file shows its message and offers no confirm', async () => {
    const { onconfirm } = await openWith('', 'empty.csv');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toBe('"empty.csv" is empty; a header row and one row per machine are expected');
    expect(screen.queryByRole('button', { name: /^Add/ })).toBeNull();
    expect(onconfirm).not.toHaveBeenCalled();
  });

  it('a pressure column without a distance asks for one; the stated distance converts it', async () => {
    const { onconfirm } = await openWith('Model,LpA dB,Rate per day\nFan,72,5\n');
    expect(await screen.findByText(/has no distance/)).toBeTruthy();
    await fireEvent.input(screen.getByLabelText('Distance of the LpA, m'), { target: { value: '10' } });
    await waitFor(() => expect(screen.queryByText(/has no distance/)).toBeNull());
    await fireEvent.click(screen.getByRole('button', { name: /^Add 1 machine/ }));
    const [candidates] = onconfirm.mock.calls[0]!;
    // 72 + 20·lg 10 + 10.99 − 10·lg 2 = 99.98 dB (back-calculation, worked by hand)
    expect(candidates[0]!.lwaDb).toBeCloseTo(99.98, 2);
    expect(candidates[0]!.lwaOrigin).toBe('from-pressure');
  });
});
