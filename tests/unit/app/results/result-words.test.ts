import { describe, expect, it } from 'vitest';
import { formatCostPerDb } from '../../../../src/app/results/format.ts';
import { RESULT_TERMS } from '../../../../src/app/text/result-terms.ts';
import { GLOSSARY } from '../../../../src/app/text/glossary.ts';

describe('formatCostPerDb', () => {
  // A machine £500 cheaper and 2 dB quieter than the baseline: −500 / 2 = −250 per dB (worked by hand).
  it('formatCostPerDb(-250) says the saving, never a negative cost', () => {
    const text = formatCostPerDb(-250, 'GBP', 'en-GB');
    expect(text).toBe('saves £250 a dB');
    expect(text).not.toMatch(/[−-]/);
  });
  it('formatCostPerDb(1200) is the cost for each dB', () => {
    expect(formatCostPerDb(1200, 'GBP', 'en-GB')).toBe('£1,200');
  });
  it('formatCostPerDb(undefined) is a dash (no reduction)', () => {
    expect(formatCostPerDb(undefined, 'GBP', 'en-GB')).toBe('—');
  });
});

describe('result labels', () => {
  it('every result label has a description of its own', () => {
    for (const t of Object.values(RESULT_TERMS)) {
      expect(t.hint.length).toBeGreaterThan(30);
      expect(t.hint).not.toContain(t.label.toLowerCase() + ':');
    }
  });
  it('the glossary lists every result label', () => {
    const terms = GLOSSARY.map((g) => g.term.toLowerCase());
    for (const t of Object.values(RESULT_TERMS)) expect(terms).toContain(t.label.toLowerCase());
  });
  it('the labels found unclear are gone from the result labels', () => {
    const labels = Object.values(RESULT_TERMS).map((t) => t.label.toLowerCase());
    for (const old of ['figures at', 'hand method', 'free win', 'dominated', 'place within ±k'])
      expect(labels).not.toContain(old);
  });
});
