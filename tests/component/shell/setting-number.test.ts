/**
 * One number of the Settings tab: label and unit from the field catalogue, the project's
 * decimal separator, and the catalogue's range and words for what is refused.
 */
import { describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/svelte';
import SettingNumber from '../../../src/app/shell/SettingNumber.svelte';
import { SETTINGS_NUMBERS } from '../../../src/ledger/catalogue/index.ts';

function setUp(separator: '.' | ',') {
  const onset = vi.fn<(v: number) => void>();
  const onproblem = vi.fn<(m: string | undefined) => void>();
  render(SettingNumber, {
    props: { field: SETTINGS_NUMBERS.pressureKPa, value: 101.325, separator, onset, onproblem },
  });
  return { onset, onproblem, input: screen.getByLabelText('Air pressure (kPa)') as HTMLInputElement };
}

describe('SettingNumber', () => {
  it('shows the stored value with the project’s separator under the catalogue’s label and unit', () => {
    const { input } = setUp(',');
    expect(input.value).toBe('101,325');
  });

  it('takes "98,5 kPa" with a decimal comma as 98.5 and clears the message', async () => {
    const { input, onset, onproblem } = setUp(',');
    await fireEvent.change(input, { target: { value: '98,5 kPa' } });
    expect(onset).toHaveBeenCalledWith(98.5);
    expect(onproblem).toHaveBeenLastCalledWith(undefined);
  });

  it('refuses 1013 (hPa typed for kPa) with the catalogue’s words and keeps the stored value', async () => {
    const { input, onset, onproblem } = setUp('.');
    await fireEvent.change(input, { target: { value: '1013' } });
    expect(onset).not.toHaveBeenCalled();
    expect(onproblem).toHaveBeenLastCalledWith(
      'Air pressure: "1013" is out of range (use an atmospheric pressure in kPa from 50 to 200, e.g. 101.325)',
    );
  });
});
