/**
 * ISO 9613-1:1993 Acoustics — Attenuation of sound during propagation outdoors —
 * Part 1: Calculation of the absorption of sound by the atmosphere.
 *
 * Pure-tone atmospheric absorption coefficient α in dB/km from the relaxation frequencies of
 * oxygen and nitrogen (eqs 3–5) and the molar concentration of water vapour (Annex B).
 * Scope used here: temperature −20 °C … +50 °C and relative humidity 10 % … 100 %
 * (the range of the standard's Table 1), pressure above 0 and up to 200 kPa (the standard
 * states its accuracy for p < 200 kPa), frequency 50 Hz … 10 kHz.
 */
import { finite, inRange } from '../check.ts';
import { InputError } from '../input-error.ts';
import { OCTAVE_BANDS_NOMINAL_HZ } from '../octave-bands.ts';

/** Reference ambient atmospheric pressure p_r, kPa (clause 3). */
export const REFERENCE_PRESSURE_KPA = 101.325;
/** Reference air temperature T0, K (293.15 K = 20 °C). */
export const REFERENCE_TEMPERATURE_K = 293.15;
/** Triple-point isotherm temperature T01, K (Annex B). */
export const TRIPLE_POINT_K = 273.16;

export const TEMPERATURE_RANGE_C = [-20, 50] as const;
export const HUMIDITY_RANGE_PCT = [10, 100] as const;
export const PRESSURE_MAX_KPA = 200;
export const FREQUENCY_RANGE_HZ = [50, 10000] as const;

/** Checks temperature, humidity and pressure against the range ISO 9613-1:1993 covers here. */
export function checkAtmosphere(temperatureC: number, humidityPct: number, pressureKPa: number): void {
  inRange(
    'temperature',
    temperatureC,
    TEMPERATURE_RANGE_C[0],
    TEMPERATURE_RANGE_C[1],
    'a temperature from -20 to 50 °C, the range ISO 9613-1:1993 covers',
  );
  inRange(
    'humidity',
    humidityPct,
    HUMIDITY_RANGE_PCT[0],
    HUMIDITY_RANGE_PCT[1],
    'a relative humidity from 10 to 100 %, the range ISO 9613-1:1993 covers',
  );
  finite('pressure', pressureKPa, 'an atmospheric pressure in kPa above 0 and up to 200, e.g. 101.325');
  if (pressureKPa <= 0 || pressureKPa > PRESSURE_MAX_KPA) {
    throw new InputError(
      'pressure',
      pressureKPa,
      'is out of range',
      'use an atmospheric pressure in kPa above 0 and up to 200, e.g. 101.325',
    );
  }
}

/**
 * Exact mid-band frequencies of the eight octave bands 63 Hz … 8 kHz, Hz:
 * f_m = 1000·10^(0.3k), k = −4 … 3 (IEC 61260 base-ten system).
 */
const EXACT_MID_BAND_HZ: readonly number[] = Object.freeze(
  OCTAVE_BANDS_NOMINAL_HZ.map((_f, index) => 1000 * 10 ** (0.3 * (index - 4))),
);

/**
 * Exact mid-band frequency of an octave band, Hz: f_m = 1000·10^(0.3k) with k the band index
 * (k = 0 at 1 kHz), IEC 61260 base-ten system. ISO 9613-2:1996 Table 2 is computed at these.
 * @example exactMidBandFrequencyHz(8000) // 7943.28
 */
export function exactMidBandFrequencyHz(nominalHz: number): number {
  const index = (OCTAVE_BANDS_NOMINAL_HZ as readonly number[]).indexOf(nominalHz);
  if (index < 0) {
    throw new InputError(
      'nominal frequency',
      nominalHz,
      'is not an octave band',
      `use one of ${OCTAVE_BANDS_NOMINAL_HZ.join(', ')} Hz`,
    );
  }
  return EXACT_MID_BAND_HZ[index] as number;
}

/** h of {@link waterVapourMolarConcentrationPct} for inputs already checked. */
function waterVapourUnchecked(temperatureC: number, humidityPct: number, pressureKPa: number): number {
  const t = temperatureC + 273.15;
  const c = -6.8346 * (TRIPLE_POINT_K / t) ** 1.261 + 4.6151;
  return (humidityPct * 10 ** c) / (pressureKPa / REFERENCE_PRESSURE_KPA);
}

/**
 * Molar concentration of water vapour h, % (Annex B, eqs B.1–B.3):
 * h = h_r·(p_sat/p_r)/(p_a/p_r), p_sat/p_r = 10^C, C = −6.8346·(T01/T)^1.261 + 4.6151.
 */
export function waterVapourMolarConcentrationPct(
  temperatureC: number,
  humidityPct: number,
  pressureKPa = REFERENCE_PRESSURE_KPA,
): number {
  checkAtmosphere(temperatureC, humidityPct, pressureKPa);
  return waterVapourUnchecked(temperatureC, humidityPct, pressureKPa);
}

/** α of {@link atmosphericAbsorptionDbPerKm}, dB/km, for inputs already checked. */
function absorptionUnchecked(
  frequencyHz: number,
  temperatureC: number,
  humidityPct: number,
  pressureKPa: number,
): number {
  const h = waterVapourUnchecked(temperatureC, humidityPct, pressureKPa);
  const pRatio = pressureKPa / REFERENCE_PRESSURE_KPA;
  const tRatio = (temperatureC + 273.15) / REFERENCE_TEMPERATURE_K;
  const t = temperatureC + 273.15;
  const f2 = frequencyHz * frequencyHz;
  const frO = pRatio * (24 + (4.04e4 * h * (0.02 + h)) / (0.391 + h));
  const frN = pRatio * tRatio ** -0.5 * (9 + 280 * h * Math.exp(-4.17 * (tRatio ** (-1 / 3) - 1)));
  const alphaDbPerM =
    8.686 *
    f2 *
    (1.84e-11 * (1 / pRatio) * tRatio ** 0.5 +
      tRatio ** -2.5 *
        ((0.01275 * Math.exp(-2239.1 / t)) / (frO + f2 / frO) + (0.1068 * Math.exp(-3352.0 / t)) / (frN + f2 / frN)));
  return alphaDbPerM * 1000;
}

/**
 * Pure-tone atmospheric absorption coefficient α, dB/km (clause 6):
 *
 * f_rO = (p_a/p_r)·(24 + 4.04·10⁴·h·(0.02 + h)/(0.391 + h))                       (eq. 3)
 * f_rN = (p_a/p_r)·(T/T0)^(−1/2)·(9 + 280·h·exp{−4.170·[(T/T0)^(−1/3) − 1]})       (eq. 4)
 * α = 8.686·f²·{1.84·10⁻¹¹·(p_a/p_r)⁻¹·(T/T0)^(1/2)
 *       + (T/T0)^(−5/2)·[0.01275·e^(−2239.1/T)/(f_rO + f²/f_rO)
 *                       + 0.1068·e^(−3352.0/T)/(f_rN + f²/f_rN)]}  dB/m               (eq. 5)
 * with h from Annex B. Returned ×1000 in dB/km.
 * @example atmosphericAbsorptionDbPerKm(1000, 20, 70) // 4.98
 */
export function atmosphericAbsorptionDbPerKm(
  frequencyHz: number,
  temperatureC: number,
  humidityPct: number,
  pressureKPa = REFERENCE_PRESSURE_KPA,
): number {
  inRange('frequency', frequencyHz, FREQUENCY_RANGE_HZ[0], FREQUENCY_RANGE_HZ[1], 'a frequency from 50 Hz to 10 kHz');
  checkAtmosphere(temperatureC, humidityPct, pressureKPa);
  return absorptionUnchecked(frequencyHz, temperatureC, humidityPct, pressureKPa);
}

/** The last few atmospheres whose octave-band α were computed: a project uses one. */
const recentAtmospheres: {
  temperatureC: number;
  humidityPct: number;
  pressureKPa: number;
  alpha: readonly number[];
}[] = [];
const RECENT_ATMOSPHERES = 4;

/**
 * α, dB/km, in the eight octave bands for an atmosphere already checked with
 * {@link checkAtmosphere}; the array is shared and must not be changed. Computed once per
 * (temperature, humidity, pressure) among the last four asked for, so a path table of
 * thousands of paths computes it once. O(1).
 */
export function octaveBandAbsorptionUnchecked(
  temperatureC: number,
  humidityPct: number,
  pressureKPa: number,
): readonly number[] {
  for (const a of recentAtmospheres) {
    if (
      Object.is(a.temperatureC, temperatureC) &&
      Object.is(a.humidityPct, humidityPct) &&
      Object.is(a.pressureKPa, pressureKPa)
    )
      return a.alpha;
  }
  const alpha = Object.freeze(
    EXACT_MID_BAND_HZ.map((f) => absorptionUnchecked(f, temperatureC, humidityPct, pressureKPa)),
  );
  recentAtmospheres.unshift({ temperatureC, humidityPct, pressureKPa, alpha });
  if (recentAtmospheres.length > RECENT_ATMOSPHERES) recentAtmospheres.pop();
  return alpha;
}

/**
 * α, dB/km, in the eight octave bands 63 Hz … 8 kHz, evaluated at the exact mid-band
 * frequencies (as ISO 9613-2:1996 Table 2 is). A new array on every call.
 * @example octaveBandAbsorptionDbPerKm(10, 70) // [0.12, 0.41, 1.04, 1.93, 3.66, 9.66, 32.8, 117]
 */
export function octaveBandAbsorptionDbPerKm(
  temperatureC: number,
  humidityPct: number,
  pressureKPa = REFERENCE_PRESSURE_KPA,
): number[] {
  checkAtmosphere(temperatureC, humidityPct, pressureKPa);
  return octaveBandAbsorptionUnchecked(temperatureC, humidityPct, pressureKPa).slice();
}

/** Molar concentration of water vapour h, %, for which ISO 9613-1:1993 states its accuracy (clause 7: about 0.05 % to 5 %). */
export const WATER_VAPOUR_ACCURACY_RANGE_PCT = [0.05, 5] as const;

/**
 * A note when an atmosphere lies outside the range for which ISO 9613-1:1993 states its
 * accuracy (clause 7: molar concentration of water vapour about 0.05 % to 5 %, temperature
 * −20 °C to +50 °C, pressure below 200 kPa; the last two are refused by
 * {@link checkAtmosphere}), or undefined inside it.
 * @example absorptionAccuracyNote(-20, 10) // "… water vapour h = 0.010 % …"
 */
export function absorptionAccuracyNote(
  temperatureC: number,
  humidityPct: number,
  pressureKPa = REFERENCE_PRESSURE_KPA,
): string | undefined {
  const h = waterVapourMolarConcentrationPct(temperatureC, humidityPct, pressureKPa);
  const [low, high] = WATER_VAPOUR_ACCURACY_RANGE_PCT;
  if (h >= low && h <= high) return undefined;
  return `Atmospheric absorption: molar concentration of water vapour h = ${h < 0.1 ? h.toFixed(3) : h.toFixed(2)} % at ${temperatureC} °C and ${humidityPct} % relative humidity lies outside ${low} % to ${high} %, the range for which ISO 9613-1:1993 states its accuracy.`;
}
