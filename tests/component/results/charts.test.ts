import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import TradeOffChart from '../../../src/app/results/TradeOffChart.svelte';
import DistanceChart from '../../../src/app/results/DistanceChart.svelte';
import type { DistanceCurves } from '../../../src/ledger/distance-curve.ts';
import { optimiseResult } from './fixtures.ts';

describe('TradeOffChart', () => {
  it('TradeOffChart marks and labels the baseline, the hand method and the chosen fleet', () => {
    const { container } = render(TradeOffChart, { props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' } });
    const marks = [...container.querySelectorAll('[data-mark]')].map((m) => m.getAttribute('data-mark'));
    expect(marks.sort()).toEqual(['baseline', 'best', 'hand']);
    expect(screen.getByText('Baseline')).toBeTruthy();
    expect(screen.getByText('Hand method')).toBeTruthy();
    expect(screen.getByText('Chosen fleet')).toBeTruthy();
    expect(screen.getByText(/£10,500 · 73.8 dB/)).toBeTruthy();
    expect(screen.getByText(/£9,000 · 78.4 dB · over/)).toBeTruthy();
  });

  it('TradeOffChart draws one point per curve fleet and has an accessible title and description', () => {
    const { container } = render(TradeOffChart, { props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' } });
    expect(container.querySelectorAll('.points circle')).toHaveLength(4);
    const svg = screen.getByRole('img');
    const ids = (svg.getAttribute('aria-labelledby') ?? '').split(' ');
    expect(ids).toHaveLength(2);
    const desc = container.querySelector(`[id="${ids[1]}"]`)?.textContent ?? '';
    expect(desc).toContain('Chosen fleet: £10,500');
    expect(desc).toContain('meets every limit');
  });

  it('TradeOffChart labels its axes with units and ticks', () => {
    const { container } = render(TradeOffChart, { props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' } });
    expect(screen.getByText('Fleet cost (GBP)')).toBeTruthy();
    expect(screen.getByText('Worst-case level above its limit, dB')).toBeTruthy();
    expect(screen.getByText('at the limit')).toBeTruthy();
    const tickTexts = [...container.querySelectorAll('.axis text')].map((t) => t.textContent);
    expect(tickTexts).toContain('£10k');
  });

  it('TradeOffChart joins the labels of fleets that coincide', () => {
    const result = optimiseResult();
    result.hand = { ...result.hand, fleet: { ...result.best.fleet }, cost: result.best.cost };
    render(TradeOffChart, { props: { result, currency: 'GBP', locale: 'en-GB' } });
    expect(screen.getByText('Chosen fleet = Hand method')).toBeTruthy();
  });
});

function curves(): DistanceCurves {
  const d = [10, 20, 50, 100, 200];
  return {
    dutyId: 'dig',
    receiverId: 'school',
    limitDb: 65,
    currentDistanceM: 40,
    curves: [
      { candidateId: 'd1', label: 'Excavator 14 t', isBaseline: true, points: d.map((x, i) => ({ distanceM: x, levelDb: 80 - 6 * i })) },
      { candidateId: 'd2', label: 'Electric excavator', isBaseline: false, points: d.map((x, i) => ({ distanceM: x, levelDb: 74 - 6 * i })) },
      { candidateId: 'd3', label: 'Unknown machine', isBaseline: false, points: d.map((x) => ({ distanceM: x, levelDb: NaN })) },
      { candidateId: 'd4', label: 'Long-reach excavator with quiet pack', isBaseline: false, points: d.map((x, i) => ({ distanceM: x, levelDb: 77 - 6 * i })) },
    ],
  };
}

describe('DistanceChart', () => {
  it('DistanceChart labels each machine’s line, the limit and the present distance', () => {
    const { container } = render(DistanceChart, { props: { curves: curves(), dutyName: 'Digging', receiverName: 'Hazel Primary' } });
    const endLabels = [...container.querySelectorAll('.line-label')].map((t) => t.textContent);
    expect(endLabels).toEqual(expect.arrayContaining(['Excavator 14 t (base…', 'Electric excavator']));
    const legend = [...container.querySelectorAll('.legend li')].map((li) => li.textContent?.trim());
    expect(legend).toEqual(expect.arrayContaining(['Excavator 14 t (baseline)', 'Electric excavator', 'Long-reach excavator with quiet pack']));
    expect(screen.getByText('Limit 65.0 dB')).toBeTruthy();
    expect(screen.getByText('now 40 m')).toBeTruthy();
    expect(container.querySelectorAll('.line path')).toHaveLength(3);
  });

  it('DistanceChart shortens a long end label and keeps the full name as its title', () => {
    const { container } = render(DistanceChart, { props: { curves: curves() } });
    expect(screen.getByText('Long-reach excavator…')).toBeTruthy();
    const titles = [...container.querySelectorAll('.end-label > title')].map((t) => t.textContent);
    expect(titles).toContain('Long-reach excavator with quiet pack');
  });

  it('DistanceChart uses a logarithmic distance axis with 1-2-5 ticks', () => {
    const { container } = render(DistanceChart, { props: { curves: curves() } });
    const ticks = [...container.querySelectorAll('.axis text')].map((t) => t.textContent);
    for (const t of ['10', '20', '50', '100', '200']) expect(ticks).toContain(t);
    expect(screen.getByText('Distance from the machines, m (logarithmic)')).toBeTruthy();
  });

  it('DistanceChart names a machine it cannot compute instead of drawing it', () => {
    render(DistanceChart, { props: { curves: curves() } });
    expect(screen.getByText('Not computed: Unknown machine.')).toBeTruthy();
  });
});
