/** README.md's table of ranges says what the field catalogue accepts: one row per field, made from the catalogue. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { readmeRangeRows } from './readme-rows.ts';

const readme = readFileSync(new URL('../../../../README.md', import.meta.url), 'utf8');

describe('README.md’s table of ranges', () => {
  it.each(readmeRangeRows())('has the row %s', (row) => {
    expect(readme).toContain(row);
  });
});
