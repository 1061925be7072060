/**
 * A tender's noise clauses as project data.
 *
 * A clause keeps the tender's own words (`text`, as typed or pasted), the tender's clause
 * number (`ref`), a kind, and the parameters that kind reads. The parameters sit side by
 * side on one flat object: changing a clause's kind keeps every figure the user typed, and
 * only the ones the new kind reads are used (a value is never dropped silently).
 *
 * Kinds:
 * - `limit`: a limit over an assessment period at named receivers (none named: every
 *   receiver) or along a boundary line; L_Aeq,T or rating level L_Ar,T (ISO 1996-1).
 * - `lwa-cap`: each machine's A-weighted sound power level L_WA at most `maxDb`.
 * - `lp-cap`: each machine's sound pressure level at `distanceM` at most `maxDb`, under the
 *   simple method with hemispherical spreading (Q = 2): Lp = L_WA + 10·lg(2/(4π·d²)).
 * - `hours`: work of a character (impulsive, tonal, or any work) of the duties named (none
 *   named: every duty) only between `start` and `end`; checked against each phase's hours.
 * - `share`: at least `minPct` % of the plant electric or battery (the energies named), by
 *   count of units or by machine-hours on site.
 * - `statement`: any other requirement, answered by a statement the user writes.
 */
import type { Candidate } from '../model/model.ts';

export type ClauseKind = 'limit' | 'lwa-cap' | 'lp-cap' | 'hours' | 'share' | 'statement';
export const CLAUSE_KINDS: readonly ClauseKind[] = ['limit', 'lwa-cap', 'lp-cap', 'hours', 'share', 'statement'];

/** Where a limit clause applies. */
export type ClauseArea = 'receivers' | 'boundary';
/** The quantity a limit clause limits: L_Aeq,T, or the rating level L_Ar,T (with the project's character penalty). */
export type ClauseMetric = 'laeq' | 'rating';
/** The character of work an hours clause restricts; `any` restricts all work of the duties named. */
export type ClauseCharacter = 'impulsive' | 'tonal' | 'any';
/** How a share clause counts plant: units, or machine-hours on site (units × days × working hours a day). */
export type ShareBasis = 'count' | 'hours';
export type Energy = Candidate['energy'];

/** A point of a boundary line on the site grid, m. */
export interface SitePoint {
  x: number;
  y: number;
}

export interface Clause {
  id: string;
  /** The tender's clause number or heading, e.g. "7.3.2". */
  ref: string;
  /** The clause as the tender words it. */
  text: string;
  kind: ClauseKind;
  /** limit: at receivers (default) or along a boundary. */
  area?: ClauseArea;
  /** limit at receivers: the receivers named; absent or empty = every receiver. */
  receiverIds?: string[];
  /** limit along a boundary: the line's points in order (a polyline; at least one point). */
  boundary?: SitePoint[];
  /** limit along a boundary: spacing of the assessment points along the line, m (default 5). */
  spacingM?: number;
  /** limit along a boundary: assessment height, m (default 1.5). */
  heightM?: number;
  /** limit: the assessment period the limit is for. */
  periodId?: string;
  /** limit: the limit, dB. */
  limitDb?: number;
  /** limit: L_Aeq,T (default) or rating level. */
  metric?: ClauseMetric;
  /** lwa-cap, lp-cap: the cap, dB. */
  maxDb?: number;
  /** lp-cap: distance of the stated sound pressure level, m (default 10). */
  distanceM?: number;
  /** lwa-cap, lp-cap, hours, share: the duties it covers; absent or empty = every duty. */
  dutyIds?: string[];
  /** hours: the character of work restricted (default impulsive). */
  character?: ClauseCharacter;
  /** hours: allowed from, "HH:MM". */
  start?: string;
  /** hours: allowed until, "HH:MM". */
  end?: string;
  /** share: count of units (default) or machine-hours. */
  basis?: ShareBasis;
  /** share: the least share, %. */
  minPct?: number;
  /** share: the energies that count (default electric and battery). */
  energies?: Energy[];
  /** The contractor's statement: the whole answer for a `statement` clause, a note for others. */
  statement?: string;
}

/** Defaults of the optional parameters. */
export const CLAUSE_DEFAULTS = {
  spacingM: 5,
  heightM: 1.5,
  distanceM: 10,
  metric: 'laeq' as ClauseMetric,
  character: 'impulsive' as ClauseCharacter,
  basis: 'count' as ShareBasis,
  energies: ['electric', 'battery'] as Energy[],
};

/** Words for a clause kind, for tables and messages. */
export const CLAUSE_KIND_WORDS: Record<ClauseKind, string> = {
  limit: 'limit at receivers or a boundary',
  'lwa-cap': 'cap on each machine’s LWA',
  'lp-cap': 'cap on each machine’s level at a distance',
  hours: 'restricted working hours',
  share: 'share of electric plant',
  statement: 'statement',
};
