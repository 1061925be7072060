/**
 * ISO 9613-2:1996 clause 9 and Table 5 — the accuracy the standard states for its method,
 * and the paths for which it states none.
 *
 * Table 5 (broadband A-weighted levels, downwind, no reflection or screening):
 *
 * | mean height h = (h_s + h_r)/2 | d < 100 m | 100 m < d < 1 000 m |
 * |-------------------------------|-----------|---------------------|
 * | 0 < h < 5 m                   | ±3 dB     | ±3 dB               |
 * | 5 m < h < 30 m                | ±1 dB     | ±3 dB               |
 *
 * Nothing is stated for d of 1 km or more, h above 30 m, or paths with screening or
 * reflections; the atmosphere's own range is ISO 9613-1:1993's (see absorptionAccuracyNote).
 */
import { absorptionAccuracyNote, REFERENCE_PRESSURE_KPA } from '../iso9613-1-1993.ts';

/** Largest distance Table 5 covers, m. */
export const ACCURACY_MAX_DISTANCE_M = 1000;
/** Largest mean height Table 5 covers, m. */
export const ACCURACY_MAX_MEAN_HEIGHT_M = 30;

export interface AccuracyInput {
  distanceM: number;
  sourceHeightM: number;
  receiverHeightM: number;
  /** The path is screened (a barrier, a rule of thumb or a stated reduction). */
  screened?: boolean;
  /** A reflection is counted on the path (e.g. the receiver 1 m in front of a façade). */
  reflected?: boolean;
  temperatureC: number;
  humidityPct: number;
  pressureKPa?: number;
}

export interface Accuracy {
  /** ± dB that Table 5 states for the path; undefined when it states none. */
  statedDb?: number;
  /** Plain sentences to show beside the figure: the stated accuracy, or why none is stated. */
  notes: string[];
}

/**
 * The ± accuracy ISO 9613-2:1996 Table 5 states for a path, dB, or undefined where it states
 * none (d of 1 km or more, mean height above 30 m, a screened or reflected path). The one
 * reading of Table 5 in the program. O(1).
 * @example table5AccuracyDb({ distanceM: 50, meanHeightM: 10 }) // 1
 */
export function table5AccuracyDb(path: {
  distanceM: number;
  meanHeightM: number;
  screened?: boolean;
  reflected?: boolean;
}): number | undefined {
  const { distanceM: d, meanHeightM: h } = path;
  if (!(d > 0) || d >= ACCURACY_MAX_DISTANCE_M || !(h >= 0) || h > ACCURACY_MAX_MEAN_HEIGHT_M) return undefined;
  if (path.screened || path.reflected) return undefined;
  return h > 5 && d < 100 ? 1 : 3;
}

/**
 * The accuracy ISO 9613-2:1996 Table 5 states for a path, or the reasons it states none,
 * plus an ISO 9613-1:1993 note when the atmosphere lies outside its stated range. O(1).
 * @example pathAccuracy({ distanceM: 200, sourceHeightM: 1.5, receiverHeightM: 4, temperatureC: 10, humidityPct: 70 }).statedDb // 3
 * @example pathAccuracy({ distanceM: 1500, … }).notes[0] // "Distance 1500 m is 1 km or more: …"
 */
export function pathAccuracy(input: AccuracyInput): Accuracy {
  const notes: string[] = [];
  const d = input.distanceM;
  const h = (input.sourceHeightM + input.receiverHeightM) / 2;
  if (d >= ACCURACY_MAX_DISTANCE_M)
    notes.push(`Distance ${fmt(d)} m is 1 km or more: ISO 9613-2:1996 Table 5 states no accuracy beyond 1 km.`);
  if (h > ACCURACY_MAX_MEAN_HEIGHT_M)
    notes.push(
      `Mean height (h_s + h_r)/2 = ${fmt(h)} m is above 30 m: ISO 9613-2:1996 Table 5 states no accuracy there.`,
    );
  if (input.screened) notes.push('Screened path: the accuracy of ISO 9613-2:1996 Table 5 excludes screening.');
  if (input.reflected)
    notes.push('Reflection counted (façade): the accuracy of ISO 9613-2:1996 Table 5 excludes reflections.');
  const atmosphere = absorptionAccuracyNote(
    input.temperatureC,
    input.humidityPct,
    input.pressureKPa ?? REFERENCE_PRESSURE_KPA,
  );
  const outside = notes.length > 0;
  if (atmosphere) notes.push(atmosphere);
  if (outside) return { notes };
  const statedDb = table5AccuracyDb({ distanceM: d, meanHeightM: h }) ?? 3;
  notes.unshift(
    `ISO 9613-2:1996 Table 5 states ±${statedDb} dB for this path (mean height ${fmt(h)} m, distance ${fmt(d)} m, broadband A-weighted, downwind).`,
  );
  return { statedDb, notes };
}

const fmt = (x: number) => Number(x.toFixed(1)).toString();
