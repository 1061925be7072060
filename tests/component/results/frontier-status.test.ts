import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import FrontierStatus from '../../../src/app/results/FrontierStatus.svelte';

describe('FrontierStatus', () => {
  it('FrontierStatus while tracing gives the fleets found so far and stops on request', async () => {
    const onstop = vi.fn();
    const { container } = render(FrontierStatus, {
      props: { frontier: { state: 'tracing', count: 1234 }, onstop, locale: 'en-GB' },
    });
    expect(container.textContent).toMatch(/Tracing the curve, cheapest fleet first: 1,234\s+fleets found so far/);
    await fireEvent.click(screen.getByRole('button', { name: 'Stop tracing' }));
    expect(onstop).toHaveBeenCalledTimes(1);
  });

  it('FrontierStatus says the curve is complete with its count, and offers no stop', () => {
    render(FrontierStatus, { props: { frontier: { state: 'complete', count: 1 }, onstop: vi.fn() } });
    expect(screen.getByText('Curve complete: 1 fleet.')).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
  });

  it('FrontierStatus after a stop says how many fleets were traced and that the quieter ones were not', () => {
    render(FrontierStatus, { props: { frontier: { state: 'stopped', count: 57 } } });
    expect(screen.getByText('Stopped after 57 fleets.')).toBeTruthy();
    expect(screen.getByRole('status').textContent).toMatch(/quieter fleets were not traced/);
  });
});
