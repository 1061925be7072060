/**
 * The buyer's machine register: machines kept across projects, each with its noise data,
 * what it costs to own, run and hire, and where each figure came from.
 *
 * A register is plain JSON like a project, so it round-trips through its own file
 * ("plant-noise-ledger/register"), IndexedDB and a worker unchanged. Money is in the
 * register's currency; a machine's life is kept in years or in working days (converted
 * with the buyer's working days per year).
 */
import type { DeclarationKind, LwaOrigin } from '../model/model.ts';

/** The `format` field of every register file. */
export const REGISTER_FORMAT = 'plant-noise-ledger/register';
/** The register file version this code writes. */
export const REGISTER_VERSION = 1;

export type LifeUnit = 'years' | 'working-days';

/** What owning a machine costs. */
export interface PurchaseTerms {
  /** Price per unit. */
  price: number;
  /** Value at the end of the life, per unit. */
  resaleValue: number;
  /** Working life, in `lifeUnit`. */
  life: number;
  lifeUnit: LifeUnit;
}

/** What hiring the machine costs (per unit), when it can be hired. */
export interface HireTerms {
  dayRate: number;
  /** Per week of 7 days, when offered. */
  weekRate?: number;
  /** Per month of 28 days, when offered. */
  monthRate?: number;
}

/** One machine of the register. */
export interface RegisterMachine {
  /** Short id unique in the register ("m1", "m2"…); candidates copied from it remember it. */
  id: string;
  label: string;
  /** Free text for the buyer's grouping (e.g. "excavator 20 t"). */
  category: string;
  /** Directive 2000/14/EC equipment type (category word of core/standards/directive-2000-14-ec/). */
  directiveCategory?: string;
  /** Net installed power, kW. */
  netPowerKw?: number;
  /** Breaker mass kg, mower cutting width cm or generator electric power kW, when the limit depends on it. */
  directiveQuantity?: number;
  /** Declared A-weighted sound power level LWA, dB. */
  lwaDb?: number;
  declaration: DeclarationKind;
  /** Uncertainty K, dB (ISO 4871), for a `measured` declaration. */
  uncertaintyDb?: number;
  lwaOrigin: LwaOrigin;
  /** Octave-band sound power Lw, dB, 63 Hz … 8 kHz. */
  bandsDb?: number[];
  /** Emission sound pressure level at the operator's position LpA, dB. */
  operatorLpaDb?: number;
  character: 'none' | 'tonal' | 'impulsive';
  energy: 'diesel' | 'petrol' | 'electric' | 'battery' | 'hybrid' | 'other';
  /** Where the data came from, as a whole (data sheet, marking, supplier's list…). */
  source: string;
  /** Source of single figures when they differ from `source`, keyed by field ("lwaDb", "purchase.price"…). */
  figureSources?: Record<string, string>;
  purchase?: PurchaseTerms;
  hire?: HireTerms;
  /** Fuel or energy per working day. */
  runningPerDay: number;
}

/** The buyer's own figures, kept with the register. */
export interface RegisterSettings {
  /** Working days a machine works in a year (whole-life cost, life in working days). */
  workingDaysPerYear: number;
  /** Hours a day an operator runs the machine (operator L_EX,8h). */
  operatorHoursPerDay: number;
}

export interface Register {
  format: typeof REGISTER_FORMAT;
  version: typeof REGISTER_VERSION;
  name: string;
  /** ISO 4217 currency code. */
  currency: string;
  settings: RegisterSettings;
  machines: RegisterMachine[];
  /**
   * Text typed into a cell that could not be read, kept exactly as typed, keyed
   * "machines/<id>/<field>"; the numeric field then holds NaN (null in a file).
   */
  unreadCells?: Record<string, string>;
}

export const DEFAULT_REGISTER_SETTINGS: RegisterSettings = { workingDaysPerYear: 200, operatorHoursPerDay: 8 };

/** An empty register. */
export function emptyRegister(name = 'My machines', currency = 'GBP'): Register {
  return {
    format: REGISTER_FORMAT,
    version: REGISTER_VERSION,
    name,
    currency,
    settings: { ...DEFAULT_REGISTER_SETTINGS },
    machines: [],
  };
}
