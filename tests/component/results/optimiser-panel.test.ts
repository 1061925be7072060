import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import OptimiserPanel from '../../../src/app/results/OptimiserPanel.svelte';
import { infeasibleResult, optimiseResult, smallProject } from './fixtures.ts';

describe('OptimiserPanel', () => {
  it('OptimiserPanel shows a run’s step and share done, offers Cancel, and asks for the solver once shown', async () => {
    const oncancel = vi.fn();
    const onwarm = vi.fn();
    render(OptimiserPanel, {
      props: {
        project: smallProject(),
        running: true,
        progress: { step: 'Working the hand method for comparison', fraction: 0.42 },
        oncancel,
        onwarm,
      },
    });
    expect(onwarm).toHaveBeenCalledTimes(1);
    const bar = screen.getByRole('progressbar', { name: 'Optimiser progress' }) as HTMLProgressElement;
    expect(bar.value).toBeCloseTo(0.42, 9);
    expect(screen.getByText('Working the hand method for comparison… 42 %')).toBeTruthy();
    await fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(oncancel).toHaveBeenCalledTimes(1);
  });

  it('OptimiserPanel says a fleet found by an earlier run is kept in the project', () => {
    render(OptimiserPanel, { props: { project: smallProject(), storedFleet: true } });
    expect(screen.getByText(/kept in the project as “Cheapest compliant \(optimiser\)”/)).toBeTruthy();
  });

  it('OptimiserPanel shows the chosen fleet’s cost and its saving over the best-buy-first fleet', () => {
    render(OptimiserPanel, { props: { project: smallProject(), result: optimiseResult(), locale: 'en-GB' } });
    const figures = document.querySelector('dl.figures')?.textContent ?? '';
    expect(figures).toMatch(/Chosen fleet\s*£10,500/);
    // the label carries its description (shown on hover and focus) before the figure
    expect(figures).toMatch(
      /Saving over the best-buy-first fleet.*Shown to measure what the exact optimiser saves\.\s*£2,000/,
    );
    expect(figures).toMatch(/best-buy-first fleet £12,500/);
    expect(screen.getByText('proven least cost')).toBeTruthy();
  });

  it('OptimiserPanel sets the baseline, best-buy-first and chosen fleets side by side, naming each machine', () => {
    render(OptimiserPanel, { props: { project: smallProject(), result: optimiseResult(), locale: 'en-GB' } });
    const row = screen.getByRole('rowheader', { name: 'Breaking' }).closest('tr') as HTMLElement;
    const cells = [...row.querySelectorAll('td')].map((td) => td.textContent ?? '');
    expect(cells[0]).toContain('Breaker on 20 t carrier');
    expect(cells[1]).toContain('Hushed breaker');
    expect(cells[2]).toContain('Hushed breaker');
    expect(cells[2]).toContain('changed');
    expect(screen.getByText('▲ over at 1 place')).toBeTruthy();
  });

  it('OptimiserPanel says in words that no fleet meets every limit and names the receiver and phase still over', () => {
    render(OptimiserPanel, { props: { project: smallProject(), result: infeasibleResult(), locale: 'en-GB' } });
    // Read as a person sees it: runs of white space in the markup are one space on screen.
    const status = (screen.getByRole('status').textContent ?? '').replace(/\s+/g, ' ');
    expect(status).toContain('No fleet meets every limit');
    expect(status).toContain('Hazel Primary, Groundworks: 65.8 dB against a limit of 65.0 dB');
  });

  it('OptimiserPanel keeps a budget it cannot read and says what is accepted', async () => {
    const onrun = vi.fn();
    render(OptimiserPanel, { props: { project: smallProject(), onrun } });
    const input = screen.getByLabelText(/Budget/) as HTMLInputElement;
    await fireEvent.input(input, { target: { value: '25k' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Find the cheapest fleet' }));
    expect(onrun).not.toHaveBeenCalled();
    expect(input.value).toBe('25k');
    expect(screen.getByRole('alert').textContent).toBe(
      'Budget: "25k" is not an amount (use GBP without the symbol, e.g. 25000 or 25000.50)',
    );
  });

  it('OptimiserPanel runs with the budget read from "25,000"', async () => {
    const onrun = vi.fn();
    render(OptimiserPanel, { props: { project: smallProject(), onrun } });
    await fireEvent.input(screen.getByLabelText(/Budget/), { target: { value: '25,000' } });
    await fireEvent.click(screen.getByRole('button', { name: 'Find the cheapest fleet' }));
    expect(onrun).toHaveBeenCalledWith({ budget: 25000 });
  });

  it('OptimiserPanel runs without a budget when the field is empty', async () => {
    const onrun = vi.fn();
    render(OptimiserPanel, { props: { project: smallProject(), onrun } });
    await fireEvent.click(screen.getByRole('button', { name: 'Find the cheapest fleet' }));
    expect(onrun).toHaveBeenCalledWith({});
  });
});
