/**
 * Hostile and awkward files: each is refused with a message saying what is wrong and what
 * is accepted (nothing is read from it), or read with its awkward cells kept as text and
 * flagged. Limits: 20 MB, 100,000 rows, 200 columns, 200 MB expanded (src/io/import/limits.ts).
 */
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { ImportRefusal, buildPreview, prepareImport, readTable } from '../../../../src/io/import/index.ts';
import { makeZip, sheetXml, workbookShell, zerosDeflated } from './zip-fixtures.ts';

const enc = (s: string) => new TextEncoder().encode(s);

async function refusal(bytes: Uint8Array, name: string): Promise<string> {
  try {
    await readTable(bytes, name);
  } catch (e) {
    expect(e).toBeInstanceOf(ImportRefusal);
    return (e as Error).message;
  }
  throw new Error(`${name} was read, but should have been refused`);
}

async function workbook(build: (ws: ExcelJS.Worksheet) => void): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  build(wb.addWorksheet('List'));
  return new Uint8Array((await wb.xlsx.writeBuffer()) as ArrayBuffer);
}

describe('readTable refuses files past the limits, before reading them', () => {
  it('readTable(a 21 MB file) refuses it by size', async () => {
    const message = await refusal(new Uint8Array(21 * 1024 * 1024).fill(0x41), 'big.csv');
    expect(message).toBe(
      '"big.csv" is 21 MB; files of up to 20 MB are accepted (split the list, or delete other sheets)',
    );
  });

  it('readTable(a workbook whose part declares 1 GB) refuses it before expanding anything', async () => {
    // 1 GB of zero bytes compresses to about 1 MB: a huge run of repeated bytes compresses tiny.
    const compressed = zerosDeflated(1024);
    const bytes = makeZip(
      workbookShell([{ name: 'xl/worksheets/sheet1.xml', raw: { compressed, uncompressedSize: 1024 * 1024 * 1024 } }]),
    );
    expect(bytes.length).toBeLessThan(2 * 1024 * 1024);
    const started = performance.now();
    const message = await refusal(bytes, 'bomb.xlsx');
    expect(performance.now() - started).toBeLessThan(1000); // refused from the directory alone
    expect(message).toMatch(
      /^"bomb\.xlsx" would expand to 1\.0 GB when opened; workbooks that expand to at most 200 MB are accepted \(it was not opened\)$/,
    );
  });

  it('readTable(a workbook whose part lies about its size) stops expanding at the declared size', async () => {
    const compressed = zerosDeflated(512); // expands to 512 MB but declares 2 kB
    const bytes = makeZip(
      workbookShell([{ name: 'xl/worksheets/sheet1.xml', raw: { compressed, uncompressedSize: 2048 } }]),
    );
    const started = performance.now();
    const message = await refusal(bytes, 'liar.xlsx');
    expect(performance.now() - started).toBeLessThan(3000);
    expect(message).toContain(
      'the part "xl/worksheets/sheet1.xml" expands past the 2 kB its table of contents declares',
    );
  });

  it('readTable(a CSV of 1,000,000 rows) stops at 100,000 rows while streaming', async () => {
    const text = 'Model,LWA\n' + 'x,1\n'.repeat(1_000_000);
    const started = performance.now();
    const message = await refusal(enc(text), 'million.csv');
    expect(performance.now() - started).toBeLessThan(10_000);
    expect(message).toBe(
      '"million.csv" has more than 100,000 rows; lists of up to 100,000 rows are accepted (split the list)',
    );
  });

  it('readTable(a workbook sheet of 100,001 rows) refuses it while scanning, before opening it', async () => {
    const bytes = makeZip(workbookShell([{ name: 'xl/worksheets/sheet1.xml', data: sheetXml(100_001, 1) }]));
    const message = await refusal(bytes, 'rows.xlsx');
    expect(message).toBe(
      '"rows.xlsx" has more than 100,000 rows in one sheet; lists of up to 100,000 rows are accepted (split the list)',
    );
  });

  it('readTable(a CSV of 201 columns) refuses it', async () => {
    const header = Array.from({ length: 201 }, (_, i) => `h${i}`).join(',');
    const message = await refusal(enc(`${header}\n`), 'wide.csv');
    expect(message).toBe(
      '"wide.csv" has 201 columns in row 1; lists of up to 200 columns are accepted (delete unused columns, or check the delimiter)',
    );
  });

  it('readTable(a workbook using column GT = 202) refuses it', async () => {
    const bytes = makeZip(workbookShell([{ name: 'xl/worksheets/sheet1.xml', data: sheetXml(2, 202) }]));
    const message = await refusal(bytes, 'wide.xlsx');
    expect(message).toBe(
      '"wide.xlsx" uses column GT (more than 200 columns); lists of up to 200 columns are accepted (delete unused columns)',
    );
  });
});

describe('readTable refuses empty, corrupt and encrypted files with a message', () => {
  it.each([
    [
      'an empty .csv',
      new Uint8Array(0),
      'empty.csv',
      '"empty.csv" is empty; a header row and one row per machine are expected',
    ],
    [
      'a .csv of blank lines',
      enc('\n\n  \n'),
      'blank.csv',
      '"blank.csv" is empty; a header row and one row per machine are expected',
    ],
    [
      'a .csv of empty cells',
      enc(',,,\n , ,\n'),
      'commas.csv',
      '"commas.csv" is empty; a header row and one row per machine are expected',
    ],
    [
      'an empty .xlsx',
      new Uint8Array(0),
      'empty.xlsx',
      '"empty.xlsx" is empty; a header row and one row per machine are expected',
    ],
  ])('readTable(%s) refuses it', async (_what, bytes, name, expected) => {
    expect(await refusal(bytes, name)).toBe(expected);
  });

  it('readTable(a workbook with no data in any sheet) refuses it', async () => {
    const bytes = await workbook(() => undefined);
    expect(await refusal(bytes, 'blank.xlsx')).toBe(
      '"blank.xlsx" is empty: none of its sheets holds any data (a header row and one row per machine are expected)',
    );
  });

  it('readTable(random bytes named .xlsx) says it is not a readable workbook', async () => {
    const bytes = enc('this is not a workbook at all');
    expect(await refusal(bytes, 'junk.xlsx')).toBe(
      '"junk.xlsx" is not a readable .xlsx workbook (damaged, or another format); an .xlsx workbook, or a .csv or .tsv text file is accepted',
    );
  });

  it('readTable(a workbook cut short) says it is damaged', async () => {
    const whole = await workbook((ws) => ws.addRow(['Model', 'LWA']));
    const message = await refusal(whole.subarray(0, Math.floor(whole.length / 2)), 'cut.xlsx');
    expect(message).toMatch(
      /^"cut\.xlsx" is damaged: .*\(save it again from the spreadsheet program as \.xlsx, or as \.csv\)$/,
    );
  });

  it('readTable(a workbook whose compressed data is garbage) says which part is damaged', async () => {
    const garbage = new Uint8Array(64).fill(0xff);
    const bytes = makeZip(
      workbookShell([{ name: 'xl/worksheets/sheet1.xml', raw: { compressed: garbage, uncompressedSize: 1000 } }]),
    );
    expect(await refusal(bytes, 'garbled.xlsx')).toBe(
      '"garbled.xlsx" is damaged: the part "xl/worksheets/sheet1.xml" cannot be expanded (save it again as .xlsx, or as .csv)',
    );
  });

  it('readTable(a ZIP that is not a workbook) says so', async () => {
    const bytes = makeZip([{ name: 'readme.txt', data: 'hello' }]);
    expect(await refusal(bytes, 'archive.xlsx')).toBe(
      '"archive.xlsx" is a ZIP archive but not an .xlsx workbook; an .xlsx workbook, or a .csv or .tsv text file is accepted',
    );
  });

  it('readTable(an OLE compound file D0 CF 11 E0, as password-protected .xlsx are) refuses it', async () => {
    // Signature of the compound file binary format ([MS-CFB] 2.2: header signature D0 CF 11 E0 A1 B1 1A E1).
    const bytes = new Uint8Array(4096);
    bytes.set([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]);
    expect(await refusal(bytes, 'secret.xlsx')).toBe(
      '"secret.xlsx" is password-protected (encrypted) or an old-style .xls workbook; save it without a password as .xlsx, or as .csv',
    );
    expect(await refusal(bytes, 'old.xls')).toBe(
      '"old.xls" is an old-style .xls workbook; save it as .xlsx or .csv and import that',
    );
  });

  it('readTable(a ZIP whose parts carry the encryption flag) refuses it', async () => {
    const bytes = makeZip(workbookShell([{ name: 'xl/worksheets/sheet1.xml', data: sheetXml(2, 2), flags: 0x0801 }]));
    expect(await refusal(bytes, 'locked.xlsx')).toBe(
      '"locked.xlsx" is encrypted (password-protected); save it without a password, or as .csv',
    );
  });

  it('readTable(binary bytes named .csv) says it is not a text file', async () => {
    const bytes = new Uint8Array([0x4d, 0x5a, 0x00, 0x00, 0x01]);
    expect(await refusal(bytes, 'program.csv')).toBe(
      '"program.csv" is not a text file (it holds binary data); an .xlsx workbook, or a .csv or .tsv text file is accepted',
    );
  });
});

describe('prototype pollution: headers and cells named __proto__, constructor, prototype', () => {
  const NAMES = ['__proto__', 'constructor', 'prototype'];

  function prototypeSnapshot(): string[] {
    return [Object.prototype, Array.prototype, Function.prototype].flatMap((p) => Object.getOwnPropertyNames(p).sort());
  }

  async function importAll(bytes: Uint8Array, name: string) {
    const table = await readTable(bytes, name);
    const setup = prepareImport(table);
    return { table, setup, preview: buildPreview(table, { ...setup, dutyId: '__proto__' }) };
  }

  it.each(['csv', 'xlsx'])(
    'importing a %s with those names keeps them as text and pollutes no prototype',
    async (kind) => {
      const before = prototypeSnapshot();
      const header = [...NAMES, 'Model', 'LWA dB', 'Category'];
      const row = ['{"polluted": true}', 'x', 'y', '__proto__', '104', 'constructor'];
      const row2 = ['a', 'b', 'c', 'prototype', '__proto__', 'toString'];
      let bytes: Uint8Array;
      if (kind === 'csv')
        bytes = enc([header, row, row2].map((r) => r.map((c) => `"${c.replace(/"/g, '""')}"`).join(',')).join('\n'));
      else bytes = await workbook((ws) => [header, row, row2].forEach((r) => ws.addRow(r)));
      const { setup, preview } = await importAll(bytes, `names.${kind}`);

      expect(setup.headers.slice(0, 3)).toEqual(NAMES);
      expect(setup.mapping.slice(0, 3)).toEqual([null, null, null]);
      expect(preview.candidates.map((c) => c.label)).toEqual(['__proto__', 'prototype']);
      expect(preview.candidates.map((c) => c.category)).toEqual(['constructor', 'toString']);
      expect(preview.candidates[1]?.lwaDb).toBeNaN();
      expect(preview.problems[0]?.message).toBe(
        'Row 3, LWA dB: "__proto__" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
      );
      expect(Object.values(preview.unreadCells).filter((t) => t !== '')).toEqual(['__proto__']); // '' = no cost given

      expect(prototypeSnapshot()).toEqual(before);
      expect(({} as Record<string, unknown>).polluted).toBeUndefined();
      expect(Object.getPrototypeOf(preview.candidates[0])).toBe(Object.prototype);
      expect(typeof ({} as { constructor: unknown }).constructor).toBe('function');
    },
  );
});

describe('formula-injection text is kept as text, never evaluated', () => {
  const INJECTIONS = [
    '=HYPERLINK("http://example.invalid","click")',
    '+1+1',
    '-2+3',
    '@SUM(A1:A9)',
    "=cmd|' /C calc'!A0",
  ];

  it('a CSV label column keeps each formula-like text exactly', async () => {
    const text = [
      'Model,LWA dB,Rate per day',
      ...INJECTIONS.map((t, i) => `"${t.replace(/"/g, '""')}",${100 + i},50`),
    ].join('\n');
    const table = await readTable(enc(text), 'inject.csv');
    const setup = prepareImport(table);
    const preview = buildPreview(table, { ...setup, dutyId: 'd1' });
    expect(preview.candidates.map((c) => c.label)).toEqual(INJECTIONS);
    expect(preview.problems).toEqual([]);
  });

  it('a formula-like text in a number column is not a number, and its text is kept', async () => {
    const table = await readTable(enc('Model,LWA dB\nA,=100+5\nB,+1+1\n'), 'inject.csv');
    const preview = buildPreview(table, { ...prepareImport(table), dutyId: 'd1' });
    expect(preview.problems.map((p) => p.message)).toEqual([
      'Row 2, LWA dB: "=100+5" is a formula without a stored value, not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
      'Row 3, LWA dB: "+1+1" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    ]);
    expect(Object.values(preview.unreadCells).filter((t) => t !== '')).toEqual(['=100+5', '+1+1']); // '' = no cost given
  });

  it('a workbook formula gives the value stored with it, not a recomputation', async () => {
    const bytes = await workbook((ws) => {
      ws.addRow(['Model', 'LWA dB']);
      // The stored result (104) differs from what the formula would compute (2): the stored one is read.
      ws.addRow(['A', { formula: '1+1', result: 104 }]);
      ws.addRow([{ formula: 'CONCATENATE("=","1")' }, 101]);
    });
    const table = await readTable(bytes, 'formulas.xlsx');
    const preview = buildPreview(table, { ...prepareImport(table), dutyId: 'd1' });
    expect(preview.candidates[0]?.lwaDb).toBe(104);
    expect(preview.candidates[1]?.label).toBe('=CONCATENATE("=","1")');
  });
});

describe('wrong types in every column', () => {
  it('a row with wrong text in every mapped column is kept, flagged, and every text kept', async () => {
    const header =
      'Model,LWA dB,Sound power W,K dB,Net power kW,Rate per day,Rate per week,Rate per month,Fuel cost per day,Delivery charge,Fuel,Character,Operator LpA dB';
    const bad = 'X1,loud,big,some,lots,cheap,n/a,tbc,?,free,steam,squeaky,ouch';
    const table = await readTable(enc(`${header}\n${bad}\n`), 'types.csv');
    const setup = prepareImport(table);
    expect(setup.mapping).toEqual([
      'label',
      'lwaDb',
      'soundPowerW',
      'uncertaintyDb',
      'netPowerKw',
      'dayRate',
      'weekRate',
      'monthRate',
      'runningPerDay',
      'fixedCharges',
      'energy',
      'character',
      'operatorLpaDb',
    ]);
    const preview = buildPreview(table, { ...setup, dutyId: 'd1' });
    expect(preview.candidates).toHaveLength(1);
    expect(preview.rows[0]?.flagged).toBe(true);
    const messages = preview.problems.map((p) => p.message);
    expect(messages).toEqual([
      'Row 2, LWA dB: "loud" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
      'Row 2, K dB: "some" is not a number (use an uncertainty K in dB from 0 to 10, e.g. 2)',
      'Row 2, Rate per day: "cheap" is not a number (use an amount of money of 0 or more, e.g. 420)',
      'Row 2, Rate per week: "n/a" is not a number (use an amount of money of 0 or more, e.g. 420)',
      'Row 2, Rate per month: "tbc" is not a number (use an amount of money of 0 or more, e.g. 420)',
      'Row 2, Fuel: "steam" is not a known word (use one of diesel, petrol, electric, battery, hybrid, other)',
      'Row 2, Character: "squeaky" is not a known word (use one of none, tonal, impulsive)',
      'Row 2, Fuel cost per day: "?" is not a number (use an amount of money of 0 or more, e.g. 420)',
      'Row 2, Delivery charge: "free" is not a number (use an amount of money of 0 or more, e.g. 420)',
      'Row 2, Net power kW: "lots" is not a number (use a net installed power in kW above 0 and up to 10000, e.g. 55)',
      'Row 2, Operator LpA dB: "ouch" is not a number (use an operator-position level LpA in dB from 40 to 140, e.g. 82)',
    ]);
    // Keys name the candidate table's fields ("<list>/<id>/<field>", cost fields under cost.).
    expect(preview.unreadCells['candidates/c1/lwaDb']).toBe('loud');
    expect(preview.unreadCells['candidates/c1/cost.dayRate']).toBe('cheap');
    expect(preview.unreadCells['candidates/c1/energy']).toBe('steam');
    const texts = Object.values(preview.unreadCells).sort();
    expect(texts).toEqual(
      ['?', 'cheap', 'free', 'loud', 'lots', 'n/a', 'ouch', 'some', 'squeaky', 'steam', 'tbc'].sort(),
    );
  });
});

describe('CSV with a byte-order mark, semicolons and decimal commas', () => {
  it('readTable + prepareImport read "104,5" as 104.5 and "1.250,50" as 1250.5', async () => {
    const text = '\ufeffModel;LWA dB(A);Tagesmiete € / day\r\nBagger A;104,5;1.250,50\r\nBagger B;98;95\r\n';
    const table = await readTable(enc(text), 'semi.csv');
    expect(table.delimiter).toBe(';');
    expect(table.rows[0]?.cells[0]).toBe('Model'); // the mark is not part of the first header
    const setup = prepareImport(table);
    expect(setup.decimalSeparator).toBe(',');
    const preview = buildPreview(table, { ...setup, dutyId: 'd1' });
    expect(preview.candidates.map((c) => c.lwaDb)).toEqual([104.5, 98]);
    expect(preview.candidates.map((c) => (c.cost.kind === 'hire' ? c.cost.dayRate : NaN))).toEqual([1250.5, 95]);
    expect(preview.problems).toEqual([]);
  });

  it('readTable decodes a UTF-16 file with its mark, and a Windows-1252 "£"', async () => {
    const utf16 = new Uint8Array([0xff, 0xfe, ...Array.from('A,B\n1,2\n').flatMap((ch) => [ch.charCodeAt(0), 0])]);
    expect((await readTable(utf16, 'wide-chars.csv')).rows[0]?.cells).toEqual(['A', 'B']);
    const cp1252 = new Uint8Array([...enc('Rate '), 0xa3, ...enc(',x\n1,2\n')]); // 0xA3 is "£" in Windows-1252
    expect((await readTable(cp1252, 'old.csv')).rows[0]?.cells[0]).toBe('Rate £');
  });
});
