import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import MatrixView from '../../../src/app/results/MatrixView.svelte';
import { smallMatrix, smallProject } from './fixtures.ts';

function renderMatrix(extra: Record<string, unknown> = {}) {
  const { matrix, worstReceiverByPhase } = smallMatrix();
  return render(MatrixView, { props: { project: smallProject(), matrix, worstReceiverByPhase, ...extra } });
}

describe('MatrixView', () => {
  it('MatrixView marks a cell over its limit with a symbol and the word "over", not colour alone', () => {
    renderMatrix();
    const cell = screen.getByRole('cell', { name: /Demolition at Orchard Terrace/ });
    expect(within(cell).getByText('▲ over')).toBeTruthy();
    expect(cell.getAttribute('aria-label')).toContain('3.4 dB over the limit');
    expect(cell.textContent).toContain('78.4 dB');
    expect(cell.textContent).toContain('limit 75.0 dB');
    expect(cell.textContent).toContain('−3.4 dB');
  });

  it('MatrixView shows "not computed" for a NaN level, never a number', () => {
    renderMatrix();
    const cell = screen.getByRole('cell', { name: /Demolition at Hazel Primary/ });
    expect(within(cell).getByText('not computed')).toBeTruthy();
    expect(cell.textContent).not.toMatch(/\d+\.\d dB/);
    expect(cell.getAttribute('aria-label')).toMatch(/missing or unreadable/);
  });

  it('MatrixView shows signed margins under the limit and "no limit" without one', () => {
    renderMatrix();
    const under = screen.getByRole('cell', { name: /Groundworks at Orchard Terrace/ });
    expect(under.textContent).toContain('+7.0 dB');
    expect(within(under).queryByText('▲ over')).toBeNull();
    const shed = screen.getByRole('cell', { name: /Groundworks at Allotment shed/ });
    expect(shed.textContent).toContain('no limit');
  });

  it('MatrixView marks the worst receiver of each phase in words', () => {
    renderMatrix();
    const worst = screen.getByRole('cell', { name: /Groundworks at Hazel Primary/ });
    expect(within(worst).getByText('◆ worst')).toBeTruthy();
    expect(worst.getAttribute('aria-label')).toContain('worst receiver of the phase');
    const other = screen.getByRole('cell', { name: /Groundworks at Orchard Terrace/ });
    expect(within(other).queryByText('◆ worst')).toBeNull();
  });

  it('MatrixView counts the cells over their limit in the caption', () => {
    renderMatrix();
    expect(screen.getByText('1 cell over the limit')).toBeTruthy();
  });

  it('MatrixView calls onselectreceiver when a receiver heading is pressed', async () => {
    const onselectreceiver = vi.fn();
    renderMatrix({ onselectreceiver });
    await fireEvent.click(screen.getByRole('button', { name: 'Hazel Primary' }));
    expect(onselectreceiver).toHaveBeenCalledWith('school');
  });

  it('MatrixView gives a phase a row per period it runs into, with the hours, and labels a rating level LAr,T with LAeq,T and the penalty', () => {
    const { matrix, worstReceiverByPhase } = smallMatrix();
    const project = smallProject();
    project.periods.push({ id: 'eve', name: 'Evening', start: '19:00', end: '23:00' });
    // Groundworks ran 07:00–21:00: 2 of the evening's 4 h; a tonal machine draws +3 dB (values set by hand for the view).
    matrix.push({
      phaseId: 'ground',
      receiverId: 'terrace',
      periodId: 'eve',
      ownPeriod: false,
      hoursWorked: 2,
      periodHours: 4,
      levelDb: 66.0,
      levelAeqDb: 63.0,
      penaltyDb: 3,
      limitDb: 65,
      marginDb: -1,
      over: true,
    });
    render(MatrixView, {
      props: {
        project,
        matrix,
        worstReceiverByPhase,
        notes: [
          {
            path: '$.phases[1]',
            message: 'Phase "Groundworks": 1 h of its working hours fall in no assessment period',
          },
        ],
      },
    });
    const header = screen.getByRole('rowheader', { name: /Groundworks Evening/ });
    expect(header.textContent).toContain('2 of 4 h worked, hours past its own period');
    const cell = screen.getByRole('cell', { name: /Groundworks at Orchard Terrace in the Evening period/ });
    expect(cell.textContent).toContain('LAr,T 66.0 dB');
    expect(cell.textContent).toContain('LAeq,T 63.0 dB + penalty 3.0 dB');
    expect(cell.getAttribute('aria-label')).toContain('rating level (ISO 1996-1)');
    expect(screen.getByText(/rating level, ISO 1996-1: LAeq,T \+ character penalty/)).toBeTruthy();
    expect(screen.getByRole('list', { name: 'Notes on the assessment' }).textContent).toContain(
      'fall in no assessment period',
    );
  });
});
