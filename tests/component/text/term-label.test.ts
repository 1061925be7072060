import { describe, expect, it } from 'vitest';
import { render, screen } from '@testing-library/svelte';
import TermLabel from '../../../src/app/text/TermLabel.svelte';
import { RESULT_TERMS } from '../../../src/app/text/result-terms.ts';

describe('TermLabel', () => {
  it('TermLabel shows the label, takes keyboard focus and is described by its hint', () => {
    render(TermLabel, { props: { term: 'costPerDb' } });
    const label = screen.getByText('Cost per dB');
    expect(label.getAttribute('tabindex')).toBe('0');
    const tip = document.getElementById(label.getAttribute('aria-describedby') ?? '');
    expect(tip?.getAttribute('role')).toBe('tooltip');
    expect(tip?.textContent).toBe(RESULT_TERMS.costPerDb.hint);
    // Focus must not throw where popovers are missing (jsdom); the browser shows the popover.
    label.focus();
    expect(document.activeElement).toBe(label);
  });
  it('TermLabel with text shows that text and keeps the description', () => {
    render(TermLabel, { props: { term: 'dbPer1000', text: 'dB per £1,000' } });
    const label = screen.getByText('dB per £1,000');
    expect(label.getAttribute('aria-describedby')).toBeTruthy();
  });
});
