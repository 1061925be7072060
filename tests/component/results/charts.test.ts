import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import type { ConfidenceCurve } from '../../../src/ledger/optimise/confidence-curve.ts';
import TradeOffChart from '../../../src/app/results/TradeOffChart.svelte';
import DistanceChart from '../../../src/app/results/DistanceChart.svelte';
import type { DistanceChartData } from '../../../src/ledger/prediction/distance-chart.ts';
import { optimiseResult } from './fixtures.ts';

describe('TradeOffChart', () => {
  it('TradeOffChart marks and labels the baseline, the hand method and the chosen fleet', () => {
    const { container } = render(TradeOffChart, {
      props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' },
    });
    const marks = [...container.querySelectorAll('[data-mark]')].map((m) => m.getAttribute('data-mark'));
    expect(marks.sort()).toEqual(['baseline', 'best', 'hand']);
    expect(screen.getByText('Baseline')).toBeTruthy();
    expect(screen.getByText('Best-buy-first fleet')).toBeTruthy();
    expect(screen.getByText('Chosen fleet')).toBeTruthy();
    expect(screen.getByText(/£10,500 · 73.8 dB/)).toBeTruthy();
    expect(screen.getByText(/£9,000 · 78.4 dB · over/)).toBeTruthy();
  });

  it('TradeOffChart draws one point per curve fleet and has an accessible title and description', () => {
    const { container } = render(TradeOffChart, {
      props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' },
    });
    expect(container.querySelectorAll('.points circle')).toHaveLength(4);
    const svg = screen.getByRole('img');
    const ids = (svg.getAttribute('aria-labelledby') ?? '').split(' ');
    expect(ids).toHaveLength(2);
    const desc = container.querySelector(`[id="${ids[1]}"]`)?.textContent ?? '';
    expect(desc).toContain('Chosen fleet: £10,500');
    expect(desc).toContain('meets every limit');
  });

  it('TradeOffChart labels its axes with units and ticks', () => {
    const { container } = render(TradeOffChart, {
      props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' },
    });
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
    expect(screen.getByText('Chosen fleet = Best-buy-first fleet')).toBeTruthy();
  });
});

/**
 * Real figures: the output of confidenceCurve on the small site of
 * tests/unit/optimise/confidence-curve.test.ts (levels 0.5, 0.9, 0.95; 4,000 draws, seed 1),
 * recorded from a run of that test.
 */
function confidenceCurveOfSmallSite(): ConfidenceCurve {
  return {
    points: [
      { confidence: 0.5, found: true, cost: 1950, probability: 0.6345, standardError: 0.007614291661080497 },
      { confidence: 0.9, found: true, cost: 2175, probability: 0.936, standardError: 0.0038698837191833025 },
      { confidence: 0.95, found: true, cost: 2375, probability: 0.98875, standardError: 0.0016675908895769356 },
    ],
    draws: 4000,
    deterministic: { cost: 2175, probability: 0.936, standardError: 0.0038698837191833025, draws: 4000 },
    assessed: { name: 'baseline', cost: 1500, probability: 0.07225, standardError: 0.004093590645753432, draws: 4000 },
  };
}

describe('TradeOffChart, probability view', () => {
  it('a labelled choice switches the chart to cost against the probability that every limit is met, one point per confidence asked, with both fleets marked', async () => {
    const { container } = render(TradeOffChart, {
      props: { result: optimiseResult(), confidence: confidenceCurveOfSmallSite(), currency: 'GBP', locale: 'en-GB' },
    });
    const level = screen.getByLabelText(/worst-case level above its limit \(dB\)/) as HTMLInputElement;
    const probability = screen.getByLabelText(/probability that every limit is met at once \(%\)/) as HTMLInputElement;
    expect(level.checked).toBe(true);
    expect(container.querySelectorAll('[data-testid="confidence-point"]').length).toBe(0);
    await fireEvent.click(probability);
    const points = [...container.querySelectorAll('[data-testid="confidence-point"]')];
    expect(points.map((p) => p.getAttribute('data-confidence'))).toEqual(['0.5', '0.9', '0.95']);
    // Each point's figures in words: 0.936 with a standard error of 0.0039 reads "93.6 % ± 0.4 %" (ledger/uncertainty/words.ts).
    expect(points[1]!.querySelector('title')!.textContent).toBe(
      'Asked 90 %: £2,175, every limit met at once 93.6 % ± 0.4 %',
    );
    expect(points[2]!.querySelector('title')!.textContent).toBe(
      'Asked 95 %: £2,375, every limit met at once 98.9 % ± 0.2 %',
    );
    expect([...container.querySelectorAll('[data-mark]')].map((m) => m.getAttribute('data-mark'))).toEqual([
      'deterministic',
      'assessed',
    ]);
    expect(screen.getByText('Deterministic optimum')).toBeTruthy();
    expect(screen.getByText('£2,175 · 93.6 % ± 0.4 %')).toBeTruthy();
    expect(screen.getByText('Assessed fleet (baseline)')).toBeTruthy();
    expect(screen.getByText('£1,500 · 7.2 % ± 0.4 %')).toBeTruthy();
    expect(screen.getByText('asked 50 %')).toBeTruthy();
    expect(screen.getByText('Fleet cost (GBP)')).toBeTruthy();
    expect(screen.getByText('Every limit met at once (simulated), %')).toBeTruthy();
    expect(container.textContent).toMatch(/competent acoustician and the local authority decide/);
    expect(container.textContent).toMatch(/4,000 draws per point/);
    // The probability axis reaches 100 % (probabilities up to 98.9 % + its error).
    const ticks = [...container.querySelectorAll('.axis text')].map((t) => t.textContent);
    expect(ticks).toContain('100');
    await fireEvent.click(level);
    expect(container.querySelectorAll('[data-testid="confidence-point"]').length).toBe(0);
    expect(screen.getByText('Chosen fleet')).toBeTruthy();
  });

  it('before the optimiser has run, the chart shows the probability view and says the level view needs the optimiser; a level not reached is named', () => {
    const curve = confidenceCurveOfSmallSite();
    curve.points.push({ confidence: 0.99, found: false });
    const { container } = render(TradeOffChart, { props: { confidence: curve, currency: 'GBP', locale: 'en-GB' } });
    const level = screen.getByLabelText(/run the optimiser first/) as HTMLInputElement;
    expect(level.disabled).toBe(true);
    expect(container.querySelectorAll('[data-testid="confidence-point"]').length).toBe(3);
    expect(screen.getByText('Not reached: 99 %.')).toBeTruthy();
  });

  it('without a cost-of-confidence run there is no choice to make', () => {
    render(TradeOffChart, { props: { result: optimiseResult(), currency: 'GBP', locale: 'en-GB' } });
    expect(screen.queryByText('Draw the fleet cost against')).toBeNull();
  });
});

function curves(): DistanceChartData {
  const d = [10, 20, 50, 100, 200];
  return {
    dutyId: 'dig',
    receiverId: 'school',
    limitDb: 65,
    currentDistanceM: 40,
    curves: [
      {
        candidateId: 'd1',
        label: 'Excavator 14 t',
        isBaseline: true,
        points: d.map((x, i) => ({ distanceM: x, levelDb: 80 - 6 * i })),
        atCurrentDb: 66.1,
      },
      {
        candidateId: 'd2',
        label: 'Electric excavator',
        isBaseline: false,
        points: d.map((x, i) => ({ distanceM: x, levelDb: 74 - 6 * i })),
        atCurrentDb: 60.1,
      },
      {
        candidateId: 'd3',
        label: 'Unknown machine',
        isBaseline: false,
        points: d.map((x) => ({ distanceM: x, levelDb: NaN })),
      },
      {
        candidateId: 'd4',
        label: 'Long-reach excavator with quiet pack',
        isBaseline: false,
        points: d.map((x, i) => ({ distanceM: x, levelDb: 77 - 6 * i })),
      },
    ],
  };
}

describe('DistanceChart', () => {
  it('DistanceChart labels each machine’s line, the limit and the present distance', () => {
    const { container } = render(DistanceChart, {
      props: { curves: curves(), dutyName: 'Digging', receiverName: 'Hazel Primary' },
    });
    const endLabels = [...container.querySelectorAll('.line-label')].map((t) => t.textContent);
    expect(endLabels).toEqual(expect.arrayContaining(['Excavator 14 t (base…', 'Electric excavator']));
    const legend = [...container.querySelectorAll('.legend li')].map((li) => li.textContent?.trim());
    expect(legend).toEqual(
      expect.arrayContaining([
        'Excavator 14 t (baseline): 66.1 dB at 40 m',
        'Electric excavator: 60.1 dB at 40 m',
        'Long-reach excavator with quiet pack',
      ]),
    );
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

  it('DistanceChart reads each line at the present distance, beside the line and in the legend', () => {
    const { container } = render(DistanceChart, { props: { curves: curves() } });
    const values = [...container.querySelectorAll('.line-value')].map((t) => t.textContent);
    expect(values).toContain('66.1 dB now, at 40 m');
    expect(values).toContain('60.1 dB now, at 40 m');
    expect(container.querySelectorAll('circle.readout')).toHaveLength(2);
    const legend = [...container.querySelectorAll('.legend li')].map((li) => li.textContent?.trim());
    expect(legend).toContain('Excavator 14 t (baseline): 66.1 dB at 40 m');
  });

  it('DistanceChart says the limit is for the phase total and marks that total at the present distance', () => {
    const data = {
      ...curves(),
      phaseTotal: { phaseName: 'Earthworks', periodName: 'Day', levelDb: 67.3, duties: 3, over: true },
    };
    const { container } = render(DistanceChart, { props: { curves: data } });
    expect(screen.getByText('for the phase total')).toBeTruthy();
    expect(screen.getByText('Phase total 67.3 dB')).toBeTruthy();
    expect(container.querySelector('.phase-total path')).not.toBeNull();
    expect(screen.getByTestId('distance-limit-words').textContent?.replace(/\s+/g, ' ').trim()).toBe(
      'The limit applies to the phase total of Earthworks (all 3 duties together, with the assessed fleet), ◆ 67.3 dB now: over the 65.0 dB limit, not to one machine, so a machine under it may still need quieter neighbours.',
    );
  });

  it('DistanceChart keeps every end label inside the drawing when many lines end close together', () => {
    const d = [10, 100, 1000];
    const many: DistanceChartData = {
      dutyId: 'dig',
      limitDb: 30,
      curves: [0, 1, 2, 3, 4, 5].map((k) => ({
        candidateId: `m${k}`,
        label: `Machine ${k}`,
        isBaseline: k === 0,
        points: d.map((x, i) => ({ distanceM: x, levelDb: 60 - 20 * i + k * 0.1 })),
      })),
    };
    const { container } = render(DistanceChart, { props: { curves: many } });
    const ys = [...container.querySelectorAll('.line-value, .limit-for')].map((t) => Number(t.getAttribute('y')));
    expect(ys).toHaveLength(7);
    // viewBox height 360: the second line of each label sits on or above it
    for (const y of ys) expect(y).toBeLessThanOrEqual(360);
    const sorted = [...container.querySelectorAll('.line-label, .limit text:not(.limit-for)')]
      .map((t) => Number(t.getAttribute('y')))
      .sort((a, b) => a - b);
    for (let i = 1; i < sorted.length; i++) expect(sorted[i]! - sorted[i - 1]!).toBeGreaterThanOrEqual(24);
  });
});
