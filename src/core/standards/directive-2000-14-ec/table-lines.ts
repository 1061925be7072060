/**
 * The lines of the Article 12 table (Directive 2000/14/EC as amended by 2005/88/EC) that
 * several types share: each line's words and its bands of the quantity with the Stage I and
 * Stage II figures (constant + slope·lg quantity, dB re 1 pW).
 */
import type { LimitBand } from './types.ts';

/** A stage's figures: constant + slope·lg(quantity), dB. */
export const c = (constant: number, slope = 0) => ({ constant, slope });

/** Compaction machines line, in net installed power P, kW. */
export const LINE_COMPACTION = 'Compaction machines (vibrating rollers, vibratory plates, vibratory rammers)';
export const COMPACTION: readonly LimitBand[] = [
  { atMost: 8, stageI: c(108), stageII: c(105) },
  { above: 8, atMost: 70, stageI: c(109), stageII: c(106) },
  { above: 70, stageI: c(89, 11), stageII: c(86, 11) },
];
/** Vibratory plates: the same line, with plates of 3 kW or less (Stage II) apart from those above 3 kW (indicative). */
export const PLATES: readonly LimitBand[] = [
  { atMost: 3, stageI: c(108), stageII: c(105) },
  { above: 3, atMost: 8, stageI: c(108), stageII: c(105), stageIIIndicative: true },
  { above: 8, atMost: 70, stageI: c(109), stageII: c(106), stageIIIndicative: true },
  { above: 70, stageI: c(89, 11), stageII: c(86, 11), stageIIIndicative: true },
];
export const LINE_TRACKED = 'Tracked dozers, tracked loaders, tracked excavator-loaders';
export const TRACKED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(106), stageII: c(103) },
  { above: 55, stageI: c(87, 11), stageII: c(84, 11) },
];
/** Steel-tracked loaders: indicative above 55 kW only. */
export const TRACKED_STEEL_LOADER: readonly LimitBand[] = [
  { atMost: 55, stageI: c(106), stageII: c(103) },
  { above: 55, stageI: c(87, 11), stageII: c(84, 11), stageIIIndicative: true },
];
export const LINE_WHEELED =
  'Wheeled dozers, wheeled loaders, wheeled excavator-loaders, dumpers, graders, loader-type landfill compactors, combustion-engine driven counterbalanced lift trucks, mobile cranes, compaction machines (non-vibrating rollers), paver-finishers, hydraulic power packs';
export const WHEELED: readonly LimitBand[] = [
  { atMost: 55, stageI: c(104), stageII: c(101) },
  { above: 55, stageI: c(85, 11), stageII: c(82, 11) },
];
export const LINE_EXCAVATORS =
  'Excavators, builders’ hoists for the transport of goods, construction winches, motor hoes';
export const EXCAVATORS: readonly LimitBand[] = [
  { atMost: 15, stageI: c(96), stageII: c(93) },
  { above: 15, stageI: c(83, 11), stageII: c(80, 11) },
];
export const LINE_BREAKERS = 'Hand-held concrete-breakers and picks';
export const LINE_GENERATORS = 'Welding and power generators';
export const GENERATORS: readonly LimitBand[] = [
  { atMost: 2, stageI: c(97, 1), stageII: c(95, 1) },
  { above: 2, atMost: 10, stageI: c(98, 1), stageII: c(96, 1) },
  { above: 10, stageI: c(97, 1), stageII: c(95, 1) },
];
