/**
 * Candidate table columns for what a buyer or reviewer checks on each machine: its
 * Directive 2000/14/EC type and quantity (inputs), and the figures the ledger's candidate
 * checks give (computed): the Stage II permissible LWA, the rated LWA the predictions use
 * (marked when the permissible level stands in), the character penalty, and the operator's
 * daily exposure L_EX,8h with the Directive 2003/10/EC value it reaches.
 *
 * Formatting only: every figure comes from `CandidateCheck` (src/ledger/checks/candidate-checks.ts).
 */
import type { Candidate } from '../../ledger/model/model.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import type { ExposureBand } from '../../core/standards/directive-2003-10-ec.ts';
import { EXPOSURE_VALUES_DB } from '../../core/standards/directive-2003-10-ec.ts';
import {
  ARTICLE_12_TYPES,
  ARTICLE_13_TYPES,
  article12Type,
  outsideScope,
} from '../../core/standards/directive-2000-14-ec/index.ts';
import type { LedgerColumn, TableContext } from './column.ts';
import { catalogueNumberColumn } from './catalogue-columns.ts';
import { MACHINE_NUMBERS } from '../../ledger/catalogue/index.ts';
import { formatFigure, readChoice, NOT_COMPUTED, type DecimalSeparator } from './parse.ts';

/**
 * A candidate's check, from the Workspace: looked up by the candidate itself (the Workspace
 * keeps one check per candidate object), so a cell reads its check without a table of every
 * machine being made after each edit.
 */
export type CheckOf = (row: Candidate) => CandidateCheck | undefined;

/** Choice value meaning "not under the directive". */
export const NO_DIRECTIVE_TYPE = 'none';

/** Every directive type as a choice: none, then the Article 12 types (limits), then the Article 13 types (marking only). */
export const DIRECTIVE_CHOICES: readonly { value: string; label: string }[] = [
  { value: NO_DIRECTIVE_TYPE, label: 'none' },
  ...ARTICLE_12_TYPES.map((t) => ({ value: t.category, label: t.category })),
  ...ARTICLE_13_TYPES.map((t) => ({ value: t.category, label: `${t.category} (marking only)` })),
];

/** The directive type column: a choice of the directive's types, or none. */
export function directiveTypeColumn(): LedgerColumn<Candidate> {
  const labelOf = (v: string | undefined) => (v ? (DIRECTIVE_CHOICES.find((c) => c.value === v)?.label ?? v) : 'none');
  const accepted =
    'use none or a Directive 2000/14/EC type such as excavator, compressor, dumper, generator (the list opens with Enter)';
  return {
    id: 'directiveCategory',
    header: 'Directive type',
    width: 190,
    kind: 'choice',
    editable: true,
    align: 'start',
    field: 'directiveCategory',
    choices: DIRECTIVE_CHOICES.map((c) => ({ ...c })),
    describe:
      'Directive 2000/14/EC equipment type: the types with a permissible level (Article 12) first, then those only marked (Article 13); none when the machine is not covered',
    value: (row) => labelOf(row.directiveCategory),
    display: (row) => labelOf(row.directiveCategory),
    write(row, text) {
      if (text.trim() === '') return { row: withoutCategory(row) };
      const reading = readChoice(text, DIRECTIVE_CHOICES);
      if (!reading.ok) return { row, failure: { problem: 'is not a directive type', accepted } };
      if (reading.value === NO_DIRECTIVE_TYPE) return { row: withoutCategory(row) };
      return { row: { ...row, directiveCategory: reading.value } };
    },
  };
}

function withoutCategory(row: Candidate): Candidate {
  const { directiveCategory: _gone, ...rest } = row;
  return rest;
}

/** The quantity other than net power a limit depends on: breaker mass, mower cutting width, generator electric power. */
export function directiveQuantityColumn(sep: DecimalSeparator): LedgerColumn<Candidate> {
  return catalogueNumberColumn<Candidate>(MACHINE_NUMBERS.directiveQuantity, sep, { optional: true, width: 150 });
}

const BAND_WORDS: Record<ExposureBand, string> = {
  'below lower action value': `below ${EXPOSURE_VALUES_DB.lowerAction} (no action value)`,
  'lower action value': `lower action value ${EXPOSURE_VALUES_DB.lowerAction}`,
  'upper action value': `upper action value ${EXPOSURE_VALUES_DB.upperAction}`,
  'limit value': `limit value ${EXPOSURE_VALUES_DB.limit}`,
};

/** Words for the Directive 2003/10/EC value an exposure reaches, with the value in dB(A). */
export function exposureBandWords(band: ExposureBand): string {
  return BAND_WORDS[band];
}

/** Short words for the permissible-level cell of a candidate without a permissible level. */
function noLimitWords(candidate: Candidate): string {
  const category = candidate.directiveCategory;
  if (!category) return '';
  const type = article12Type(category);
  if (type) {
    const q =
      type.quantity === 'net-power-kw'
        ? (candidate.netPowerKw ?? candidate.directiveQuantity)
        : candidate.directiveQuantity;
    if (typeof q === 'number' && outsideScope(type, q)) return 'no limit (above Art. 12 scope)';
    return 'give the quantity';
  }
  if (ARTICLE_13_TYPES.some((t) => t.category === category)) return 'no limit (marking only)';
  return 'not a directive type';
}

/** Text of the permissible-level cell: the level, "(over)" when the declared level exceeds it, the stage when Stage I figures apply. */
export function permissibleText(check: CandidateCheck | undefined, candidate: Candidate): string {
  const p = check?.permissible;
  if (!p) return noLimitWords(candidate);
  const parts = [String(p.levelDb)];
  if (p.stage !== 'II') parts.push('(Stage I figures)');
  if (check.overPermissible) parts.push('(over)');
  return parts.join(' ');
}

/** Text of the rated-LWA cell, e.g. "103.0" or "101.0 (stand-in)". */
export function ratedText(check: CandidateCheck | undefined, sep: DecimalSeparator): string {
  if (!check) return NOT_COMPUTED;
  const level = formatFigure(check.ratedLwaDb, sep, 1);
  if (!Number.isFinite(check.ratedLwaDb)) return level;
  if (check.standIn) return check.offBasis ? `${level} (stand-in, off basis)` : `${level} (stand-in)`;
  return check.offBasis ? `${level} (off basis)` : level;
}

/** Text of the operator's daily exposure cell: L_EX,8h, nothing without operator data, "not computed" when it is unreadable. */
function exposureText(check: CandidateCheck | undefined, candidate: Candidate, sep: DecimalSeparator): string {
  if (check?.exposure) return formatFigure(check.exposure.dailyExposureDb, sep, 1);
  return candidate.operatorLpaDb !== undefined && candidate.operatorHoursPerDay !== undefined ? NOT_COMPUTED : '';
}

/**
 * The message a computed check cell carries, shown as the cell's note: why a stand-in
 * is used, by how much a level is over the permissible one.
 */
export function checkNotice(check: CandidateCheck | undefined, columnId: string): string | undefined {
  if (!check) return undefined;
  if (columnId === 'ratedLwa' && check.standIn)
    return `Stand-in: ${check.ratedExplanation}. ${check.permissibleNote ?? ''}${check.offBasis ? ` Off basis: ${check.offBasis}.` : ''}`.trim();
  if (columnId === 'ratedLwa' && check.offBasis) return `Off basis: ${check.offBasis}.`;
  if (columnId === 'permissibleLwa' && check.overPermissible)
    return `Over the permissible level: ${check.permissibleNote ?? ''}`.trim();
  return undefined;
}

/** The columns a check notice can sit on (see {@link checkNotice}). */
export const NOTICE_COLUMNS: ReadonlySet<string> = new Set(['ratedLwa', 'permissibleLwa']);

/** Whether a candidate's check puts a notice on any of its cells. */
export function checkHasNotice(check: CandidateCheck | undefined): boolean {
  if (!check) return false;
  for (const columnId of NOTICE_COLUMNS) if (checkNotice(check, columnId) !== undefined) return true;
  return false;
}

type CheckColumn = (
  id: string,
  header: string,
  unit: string | undefined,
  width: number,
  align: 'start' | 'end',
  get: (c: CandidateCheck | undefined, row: Candidate) => number | string | undefined,
  show: (c: CandidateCheck | undefined, row: Candidate) => string,
  describe: string,
) => LedgerColumn<Candidate>;

function maker(checkOf: CheckOf | undefined): CheckColumn {
  return (id, header, unit, width, align, get, show, describe) => ({
    id,
    header,
    ...(unit ? { unit } : {}),
    width,
    kind: 'computed',
    editable: false,
    align,
    describe,
    value: (row) => {
      const v = get(checkOf?.(row), row);
      return typeof v === 'number' && Number.isNaN(v) ? undefined : v;
    },
    display: (row) => show(checkOf?.(row), row),
  });
}

/** The LWA used (rated LWA), its working and the character penalty: computed columns placed beside the declaration. */
export function ratingColumns(ctx: TableContext, checkOf: CheckOf | undefined): LedgerColumn<Candidate>[] {
  const col = maker(checkOf);
  const sep = ctx.separator;
  return [
    col(
      'ratedLwa',
      'LWA used',
      'dB',
      156,
      'end',
      (c) => c?.ratedLwaDb,
      (c) => ratedText(c, sep),
      'the LWA the predictions use: the guaranteed value L + K, or the measured L when the project ranks on it (Settings); “off basis”: no K given, so the declared value is used as it is and the machine is not on the project’s basis; “stand-in”: no LWA is declared and the Directive 2000/14/EC permissible level is used, conservatively',
    ),
    col(
      'ratedFrom',
      'Working of LWA used',
      undefined,
      230,
      'start',
      (c) => c?.ratedExplanation,
      (c) => c?.ratedExplanation ?? '',
      'how the LWA used was worked out: the declared value, its declaration, K and the project’s level basis, or the permissible level standing in',
    ),
  ];
}

/** The character penalty column, placed beside the character. */
export function penaltyColumn(ctx: TableContext, checkOf: CheckOf | undefined): LedgerColumn<Candidate> {
  return maker(checkOf)(
    'penaltyDb',
    'Penalty',
    'dB',
    84,
    'end',
    (c) => c?.penaltyDb,
    (c) => (c ? (c.penaltyDb > 0 ? `+${formatFigure(c.penaltyDb, ctx.separator, 0)}` : '0') : NOT_COMPUTED),
    'character penalty added at every receiver for a tonal or impulsive machine (the project’s choice of 0, 3 or 6 dB in Settings)',
  );
}

/** The permissible level column, placed after the directive type and its quantities. */
export function permissibleColumn(checkOf: CheckOf | undefined): LedgerColumn<Candidate> {
  return maker(checkOf)(
    'permissibleLwa',
    'Permissible LWA',
    'dB, Stage II',
    150,
    'end',
    (c) => c?.permissible?.levelDb,
    (c, row) => permissibleText(c, row),
    'Directive 2000/14/EC permissible sound power level (Stage II, as amended by 2005/88/EC) for the type and its quantity; “over” when the declared guaranteed level exceeds it',
  );
}

/** The operator exposure columns, placed after the operator's LpA and hours. */
export function exposureColumns(ctx: TableContext, checkOf: CheckOf | undefined): LedgerColumn<Candidate>[] {
  const col = maker(checkOf);
  return [
    col(
      'dailyExposureDb',
      'LEX,8h',
      'dB(A)',
      96,
      'end',
      (c) => c?.exposure?.dailyExposureDb,
      (c, row) => exposureText(c, row, ctx.separator),
      'operator’s daily noise exposure L_EX,8h (ISO 9612) from the operator-position LpA and the hours a day; an estimate that does not replace a workplace assessment',
    ),
    col(
      'exposureBand',
      'Exposure value reached',
      'dB(A), 2003/10/EC',
      200,
      'start',
      (c) => c?.exposure?.band,
      (c) => (c?.exposure ? exposureBandWords(c.exposure.band) : ''),
      'the Directive 2003/10/EC value the daily exposure reaches: lower action value 80, upper action value 85, limit value 87 dB(A) (the limit value counts the hearing protection worn)',
    ),
  ];
}

/** Flags from the checks, as words for the Flags column. */
export function checkFlags(check: CandidateCheck | undefined): string[] {
  const flags: string[] = [];
  if (check?.overPermissible) flags.push('over permissible');
  if (check?.standIn) flags.push('stand-in LWA');
  if (check?.offBasis) flags.push('off basis');
  return flags;
}
