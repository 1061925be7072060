/**
 * Tab-separated clipboard text. The quoting rule (cells holding a tab, a
 * line break or a quote are wrapped in quotes, inner quotes doubled) is the
 * common practice of spreadsheet programs, the same rule RFC 4180 §2 states
 * for CSV; rows end in CRLF on Windows and LF elsewhere.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseTsv, readBlock, serializeTsv } from '../../../src/app/grid/index.ts';

describe('parseTsv', () => {
  it('parseTsv("") returns no rows', () => {
    expect(parseTsv('')).toEqual([]);
  });
  it('parseTsv splits cells on tabs and rows on LF', () => {
    expect(parseTsv('a\tb\n1\t2')).toEqual([
      ['a', 'b'],
      ['1', '2'],
    ]);
  });
  it('parseTsv accepts CRLF and a final line break without adding a row', () => {
    expect(parseTsv('a\tb\r\n1\t2\r\n')).toEqual([
      ['a', 'b'],
      ['1', '2'],
    ]);
  });
  it('parseTsv accepts lone CR line breaks', () => {
    expect(parseTsv('a\rb\r')).toEqual([['a'], ['b']]);
  });
  it('parseTsv reads a quoted cell holding a tab', () => {
    expect(parseTsv('"x\ty"\tz')).toEqual([['x\ty', 'z']]);
  });
  it('parseTsv reads a quoted cell holding CRLF and LF line breaks', () => {
    expect(parseTsv('"line 1\r\nline 2"\t"a\nb"\r\nnext')).toEqual([['line 1\r\nline 2', 'a\nb'], ['next']]);
  });
  it('parseTsv turns doubled quotes inside a quoted cell into one quote', () => {
    expect(parseTsv('"say ""quiet"""\t2')).toEqual([['say "quiet"', '2']]);
  });
  it('parseTsv keeps a quote that does not open a well-formed quoted cell', () => {
    expect(parseTsv('"12 inch\t5')).toEqual([['"12 inch', '5']]);
    expect(parseTsv('"a"b\tc')).toEqual([['"a"b', 'c']]);
    expect(parseTsv('5" pipe\t6')).toEqual([['5" pipe', '6']]);
  });
  it('parseTsv keeps empty cells, including a trailing one', () => {
    expect(parseTsv('a\t\tc\n\tb\t')).toEqual([
      ['a', '', 'c'],
      ['', 'b', ''],
    ]);
  });
  it('parseTsv keeps ragged rows as they are', () => {
    expect(parseTsv('a\tb\tc\nd\ne\tf')).toEqual([['a', 'b', 'c'], ['d'], ['e', 'f']]);
  });
  it('parseTsv keeps an empty row between rows', () => {
    expect(parseTsv('a\n\nb')).toEqual([['a'], [''], ['b']]);
  });
  it('parseTsv drops a byte-order mark at the start', () => {
    expect(parseTsv('\uFEFFa\tb')).toEqual([['a', 'b']]);
  });
  it('parseTsv reads a 20-row block with decimal commas cell by cell, unchanged', () => {
    // invented demo figures, written the way a spreadsheet in a decimal-comma locale copies them
    const lines = Array.from({ length: 20 }, (_, i) => `Unit ${i + 1}\t${100 + i},5\t${(i * 7) % 11}\t`);
    const rows = parseTsv(lines.join('\r\n') + '\r\n');
    expect(rows).toHaveLength(20);
    expect(rows[0]).toEqual(['Unit 1', '100,5', '0', '']);
    expect(rows[19]).toEqual(['Unit 20', '119,5', '1', '']); // 19 × 7 = 133, 133 mod 11 = 1
    expect(rows.every((row) => row.length === 4)).toBe(true);
  });
});

describe('serializeTsv', () => {
  it('serializeTsv joins cells with tabs and rows with CRLF, no final line break', () => {
    expect(
      serializeTsv([
        ['a', 'b'],
        ['1', '2'],
      ]),
    ).toBe('a\tb\r\n1\t2');
  });
  it('serializeTsv quotes cells holding a tab, a line break or a quote', () => {
    expect(serializeTsv([['x\ty', 'a\nb', 'say "hi"', 'plain']])).toBe('"x\ty"\t"a\nb"\t"say ""hi"""\tplain');
  });
  it('serializeTsv quotes a row made of one empty cell so that it survives the round trip', () => {
    expect(serializeTsv([['a'], ['']])).toBe('a\r\n""');
    expect(parseTsv(serializeTsv([['a'], ['']]))).toEqual([['a'], ['']]);
  });
  it('parseTsv(serializeTsv(rows)) returns rows for any text (property)', () => {
    const cell = fc.string({ unit: fc.constantFrom('a', 'b', ' ', '\t', '\n', '\r', '"', ',', '5'), maxLength: 6 });
    const rows = fc.array(fc.array(cell, { minLength: 1, maxLength: 4 }), { minLength: 1, maxLength: 5 });
    fc.assert(
      fc.property(rows, (block) => {
        expect(parseTsv(serializeTsv(block))).toEqual(block);
      }),
    );
  });
});

describe('readBlock', () => {
  it('readBlock reads the selected cells row by row', () => {
    expect(readBlock(['a', 'b'], [{ id: 'x' }, { id: 'y' }], (row, col) => `${row}${col}`)).toEqual([
      ['ax', 'ay'],
      ['bx', 'by'],
    ]);
  });
});
