/**
 * Directive 2000/14/EC (noise emission in the environment by equipment for use outdoors),
 * as amended by Directive 2005/88/EC.
 *
 * Article 12 equipment must not exceed a permissible guaranteed sound power level; the
 * Stage II levels (from 3 January 2006) are given by the table of Article 12 as formulas in
 * net installed power P (kW), the mass m of hand-held breakers (kg), the electric power Pel
 * of generators (kW) or the cutting width L of mowers (cm). The result is rounded to the
 * nearest whole number (below .5 down, .5 and above up). For the types 2005/88/EC lists as
 * "indicative only" at Stage II, the Stage I figures continue to apply; for hand-held
 * internal-combustion-engine concrete-breakers and picks that holds only for 15 < m < 30 kg.
 * Article 13 equipment carries a guaranteed level on its marking but has no limit.
 *
 * The table is data (below); each row's figures are from the Article 12 table.
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

export interface Article12Type {
  /** Our category word, used on the command line and in project files. */
  category: string;
  /** The directive's own words for the type(s). */
  directiveName: string;
  /** Item number of the Article 12 table. */
  item: number;
  quantity: LimitQuantity;
  bands: readonly LimitBand[];
  /** Stage II listed as indicative only by 2005/88/EC: the Stage I figures apply. */
  stageIIIndicative?: boolean;
}

const c = (constant: number, slope = 0) => ({ constant, slope });

/** Item 1 (compaction machines), in net installed power P, kW. */
const ITEM_1_COMPACTION: readonly LimitBand[] = [
  { atMost: 8, stageI: c(108), stageII: c(105) },
  { above: 8, atMost: 70, stageI: c(109), stageII: c(106) },
  { above: 70, stageI: c(89, 11), stageII: c(86, 11) },
];
/** Item 2 (tracked dozers, loaders, excavator-loaders), in P, kW. */
const ITEM_2_TRACKED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(106), stageII: c(103) },
  { above: 55, stageI: c(87, 11), stageII: c(84, 11) },
];
/** Item 3 (wheeled dozers and loaders, dumpers, graders, mobile cranes, paver-finishers, hydraulic power packs…), in P, kW. */
const ITEM_3_WHEELED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(104), stageII: c(101) },
  { above: 55, stageI: c(85, 11), stageII: c(82, 11) },
];
/** Item 4 (excavators, builders' hoists, construction winches, motor hoes), in P, kW. */
const ITEM_4_EXCAVATORS: readonly LimitBand[] = [
  { atMost: 15, stageI: c(96), stageII: c(93) },
  { above: 15, stageI: c(83, 11), stageII: c(80, 11) },
];

/** Article 12 table of Directive 2000/14/EC as amended by 2005/88/EC. Levels in dB re 1 pW. */
export const ARTICLE_12_TYPES: readonly Article12Type[] = [
  {
    category: 'vibratory-compactor',
    item: 1,
    directiveName: 'Compaction machines (vibrating rollers, vibratory plates, vibratory rammers)',
    quantity: 'net-power-kw',
    bands: ITEM_1_COMPACTION,
  },
  {
    category: 'walk-behind-vibratory-compactor',
    item: 1,
    directiveName:
      'Walk-behind vibrating rollers, vibratory plates (> 3 kW), vibratory rammers (Stage II indicative only)',
    quantity: 'net-power-kw',
    stageIIIndicative: true,
    bands: ITEM_1_COMPACTION,
  },
  {
    category: 'tracked-loader',
    item: 2,
    directiveName: 'Tracked dozers, tracked loaders, tracked excavator-loaders',
    quantity: 'net-power-kw',
    bands: ITEM_2_TRACKED,
  },
  {
    category: 'tracked-dozer',
    item: 2,
    directiveName: 'Tracked dozers',
    quantity: 'net-power-kw',
    bands: ITEM_2_TRACKED,
  },
  {
    category: 'wheeled-loader',
    item: 3,
    directiveName:
      'Wheeled dozers, wheeled loaders, wheeled excavator-loaders, dumpers, graders, loader-type landfill compactors, combustion-engine counterbalanced lift trucks, mobile cranes, non-vibrating rollers, paver-finishers, hydraulic power packs',
    quantity: 'net-power-kw',
    bands: ITEM_3_WHEELED,
  },
  { category: 'dumper', item: 3, directiveName: 'Dumpers', quantity: 'net-power-kw', bands: ITEM_3_WHEELED },
  {
    category: 'mobile-crane',
    item: 3,
    directiveName: 'Mobile cranes',
    quantity: 'net-power-kw',
    bands: ITEM_3_WHEELED,
  },
  {
    category: 'paver-finisher',
    item: 3,
    directiveName: 'Paver-finishers',
    quantity: 'net-power-kw',
    bands: ITEM_3_WHEELED,
  },
  {
    category: 'hydraulic-power-pack',
    item: 3,
    directiveName: 'Hydraulic power packs',
    quantity: 'net-power-kw',
    bands: ITEM_3_WHEELED,
  },
  {
    category: 'excavator',
    item: 4,
    directiveName: 'Excavators, builders’ hoists for the transport of goods, construction winches, motor hoes',
    quantity: 'net-power-kw',
    bands: ITEM_4_EXCAVATORS,
  },
  {
    category: 'builders-hoist',
    item: 4,
    directiveName: 'Builders’ hoists for the transport of goods (combustion engine driven)',
    quantity: 'net-power-kw',
    bands: ITEM_4_EXCAVATORS,
  },
  {
    category: 'hand-held-breaker',
    item: 5,
    directiveName:
      'Hand-held concrete-breakers and picks (electric, pneumatic or hydraulic; combustion-engine ones see hand-held-breaker-combustion)',
    quantity: 'mass-kg',
    bands: [
      { atMost: 15, stageI: c(107), stageII: c(105) },
      { above: 15, below: 30, stageI: c(94, 11), stageII: c(92, 11) },
      { atLeast: 30, stageI: c(96, 11), stageII: c(94, 11) },
    ],
  },
  {
    category: 'hand-held-breaker-combustion',
    item: 5,
    directiveName:
      'Hand-held concrete-breakers and picks with an internal combustion engine (15 < m < 30 kg: Stage II indicative only)',
    quantity: 'mass-kg',
    bands: [
      { atMost: 15, stageI: c(107), stageII: c(105) },
      { above: 15, below: 30, stageI: c(94, 11), stageII: c(92, 11), stageIIIndicative: true },
      { atLeast: 30, stageI: c(96, 11), stageII: c(94, 11) },
    ],
  },
  {
    category: 'tower-crane',
    item: 6,
    directiveName: 'Tower cranes',
    quantity: 'net-power-kw',
    bands: [{ stageI: c(98, 1), stageII: c(96, 1) }],
  },
  {
    category: 'generator',
    item: 7,
    directiveName: 'Welding and power generators',
    quantity: 'electric-power-kw',
    bands: [
      { atMost: 2, stageI: c(97, 1), stageII: c(95, 1) },
      { above: 2, atMost: 10, stageI: c(98, 1), stageII: c(96, 1) },
      { above: 10, stageI: c(97, 1), stageII: c(95, 1) },
    ],
  },
  {
    category: 'compressor',
    item: 8,
    directiveName: 'Compressors',
    quantity: 'net-power-kw',
    bands: [
      { atMost: 15, stageI: c(99), stageII: c(97) },
      { above: 15, stageI: c(97, 2), stageII: c(95, 2) },
    ],
  },
  {
    category: 'lawnmower',
    item: 9,
    directiveName: 'Lawnmowers, lawn trimmers/lawn edge trimmers (Stage II indicative only)',
    quantity: 'cutting-width-cm',
    stageIIIndicative: true,
    bands: [
      { atMost: 50, stageI: c(96), stageII: c(94) },
      { above: 50, atMost: 70, stageI: c(100), stageII: c(98) },
      { above: 70, atMost: 120, stageI: c(100), stageII: c(98) },
      { above: 120, stageI: c(105), stageII: c(103) },
    ],
  },
];

/** Article 13 types (marking of the guaranteed level only, no limit): our category word and the directive's words. A selection of the list. */
export const ARTICLE_13_TYPES: readonly { category: string; directiveName: string }[] = [
  { category: 'piling-rig', directiveName: 'Piling equipment' },
  { category: 'drill-rig', directiveName: 'Drill rigs' },
  { category: 'concrete-mixer', directiveName: 'Concrete or mortar mixers' },
  { category: 'truck-mixer', directiveName: 'Truck mixers' },
  { category: 'concrete-pump', directiveName: 'Conveying and spraying machines for concrete and mortar' },
  { category: 'hydraulic-hammer', directiveName: 'Hydraulic hammers' },
  { category: 'road-milling-machine', directiveName: 'Road milling machines' },
  { category: 'trencher', directiveName: 'Trenchers' },
  { category: 'water-pump', directiveName: 'Water pump units (not for use under water)' },
  { category: 'saw-bench', directiveName: 'Building site circular saw benches' },
  { category: 'joint-cutter', directiveName: 'Joint cutters' },
  { category: 'power-sweeper', directiveName: 'Power sweepers' },
  { category: 'high-pressure-water-jet', directiveName: 'High pressure water jet machines' },
  { category: 'shredder-chipper', directiveName: 'Shredders/chippers' },
  { category: 'large-generator', directiveName: 'Power generators (≥ 400 kW)' },
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
}

/**
 * Permissible sound power level L_WA (Stage II) of an Article 12 type for its quantity.
 * Throws for an unknown category (naming the accepted ones) or a quantity that is not positive.
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
  return { levelDb, unroundedDb: unrounded, stage: indicative ? 'I (Stage II indicative only)' : 'II', working, type };
}
