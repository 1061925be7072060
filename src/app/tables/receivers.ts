/**
 * Columns of the receivers table: where each receiver is, its limits per assessment
 * period, and how it is screened from each duty.
 */
import type { Receiver, Screening } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { booleanColumn, textColumn } from './cells.ts';
import { formatNumber, readNumberCell, type DecimalSeparator } from './parse.ts';
import { catalogueChoiceColumn, catalogueNumberColumn, gridRule } from './catalogue-columns.ts';
import { FACADE, RECEIVER_KIND, RECEIVER_NUMBERS as R } from '../../ledger/catalogue/index.ts';
import { own } from '../../ledger/model/own.ts';
import { SCREENING_WORDS } from '../../core/screening-words.ts';

const TOP = SCREENING_WORDS['top-visible'].short;
const OUT = SCREENING_WORDS.hidden.short;
const SCREENING_ACCEPTED = `use none, ${TOP} (−5 dB), ${OUT} (−10 dB), ${R.screeningDb.accepted}, or z followed by ${R.pathDifferenceM.accepted.replace('a path difference z', 'a barrier path difference')}`;

/** Words for a screening, as typed back in. */
export function screeningText(s: Screening | undefined, sep: DecimalSeparator): string {
  if (!s || s.kind === 'none') return 'none';
  if (s.kind === 'top-visible') return TOP;
  if (s.kind === 'hidden') return OUT;
  if (s.kind === 'explicit') return `${formatNumber(s.db, sep)} dB`;
  return `z ${formatNumber(s.pathDifferenceM, sep)}`;
}

/** A stated reduction, or a barrier's path difference after "z", read with the catalogue's range and unit words. */
function screeningNumber(text: string, sep: DecimalSeparator) {
  const z = /^z(?:\s*=\s*|\s+|(?=[\d.,+-]))(.*)$/.exec(text);
  return z
    ? { kind: 'barrier' as const, reading: readNumberCell(z[1] ?? '', sep, gridRule(R.pathDifferenceM)) }
    : { kind: 'explicit' as const, reading: readNumberCell(text, sep, gridRule(R.screeningDb)) };
}

/** Reads a screening from words, a dB reduction or "z <metres>"; undefined when unreadable or out of range. */
export function readScreening(text: string, sep: DecimalSeparator): Screening | undefined {
  const t = text.trim().toLowerCase();
  if (t === '' || t === 'none' || t === 'no') return { kind: 'none' };
  // The words of earlier versions are still read.
  if (t === TOP || t === 'top visible' || t === 'top-visible' || t === 'top just visible')
    return { kind: 'top-visible' };
  if (t === OUT || t === 'hidden' || t === 'fully hidden') return { kind: 'hidden' };
  const { kind, reading } = screeningNumber(t, sep);
  if (!reading.ok) return undefined;
  return kind === 'barrier' ? { kind, pathDifferenceM: reading.value } : { kind, db: reading.value };
}

/**
 * Why a screening text could not be read, in words for the message. A text that names a
 * barrier ("z …") or a reduction ("… dB") gets the words of that kind; a number outside the
 * catalogue's range says so.
 */
function screeningFailure(text: string, sep: DecimalSeparator): { problem: string; accepted: string } {
  const t = text.trim().toLowerCase();
  const { kind, reading } = screeningNumber(t, sep);
  if (reading.ok) return { problem: 'is not a screening', accepted: SCREENING_ACCEPTED };
  if (reading.problem === 'is out of range') return { problem: reading.problem, accepted: reading.accepted };
  if (kind === 'barrier') return { problem: 'is not a path difference', accepted: reading.accepted };
  if (/db(\s*\(?a\)?)?$/.test(t)) return { problem: 'is not a reduction in dB', accepted: reading.accepted };
  return { problem: 'is not a screening', accepted: SCREENING_ACCEPTED };
}

/**
 * What an unreadable screening stands for in the model while its text is kept: the kind
 * the text names with a NaN amount, so results that depend on it are not computed.
 */
function unreadScreening(text: string): Screening {
  return /^z/i.test(text.trim()) ? { kind: 'barrier', pathDifferenceM: NaN } : { kind: 'explicit', db: NaN };
}

function screeningColumn(dutyId: string, dutyName: string, sep: DecimalSeparator): LedgerColumn<Receiver> {
  return {
    id: `screening:${dutyId}`,
    header: `Screening from ${dutyName}`,
    width: 150,
    kind: 'text',
    editable: true,
    align: 'start',
    field: `screening.${dutyId}`,
    describe: SCREENING_ACCEPTED,
    value: (row) => screeningText(own(row.screening, dutyId), sep),
    display: (row) => screeningText(own(row.screening, dutyId), sep),
    write(row, text) {
      const s = readScreening(text, sep);
      const screening = { ...row.screening };
      if (!s) {
        screening[dutyId] = unreadScreening(text);
        return { row: { ...row, screening }, failure: screeningFailure(text, sep) };
      }
      if (s.kind === 'none') delete screening[dutyId];
      else screening[dutyId] = s;
      return { row: { ...row, screening } };
    },
  };
}

export function receiverColumns(ctx: TableContext): LedgerColumn<Receiver>[] {
  const { project, separator: sep } = ctx;
  return [
    textColumn<Receiver>({
      id: 'name',
      header: 'Receiver',
      field: 'name',
      width: 190,
      required: 'type a name for the receiver',
    }),
    catalogueChoiceColumn<Receiver, Receiver['kind']>(RECEIVER_KIND, 90),
    catalogueNumberColumn<Receiver>(R.x, sep, { width: 70 }),
    catalogueNumberColumn<Receiver>(R.y, sep, { width: 70 }),
    catalogueNumberColumn<Receiver>(R.heightM, sep, { width: 70 }),
    booleanColumn<Receiver>({
      id: 'facade',
      header: FACADE.header,
      field: FACADE.path,
      width: 70,
      describe: FACADE.describe,
    }),
    ...project.periods.map((p) =>
      catalogueNumberColumn<Receiver>(R.limitDb, sep, {
        id: `limit:${p.id}`,
        path: `${R.limitDb.path}.${p.id}`,
        header: `${R.limitDb.header} ${p.name}`,
        optional: true,
        width: 110,
      }),
    ),
    catalogueNumberColumn<Receiver>(R.ambientDb, sep, { optional: true, width: 80 }),
    ...project.duties.map((d) => screeningColumn(d.id, d.name, sep)),
  ].map(fitHeader);
}

export function receiverTable(ctx: TableContext): TableDefinition<Receiver> {
  return {
    list: 'receivers',
    label: 'Receivers',
    rows: (project) => project.receivers,
    columns: receiverColumns(ctx),
    blankRow: (_project, taken) => ({
      id: nextId('r', taken),
      name: '',
      kind: 'home',
      x: NaN,
      y: NaN,
      heightM: 4,
      facade: true,
      limitsDb: {},
      screening: {},
    }),
    withRows: (project, rows) => ({ ...project, receivers: rows }),
  };
}
