/**
 * The ledger's data model: the types of a project file (format version 10).
 *
 * A project is a set of duties (jobs that each need one machine choice), the candidate
 * machines offered for each duty, the phases of the works the duties fall in, and the
 * receivers (homes, schools, hospitals…) whose limits the fleet must meet.
 *
 * Conventions: levels in dB, distances and heights in metres, positions on a local site
 * grid (x east, y north, metres), money in the project's currency, durations of a duty in
 * days, times of day as "HH:MM". Identifiers are short strings unique within their list.
 * Plain JSON only (no Dates, Maps or classes) so a project round-trips through a file,
 * IndexedDB and a worker unchanged.
 */
import type { Clause } from '../clauses/clause.ts';

export type { Clause } from '../clauses/clause.ts';

import type { Barrier, LineLocation, PolygonLocation, SitePlan } from './plan-model.ts';

export type {
  AreaDistanceBy,
  Barrier,
  LineLocation,
  PlanImage,
  PolygonLocation,
  SitePlan,
  SitePoint,
} from './plan-model.ts';

/** The `format` field of every project file. */
export const PROJECT_FORMAT = 'plant-noise-ledger/project';
/** The project file version this code writes. Older versions are upgraded on reading. */
export const PROJECT_VERSION = 10;

/** Nominal octave-band centre frequencies, Hz, in the order every band array uses. */
export const OCTAVE_BANDS_HZ = [63, 125, 250, 500, 1000, 2000, 4000, 8000] as const;

export type ReceiverKind = 'home' | 'school' | 'hospital' | 'office' | 'other';
export const RECEIVER_KINDS: readonly ReceiverKind[] = ['home', 'school', 'hospital', 'office', 'other'];

/** Directivity factor Q of a point source: 1 free field, 2 on hard ground, 4 ground and a wall, 8 a corner. */
export type Directivity = 1 | 2 | 4 | 8;

/**
 * How sound travels from a duty's location to a receiver.
 * - `simple`: point source, Lp = Lw + 10·lg(Q/(4πr²)).
 * - `iso9613-2:1996`: ISO 9613-2:1996 outdoor propagation with the atmosphere and ground
 *   given here; `groundMethod` chooses the general method (clause 7.3.1: octave bands for
 *   machines with octave-band Lw, its terms at 500 Hz for machines known only by LWA) or
 *   the alternative A-weighted method (clause 7.3.2, eq. 10 with D_Ω, meant for ground that
 *   is mostly porous). Screening is D_z, replacing the ground effect (A_bar = D_z − A_gr, eq. 12).
 */
export type Propagation =
  | { method: 'simple'; q: Directivity }
  | {
      method: 'iso9613-2:1996';
      temperatureC: number;
      humidityPct: number;
      pressureKPa: number;
      /** Ground factor G, 0 hard … 1 porous, for source, middle and receiver regions alike. */
      groundFactor: number;
      /** Ground method: 'general' (clause 7.3.1; the default) or 'alternative' (clause 7.3.2). */
      groundMethod: 'general' | 'alternative';
      /** Height of the sources above ground, m, unless a duty gives its own. */
      sourceHeightM: number;
      /**
       * C0 of the meteorological correction, dB, 0 to 5 (0 for downwind, short-term predictions):
       * per path C_met = 0 for d_p ≤ 10(h_s + h_r), else C0·[1 − 10(h_s + h_r)/d_p] (eqs 21, 22).
       * Versions 1 to 7 held one flat `cmetDb` for every path instead.
       */
      c0Db: number;
    };

/** A period over which a limit applies, e.g. weekday daytime 07:00–19:00 (LAeq,T with T its length). */
export interface AssessmentPeriod {
  id: string;
  name: string;
  /** "HH:MM" */
  start: string;
  /** "HH:MM", different from start; an end earlier than the start runs past midnight (23:00–07:00 is 8 h). */
  end: string;
}

/**
 * A stage of the works. Its duties are those whose `phaseId` names it. The phase total at a
 * receiver is the energetic sum of its duties' contributions during working hours, spread
 * over the assessment period: + 10·lg(working hours inside the period / period length).
 * The phase is assessed in its own period for the hours inside it, and in every other
 * period its remaining working hours fall in (./phase-periods.ts); hours in no period are
 * named in a note.
 */
export interface Phase {
  id: string;
  name: string;
  /** The phase's own period: its contributions and rankings are given in it. */
  periodId: string;
  /** Working hours, "HH:MM"; an end earlier than the start runs past midnight (night works 23:00–03:00). */
  start: string;
  end: string;
}

/** How a receiver is screened from one duty. Rule-of-thumb values are common practice. */
export type Screening =
  | { kind: 'none' }
  /** A hoarding or bund leaves only the machine's top in sight: −5 dB (rule of thumb, core/screening-words.ts). */
  | { kind: 'top-visible' }
  /** The machine wholly out of sight: −10 dB (rule of thumb). */
  | { kind: 'hidden' }
  /** An explicit reduction, dB (positive number = reduction). */
  | { kind: 'explicit'; db: number }
  /** A barrier described by its path difference z, m (ISO 9613-2:1996 method only). */
  | { kind: 'barrier'; pathDifferenceM: number };

export interface Receiver {
  id: string;
  name: string;
  kind: ReceiverKind;
  x: number;
  y: number;
  /** Assessment height above ground, m. */
  heightM: number;
  /** Assessed 1 m in front of a façade: +3 dB. */
  facade: boolean;
  /** Limit LAeq,T in dB for each assessment period id. A period without a limit is not assessed. */
  limitsDb: Record<string, number>;
  /** Existing ambient level, dB LAeq,T, when known (information; it is not added to predictions). */
  ambientDb?: number;
  /** Screening per duty id; a duty not listed is unscreened. */
  screening: Record<string, Screening>;
}

/**
 * Where a duty's machines work: a point on the site grid, a distance to each receiver, or
 * (version 7) a line or an area on the site grid with the way its distance is taken.
 */
export type DutyLocation =
  | { kind: 'point'; x: number; y: number }
  | { kind: 'distances'; distancesM: Record<string, number> }
  | LineLocation
  | PolygonLocation;

export interface Duty {
  id: string;
  name: string;
  phaseId: string;
  /** Number of identical units working on the duty (whole number ≥ 1). */
  count: number;
  /** Share of the phase's working hours a unit runs at full power, % (0 < on-time ≤ 100). */
  onTimePct: number;
  /** How long the duty needs the machines, days (hire and running costs are charged for these). */
  durationDays: number;
  location: DutyLocation;
  /** Source height, m; when absent the project's propagation setting (or 1.5 m) applies. */
  sourceHeightM?: number;
  /** The candidate that would be used anyway; reductions and extra costs are measured from it. */
  baselineCandidateId: string;
  /**
   * The lowest and highest on-time the duty could really run at, % (for how sure compliance
   * is; the levels use `onTimePct`; version 6). Absent: the on-time is taken as known.
   */
  onTimeRangePct?: OnTimeRange;
}

/** A range of on-time, %: 0 < low ≤ high ≤ 100. */
export interface OnTimeRange {
  lowPct: number;
  highPct: number;
}

/** How a candidate's sound power was obtained. */
export type LwaOrigin =
  /** As declared on the marking or data sheet. */
  | 'declared'
  /** Converted from a sound power in watts. */
  | 'from-watts'
  /** Back-calculated from a sound pressure level at a stated distance. */
  | 'from-pressure'
  /** No declared value: the Directive 2000/14/EC permissible level stands in (conservative). */
  | 'permissible-stand-in';

/**
 * ISO 4871 declaration: `guaranteed` is a single declared value Ld = L + K (what the
 * Directive 2000/14/EC marking shows); `measured` is the pair (L, K).
 */
export type DeclarationKind = 'guaranteed' | 'measured';

export type CandidateCost =
  | {
      kind: 'hire';
      /** Rate per day, per unit. */
      dayRate: number;
      /** Rate per week (7 days), per unit, when offered. */
      weekRate?: number;
      /** Rate per month (28 days), per unit, when offered. */
      monthRate?: number;
    }
  | {
      kind: 'purchase';
      /** Price per unit. */
      price: number;
      /** Working life, days; the price less resale is spread evenly over it. */
      lifeDays: number;
      /** Value at the end of the life, per unit. */
      resaleValue: number;
    };

/** Category words for Directive 2000/14/EC equipment types (see core/standards/directive-2000-14-ec/). */
export type DirectiveCategory = string;

export interface Candidate {
  id: string;
  dutyId: string;
  label: string;
  /** Free text for the user's grouping (e.g. "excavator 20 t"). */
  category: string;
  /** Directive 2000/14/EC equipment type, when the machine falls under it. */
  directiveCategory?: DirectiveCategory;
  /** Net installed power, kW. */
  netPowerKw?: number;
  /** Quantity other than power a directive limit depends on: breaker mass kg, mower cutting width cm, generator electric power kW. */
  directiveQuantity?: number;
  /** Declared A-weighted sound power level LWA, dB. Absent when unknown (a stand-in may apply). */
  lwaDb?: number;
  declaration: DeclarationKind;
  /** Uncertainty K, dB (ISO 4871), for a `measured` declaration. */
  uncertaintyDb?: number;
  lwaOrigin: LwaOrigin;
  /** Octave-band sound power Lw, dB (unweighted), 63 Hz … 8 kHz, when known. */
  bandsDb?: number[];
  /** Emission sound pressure level at the operator's position LpA, dB. */
  operatorLpaDb?: number;
  /** Hours a day the operator is exposed. */
  operatorHoursPerDay?: number;
  /** Tonal or impulsive character draws the project's character penalty. */
  character: 'none' | 'tonal' | 'impulsive';
  energy: 'diesel' | 'petrol' | 'electric' | 'battery' | 'hybrid' | 'other';
  /** Where the data came from (data sheet, marking, supplier's list…). */
  source: string;
  /** The cost basis in use and its figures: the only figures any cost is computed from. */
  cost: CandidateCost;
  /**
   * The other basis's figures, as last typed, kept when the basis was switched (version 9), so
   * switching back restores them; never used in a cost. Absent when the other basis was never filled in.
   */
  setAsideCost?: CandidateCost;
  /** Fuel or energy per day, per unit. */
  runningPerDay: number;
  /** Delivery, collection and other one-off charges, per unit. */
  fixedCharges: number;
  /** The optimiser must choose this candidate for its duty. */
  pinned?: boolean;
  /** The optimiser must not choose this candidate. */
  excluded?: boolean;
  /**
   * The buyer's register machine this candidate was copied from (added in version 2). The copy
   * is the candidate's own: a register change never reaches it unless the user asks.
   */
  registerLink?: RegisterLink;
}

/** Which register machine a candidate was copied from, and on which cost basis. */
export interface RegisterLink {
  /** The machine's id in the register. */
  machineId: string;
  /** The cost basis the machine was copied on. */
  basis: 'hire' | 'purchase';
}

export interface ProjectSettings {
  /** Distance of the reference receiver used when no site exists, m (hemispherical spreading, Q = 2). */
  referenceDistanceM: number;
  /** Penalty for tonal or impulsive candidates at receivers, dB. */
  characterPenaltyDb: 0 | 3 | 6;
  /** Rank and optimise on the guaranteed value (L + K, default) or on the measured L. */
  levelBasis: 'guaranteed' | 'measured';
  /** Decimal separator expected in typed and pasted numbers. */
  decimalSeparator: '.' | ',';
}

/**
 * The spreads assumed when asking how sure compliance is (./uncertainty/). Every value is a
 * setting; absent fields take the defaults of ./uncertainty/settings.ts.
 */
export interface UncertaintySettings {
  /** K assumed for a machine that declares none, dB (this model only; the levels are unchanged). */
  defaultKDb: number;
  /** K = f·σ: how many standard deviations the declared uncertainty K stands for (1.645, from memory of ISO 4871). */
  kPerStandardDeviation: number;
  /** Accuracy of the simple point-source method, ± dB. */
  simpleMethodAccuracyDb: number;
  /** Accuracy of an ISO 9613-2:1996 path for which its Table 5 states none, ± dB. */
  unstatedAccuracyDb: number;
  /** A stated ± accuracy stands for this many standard deviations (2: about 95 % of predictions within it). */
  accuracyPerStandardDeviation: number;
  /** Monte Carlo draws. */
  draws: number;
  /** Seed of the random stream, so a result can be reproduced. */
  seed: number;
}

export interface Project {
  format: typeof PROJECT_FORMAT;
  version: typeof PROJECT_VERSION;
  name: string;
  /** ISO 4217 currency code, e.g. "GBP", "EUR". */
  currency: string;
  propagation: Propagation;
  settings: ProjectSettings;
  periods: AssessmentPeriod[];
  phases: Phase[];
  receivers: Receiver[];
  duties: Duty[];
  candidates: Candidate[];
  /** The tender's noise clauses the contractor answers (version 5 on; see ./clauses/clause.ts). */
  clauses?: Clause[];
  notes?: string;
  /**
   * Named fleets kept with the project (version 3): the optimiser's latest result and fleets
   * the user made. The baseline fleet is never stored; it is the duties' baselines.
   */
  fleets?: NamedFleet[];
  /** Name of the fleet the matrix, report and workbook assess; absent means the baseline. */
  assessedFleet?: string;
  /** The spreads assumed for the probability of compliance (version 6); absent fields take the defaults. */
  uncertainty?: Partial<UncertaintySettings>;
  /** Barriers on the site grid (version 7); each screens the paths whose line of sight it cuts. */
  barriers?: Barrier[];
  /** The drawing under the site plan, with its scale, origin and north (version 7). */
  sitePlan?: SitePlan;
  /**
   * Text typed into a cell that could not be read, kept exactly as typed, keyed
   * "<list>/<id>/<field>" (e.g. "candidates/c12/lwaDb"). While an entry exists the numeric
   * field holds NaN (null in a JSON file) and every result depending on it is not computed.
   */
  unreadCells?: Record<string, string>;
}

/** A fleet: the chosen candidate id for every duty id. */
export type Fleet = Record<string, string>;

/** A fleet kept in the project under a name. */
export interface NamedFleet {
  /** Unique in the project, compared without regard to case; never "baseline" or "best". */
  name: string;
  /** The chosen candidate per duty id; a duty left out uses its baseline. */
  choice: Fleet;
  /** Who made it: the optimiser, or the user. */
  origin: 'optimiser' | 'user';
  /**
   * For the optimiser's fleet: a fingerprint of the inputs it was found for
   * (ledger/model/fleets.ts `inputsFingerprint`), so a later edit marks it out of date.
   */
  foundFor?: string;
  /** For the optimiser's fleet: the budget it was found within, when one was given. */
  budget?: number;
}

/** The id that names the reference receiver in results and rankings. */
export const REFERENCE_RECEIVER_ID = '@reference';
