/**
 * Columns of the receivers table: where each receiver is, its limits per assessment
 * period, and how it is screened from each duty.
 */
import type { Receiver, Screening } from '../../ledger/model/model.ts';
import { RECEIVER_KINDS } from '../../ledger/model/model.ts';
import type { LedgerColumn, TableContext, TableDefinition } from './column.ts';
import { fitHeader, nextId } from './column.ts';
import { booleanColumn, choiceColumn, numberColumn, textColumn } from './cells.ts';
import { formatNumber, readNumber, type DecimalSeparator } from './parse.ts';
import { own } from '../../ledger/model/own.ts';
import { SCREENING_WORDS } from '../../core/screening-words.ts';

const TOP = SCREENING_WORDS['top-visible'].short;
const OUT = SCREENING_WORDS.hidden.short;
const SCREENING_ACCEPTED = `use none, ${TOP} (−5 dB), ${OUT} (−10 dB), a reduction in dB such as 7.5, or z followed by a barrier path difference in metres such as z 0.8`;

/** Words for a screening, as typed back in. */
export function screeningText(s: Screening | undefined, sep: DecimalSeparator): string {
  if (!s || s.kind === 'none') return 'none';
  if (s.kind === 'top-visible') return TOP;
  if (s.kind === 'hidden') return OUT;
  if (s.kind === 'explicit') return `${formatNumber(s.db, sep)} dB`;
  return `z ${formatNumber(s.pathDifferenceM, sep)}`;
}

/** Reads a screening from words, a dB reduction or "z <metres>"; undefined when unreadable. */
export function readScreening(text: string, sep: DecimalSeparator): Screening | undefined {
  const t = text.trim().toLowerCase();
  if (t === '' || t === 'none' || t === 'no') return { kind: 'none' };
  // The words of earlier versions are still read.
  if (t === TOP || t === 'top visible' || t === 'top-visible' || t === 'top just visible')
    return { kind: 'top-visible' };
  if (t === OUT || t === 'hidden' || t === 'fully hidden') return { kind: 'hidden' };
  const z = /^z\s*=?\s*(.+?)\s*m?$/.exec(t);
  if (z) {
    const v = readNumber(z[1] ?? '', sep);
    return v !== undefined && v >= 0 ? { kind: 'barrier', pathDifferenceM: v } : undefined;
  }
  const db = readNumber(t.replace(/\s*db$/, ''), sep);
  return db !== undefined && db >= 0 ? { kind: 'explicit', db } : undefined;
}

/** Accepted input for an explicit reduction and for a barrier's path difference. */
export const REDUCTION_ACCEPTED = 'use a reduction in dB from 0 to 40, e.g. 7.5';
export const PATH_DIFFERENCE_ACCEPTED = 'use a barrier path difference in metres of 0 or more, e.g. 0.8';

/**
 * Why a screening text could not be read, in words for the message. A text that names a
 * barrier ("z …") or a reduction ("… dB") gets the words of that kind.
 */
function screeningFailure(text: string): { problem: string; accepted: string } {
  const t = text.trim().toLowerCase();
  if (/^z\b|^z\s*=|^z\d/.test(t)) return { problem: 'is not a path difference', accepted: PATH_DIFFERENCE_ACCEPTED };
  if (/db$/.test(t)) return { problem: 'is not a reduction in dB', accepted: REDUCTION_ACCEPTED };
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
        return { row: { ...row, screening }, failure: screeningFailure(text) };
      }
      if (s.kind === 'none') delete screening[dutyId];
      else screening[dutyId] = s;
      return { row: { ...row, screening } };
    },
  };
}

export function receiverColumns(ctx: TableContext): LedgerColumn<Receiver>[] {
  const { project, separator: sep } = ctx;
  const dB = { suffixes: ['dB(A)', 'dBA', 'dB'] };
  return [
    textColumn<Receiver>({
      id: 'name',
      header: 'Receiver',
      field: 'name',
      width: 190,
      required: 'type a name for the receiver',
    }),
    choiceColumn<Receiver, Receiver['kind']>(
      { id: 'kind', header: 'Kind', field: 'kind', width: 90 },
      RECEIVER_KINDS.map((k) => ({ value: k, label: k })),
    ),
    numberColumn<Receiver>(
      {
        id: 'x',
        header: 'X',
        unit: 'm',
        field: 'x',
        width: 70,
        rule: { accepted: 'use metres east on the site grid, e.g. 120.5', suffixes: ['m'] },
      },
      sep,
    ),
    numberColumn<Receiver>(
      {
        id: 'y',
        header: 'Y',
        unit: 'm',
        field: 'y',
        width: 70,
        rule: { accepted: 'use metres north on the site grid, e.g. 64', suffixes: ['m'] },
      },
      sep,
    ),
    numberColumn<Receiver>(
      {
        id: 'heightM',
        header: 'Height',
        unit: 'm',
        field: 'heightM',
        width: 70,
        rule: { accepted: 'use metres of 0 or more, e.g. 4', min: 0, suffixes: ['m'] },
      },
      sep,
    ),
    booleanColumn<Receiver>({
      id: 'facade',
      header: 'Façade',
      field: 'facade',
      width: 70,
      describe: 'yes: assessed 1 m in front of a façade (+3 dB)',
    }),
    ...project.periods.map((p) =>
      numberColumn<Receiver>(
        {
          id: `limit:${p.id}`,
          header: `Limit ${p.name}`,
          unit: 'dB',
          field: `limitsDb.${p.id}`,
          optional: true,
          width: 110,
          describe: `LAeq over ${p.start}–${p.end} in dB, e.g. 65; empty: not assessed`,
          rule: { accepted: 'use a limit in dB, e.g. 65, or leave empty', min: 0, max: 200, ...dB },
        },
        sep,
      ),
    ),
    numberColumn<Receiver>(
      {
        id: 'ambientDb',
        header: 'Ambient',
        unit: 'dB',
        field: 'ambientDb',
        optional: true,
        width: 80,
        rule: { accepted: 'use dB, e.g. 58.5', min: 0, max: 200, ...dB },
      },
      sep,
    ),
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
