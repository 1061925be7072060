/**
 * Turning raw rows and a column mapping into the candidates an import would add, with
 * every problem listed per cell. Rows with problems are kept and flagged, never dropped:
 * a cell that cannot be read leaves its number unset (NaN) and its text is kept in
 * `unreadCells`, so nothing the file held is lost. Nothing is added to a project here;
 * the caller does that after the user confirms.
 *
 * Sound power arrives as LWA in dB (declared), as a sound power in watts
 * (Lw = 10·lg(W / 1 pW)), or as a sound pressure level at a stated distance
 * (Lw = Lp + 20·lg r + 10.99 − 10·lg Q); converted values are marked by `lwaOrigin`
 * and described in the candidate's source. O(rows × columns).
 */
import type { Candidate, CandidateCost, Directivity } from '../../ledger/model/model.ts';
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import { MACHINE_NUMBERS, fieldAccepts } from '../../ledger/catalogue/index.ts';
import { lwFromWatts } from '../../core/power.ts';
import { soundPowerFromPressureDb } from '../../core/point-source.ts';
import { bandIndex, fieldSpec, type ImportField } from './fields.ts';
import { distanceInHeader } from './header-words.ts';
import { freshIds } from './ids.ts';
import type { DecimalSeparator } from '../../ledger/catalogue/index.ts';
import { readChoiceCell, readNumberCell, readTextCell, where, type CellPlace, type CellReading } from './read-cell.ts';
import { headerText } from './suggest-mapping.ts';
import { columnLetters } from './workbook-guard.ts';
import type { CellProblem, ColumnMapping, ImportPreview, ImportedRow, RawTable } from './types.ts';

export interface BuildOptions {
  /** Index into `table.rows` of the header row; the rows after it are machines. */
  headerRowIndex: number;
  mapping: ColumnMapping;
  decimalSeparator: DecimalSeparator;
  /** The duty every imported candidate is offered for ('' when none is chosen yet). */
  dutyId: string;
  /**
   * The project's duties, to place rows whose "Duty" column names one (by id or name);
   * without it a Duty column's text is taken as the duty id.
   */
  duties?: readonly { id: string; name: string }[];
  /** Candidate ids already in the project; new ids avoid them. */
  existingIds?: Iterable<string>;
  /** Distance of pressure levels when neither a column nor the header states one, m. */
  pressureDistanceM?: number;
  /** Directivity Q used to back-calculate sound power from pressure; 2 (hemisphere, machine on hard ground) unless stated. */
  directivityQ?: Directivity;
}

/** Q used for the back-calculation from a pressure level unless stated: a machine standing on hard ground. */
export const DEFAULT_BACK_CALCULATION_Q: Directivity = 2;

/** The key of an unread cell in `Project.unreadCells`. */
export function unreadCellKey(candidateId: string, field: string): string {
  return `candidates/${candidateId}/${field}`;
}

/** The name of a column in messages: its header, or "column D" without one. */
export function columnName(table: RawTable, headerRowIndex: number, column: number): string {
  const text = headerText(table.rows[headerRowIndex]?.cells[column]).replace(/\s+/g, ' ');
  if (text === '') return `column ${columnLetters(column + 1)}`;
  return text.length > 40 ? `${text.slice(0, 39)}…` : text;
}

const fmt1 = (x: number) => (Math.round(x * 10) / 10).toFixed(1);

/** Builds the preview of an import. Never throws for cell content. */
export function buildPreview(table: RawTable, options: BuildOptions): ImportPreview {
  const { headerRowIndex, mapping, decimalSeparator: decimal } = options;
  const q = options.directivityQ ?? DEFAULT_BACK_CALCULATION_Q;
  const listDistance =
    options.pressureDistanceM !== undefined && options.pressureDistanceM > 0 ? options.pressureDistanceM : undefined;
  const columnsOf = new Map<ImportField, number>();
  mapping.forEach((field, column) => {
    if (field !== null && fieldSpec(field) && !columnsOf.has(field)) columnsOf.set(field, column);
  });
  const names = new Map<number, string>();
  const nameOf = (column: number) => {
    let n = names.get(column);
    if (n === undefined) names.set(column, (n = columnName(table, headerRowIndex, column)));
    return n;
  };
  const pressureColumn = columnsOf.get('pressureDb');
  const headerDistance = pressureColumn === undefined ? undefined : distanceInHeader(nameOf(pressureColumn));
  const lwaHeader = columnsOf.has('lwaDb') ? nameOf(columnsOf.get('lwaDb') as number).toLowerCase() : '';
  const hasCostColumn = ['dayRate', 'weekRate', 'monthRate', 'price'].some((f) => columnsOf.has(f as ImportField));
  const dataRows = table.rows.slice(headerRowIndex + 1);
  const ids = freshIds(options.existingIds ?? [], dataRows.length);
  const where0 = table.sheetName ? `${table.fileName} (${table.sheetName})` : table.fileName;

  const candidates: Candidate[] = [];
  const rows: ImportedRow[] = [];
  const problems: CellProblem[] = [];
  const unreadCells: Record<string, string> = {};
  const notes: string[] = [];

  dataRows.forEach((raw, k) => {
    const id = ids[k] as string;
    const rowProblems: CellProblem[] = [];
    const add = (
      place: Pick<CellPlace, 'column' | 'columnName' | 'field'> | null,
      message: string,
      severity: CellProblem['severity'],
    ) =>
      rowProblems.push({
        rowNumber: raw.rowNumber,
        column: place?.column ?? -1,
        columnName: place?.columnName ?? '',
        field: place?.field ?? null,
        message,
        severity,
      });
    const place = (field: ImportField): CellPlace | undefined => {
      const column = columnsOf.get(field);
      return column === undefined ? undefined : { rowNumber: raw.rowNumber, column, columnName: nameOf(column), field };
    };
    /** Reads a field; records problems and unread text under `target` (the candidate field it feeds). */
    const read = <T>(
      field: ImportField,
      reader: (p: CellPlace) => CellReading<T>,
      target: string = field,
    ): CellReading<T> => {
      const p = place(field);
      if (!p) return { kind: 'empty' };
      const r = reader(p);
      if (r.kind === 'unread') {
        add(p, r.problem, 'error');
        unreadCells[unreadCellKey(id, target)] = r.text;
      } else if (r.kind === 'value' && r.note) add(p, r.note, 'note');
      return r;
    };
    const cell = (p: CellPlace) => raw.cells[p.column] ?? null;
    const num = (field: ImportField, target?: string) =>
      read(field, (p) => readNumberCell(cell(p), p, decimal), target);
    const text = (field: ImportField) => read(field, (p) => readTextCell(cell(p), p));
    const choice = (field: ImportField) => read(field, (p) => readChoiceCell(cell(p), p));
    /** A number for an optional field: undefined when empty, NaN when unread. */
    const optional = (field: ImportField, target?: string): number | undefined => {
      const r = num(field, target);
      return r.kind === 'value' ? r.value : r.kind === 'unread' ? NaN : undefined;
    };

    const label = text('label');
    const category = text('category');
    const directiveCategory = text('directiveCategory');
    const sourceCell = text('source');

    // Sound power: declared LWA first, then watts, then pressure at a distance.
    let lwaDb: number | undefined;
    let lwaOrigin: Candidate['lwaOrigin'] = 'declared';
    let conversion = '';
    const lwa = num('lwaDb');
    if (lwa.kind !== 'empty') lwaDb = lwa.kind === 'value' ? lwa.value : NaN;
    else {
      const watts = num('soundPowerW', 'lwaDb');
      if (watts.kind === 'unread') lwaDb = NaN;
      else if (watts.kind === 'value') {
        lwaDb = lwFromWatts(watts.value);
        lwaOrigin = 'from-watts';
        conversion = `LWA ${fmt1(lwaDb)} dB from a sound power of ${watts.value} W (Lw = 10·lg(W / 1 pW))`;
      } else {
        const lp = num('pressureDb', 'lwaDb');
        if (lp.kind === 'unread') lwaDb = NaN;
        else if (lp.kind === 'value') {
          const d = num('pressureDistanceM', 'lwaDb');
          const distance = d.kind === 'value' ? d.value : d.kind === 'unread' ? NaN : (headerDistance ?? listDistance);
          const p = place('pressureDb') as CellPlace;
          if (distance === undefined) {
            lwaDb = NaN;
            unreadCells[unreadCellKey(id, 'lwaDb')] = `LpA ${lp.value} dB, distance not stated`;
            add(
              p,
              `${where(p)}${lp.value} dB has no distance (map a distance column, state it in the header as "at 10 m", or give the distance for the whole list)`,
              'error',
            );
          } else if (Number.isNaN(distance)) lwaDb = NaN;
          else {
            lwaDb = soundPowerFromPressureDb(lp.value, distance, q);
            lwaOrigin = 'from-pressure';
            conversion = `LWA ${fmt1(lwaDb)} dB back-calculated from LpA ${lp.value} dB at ${distance} m, Q = ${q} (Lw = Lp + 20·lg r + 10.99 − 10·lg Q)`;
          }
        }
      }
      if (lwaDb !== undefined && Number.isFinite(lwaDb) && !fieldAccepts(MACHINE_NUMBERS.lwaDb, lwaDb)) {
        const p = (place('soundPowerW') ?? place('pressureDb')) as CellPlace;
        add(
          p,
          `${where(p)}converts to LWA ${fmt1(lwaDb)} dB, outside ${MACHINE_NUMBERS.lwaDb.min} to ${MACHINE_NUMBERS.lwaDb.max} dB (check the unit of the column)`,
          'error',
        );
        unreadCells[unreadCellKey(id, 'lwaDb')] = String(raw.cells[p.column] ?? '');
        lwaDb = NaN;
        lwaOrigin = 'declared';
        conversion = '';
      }
    }

    const uncertaintyDb = optional('uncertaintyDb');
    const declared = choice('declaration');
    const declaration: Candidate['declaration'] =
      declared.kind === 'value'
        ? (declared.value as Candidate['declaration'])
        : uncertaintyDb !== undefined && !lwaHeader.includes('guarant')
          ? 'measured'
          : 'guaranteed';

    const bands: number[] = [];
    const bandTexts: string[] = [];
    let bandCount = 0;
    let bandMapped = false;
    for (const hz of OCTAVE_BANDS_HZ) {
      const field = `band${hz}` as ImportField;
      const column = columnsOf.get(field);
      bandTexts.push(column === undefined ? '' : String(raw.cells[column] ?? '').trim());
      if (column === undefined) continue;
      bandMapped = true;
      const v = optional(field, 'bandsDb');
      if (v !== undefined) {
        bands[bandIndex(field)] = v;
        bandCount++;
      }
    }
    // The bands column holds all eight levels: an unread band keeps the eight texts together.
    const bandsKey = unreadCellKey(id, 'bandsDb');
    if (bandsKey in unreadCells) unreadCells[bandsKey] = bandTexts.join(' ');
    let bandsDb: number[] | undefined;
    if (bandCount === OCTAVE_BANDS_HZ.length) bandsDb = bands;
    else if (bandMapped && bandCount > 0) {
      add(
        null,
        `Row ${raw.rowNumber}: ${bandCount} of the 8 octave bands (63 Hz to 8 kHz) given, so the bands are not used`,
        'note',
      );
    }

    const costKind = choice('costKind');
    const cost = readCost(
      num,
      id,
      raw.rowNumber,
      hasCostColumn,
      unreadCells,
      add,
      costKind.kind === 'value' ? (costKind.value as CandidateCost['kind']) : undefined,
    );
    const origin = choice('lwaOrigin');
    // The file's own statement of the origin stands unless this import converted the level itself.
    if (origin.kind === 'value' && lwaOrigin === 'declared') lwaOrigin = origin.value as Candidate['lwaOrigin'];
    const pinned = choice('pinned');
    const excluded = choice('excluded');
    const dutyRef = text('dutyRef');
    let dutyId = options.dutyId;
    if (dutyRef.kind === 'value') {
      if (!options.duties) dutyId = dutyRef.value;
      else {
        const wanted = dutyRef.value.toLowerCase();
        const duty =
          options.duties.find((d) => d.id === dutyRef.value) ??
          options.duties.find((d) => d.name.trim().toLowerCase() === wanted);
        if (duty) dutyId = duty.id;
        else {
          const p = place('dutyRef') as CellPlace;
          const chosen = options.duties.find((d) => d.id === options.dutyId)?.name ?? options.dutyId;
          add(
            p,
            `${where(p)}${JSON.stringify(dutyRef.value)} is not a duty of the project, so the machine is offered for ${JSON.stringify(chosen)}`,
            'note',
          );
        }
      }
    }
    const energy = choice('energy');
    const character = choice('character');
    const source = sourceCell.kind === 'value' ? sourceCell.value : `${where0}, row ${raw.rowNumber}`;

    const candidate: Candidate = {
      id,
      dutyId,
      label: label.kind === 'value' ? label.value : `Row ${raw.rowNumber}`,
      category: category.kind === 'value' ? category.value : '',
      declaration,
      lwaOrigin,
      character: character.kind === 'value' ? (character.value as Candidate['character']) : 'none',
      energy: energy.kind === 'value' ? (energy.value as Candidate['energy']) : 'other',
      source: conversion ? `${source}; ${conversion}` : source,
      cost,
      runningPerDay: optional('runningPerDay') ?? 0,
      fixedCharges: optional('fixedCharges') ?? 0,
    };
    if (directiveCategory.kind === 'value') candidate.directiveCategory = directiveCategory.value;
    if (lwaDb !== undefined) candidate.lwaDb = lwaDb;
    if (uncertaintyDb !== undefined) candidate.uncertaintyDb = uncertaintyDb;
    const netPowerKw = optional('netPowerKw');
    if (netPowerKw !== undefined) candidate.netPowerKw = netPowerKw;
    const directiveQuantity = optional('directiveQuantity');
    if (directiveQuantity !== undefined) candidate.directiveQuantity = directiveQuantity;
    const operatorLpaDb = optional('operatorLpaDb');
    if (operatorLpaDb !== undefined) candidate.operatorLpaDb = operatorLpaDb;
    const operatorHoursPerDay = optional('operatorHoursPerDay');
    if (operatorHoursPerDay !== undefined) candidate.operatorHoursPerDay = operatorHoursPerDay;
    if (bandsDb) candidate.bandsDb = bandsDb;
    if (pinned.kind === 'value' && pinned.value === 'yes') candidate.pinned = true;
    if (excluded.kind === 'value' && excluded.value === 'yes') candidate.excluded = true;
    if (label.kind === 'empty' && columnsOf.has('label')) {
      const p = place('label') as CellPlace;
      add(p, `${where(p)}empty, so the machine is called "Row ${raw.rowNumber}"`, 'note');
    }

    if (raw.rowNumber === table.unclosedQuoteRow) {
      add(
        null,
        `Row ${raw.rowNumber}: a quoted cell is not closed, so every line after it was read into this row; close the quote (") and import again`,
        'error',
      );
    }

    candidates.push(candidate);
    problems.push(...rowProblems);
    rows.push({
      rowNumber: raw.rowNumber,
      candidateId: id,
      problems: rowProblems,
      flagged: rowProblems.some((p) => p.severity === 'error'),
    });
  });

  if (table.unclosedQuoteRow !== undefined && !dataRows.some((r) => r.rowNumber === table.unclosedQuoteRow)) {
    notes.push(
      `Row ${table.unclosedQuoteRow}: a quoted cell is not closed, so every line after it was read into that row; close the quote (") and import again.`,
    );
  }
  if (!columnsOf.has('lwaDb') && !columnsOf.has('soundPowerW') && !columnsOf.has('pressureDb')) {
    notes.push(
      'No column gives the sound power (LWA, watts, or LpA at a distance): the machines are imported without it, and a permissible level may stand in where one applies.',
    );
  }
  if (!hasCostColumn)
    notes.push('No column gives a hire rate or a price: costs are left empty (not computed) until entered.');
  if (candidates.some((c) => c.lwaOrigin === 'from-pressure')) {
    notes.push(
      `Sound power back-calculated from a pressure level at a distance uses Q = ${q}${q === 2 ? ' (machine on hard ground)' : ''}; marked "from pressure".`,
    );
  }
  if (candidates.some((c) => c.lwaOrigin === 'from-watts'))
    notes.push('Sound power given in watts converted to LWA with Lw = 10·lg(W / 1 pW); marked "from watts".');
  if (dataRows.length === 0) notes.push('The list has a header row but no machines below it.');
  return { candidates, rows, problems, unreadCells, notes };
}

type NumReader = (field: ImportField, target?: string) => CellReading<number>;
type AddProblem = (place: null, message: string, severity: CellProblem['severity']) => void;

/**
 * The cost of a row: the basis a "Cost basis" column states, else hire when any rate is
 * given (a missing day rate is taken from the week rate, else the month rate: the shortest
 * hire offered is paid in full), purchase when a price is given, else an unset day rate.
 */
function readCost(
  num: NumReader,
  id: string,
  rowNumber: number,
  hasCostColumn: boolean,
  unreadCells: Record<string, string>,
  add: AddProblem,
  basis?: CandidateCost['kind'],
): CandidateCost {
  const value = (r: CellReading<number>) => (r.kind === 'value' ? r.value : r.kind === 'unread' ? NaN : undefined);
  const day = value(num('dayRate', 'cost.dayRate'));
  const week = value(num('weekRate', 'cost.weekRate'));
  const month = value(num('monthRate', 'cost.monthRate'));
  if (basis !== 'purchase' && (day !== undefined || week !== undefined || month !== undefined)) {
    const cost: CandidateCost = { kind: 'hire', dayRate: day ?? week ?? (month as number) };
    if (week !== undefined) cost.weekRate = week;
    else if (month !== undefined && day === undefined) cost.weekRate = month;
    if (month !== undefined) cost.monthRate = month;
    if (day === undefined) {
      add(
        null,
        `Row ${rowNumber}: no day rate, so the ${week !== undefined ? 'week' : 'month'} rate is charged for any shorter hire`,
        'note',
      );
    }
    return cost;
  }
  const price = value(num('price', 'cost.price'));
  if (basis !== 'hire' && price !== undefined) {
    let lifeDays = value(num('lifeDays', 'cost.lifeDays'));
    if (lifeDays === undefined) {
      lifeDays = NaN;
      unreadCells[unreadCellKey(id, 'cost.lifeDays')] = '';
      add(
        null,
        `Row ${rowNumber}: a purchase price needs a working life in days to spread it over (map a life column, or enter it after importing)`,
        'error',
      );
    }
    return { kind: 'purchase', price, lifeDays, resaleValue: value(num('resaleValue', 'cost.resaleValue')) ?? 0 };
  }
  unreadCells[unreadCellKey(id, 'cost.dayRate')] = '';
  if (hasCostColumn)
    add(
      null,
      `Row ${rowNumber}: no hire rate or price given (enter a rate per day, week or month, or a price)`,
      'error',
    );
  return { kind: 'hire', dayRate: NaN };
}
