import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import QuickCalc from '../../../src/app/results/QuickCalc.svelte';

const levelText = () => screen.getAllByTestId('quick-level')[0]?.textContent ?? '';

async function type(label: RegExp, text: string) {
  const input = screen.getByLabelText(label) as HTMLInputElement;
  await fireEvent.input(input, { target: { value: text } });
  return input;
}

describe('QuickCalc', () => {
  it('QuickCalc(LWA 105, 50 m, Q 2) shows 63.0 dB with every term', () => {
    render(QuickCalc);
    // common practice: Lp = Lw − 20·lg r − 7.98 for a hemisphere: 105 − 33.98 − 7.98 = 63.04 (domain primer §2)
    expect(levelText()).toBe('63.0 dB');
    const rows = [...document.querySelectorAll('tr[data-term]')].map((r) => r.getAttribute('data-term'));
    expect(rows).toEqual(['lw', 'spreading', 'count', 'onTime']);
    expect(screen.getByText(/Point-source spreading/)).toBeTruthy();
  });

  it('QuickCalc adds the on-time, count, screening and façade terms the user chooses', async () => {
    render(QuickCalc);
    await type(/^On-time/, '50');
    await type(/^Number of units/, '2');
    await fireEvent.click(screen.getByLabelText(/Screened wholly out of sight/));
    await fireEvent.click(screen.getByLabelText(/façade/));
    // common practice: 50 % on-time −3.01, two units +3.01, fully hidden −10, façade +3 (domain primer §3)
    const byKey = (k: string) => document.querySelector(`tr[data-term="${k}"] td:last-child`)?.textContent;
    expect(byKey('onTime')).toBe('−3.0 dB');
    expect(byKey('count')).toBe('+3.0 dB');
    expect(byKey('screening')).toBe('−10.0 dB');
    expect(byKey('facade')).toBe('+3.0 dB');
    // 63.04 − 3.01 + 3.01 − 10 + 3 = 56.04
    expect(levelText()).toBe('56.0 dB');
  });

  it('QuickCalc keeps an unreadable LWA as typed and says what is accepted beside the field', async () => {
    render(QuickCalc);
    const input = await type(/^LWA/, '12O');
    expect(input.value).toBe('12O');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(
      screen.getByText('LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)'),
    ).toBeTruthy();
    expect(levelText()).toBe('not computed');
  });

  it('QuickCalc reads a level with its unit as the grid and `ledger level` do', async () => {
    render(QuickCalc);
    await type(/^LWA/, '105');
    const plain = levelText();
    const input = await type(/^LWA/, '105 dB(A)');
    expect(input.getAttribute('aria-invalid')).not.toBe('true');
    expect(levelText()).toBe(plain);
  });

  it('QuickCalc says the project file’s range for an out-of-range on-time beside that field', async () => {
    render(QuickCalc);
    const input = await type(/^On-time/, '150');
    expect(input.value).toBe('150');
    const message = document.getElementById(input.getAttribute('aria-describedby') ?? '')?.textContent ?? '';
    expect(message).toBe('On-time: "150" is out of range (use a percentage above 0 and up to 100, e.g. 60)');
    expect(levelText()).toBe('not computed');
  });

  it('QuickCalc in ISO 9613-2 mode shows the standard’s terms and its edition', async () => {
    render(QuickCalc);
    await fireEvent.click(screen.getByLabelText(/ISO 9613-2:1996 outdoor propagation/));
    const rows = [...document.querySelectorAll('tr[data-term]')].map((r) => r.getAttribute('data-term'));
    expect(rows).toEqual(expect.arrayContaining(['lw', 'dc', 'adiv', 'aatm', 'agr', 'onTime', 'count'])); // ISO 9613-2:1996 eqs 3, 4
    expect(
      screen.getByText(
        /ISO 9613-2:1996, A-weighted estimate \(ground: general method’s terms at 500 Hz, clause 7\.3\.1\)/,
      ),
    ).toBeTruthy();
    // ISO 9613-2:1996 eq. 7: A_div = 20·lg(d) + 11 = 20·lg(50.0) + 11 ≈ 45.0 dB at d ≈ 50 m
    expect(document.querySelector('tr[data-term="adiv"] td:last-child')?.textContent).toBe('−45.0 dB');
    // The standard's own value: an attenuation, positive, subtracted (ISO 9613-2:1996 eq. 4)
    // set as a symbol: A with the subscript "div", no raw underscore
    const standard = document.querySelector('tr[data-term="adiv"] td.standard');
    expect(standard?.textContent).toBe('Adiv = 45.0, subtracted');
    expect(standard?.querySelector('sub')?.textContent).toBe('div');
  });

  it('QuickCalc shows the caution next to the prediction', () => {
    render(QuickCalc);
    expect(screen.getByText(/ISO 9613-2 quotes ±3 dB/)).toBeTruthy();
  });
});
