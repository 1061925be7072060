/**
 * Every column of the machine grid and the register grid carries a short description (shown
 * on hover of its header and, for the active cell's column, below the grid), the catalogue's
 * fields take theirs from the catalogue, money columns show the currency, and each renamed
 * header is in the glossary.
 */
import { describe, expect, it } from 'vitest';
import { candidateColumns } from '../../../src/app/tables/candidates.ts';
import { registerColumns } from '../../../src/app/register/register-table.ts';
import { demoProject } from '../../../src/ledger/model/demo.ts';
import { MACHINE_NUMBERS } from '../../../src/ledger/catalogue/index.ts';
import { GLOSSARY } from '../../../src/app/text/glossary.ts';

const project = demoProject();
const machineColumns = candidateColumns({
  project,
  separator: '.',
  ranking: new Map(),
  receiverName: 'worst receiver',
});
const register = registerColumns('.', 'GBP');

describe('column headers and their descriptions', () => {
  it.each(machineColumns.map((c) => [c.header, c.describe] as const))(
    'machine grid column "%s" has a description',
    (_header, describe) => {
      expect(describe?.length ?? 0).toBeGreaterThan(10);
    },
  );

  it.each(register.map((c) => [c.header, c.describe] as const))(
    'register grid column "%s" has a description',
    (_header, describe) => {
      expect(describe?.length ?? 0).toBeGreaterThan(10);
    },
  );

  it('the LWA column of both grids takes its header, description and range from the catalogue', () => {
    for (const columns of [machineColumns, register]) {
      const lwa = columns.find((c) => c.id === 'lwaDb')!;
      expect(lwa.header).toBe(MACHINE_NUMBERS.lwaDb.header);
      expect(lwa.describe).toBe(MACHINE_NUMBERS.lwaDb.describe);
      // 160 was accepted by the grid before (0–200); the catalogue's range is 40–150
      expect(lwa.write!({ id: 'x' } as never, '160').failure?.problem).toBe('is out of range');
      expect(lwa.write!({ id: 'x' } as never, '104.5 dB(A)').failure).toBeUndefined();
    }
  });

  it('money columns show the currency in both grids', () => {
    expect(machineColumns.find((c) => c.id === 'dayRate')?.unit).toBe(project.currency);
    expect(machineColumns.find((c) => c.id === 'runningPerDay')?.unit).toBe(project.currency);
    expect(register.find((c) => c.id === 'dayRate')?.unit).toBe('GBP');
    expect(register.find((c) => c.id === 'price')?.unit).toBe('GBP');
  });

  it('the renamed headers are the ones shown, and the glossary lists each', () => {
    const headers = machineColumns.map((c) => c.header);
    for (const renamed of ['LWA used', 'Working of LWA used', 'Size for limit', 'LWA obtained as', 'Power source'])
      expect(headers).toContain(renamed);
    for (const old of ['Rated LWA', 'Rated LWA from', 'Directive quantity', 'Energy'])
      expect(headers).not.toContain(old);
    const terms = GLOSSARY.map((g) => g.term);
    for (const term of ['LWA used', 'Size for limit', 'LWA obtained as', 'Power source']) expect(terms).toContain(term);
  });
});
