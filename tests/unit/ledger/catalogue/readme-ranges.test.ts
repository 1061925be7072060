/** README.md's table of ranges says what the field catalogue accepts: one row per field, made from the catalogue. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { readmeRangeRows } from './readme-rows.ts';
import { CALCULATION_NUMBERS } from '../../../../src/ledger/catalogue/index.ts';
import { DIRECTIVITY_FACTORS, checkDirectivity } from '../../../../src/core/directivity.ts';

const readme = readFileSync(new URL('../../../../README.md', import.meta.url), 'utf8');

describe('README.md’s table of ranges', () => {
  it.each(readmeRangeRows())('has the row %s', (row) => {
    expect(readme).toContain(row);
  });
});

describe('README.md’s row for directivity Q', () => {
  const words = CALCULATION_NUMBERS.directivityQ.accepted;

  it('names exactly the factors the prediction takes', () => {
    // 1 free field, 2 on hard ground, 4 ground and a wall, 8 a corner (point-source spreading, common practice)
    const named = [...words.matchAll(/\d+/g)].map((m) => Number(m[0]));
    expect(named).toEqual([1, 2, 4, 8]);
    expect([...DIRECTIVITY_FACTORS]).toEqual(named);
  });

  it.each([1.5, 3, 6, 0, 16])('Q = %s, between or beyond them, is refused', (q) => {
    expect(() => checkDirectivity(q)).toThrow();
  });

  it('the row is in the table', () => {
    expect(readme).toContain('| Directivity Q | one of 1, 2, 4 or 8, no value between | — |');
  });
});
