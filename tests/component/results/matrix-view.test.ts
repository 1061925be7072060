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
});
