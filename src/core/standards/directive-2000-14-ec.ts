/**
 * Directive 2000/14/EC (noise emission in the environment by equipment for use outdoors),
 * checked against the consolidated text of Directive 2000/14/EC incl. its amendment by
 * Directive 2005/88/EC (EUR-Lex consolidated version 02000L0014; the Article 12 list and
 * table, Article 13 list and Annex I definitions).
 *
 * Article 12 equipment must not exceed a permissible guaranteed sound power level; the
 * Stage II levels (from 3 January 2006) are given by the table of Article 12 as formulas in
 * net installed power P (kW), the mass m of hand-held breakers (kg), the electric power Pel
 * of generators (kW) or the cutting width L of mowers (cm). The result is rounded to the
 * nearest whole number (below .5 down, .5 and above up).
 *
 * - Scope: Article 12's list limits some types by power (dozers, dumpers, excavators,
 *   excavator-loaders, graders, loaders, loader-type landfill compactors < 500 kW;
 *   compressors < 350 kW; power generators < 400 kW; motor hoes < 3 kW). Above the limit no
 *   permissible level applies: the machine carries its guaranteed level under Article 13
 *   where that article lists it (power generators ≥ 400 kW), and no limit in any case.
 * - Stage II indicative only (2005/88/EC footnote to the table): walk-behind vibrating
 *   rollers; vibratory plates (> 3 kW); vibratory rammers; dozers (steel tracked); loaders
 *   (steel tracked > 55 kW); combustion-engine driven counterbalanced lift trucks; compacting
 *   screed paver-finishers; hand-held internal combustion engine concrete-breakers and picks
 *   (15 < m < 30 kg); lawnmowers, lawn trimmers/lawn-edge trimmers. For these the Stage I
 *   figures continue to apply, and each row or band below says so.
 * - Item numbers are the directive's own: the Annex I definition each type refers to
 *   (Article 12's list: "Definition: Annex I, item N"), not a numbering of the table's lines.
 *
 * Each row names its source beside it (`source`); what rests on memory of the text rather
 * than a reading of it says "from memory". Article 13 equipment carries a guaranteed level on
 * its marking but has no limit.
 */
import { finite, positive } from '../check.ts';
import { InputError } from '../input-error.ts';

/** The quantity a limit depends on. */
export type LimitQuantity = 'net-power-kw' | 'mass-kg' | 'electric-power-kw' | 'cutting-width-cm';

/** One band of a limit: applies while the quantity is within (above, atMost]. */
export interface LimitBand {
  /** Lower bound, exclusive; undefined = from 0. */
  above?: number;
  /** Upper bound, inclusive; undefined = no upper bound. */
  atMost?: number;
  /** Upper bound is exclusive instead (the breaker row 15 < m < 30). */
  below?: number;
  /** Lower bound, inclusive (the breaker row m ≥ 30). */
  atLeast?: number;
  /** Stage I: constant + slope·lg(quantity), dB. */
  stageI: { constant: number; slope: number };
  /** Stage II: constant + slope·lg(quantity), dB. */
  stageII: { constant: number; slope: number };
  /** This band alone is listed as Stage II indicative only by 2005/88/EC: its Stage I figures apply. */
  stageIIIndicative?: boolean;
}

/** Article 12's power limit on a type: it applies only below `belowKw`. */
export interface ScopeLimit {
  belowKw: number;
  /** The list's words, e.g. "dozers (< 500 kW)". */
  words: string;
  /** Where a machine at or above the limit goes, e.g. "Article 13: marking only". */
  above: string;
}

export interface Article12Type {
  /** Our category word, used on the command line and in project files. */
  category: string;
  /** The directive's own words for the type(s) this category covers. */
  directiveName: string;
  /** Annex I item number(s) of the definition(s) the type refers to (the directive's numbering). */
  annexI: readonly number[];
  /** The line of the Article 12 table whose figures apply, in the table's words. */
  tableLine: string;
  quantity: LimitQuantity;
  bands: readonly LimitBand[];
  /** Stage II listed as indicative only by 2005/88/EC: the Stage I figures apply. */
  stageIIIndicative?: boolean;
  /** Article 12's power limit, when its list sets one. */
  scope?: ScopeLimit;
  /** Where the row comes from, named beside it; "from memory" where that is all it is. */
  source: string;
}

const c = (constant: number, slope = 0) => ({ constant, slope });

/** The consolidated text checked against. */
export const DIRECTIVE_TEXT = 'Directive 2000/14/EC, consolidated text incl. 2005/88/EC';
/** Source of the table's figures (every row). */
const FIGURES = `${DIRECTIVE_TEXT}, Art. 12 table (figures from memory of the table)`;
/** Source of the list of indicative Stage II figures. */
const INDICATIVE = '2005/88/EC footnote to the Art. 12 table: Stage II indicative only, Stage I applies (from memory)';
/** Source of the Annex I item numbers and power limits (Art. 12 list, read). */
const LIST = 'Art. 12 list: Annex I item and power limit';

const NO_LIMIT_ABOVE = 'no permissible level (outside Article 12; from memory, Article 13 lists no such type by power)';
const POWER_500 = (what: string): ScopeLimit => ({ belowKw: 500, words: `${what} (< 500 kW)`, above: NO_LIMIT_ABOVE });

/** Compaction machines line, in net installed power P, kW. */
const LINE_COMPACTION = 'Compaction machines (vibrating rollers, vibratory plates, vibratory rammers)';
const COMPACTION: readonly LimitBand[] = [
  { atMost: 8, stageI: c(108), stageII: c(105) },
  { above: 8, atMost: 70, stageI: c(109), stageII: c(106) },
  { above: 70, stageI: c(89, 11), stageII: c(86, 11) },
];
/** Vibratory plates: the same line, with plates of 3 kW or less (Stage II) apart from those above 3 kW (indicative). */
const PLATES: readonly LimitBand[] = [
  { atMost: 3, stageI: c(108), stageII: c(105) },
  { above: 3, atMost: 8, stageI: c(108), stageII: c(105), stageIIIndicative: true },
  { above: 8, atMost: 70, stageI: c(109), stageII: c(106), stageIIIndicative: true },
  { above: 70, stageI: c(89, 11), stageII: c(86, 11), stageIIIndicative: true },
];
const LINE_TRACKED = 'Tracked dozers, tracked loaders, tracked excavator-loaders';
const TRACKED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(106), stageII: c(103) },
  { above: 55, stageI: c(87, 11), stageII: c(84, 11) },
];
/** Steel-tracked loaders: indicative above 55 kW only. */
const TRACKED_STEEL_LOADER: readonly LimitBand[] = [
  { atMost: 55, stageI: c(106), stageII: c(103) },
  { above: 55, stageI: c(87, 11), stageII: c(84, 11), stageIIIndicative: true },
];
const LINE_WHEELED =
  'Wheeled dozers, wheeled loaders, wheeled excavator-loaders, dumpers, graders, loader-type landfill compactors, combustion-engine driven counterbalanced lift trucks, mobile cranes, compaction machines (non-vibrating rollers), paver-finishers, hydraulic power packs';
const WHEELED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(104), stageII: c(101) },
  { above: 55, stageI: c(85, 11), stageII: c(82, 11) },
];
const LINE_EXCAVATORS = 'Excavators, builders’ hoists for the transport of goods, construction winches, motor hoes';
const EXCAVATORS: readonly LimitBand[] = [
  { atMost: 15, stageI: c(96), stageII: c(93) },
  { above: 15, stageI: c(83, 11), stageII: c(80, 11) },
];
const LINE_BREAKERS = 'Hand-held concrete-breakers and picks';
const LINE_GENERATORS = 'Welding and power generators';
const GENERATORS: readonly LimitBand[] = [
  { atMost: 2, stageI: c(97, 1), stageII: c(95, 1) },
  { above: 2, atMost: 10, stageI: c(98, 1), stageII: c(96, 1) },
  { above: 10, stageI: c(97, 1), stageII: c(95, 1) },
];

/** Article 12 table of Directive 2000/14/EC as amended by 2005/88/EC, one row per category. Levels in dB re 1 pW. */
export const ARTICLE_12_TYPES: readonly Article12Type[] = [
  {
    category: 'vibratory-compactor',
    annexI: [8],
    tableLine: LINE_COMPACTION,
    directiveName:
      'Compaction machines: vibrating rollers other than walk-behind (vibratory plates: vibratory-plate; rammers: vibratory-rammer)',
    quantity: 'net-power-kw',
    bands: COMPACTION,
    source: `${FIGURES}; ${LIST} (item 8)`,
  },
  {
    category: 'walk-behind-vibratory-roller',
    annexI: [8],
    tableLine: LINE_COMPACTION,
    directiveName: 'Walk-behind vibrating rollers (Stage II indicative only)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: COMPACTION,
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 8)`,
  },
  {
    category: 'vibratory-plate',
    annexI: [8],
    tableLine: LINE_COMPACTION,
    directiveName: 'Vibratory plates (3 kW or less: Stage II; above 3 kW: Stage II indicative only)',
    quantity: 'net-power-kw',
    bands: PLATES,
    source: `${FIGURES}; ${INDICATIVE} for plates > 3 kW; ${LIST} (item 8)`,
  },
  {
    category: 'vibratory-rammer',
    annexI: [8],
    tableLine: LINE_COMPACTION,
    directiveName: 'Vibratory rammers (Stage II indicative only)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: COMPACTION,
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 8)`,
  },
  {
    category: 'walk-behind-vibratory-compactor',
    annexI: [8],
    tableLine: LINE_COMPACTION,
    directiveName:
      'Walk-behind vibrating rollers and vibratory rammers (Stage II indicative only); kept for older files — a vibratory plate is vibratory-plate, whose 3 kW and smaller keep Stage II',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: COMPACTION,
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 8)`,
  },
  {
    category: 'non-vibrating-roller',
    annexI: [8],
    tableLine: LINE_WHEELED,
    directiveName: 'Compaction machines (non-vibrating rollers)',
    quantity: 'net-power-kw',
    bands: WHEELED,
    source: `${FIGURES}; ${LIST} (item 8)`,
  },
  {
    category: 'tracked-dozer',
    annexI: [16],
    tableLine: LINE_TRACKED,
    directiveName: 'Dozers (steel tracked; Stage II indicative only)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: TRACKED,
    scope: POWER_500('dozers'),
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 16, < 500 kW)`,
  },
  {
    category: 'rubber-tracked-dozer',
    annexI: [16],
    tableLine: LINE_TRACKED,
    directiveName: 'Tracked dozers on rubber tracks',
    quantity: 'net-power-kw',
    bands: TRACKED,
    scope: POWER_500('dozers'),
    source: `${FIGURES}; ${LIST} (item 16, < 500 kW)`,
  },
  {
    category: 'tracked-loader',
    annexI: [37],
    tableLine: LINE_TRACKED,
    directiveName: 'Loaders (steel tracked; above 55 kW Stage II indicative only)',
    quantity: 'net-power-kw',
    bands: TRACKED_STEEL_LOADER,
    scope: POWER_500('loaders'),
    source: `${FIGURES}; ${INDICATIVE} for > 55 kW; ${LIST} (item 37, < 500 kW)`,
  },
  {
    category: 'rubber-tracked-loader',
    annexI: [37],
    tableLine: LINE_TRACKED,
    directiveName: 'Tracked loaders on rubber tracks',
    quantity: 'net-power-kw',
    bands: TRACKED,
    scope: POWER_500('loaders'),
    source: `${FIGURES}; ${LIST} (item 37, < 500 kW)`,
  },
  {
    category: 'tracked-excavator-loader',
    annexI: [21],
    tableLine: LINE_TRACKED,
    directiveName: 'Tracked excavator-loaders',
    quantity: 'net-power-kw',
    bands: TRACKED,
    scope: POWER_500('excavator-loaders'),
    source: `${FIGURES}; ${LIST} (item 21, < 500 kW)`,
  },
  {
    category: 'wheeled-loader',
    annexI: [16, 37, 21, 23, 31],
    tableLine: LINE_WHEELED,
    directiveName:
      'Wheeled dozers, wheeled loaders, wheeled excavator-loaders, graders, loader-type landfill compactors (each < 500 kW)',
    quantity: 'net-power-kw',
    bands: WHEELED,
    scope: POWER_500('dozers, loaders, excavator-loaders, graders, landfill compactors'),
    source: `${FIGURES}; ${LIST} (items 16, 37, 21, 23, 31, each < 500 kW)`,
  },
  {
    category: 'dumper',
    annexI: [18],
    tableLine: LINE_WHEELED,
    directiveName: 'Dumpers',
    quantity: 'net-power-kw',
    bands: WHEELED,
    scope: POWER_500('dumpers'),
    source: `${FIGURES}; ${LIST} (item 18, < 500 kW)`,
  },
  {
    category: 'lift-truck',
    annexI: [36],
    tableLine: LINE_WHEELED,
    directiveName:
      'Combustion-engine driven counterbalanced lift trucks (Stage II indicative only; “other counterbalanced lift trucks” of 10 t or less: Article 13)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: WHEELED,
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 36)`,
  },
  {
    category: 'mobile-crane',
    annexI: [38],
    tableLine: LINE_WHEELED,
    directiveName: 'Mobile cranes (single-engine ones kept Stage I until 3 January 2008, Stage II since)',
    quantity: 'net-power-kw',
    bands: WHEELED,
    source: `${FIGURES}; table footnote on single-engine mobile cranes (from memory); ${LIST} (item 38)`,
  },
  {
    category: 'paver-finisher',
    annexI: [41],
    tableLine: LINE_WHEELED,
    directiveName:
      'Paver-finishers without a compacting screed (compacting screed: compacting-screed-paver-finisher; high-compaction screed: Article 13)',
    quantity: 'net-power-kw',
    bands: WHEELED,
    source: `${FIGURES}; ${LIST} (item 41)`,
  },
  {
    category: 'compacting-screed-paver-finisher',
    annexI: [41],
    tableLine: LINE_WHEELED,
    directiveName: 'Compacting screed paver-finishers (Stage II indicative only)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: WHEELED,
    source: `${FIGURES}; ${INDICATIVE}; ${LIST} (item 41)`,
  },
  {
    category: 'hydraulic-power-pack',
    annexI: [29],
    tableLine: LINE_WHEELED,
    directiveName: 'Hydraulic power packs',
    quantity: 'net-power-kw',
    bands: WHEELED,
    source: `${FIGURES}; ${LIST} (item 29)`,
  },
  {
    category: 'excavator',
    annexI: [20],
    tableLine: LINE_EXCAVATORS,
    directiveName: 'Excavators, hydraulic or rope-operated (< 500 kW)',
    quantity: 'net-power-kw',
    bands: EXCAVATORS,
    scope: POWER_500('excavators'),
    source: `${FIGURES}; ${LIST} (item 20, < 500 kW)`,
  },
  {
    category: 'builders-hoist',
    annexI: [3],
    tableLine: LINE_EXCAVATORS,
    directiveName: 'Builders’ hoists for the transport of goods (combustion-engine driven; electric: Article 13)',
    quantity: 'net-power-kw',
    bands: EXCAVATORS,
    source: `${FIGURES}; ${LIST} (item 3)`,
  },
  {
    category: 'construction-winch',
    annexI: [12],
    tableLine: LINE_EXCAVATORS,
    directiveName: 'Construction winches (combustion-engine driven; electric: Article 13)',
    quantity: 'net-power-kw',
    bands: EXCAVATORS,
    source: `${FIGURES}; ${LIST} (item 12)`,
  },
  {
    category: 'motor-hoe',
    annexI: [40],
    tableLine: LINE_EXCAVATORS,
    directiveName: 'Motor hoes (< 3 kW)',
    quantity: 'net-power-kw',
    bands: EXCAVATORS,
    scope: { belowKw: 3, words: 'motor hoes (< 3 kW)', above: NO_LIMIT_ABOVE },
    source: `${FIGURES}; ${LIST} (item 40, < 3 kW, from memory)`,
  },
  {
    category: 'hand-held-breaker',
    annexI: [10],
    tableLine: LINE_BREAKERS,
    directiveName:
      'Hand-held concrete-breakers and picks (electric, pneumatic or hydraulic; combustion-engine ones see hand-held-breaker-combustion)',
    quantity: 'mass-kg',
    bands: [
      { atMost: 15, stageI: c(107), stageII: c(105) },
      { above: 15, below: 30, stageI: c(94, 11), stageII: c(92, 11) },
      { atLeast: 30, stageI: c(96, 11), stageII: c(94, 11) },
    ],
    source: `${FIGURES}; ${LIST} (item 10)`,
  },
  {
    category: 'hand-held-breaker-combustion',
    annexI: [10],
    tableLine: LINE_BREAKERS,
    directiveName:
      'Hand-held concrete-breakers and picks with an internal combustion engine (15 < m < 30 kg: Stage II indicative only)',
    quantity: 'mass-kg',
    bands: [
      { atMost: 15, stageI: c(107), stageII: c(105) },
      { above: 15, below: 30, stageI: c(94, 11), stageII: c(92, 11), stageIIIndicative: true },
      { atLeast: 30, stageI: c(96, 11), stageII: c(94, 11) },
    ],
    source: `${FIGURES}; ${INDICATIVE} for 15 < m < 30 kg; ${LIST} (item 10)`,
  },
  {
    category: 'tower-crane',
    annexI: [53],
    tableLine: 'Tower cranes',
    directiveName: 'Tower cranes',
    quantity: 'net-power-kw',
    bands: [{ stageI: c(98, 1), stageII: c(96, 1) }],
    source: `${FIGURES}; ${LIST} (item 53)`,
  },
  {
    category: 'generator',
    annexI: [45],
    tableLine: LINE_GENERATORS,
    directiveName: 'Power generators (< 400 kW; 400 kW or more: Article 13)',
    quantity: 'electric-power-kw',
    bands: GENERATORS,
    scope: {
      belowKw: 400,
      words: 'power generators (< 400 kW)',
      above: 'Article 13: marking only, no permissible level',
    },
    source: `${FIGURES}; ${LIST} (item 45, < 400 kW); Art. 13 list: power generators ≥ 400 kW (from memory)`,
  },
  {
    category: 'welding-generator',
    annexI: [57],
    tableLine: LINE_GENERATORS,
    directiveName: 'Welding generators',
    quantity: 'electric-power-kw',
    bands: GENERATORS,
    source: `${FIGURES}; ${LIST} (item 57, from memory)`,
  },
  {
    category: 'compressor',
    annexI: [9],
    tableLine: 'Compressors',
    directiveName: 'Compressors (< 350 kW)',
    quantity: 'net-power-kw',
    bands: [
      { atMost: 15, stageI: c(99), stageII: c(97) },
      { above: 15, stageI: c(97, 2), stageII: c(95, 2) },
    ],
    scope: { belowKw: 350, words: 'compressors (< 350 kW)', above: NO_LIMIT_ABOVE },
    source: `${FIGURES}; ${LIST} (item 9, < 350 kW)`,
  },
  {
    category: 'lawnmower',
    annexI: [32, 33],
    tableLine: 'Lawnmowers, lawn trimmers/lawn edge trimmers',
    directiveName:
      'Lawnmowers, lawn trimmers/lawn edge trimmers (Stage II indicative only; not agricultural or forestry equipment, nor multi-purpose devices whose main motorised component exceeds 20 kW)',
    quantity: 'cutting-width-cm',
    stageIIIndicative: true,
    bands: [
      { atMost: 50, stageI: c(96), stageII: c(94) },
      { above: 50, atMost: 70, stageI: c(100), stageII: c(98) },
      { above: 70, atMost: 120, stageI: c(100), stageII: c(98) },
      { above: 120, stageI: c(105), stageII: c(103) },
    ],
    // From memory: the table marks the footnote on L ≤ 50, 70 < L ≤ 120 and L > 120 but not on
    // 50 < L ≤ 70, while the footnote's list names lawnmowers without a width; Stage I is applied at every width.
    source: `${FIGURES}; ${INDICATIVE} (lawnmowers named without a width: Stage I at every width); ${LIST} (items 32, 33)`,
  },
];

/** Article 13 types (marking of the guaranteed level only, no limit): our category word, the directive's words and Annex I item. A selection of the list. */
export const ARTICLE_13_TYPES: readonly { category: string; directiveName: string; annexI: number }[] = [
  { category: 'piling-rig', directiveName: 'Piling equipment', annexI: 42 },
  { category: 'drill-rig', directiveName: 'Drill rigs', annexI: 17 },
  { category: 'concrete-mixer', directiveName: 'Concrete or mortar mixers', annexI: 11 },
  { category: 'truck-mixer', directiveName: 'Truck mixers', annexI: 55 },
  { category: 'concrete-pump', directiveName: 'Conveying and spraying machines for concrete and mortar', annexI: 13 },
  { category: 'hydraulic-hammer', directiveName: 'Hydraulic hammers', annexI: 28 },
  { category: 'road-milling-machine', directiveName: 'Road milling machines', annexI: 48 },
  { category: 'trencher', directiveName: 'Trenchers', annexI: 54 },
  { category: 'water-pump', directiveName: 'Water pump units (not for use under water)', annexI: 56 },
  { category: 'saw-bench', directiveName: 'Building site circular saw benches', annexI: 5 },
  { category: 'joint-cutter', directiveName: 'Joint cutters', annexI: 30 },
  { category: 'power-sweeper', directiveName: 'Power sweepers', annexI: 46 },
  { category: 'high-pressure-water-jet', directiveName: 'High pressure water jet machines', annexI: 27 },
  { category: 'shredder-chipper', directiveName: 'Shredders/chippers', annexI: 50 },
  { category: 'large-generator', directiveName: 'Power generators (≥ 400 kW)', annexI: 45 },
  {
    category: 'high-compaction-paver-finisher',
    directiveName: 'Paver-finishers equipped with a high-compaction screed',
    annexI: 41,
  },
  { category: 'explosion-rammer', directiveName: 'Compaction machines (explosion rammers only)', annexI: 8 },
];

/** Words of each quantity for messages and help. */
export const QUANTITY_WORDS: Record<LimitQuantity, { flag: string; words: string; unit: string }> = {
  'net-power-kw': { flag: 'power', words: 'net installed power P', unit: 'kW' },
  'electric-power-kw': { flag: 'power', words: 'electric power Pel', unit: 'kW' },
  'mass-kg': { flag: 'mass', words: 'mass m', unit: 'kg' },
  'cutting-width-cm': { flag: 'width', words: 'cutting width L', unit: 'cm' },
};

/**
 * Rounding rule of the Article 12 table: to the nearest integer, below .5 down, .5 and above up.
 * @example roundPermissible(97.49) // 97; roundPermissible(97.5) // 98
 */
export function roundPermissible(levelDb: number): number {
  return Math.floor(levelDb + 0.5 + 1e-9);
}

/** The slope of a formula as written in the table: "11·" for 11, nothing for 1. */
const slopeText = (slope: number) => (slope === 1 ? '' : `${slope}·`);

/** Finds an Article 12 type by our category word, or undefined. */
export function article12Type(category: string): Article12Type | undefined {
  return ARTICLE_12_TYPES.find((t) => t.category === category);
}

function bandFor(type: Article12Type, quantity: number): LimitBand {
  const band = type.bands.find(
    (b) =>
      (b.above === undefined || quantity > b.above) &&
      (b.atLeast === undefined || quantity >= b.atLeast) &&
      (b.atMost === undefined || quantity <= b.atMost) &&
      (b.below === undefined || quantity < b.below),
  );
  if (!band)
    throw new InputError(QUANTITY_WORDS[type.quantity].flag, quantity, 'is outside the table', 'use a positive value');
  return band;
}

/**
 * Why a machine of an Article 12 type has no permissible level at this quantity because it is
 * at or above the power limit of Article 12's list, in words; undefined inside the scope. O(1).
 * @example outsideScope(article12Type('excavator')!, 520) // "is 500 kW or more, above Article 12's scope (excavators (< 500 kW)): no permissible level (…)"
 */
export function outsideScope(type: Article12Type, quantity: number): string | undefined {
  const scope = type.scope;
  if (!scope || !(quantity >= scope.belowKw)) return undefined;
  return `is ${scope.belowKw} kW or more, above Article 12's scope (${scope.words}): ${scope.above}`;
}

export interface PermissibleLevel {
  /** Permissible guaranteed sound power level LWA, dB re 1 pW, rounded. */
  levelDb: number;
  /** The formula's value before rounding, dB. */
  unroundedDb: number;
  /** The stage whose figures apply. */
  stage: 'II' | 'I (Stage II indicative only)';
  /** The formula in words, e.g. "80 + 11·lg P = 80 + 11·lg 100 = 102.0 → 102". */
  working: string;
  type: Article12Type;
  /** The source of the row, named (see Article12Type.source). */
  source: string;
}

/**
 * Permissible sound power level L_WA (Stage II, or Stage I where Stage II is indicative only)
 * of an Article 12 type for its quantity. Throws for an unknown category (naming the accepted
 * ones), a quantity that is not positive, or one at or above the type's Article 12 power limit.
 * @example permissibleSoundPower('excavator', 100).levelDb // 102
 */
export function permissibleSoundPower(category: string, quantity: number): PermissibleLevel {
  const type = article12Type(category);
  if (!type) {
    const art13 = ARTICLE_13_TYPES.find((t) => t.category === category);
    const problem = art13 ? 'is an Article 13 type (marking only, no permissible level)' : 'is not an Article 12 type';
    throw new InputError('type', category, problem, `use one of ${ARTICLE_12_TYPES.map((t) => t.category).join(', ')}`);
  }
  const words = QUANTITY_WORDS[type.quantity];
  finite(words.flag, quantity, `the ${words.words} in ${words.unit}`);
  positive(words.flag, quantity, `the ${words.words} in ${words.unit}, greater than 0`);
  const outside = outsideScope(type, quantity);
  if (outside)
    throw new InputError(
      words.flag,
      quantity,
      outside,
      `a ${words.words} below ${type.scope!.belowKw} ${words.unit} for a permissible level`,
    );
  const band = bandFor(type, quantity);
  const indicative = type.stageIIIndicative === true || band.stageIIIndicative === true;
  const figures = indicative ? band.stageI : band.stageII;
  const unrounded = figures.constant + figures.slope * Math.log10(quantity);
  const levelDb = roundPermissible(unrounded);
  const symbol = words.words.split(' ').pop() as string;
  const working =
    figures.slope === 0
      ? `${figures.constant} dB (${words.words} ${quantity} ${words.unit})`
      : `${figures.constant} + ${slopeText(figures.slope)}lg ${symbol} = ${figures.constant} + ${slopeText(figures.slope)}lg ${quantity} = ${unrounded.toFixed(2)} → ${levelDb}`;
  return {
    levelDb,
    unroundedDb: unrounded,
    stage: indicative ? 'I (Stage II indicative only)' : 'II',
    working,
    type,
    source: type.source,
  };
}
