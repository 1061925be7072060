import { describe, expect, it } from 'vitest';
import { detectHeaderRow } from '../../../../src/io/import/index.ts';
import type { RawCell, RawRow } from '../../../../src/io/import/index.ts';

const rows = (...cells: RawCell[][]): RawRow[] => cells.map((c, i) => ({ rowNumber: i + 1, cells: c }));

describe('detectHeaderRow', () => {
  it('detectHeaderRow(header first) returns 0', () => {
    expect(detectHeaderRow(rows(['Model', 'LWA dB', 'Rate per day'], ['A', 104, 120]))).toBe(0);
  });

  it('detectHeaderRow skips a title row, a blank-ish row and a date row', () => {
    const table = rows(
      ['Hire catalogue — quiet plant', null, null],
      ['Issued', '2024-03-01'],
      [null, null, null, 'page 1'],
      ['Machine', 'Sound power dB(A)', 'Weekly rate £'],
      ['Excavator 8 t', 99, 450],
    );
    expect(detectHeaderRow(table)).toBe(3);
  });

  it('detectHeaderRow accepts unknown header words when the row is as wide as the data below', () => {
    expect(detectHeaderRow(rows(['List of kit'], ['Alpha', 'Beta', 'Gamma'], ['x', 1, 2], ['y', 3, 4]))).toBe(1);
  });

  it('detectHeaderRow does not take a row of numbers for headers', () => {
    expect(detectHeaderRow(rows(['Title'], ['1', '2', '3'], ['Model', 'LWA', 'kW'], ['A', 1, 2]))).toBe(2);
  });

  it('detectHeaderRow of rows that never look like headers returns 0', () => {
    expect(detectHeaderRow(rows([1, 2], [3, 4]))).toBe(0);
    expect(detectHeaderRow([])).toBe(0);
  });
});
