/**
 * `ledger import`: reads a supplier's list of candidate machines (.xlsx, .csv, .tsv) and
 * prints the column mapping used, the candidates read and every problem, per cell.
 * Nothing is written: the output (or its --json form) is for checking a list before it
 * goes into a project.
 */
import { stat, readFile } from 'node:fs/promises';
import { basename } from 'node:path';
import type { Command } from '../command.ts';
import { UsageError, helpText, numberFlag, parseFlags, textSeparatorOf, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import type { Candidate, Directivity } from '../../ledger/model/model.ts';
import {
  FIELD_SPECS,
  ImportRefusal,
  MAX_FILE_BYTES,
  MapSpecError,
  applyMapSpec,
  buildPreview,
  fieldSpec,
  formatBytes,
  headersAt,
  prepareImport,
  readTable,
  type ImportPreview,
  type RawTable,
} from '../../io/import/index.ts';
import { columnLetters } from '../../io/import/workbook-guard.ts';

const specs: FlagSpecs = {
  map: {
    type: 'string',
    value: '<column=field,…>',
    help: 'set or change the mapping, e.g. "Noise=lwaDb,C=dayRate" (column by header, letter or number; field "none" leaves it out)',
  },
  duty: { type: 'string', value: '<id>', help: 'the duty the candidates are offered for' },
  'header-row': { type: 'string', value: '<n>', help: 'the row holding the headers (default: found from the cells)' },
  decimal: {
    type: 'string',
    value: '<.|,>',
    help: 'decimal separator of numbers written as text (default: found from the cells)',
  },
  distance: {
    type: 'string',
    value: '<m>',
    help: 'distance of pressure levels when neither a column nor the header gives it',
  },
  q: {
    type: 'string',
    value: '<1|2|4|8>',
    help: 'directivity Q for sound power back-calculated from pressure (default 2, on hard ground)',
  },
  json: { type: 'boolean', help: 'print the mapping, candidates, unread cells and problems as JSON' },
};

const usage = 'Usage: ledger import <supplier.xlsx|csv|tsv> [--map <column=field,…>] [--duty <id>] [--json]';
const summary = 'Read a supplier list of candidate machines and show every problem.';

const fieldsHelp = FIELD_SPECS.map((f) => `  ${f.key.padEnd(20)} ${f.label}`).join('\n');

function pad(s: string, n: number): string {
  return s.length > n ? `${s.slice(0, n - 1)}…` : s.padEnd(n);
}

const show = (x: number | undefined, digits = 1) =>
  x === undefined ? '' : Number.isNaN(x) ? 'unread' : x.toFixed(digits);

function costText(c: Candidate): string {
  if (c.cost.kind === 'hire') {
    const parts = [`${show(c.cost.dayRate, 2)}/day`];
    if (c.cost.weekRate !== undefined) parts.push(`${show(c.cost.weekRate, 2)}/week`);
    if (c.cost.monthRate !== undefined) parts.push(`${show(c.cost.monthRate, 2)}/month`);
    return `hire ${parts.join(', ')}`;
  }
  return `buy ${show(c.cost.price, 2)} over ${show(c.cost.lifeDays, 0)} days`;
}

function textReport(
  table: RawTable,
  headerRowIndex: number,
  headers: string[],
  mapping: (string | null)[],
  decimal: string,
  preview: ImportPreview,
): string {
  const lines: string[] = [];
  const headerRow = table.rows[headerRowIndex]?.rowNumber ?? 1;
  const sheet = table.sheetName ? `, sheet "${table.sheetName}"` : '';
  const delim = table.delimiter ? `, delimiter ${JSON.stringify(table.delimiter)}` : '';
  lines.push(
    `Read "${table.fileName}"${sheet}: header in row ${headerRow}${delim}, decimal ${decimal === ',' ? 'comma' : 'point'}.`,
  );
  lines.push('', 'Mapping (column → field):');
  headers.forEach((h, i) => {
    const field = mapping[i] ?? null;
    const label = field ? `${field} (${fieldSpec(field)?.label ?? ''})` : 'not imported';
    lines.push(`  ${pad(columnLetters(i + 1), 4)}${pad(h === '' ? '(no header)' : h, 28)} → ${label}`);
  });
  const flagged = preview.rows.filter((r) => r.flagged).length;
  lines.push('', `Candidates read: ${preview.candidates.length}${flagged ? ` (${flagged} flagged)` : ''}`);
  lines.push(`  ${pad('row', 7)}${pad('id', 8)}${pad('label', 28)}${pad('LWA dB', 9)}${pad('origin', 16)}cost`);
  preview.candidates.forEach((c, i) => {
    const row = preview.rows[i];
    const mark = row?.flagged ? '!' : ' ';
    lines.push(
      `${mark} ${pad(String(row?.rowNumber ?? ''), 7)}${pad(c.id, 8)}${pad(c.label, 28)}${pad(show(c.lwaDb), 9)}${pad(c.lwaOrigin, 16)}${costText(c)}`,
    );
  });
  const errors = preview.problems.filter((p) => p.severity === 'error');
  const notes = preview.problems.filter((p) => p.severity === 'note');
  lines.push('', errors.length ? `Problems (${errors.length}; the text of these cells is kept):` : 'Problems: none');
  for (const p of errors) lines.push(`  ${p.message}`);
  if (notes.length || preview.notes.length || table.notes.length) {
    lines.push('', 'Notes:');
    for (const n of [...table.notes, ...preview.notes]) lines.push(`  ${n}`);
    for (const p of notes) lines.push(`  ${p.message}`);
  }
  lines.push('');
  return lines.join('\n');
}

export const importCommand: Command = {
  name: 'import',
  summary,
  help:
    helpText(usage, summary, specs) +
    '\nRows with problems are kept and flagged (!); the text of each cell that could not be read is kept.\n' +
    'Exit code 0: every cell read; 1: some cells could not be read (listed); 2: the file was refused.\n' +
    `Files over ${formatBytes(MAX_FILE_BYTES)}, over 100,000 rows or over 200 columns are refused.\n` +
    `\nFields for --map:\n${fieldsHelp}\n`,
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const path = positionals[0];
    if (path === undefined) throw new UsageError('missing the supplier list (give a .xlsx, .csv or .tsv file name)');
    const headerRowFlag = numberFlag(values, 'header-row', FLAG_RULES.rowNumber);
    const distance = numberFlag(values, 'distance', FLAG_RULES.distanceM);
    if (distance !== undefined && !(distance > 0))
      throw new UsageError(
        `--distance: ${distance} is out of range (give a distance in metres greater than 0, e.g. 10)`,
      );
    const q = numberFlag(values, 'q', FLAG_RULES.q) ?? 2;
    if (![1, 2, 4, 8].includes(q)) throw new UsageError(`--q: ${q} is not accepted (give 1, 2, 4 or 8)`);
    const decimalFlag = textSeparatorOf(values);
    const name = basename(path);
    let table: RawTable;
    try {
      const info = await stat(path).catch(() => {
        throw new UsageError(`${JSON.stringify(path)}: no such file (give a .xlsx, .csv or .tsv file name)`);
      });
      if (!info.isFile())
        throw new UsageError(`${JSON.stringify(path)}: not a file (give a .xlsx, .csv or .tsv file name)`);
      if (info.size > MAX_FILE_BYTES) {
        throw new ImportRefusal(
          `"${name}" is ${formatBytes(info.size)}; files of up to ${formatBytes(MAX_FILE_BYTES)} are accepted (split the list, or delete other sheets)`,
        );
      }
      table = await readTable(new Uint8Array(await readFile(path)), name);
    } catch (e) {
      if (e instanceof ImportRefusal) {
        io.err(`ledger import: ${e.message}\nNothing was imported.\n`);
        return 2;
      }
      throw e;
    }
    let headerRowIndex: number | undefined;
    if (headerRowFlag !== undefined) {
      headerRowIndex = table.rows.findIndex((r) => r.rowNumber === headerRowFlag);
      if (headerRowIndex < 0)
        throw new UsageError(
          `--header-row: row ${headerRowFlag} is empty or not in the file (give the number of a row holding the headers)`,
        );
    }
    const setup = prepareImport(table, headerRowIndex);
    let mapping = setup.mapping;
    if (typeof values.map === 'string') {
      try {
        mapping = applyMapSpec(values.map, setup.headers, mapping);
      } catch (e) {
        if (e instanceof MapSpecError) throw new UsageError(e.message.replace(/^--map: /, '--map: '));
        throw e;
      }
    }
    const decimal = decimalFlag ?? setup.decimalSeparator;
    const preview = buildPreview(table, {
      headerRowIndex: setup.headerRowIndex,
      mapping,
      decimalSeparator: decimal,
      dutyId: typeof values.duty === 'string' ? values.duty : '',
      ...(distance !== undefined ? { pressureDistanceM: distance } : {}),
      directivityQ: q as Directivity,
    });
    const headers = headersAt(table, setup.headerRowIndex);
    if (values.json) {
      const out = {
        file: table.fileName,
        ...(table.sheetName ? { sheet: table.sheetName } : {}),
        headerRow: table.rows[setup.headerRowIndex]?.rowNumber ?? null,
        decimalSeparator: decimal,
        mapping: headers.map((header, i) => ({ column: columnLetters(i + 1), header, field: mapping[i] ?? null })),
        candidates: preview.candidates,
        unreadCells: preview.unreadCells,
        problems: preview.problems.map((p) => ({
          row: p.rowNumber,
          column: p.column >= 0 ? columnLetters(p.column + 1) : null,
          field: p.field,
          severity: p.severity,
          message: p.message,
        })),
        notes: [...table.notes, ...preview.notes],
      };
      io.out(`${JSON.stringify(out, null, 2)}\n`);
    } else {
      io.out(textReport(table, setup.headerRowIndex, headers, mapping, decimal, preview));
    }
    return preview.rows.some((r) => r.flagged) || table.unclosedQuoteRow !== undefined ? 1 : 0;
  },
};
