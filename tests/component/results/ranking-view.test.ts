import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/svelte';
import RankingView from '../../../src/app/results/RankingView.svelte';
import { digRanking, smallProject } from './fixtures.ts';

function renderRanking(extra: Record<string, unknown> = {}) {
  return render(RankingView, {
    props: {
      project: smallProject(),
      dutyId: 'dig',
      receiverId: 'school',
      rows: digRanking(),
      locale: 'en-GB',
      ...extra,
    },
  });
}

const rowOf = (name: string) => screen.getByRole('rowheader', { name: new RegExp(name) }).closest('tr') as HTMLElement;

describe('RankingView', () => {
  it('RankingView with only the baseline machine says there is nothing to rank (no table, no cost per dB)', () => {
    const only = digRanking().filter((r) => r.isBaseline);
    expect(only).toHaveLength(1);
    renderRanking({ rows: only });
    const text = screen.getByTestId('only-baseline').textContent ?? '';
    expect(text).toContain('is the only machine offered for this duty, and so its baseline');
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('RankingView names the duty and the receiver', () => {
    renderRanking();
    expect(screen.getByRole('heading', { name: 'Ranking: Digging at Hazel Primary' })).toBeTruthy();
  });

  it('RankingView shows the flags as text badges', () => {
    renderRanking();
    expect(within(rowOf('Electric excavator')).getByText('quieter, costs no more')).toBeTruthy();
    expect(within(rowOf('^Excavator 14 t')).getByText('baseline')).toBeTruthy();
    const old = rowOf('Old excavator');
    expect(within(old).getByText('beaten on both')).toBeTruthy();
    expect(within(old).getByText('over limit')).toBeTruthy();
    expect(within(old).getByText('excluded')).toBeTruthy();
  });

  it('RankingView writes levels with one decimal, reductions signed and money in the project currency', () => {
    renderRanking();
    const row = rowOf('Old excavator');
    expect(row.textContent).toContain('66.0 dB');
    expect(row.textContent).toContain('−4.8 dB');
    expect(row.textContent).toContain('+£1,250');
    const free = rowOf('Electric excavator');
    expect(free.textContent).toContain('+5.4 dB');
    // no extra cost: dB per 1,000 is undefined and shown as a dash
    expect(within(free).getAllByText('—').length).toBeGreaterThan(0);
  });

  it('RankingView emits pin and exclude with the new state', async () => {
    const onpin = vi.fn();
    const onexclude = vi.fn();
    renderRanking({ onpin, onexclude });
    await fireEvent.click(screen.getByRole('button', { name: 'Pin Electric excavator 14 t' }));
    expect(onpin).toHaveBeenCalledWith('d2', true);
    await fireEvent.click(screen.getByRole('button', { name: 'Include Old excavator 14 t' }));
    expect(onexclude).toHaveBeenCalledWith('d3', false);
  });

  it('RankingView without handlers shows no buttons', () => {
    renderRanking();
    expect(screen.queryAllByRole('button')).toHaveLength(0);
  });
});
