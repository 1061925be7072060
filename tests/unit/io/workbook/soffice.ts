/**
 * LibreOffice headless for the workbook proof: recalculates an exported workbook on load
 * (a private profile with "recalculate always" for Excel 2007+ files, so the cached results
 * are NOT what comes out) and writes every sheet as CSV with full precision.
 */
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { delimiter, join } from 'node:path';
import { promisify } from 'node:util';
import Papa from 'papaparse';

const run = promisify(execFile);

/** Path of `soffice` on the PATH, or undefined when LibreOffice is not installed. */
export function findSoffice(): string | undefined {
  for (const dir of (process.env.PATH ?? '').split(delimiter)) {
    const candidate = join(dir, 'soffice');
    if (dir && existsSync(candidate)) return candidate;
  }
  return undefined;
}

/** LibreOffice setting: recalculate formulas of OOXML (and ODF) files on load, always (0). */
const RECALC_ALWAYS = `<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>0</value></prop></item>
</oor:items>
`;

/**
 * CSV export of every sheet: comma, double quote, UTF-8 (76), from line 1, values not "as
 * shown" (full precision), formulas as values, all sheets (-1).
 */
const CSV_FILTER = 'csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1';

/**
 * Recalculates each workbook in LibreOffice and returns, per workbook name, each sheet's
 * rows. One LibreOffice run converts them all.
 */
export async function recalculateInLibreOffice(
  soffice: string,
  workbooks: Record<string, Uint8Array>,
): Promise<Record<string, Record<string, string[][]>>> {
  const dir = mkdtempSync(join(tmpdir(), 'ledger-lo-'));
  const profile = join(dir, 'profile');
  mkdirSync(join(profile, 'user'), { recursive: true });
  writeFileSync(join(profile, 'user', 'registrymodifications.xcu'), RECALC_ALWAYS);
  const out = join(dir, 'out');
  mkdirSync(out);
  const files = Object.entries(workbooks).map(([name, bytes]) => {
    const file = join(dir, `${name}.xlsx`);
    writeFileSync(file, bytes);
    return file;
  });
  await run(
    soffice,
    [
      `-env:UserInstallation=file://${profile}`,
      '--headless',
      '--norestore',
      '--convert-to',
      CSV_FILTER,
      '--outdir',
      out,
      ...files,
    ],
    { timeout: 170_000 },
  );
  const result: Record<string, Record<string, string[][]>> = {};
  for (const name of Object.keys(workbooks)) {
    result[name] = {};
    for (const sheet of [
      'inputs',
      'assumptions',
      'paths',
      'contributions',
      'levels',
      'shortlist',
      'compliance',
      'clauses',
      'confidence',
      'checks',
    ]) {
      const file = join(out, `${name}-${sheet}.csv`);
      if (!existsSync(file)) continue;
      (result[name] as Record<string, string[][]>)[sheet] = Papa.parse<string[]>(readFileSync(file, 'utf8'), {
        skipEmptyLines: false,
      }).data;
    }
  }
  return result;
}
