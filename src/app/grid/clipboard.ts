/**
 * Tab-separated text as spreadsheet programs put it on the clipboard.
 *
 * Cells are separated by a tab, rows by CRLF, LF or CR. A cell that holds a
 * tab, a line break or a quote is wrapped in double quotes with inner quotes
 * doubled (the common practice of spreadsheet programs, also described for
 * CSV in RFC 4180 §2). A final line break does not start a new row. A quote
 * that does not open a well-formed quoted cell is kept as typed.
 */

const TAB = '\t';
const QUOTE = '"';

function isLineBreak(char: string | undefined): boolean {
  return char === '\n' || char === '\r';
}

/** Index just past the line break starting at `index` (CRLF counts as one). */
function skipLineBreak(text: string, index: number): number {
  return text[index] === '\r' && text[index + 1] === '\n' ? index + 2 : index + 1;
}

/** Reads an unquoted cell; returns its text and the index of the separator after it. */
function readPlain(text: string, start: number): [string, number] {
  let end = start;
  while (end < text.length && text[end] !== TAB && !isLineBreak(text[end])) end++;
  return [text.slice(start, end), end];
}

/** Reads a quoted cell starting at the opening quote, or returns null when it is not well formed. */
function readQuoted(text: string, start: number): [string, number] | null {
  let value = '';
  let index = start + 1;
  while (index < text.length) {
    const char = text[index];
    if (char === QUOTE) {
      if (text[index + 1] === QUOTE) {
        value += QUOTE;
        index += 2;
        continue;
      }
      const after = index + 1;
      if (after === text.length || text[after] === TAB || isLineBreak(text[after])) return [value, after];
      return null;
    }
    value += char;
    index++;
  }
  return null;
}

/**
 * Splits clipboard text into rows of cells.
 *
 * Rows keep their own length (a ragged block stays ragged); empty cells are
 * empty strings. Cost O(n) in the text length.
 * @example parseTsv('a\t"b\tc"\r\n1\t2\r\n') // → [['a', 'b\tc'], ['1', '2']]
 * @example parseTsv('') // → []
 */
export function parseTsv(text: string): string[][] {
  const source = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const rows: string[][] = [];
  if (source.length === 0) return rows;
  let row: string[] = [];
  let index = 0;
  for (;;) {
    const quoted = source[index] === QUOTE ? readQuoted(source, index) : null;
    const cell: [string, number] = quoted ?? readPlain(source, index);
    row.push(cell[0]);
    index = cell[1];
    if (index >= source.length) {
      rows.push(row);
      break;
    }
    if (source[index] === TAB) {
      index++;
      if (index >= source.length) {
        row.push('');
        rows.push(row);
        break;
      }
      continue;
    }
    // a line break ends the row; one at the very end ends the block
    rows.push(row);
    row = [];
    index = skipLineBreak(source, index);
    if (index >= source.length) break;
  }
  return rows;
}

function quoteCell(cell: string, alone: boolean): string {
  if (/[\t\r\n"]/.test(cell) || (alone && cell === '')) return QUOTE + cell.replaceAll(QUOTE, QUOTE + QUOTE) + QUOTE;
  return cell;
}

/**
 * Writes rows of cells as tab-separated text, rows joined by CRLF, quoting
 * cells that need it, so that `parseTsv(serializeTsv(rows))` returns `rows`.
 * @example serializeTsv([['a', 'b\tc'], ['1', '2']]) // → 'a\t"b\tc"\r\n1\t2'
 */
export function serializeTsv(rows: readonly (readonly string[])[]): string {
  return rows.map((row) => row.map((cell) => quoteCell(cell, row.length === 1)).join(TAB)).join('\r\n');
}

/**
 * Reads the text of the selected cells as rows of cells, for copying.
 * @example readBlock(['a', 'b'], [{ id: 'x' }], (r) => r.toUpperCase()) // → [['A'], ['B']]
 */
export function readBlock(
  rowIds: readonly string[],
  columns: readonly { id: string }[],
  textOf: (rowId: string, columnId: string) => string,
): string[][] {
  return rowIds.map((rowId) => columns.map((column) => textOf(rowId, column.id)));
}
